import {
	DataTypes,
	Model,
	type CreationOptional,
	type ForeignKey,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';
import type { QuestionOptionDef } from '../../../framework/types';
import type { Task } from './Task';

/** A knowledge-check question in a task's bank; the options hold which answers are correct. */
export class TaskQuestion extends Model<
	InferAttributes<TaskQuestion>,
	InferCreationAttributes<TaskQuestion>
> {
	declare id: CreationOptional<number>;
	declare taskId: ForeignKey<Task['id']>;
	declare position: number;
	declare prompt: string;
	declare explanation: string;
	declare options: QuestionOptionDef[];

	static initModel(sequelize: Sequelize) {
		TaskQuestion.init(
			{
				id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
				position: { type: DataTypes.INTEGER, allowNull: false },
				prompt: { type: DataTypes.TEXT, allowNull: false },
				explanation: { type: DataTypes.TEXT, allowNull: false },
				options: { type: DataTypes.JSON, allowNull: false }
			},
			{ sequelize, tableName: 'task_questions', timestamps: false }
		);
	}
}
