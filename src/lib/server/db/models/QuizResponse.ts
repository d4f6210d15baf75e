import {
	DataTypes,
	Model,
	type CreationOptional,
	type ForeignKey,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';
import type { QuizAttempt } from './QuizAttempt';
import type { TaskQuestion } from './TaskQuestion';

/** Whether one drawn question was answered correctly; item statistics aggregate these in SQL. */
export class QuizResponse extends Model<
	InferAttributes<QuizResponse>,
	InferCreationAttributes<QuizResponse>
> {
	declare id: CreationOptional<number>;
	declare attemptId: ForeignKey<QuizAttempt['id']>;
	declare questionId: ForeignKey<TaskQuestion['id']>;
	declare correct: boolean;

	static initModel(sequelize: Sequelize) {
		QuizResponse.init(
			{
				id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
				correct: { type: DataTypes.BOOLEAN, allowNull: false }
			},
			{ sequelize, tableName: 'quiz_responses', timestamps: false }
		);
	}
}
