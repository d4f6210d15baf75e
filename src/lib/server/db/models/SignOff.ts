import {
	DataTypes,
	Model,
	type CreationOptional,
	type ForeignKey,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';
import type { Framework } from './Framework';
import type { QuizAttempt } from './QuizAttempt';
import type { Task } from './Task';
import type { User } from './User';

export type SignOffKind = 'sign-off' | 'correction' | 'revocation';
export type StepResult = 'met' | 'not met' | 'n/a';

/**
 * A journeyworker's assessment of a task, never edited or deleted: corrections and revocations
 * are new rows that point back with `refersToId`.
 */
export class SignOff extends Model<InferAttributes<SignOff>, InferCreationAttributes<SignOff>> {
	declare id: CreationOptional<number>;
	declare kind: SignOffKind;
	declare apprenticeId: ForeignKey<User['id']>;
	declare taskId: ForeignKey<Task['id']>;
	declare frameworkId: ForeignKey<Framework['id']>;
	/** The journeyworker for sign-offs; the coordinator for corrections and revocations. */
	declare supervisorId: ForeignKey<User['id']>;
	declare level: 1 | 2 | 3 | 4 | null;
	declare results: Record<string, StepResult> | null;
	declare quizAttemptId: ForeignKey<QuizAttempt['id']> | null;
	declare verifiedTenths: number;
	declare notes: CreationOptional<string>;
	declare refersToId: ForeignKey<SignOff['id']> | null;
	declare reason: string | null;
	declare sessionHash: string;
	declare contentHash: string;
	declare signedAt: Date;

	static initModel(sequelize: Sequelize) {
		SignOff.init(
			{
				id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
				kind: { type: DataTypes.STRING(12), allowNull: false },
				level: { type: DataTypes.INTEGER, allowNull: true },
				results: { type: DataTypes.JSON, allowNull: true },
				verifiedTenths: { type: DataTypes.INTEGER, allowNull: false },
				notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
				reason: { type: DataTypes.TEXT, allowNull: true },
				sessionHash: { type: DataTypes.STRING(64), allowNull: false },
				contentHash: { type: DataTypes.STRING(64), allowNull: false },
				signedAt: { type: DataTypes.DATE, allowNull: false }
			},
			{ sequelize, tableName: 'sign_offs', timestamps: false }
		);
	}
}
