import { randomBytes } from 'node:crypto';
import pg from 'pg';

/**
 * Creates an empty database on the PostgreSQL server `serverUrl` points at (any database on it
 * will do for connecting) and returns its address and a way to drop it again.
 */
export async function freshPostgresDatabase(serverUrl: string) {
	const name = `jm_test_${process.pid}_${randomBytes(4).toString('hex')}`;
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
