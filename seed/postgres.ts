import { randomBytes } from 'node:crypto';
import pg from 'pg';

export interface FreshDatabase {
	name: string;
	url: string;
	drop(): Promise<void>;
}

/**
 * Creates an empty database named `<prefix>_<pid>_<random>` on the PostgreSQL server
 * `serverUrl` points at (any database on it will do for connecting) and returns its address
 * and a way to drop it again. The integration tests, the two-instance test and
 * `bench --postgres` each make theirs here.
 */
export async function freshPostgresDatabase(
	serverUrl: string,
	prefix = 'jm_test'
): Promise<FreshDatabase> {
	const name = `${prefix}_${process.pid}_${randomBytes(4).toString('hex')}`;
	const admin = new pg.Client({ connectionString: serverUrl });
	await admin.connect();
	try {
		await admin.query(`CREATE DATABASE ${name}`);
	} finally {
		await admin.end();
	}
	const url = new URL(serverUrl);
	url.pathname = `/${name}`;
	return {
		name,
		url: url.toString(),
		async drop() {
			const again = new pg.Client({ connectionString: serverUrl });
			await again.connect();
			try {
				await again.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
			} finally {
				await again.end();
			}
		}
	};
}
