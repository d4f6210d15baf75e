import { SequelizeStorage, Umzug } from 'umzug';
import { config, withoutPassword } from '../config';
import { openDatabase, WriteQueue } from './connection';
import { STATEMENTS } from './dialect';
import { migrations } from './migrations';
import { initModels } from './models';

export * from './models';

/** The one database of this process. */
export const sequelize = openDatabase(
	config.database,
	process.env.DB_LOG === '1',
	config.DATABASE_POOL_MAX
);
initModels(sequelize);

/**
 * A second connection to the same file for the heaviest read-only aggregates. SQLite runs one
 * statement at a time per connection; in WAL mode a second reader works beside the first, so a
 * dashboard's queries share the machine's cores. Never write through it. PostgreSQL's pool
 * already runs queries side by side, so there it is the same pool.
 */
export const reader =
	config.database.dialect === 'sqlite'
		? openDatabase(config.database, process.env.DB_LOG === '1')
		: sequelize;

const queue = new WriteQueue(sequelize);

/** Runs `work` in an IMMEDIATE transaction, queued behind every other write of this process. */
export const write = queue.run.bind(queue);

export function migrator() {
	return new Umzug({
		migrations,
		context: sequelize.getQueryInterface(),
		storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
		logger: undefined
	});
}

let ready: Promise<void> | undefined;

/** The database address with any password hidden, for messages. */
export const databaseLabel =
	config.database.dialect === 'sqlite'
		? config.database.path
		: withoutPassword(config.database.url);

/**
 * Checks the database answers (and refuses to go on with a clear message when not), switches
 * SQLite to WAL, applies pending migrations and refreshes planner statistics, once per process.
 * On PostgreSQL the migrations run under a session advisory lock, so instances starting
 * together migrate once.
 */
export function prepare(): Promise<void> {
	ready ??= (async () => {
		await checkDatabase();
		if (sequelize.getDialect() === 'sqlite') {
			await sequelize.query(STATEMENTS.walMode);
			await migrator().up();
		} else {
			await migrateLocked();
		}
		await analyse();
	})();
	return ready;
}

/** Throws a clear message unless the database answers; reads only, so nothing is written. */
export async function checkDatabase(): Promise<void> {
	try {
		await sequelize.authenticate();
	} catch (err) {
		throw new Error(
			`The database at ${databaseLabel} could not be opened: ${(err as Error).message}`,
			{
				cause: err
			}
		);
	}
}

const MIGRATION_LOCK = 0x4a4d_0002;

async function migrateLocked() {
	// Session-level locks belong to one connection: hold one for the whole run.
	const manager = sequelize.connectionManager as unknown as {
		getConnection(): Promise<{ query(sql: string): Promise<unknown> }>;
		releaseConnection(connection: unknown): Promise<void>;
	};
	const connection = await manager.getConnection();
	try {
		await connection.query(STATEMENTS.sessionLock(MIGRATION_LOCK));
		try {
			await migrator().up();
		} finally {
			await connection.query(STATEMENTS.sessionUnlock(MIGRATION_LOCK));
		}
	} finally {
		await manager.releaseConnection(connection);
	}
}

/**
 * Refreshes the statistics SQLite's planner uses. Without them it takes `status = ?` for a
 * selective test and walks most of the work log where a small index would do. A sampled
 * analysis misjudges the mostly-empty `corrects_id` column the same way, so it is a full one:
 * about 0.3 s on the benchmark's quarter-million entries.
 */
export async function analyse(): Promise<void> {
	await sequelize.query('ANALYZE');
}
