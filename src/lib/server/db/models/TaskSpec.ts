import {
	DataTypes,
	Model,
	type CreationOptional,
	type ForeignKey,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';
import type { SpecLimit } from '../../../framework/types';
import type { Unit } from '../../../units';
import type { Task } from './Task';

/** A specification value, stored in SI with the unit it was entered in. */
export class TaskSpec extends Model<InferAttributes<TaskSpec>, InferCreationAttributes<TaskSpec>> {
	declare id: CreationOptional<number>;
	declare taskId: ForeignKey<Task['id']>;
	declare position: number;
	declare label: string;
	declare valueSi: number;
	declare unit: Unit;
	declare limitKind: SpecLimit;

	static initModel(sequelize: Sequelize) {
		TaskSpec.init(
			{
				id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
				position: { type: DataTypes.INTEGER, allowNull: false },
				label: { type: DataTypes.STRING(200), allowNull: false },
				valueSi: { type: DataTypes.DOUBLE, allowNull: false },
				unit: { type: DataTypes.STRING(8), allowNull: false },
				limitKind: { type: DataTypes.STRING(8), allowNull: false }
			},
			{ sequelize, tableName: 'task_specs', timestamps: false }
		);
	}
}
