import {
	DataTypes,
	Model,
	type CreationOptional,
	type ForeignKey,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';
import type { LogEntry } from './LogEntry';
import type { Task } from './Task';

/** The share of an entry's time spent practising one task. */
export class LogEntryTask extends Model<
	InferAttributes<LogEntryTask>,
	InferCreationAttributes<LogEntryTask>
> {
	declare id: CreationOptional<number>;
	declare entryId: ForeignKey<LogEntry['id']>;
	declare taskId: ForeignKey<Task['id']>;
	declare tenths: number;

	static initModel(sequelize: Sequelize) {
		LogEntryTask.init(
			{
				id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
				tenths: { type: DataTypes.INTEGER, allowNull: false }
			},
			{ sequelize, tableName: 'log_entry_tasks', timestamps: false }
		);
	}
}
