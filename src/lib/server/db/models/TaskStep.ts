import {
	DataTypes,
	Model,
	type CreationOptional,
	type ForeignKey,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';
import type { Task } from './Task';

/** One item of a task's performance checklist, as an assessor watches it. */
export class TaskStep extends Model<InferAttributes<TaskStep>, InferCreationAttributes<TaskStep>> {
	declare id: CreationOptional<number>;
	declare taskId: ForeignKey<Task['id']>;
	declare position: number;
	declare text: string;
	declare safety: boolean;

	static initModel(sequelize: Sequelize) {
		TaskStep.init(
			{
				id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
				position: { type: DataTypes.INTEGER, allowNull: false },
				text: { type: DataTypes.TEXT, allowNull: false },
				safety: { type: DataTypes.BOOLEAN, allowNull: false }
			},
			{ sequelize, tableName: 'task_steps', timestamps: false }
		);
	}
}
