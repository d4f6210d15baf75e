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
import type { User } from './User';

/** Which questions were drawn, in which option order; stored so answers are scored server-side. */
export interface DrawnQuestion {
	questionId: number;
	order: number[];
}

export class QuizAttempt extends Model<
	InferAttributes<QuizAttempt>,
	InferCreationAttributes<QuizAttempt>
> {
	declare id: CreationOptional<number>;
	declare apprenticeId: ForeignKey<User['id']>;
	declare taskId: ForeignKey<Task['id']>;
	declare drawn: DrawnQuestion[];
	declare passMark: number;
	declare answers: Record<string, number[]> | null;
	declare correct: number | null;
	declare total: number;
	declare percent: number | null;
	declare passed: boolean | null;
	declare startedAt: Date;
	declare submittedAt: Date | null;

	static initModel(sequelize: Sequelize) {
		QuizAttempt.init(
			{
				id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
				drawn: { type: DataTypes.JSON, allowNull: false },
				passMark: { type: DataTypes.INTEGER, allowNull: false },
				answers: { type: DataTypes.JSON, allowNull: true },
				correct: { type: DataTypes.INTEGER, allowNull: true },
				total: { type: DataTypes.INTEGER, allowNull: false },
				percent: { type: DataTypes.FLOAT, allowNull: true },
				passed: { type: DataTypes.BOOLEAN, allowNull: true },
				startedAt: { type: DataTypes.DATE, allowNull: false },
				submittedAt: { type: DataTypes.DATE, allowNull: true }
			},
			{ sequelize, tableName: 'quiz_attempts', timestamps: false }
		);
	}
}
