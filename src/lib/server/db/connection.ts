import pg from 'pg';
import { DataTypes, QueryTypes, Sequelize, Transaction } from 'sequelize';
import type { Database as SqliteDatabase } from 'sqlite3';
import type { Database } from '../config';
import { STATEMENTS } from './dialect';

export const BUSY_TIMEOUT_MS = 10_000;

// PostgreSQL returns COUNT and SUM as bigint and AVG or `* 1.0` as numeric, both as strings;
// SQLite returns numbers. Every count and sum here fits a double, so both dialects give numbers.
pg.types.setTypeParser(pg.types.builtins.INT8, (value) => Number(value));
(
	DataTypes as unknown as { postgres: { DECIMAL: { parse(v: string): unknown } } }
).postgres.DECIMAL.parse = (value) => Number(value);

/** Opens the configured database: SQLite by default, PostgreSQL for a postgres:// address. */
export function openDatabase(database: Database, logging = false, poolMax = 10): Sequelize {
	if (database.dialect === 'sqlite') return openSequelize(database.path, logging);
	const sequelize = new Sequelize(database.url, {
		dialect: 'postgres',
		logging: logging ? console.log : false,
		define: { underscored: true },
		pool: { max: poolMax, min: 0, idle: 10_000, acquire: 30_000 },
		// A server that does not answer fails the start in seconds, not minutes.
		dialectOptions: { connectionTimeoutMillis: 5_000, application_name: 'journeymark' }
	});
	textTimesInRawSelects(sequelize);
	return sequelize;
}

/**
 * Raw SELECTs on SQLite return stored times as text; PostgreSQL's driver makes Dates of them.
 * So that raw rows look the same on both, times in raw SELECT results (not model reads) are
 * given as ISO 8601 text here.
 */
function textTimesInRawSelects(sequelize: Sequelize) {
	const query = sequelize.query.bind(sequelize) as (
		sql: unknown,
		options?: unknown
	) => Promise<unknown>;
	(sequelize as unknown as { query: typeof query }).query = async (sql, options) => {
		const result = await query(sql, options);
		const o = options as { type?: string; model?: unknown; instance?: unknown } | undefined;
		if (o?.type === 'SELECT' && !o.model && !o.instance && Array.isArray(result)) {
			for (const row of result) {
				if (row && typeof row === 'object') {
					for (const key of Object.keys(row)) {
						const value = (row as Record<string, unknown>)[key];
						if (value instanceof Date) (row as Record<string, unknown>)[key] = value.toISOString();
					}
				}
			}
		}
		return result;
	};
}

/**
 * Opens SQLite through Sequelize with the settings concurrent use needs: WAL, foreign keys,
 * IMMEDIATE transactions, and a busy timeout on every connection (Sequelize runs no
 * connection hooks for SQLite, so its connection manager is wrapped).
 */
export function openSequelize(storage: string, logging = false): Sequelize {
	const sequelize = new Sequelize({
		dialect: 'sqlite',
		storage,
		logging: logging ? console.log : false,
		transactionType: Transaction.TYPES.IMMEDIATE,
		define: { underscored: true }
	});
	const manager = sequelize.connectionManager as unknown as {
		getConnection(options?: unknown): Promise<SqliteDatabase>;
	};
	const configured = new WeakSet<SqliteDatabase>();
	const getConnection = manager.getConnection.bind(manager);
	manager.getConnection = async (options) => {
		const connection = await getConnection(options);
		if (!configured.has(connection)) {
			connection.configure('busyTimeout', BUSY_TIMEOUT_MS);
			configured.add(connection);
		}
		return connection;
	};
	return sequelize;
}

/** The advisory lock every PostgreSQL write transaction holds: one number for the whole app. */
export const WRITE_LOCK = 0x4a4d_0001;

/**
 * Runs write transactions one after another. SQLite allows one writer at a time; queueing in
 * process keeps blocked BEGIN IMMEDIATE calls from filling libuv's thread pool. On PostgreSQL
 * each transaction first takes one transaction-scoped advisory lock, so writes from every
 * instance keep SQLite's one-at-a-time order: the audit chain's next link, serial numbers and
 * "not twice in a row" checks read what the previous writer committed, whichever instance it was.
 */
export class WriteQueue {
	#tail: Promise<unknown> = Promise.resolve();

	constructor(private readonly sequelize: Sequelize) {}

	run<T>(work: (transaction: Transaction) => Promise<T>): Promise<T> {
		const postgres = this.sequelize.getDialect() === 'postgres';
		const next = this.#tail.then(() =>
			this.sequelize.transaction(async (t) => {
				if (postgres) {
					await this.sequelize.query(STATEMENTS.transactionLock(WRITE_LOCK), {
						transaction: t
					});
				}
				return work(t);
			})
		);
		this.#tail = next.catch(() => undefined);
		return next;
	}
}

/**
 * After rows were stored with ids chosen by the caller (the demo's bulk loads), moves each
 * PostgreSQL id sequence past the highest id, so the next ordinary insert gets a free one.
 * SQLite picks the next id from the table itself and needs nothing.
 */
export async function syncIdSequences(sequelize: Sequelize, transaction?: Transaction) {
	if (sequelize.getDialect() !== 'postgres') return;
	const tables = await sequelize.query<{ table: string }>(STATEMENTS.sequencedTables, {
		type: QueryTypes.SELECT,
		transaction
	});
	for (const { table } of tables) {
		await sequelize.query(STATEMENTS.advanceSequence(table), { transaction });
	}
}
