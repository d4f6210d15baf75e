import { SequelizeStorage, Umzug } from 'umzug';
import { config } from '../config';
import { openSequelize, WriteQueue } from './connection';
import { migrations } from './migrations';
import { initModels } from './models';

export * from './models';

/** The one database of this process. */
export const sequelize = openSequelize(config.databasePath, process.env.DB_LOG === '1');
initModels(sequelize);

/**
 * A second connection to the same file for the heaviest read-only aggregates. SQLite runs one
 * statement at a time per connection; in WAL mode a second reader works beside the first, so a
 * dashboard's queries share the machine's cores. Never write through it.
 */
export const reader = openSequelize(config.databasePath, process.env.DB_LOG === '1');

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

/** Switches on WAL, applies pending migrations and refreshes planner statistics, once per process. */
export function prepare(): Promise<void> {
	ready ??= (async () => {
		await sequelize.query('PRAGMA journal_mode = WAL');
		await migrator().up();
		await analyse();
	})();
	return ready;
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
