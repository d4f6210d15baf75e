import { Sequelize, Transaction } from 'sequelize';
import type { Database as SqliteDatabase } from 'sqlite3';

export const BUSY_TIMEOUT_MS = 10_000;

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

/**
 * Runs write transactions one after another. SQLite allows one writer at a time; queueing in
 * process keeps blocked BEGIN IMMEDIATE calls from filling libuv's thread pool.
 */
export class WriteQueue {
	#tail: Promise<unknown> = Promise.resolve();

	constructor(private readonly sequelize: Sequelize) {}

	run<T>(work: (transaction: Transaction) => Promise<T>): Promise<T> {
		const next = this.#tail.then(() => this.sequelize.transaction((t) => work(t)));
		this.#tail = next.catch(() => undefined);
		return next;
	}
}
