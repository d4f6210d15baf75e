import { SequelizeStorage, Umzug } from 'umzug';
import { config } from '../config';
import { openSequelize, WriteQueue } from './connection';
import { migrations } from './migrations';
import { initModels } from './models';

export * from './models';

/** The one database of this process. */
export const sequelize = openSequelize(config.databasePath, process.env.DB_LOG === '1');
initModels(sequelize);

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

/** Switches on WAL and applies pending migrations, once per process. */
export function prepare(): Promise<void> {
	ready ??= (async () => {
		await sequelize.query('PRAGMA journal_mode = WAL');
		await migrator().up();
	})();
	return ready;
}
