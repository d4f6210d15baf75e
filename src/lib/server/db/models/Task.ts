import {
	DataTypes,
	Model,
	type CreationOptional,
	type ForeignKey,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';
import type { ServiceInfoKind } from '../../../framework/types';
import type { Area } from './Area';
import type { Framework } from './Framework';

/** A task card within one framework version. */
export class Task extends Model<InferAttributes<Task>, InferCreationAttributes<Task>> {
	declare id: CreationOptional<number>;
	declare frameworkId: ForeignKey<Framework['id']>;
	declare areaId: ForeignKey<Area['id']>;
	declare code: string;
	declare title: string;
	declare description: string;
	declare tier: 1 | 2 | 3;
	declare requiredLevel: 1 | 2 | 3 | 4;
	declare minHours: number;
	declare tools: string[];
	declare cautions: string[];
	declare serviceInfo: ServiceInfoKind[];
	declare position: number;

	static initModel(sequelize: Sequelize) {
		Task.init(
			{
				id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
				code: { type: DataTypes.STRING(6), allowNull: false },
				title: { type: DataTypes.STRING(200), allowNull: false },
				description: { type: DataTypes.TEXT, allowNull: false },
				tier: { type: DataTypes.INTEGER, allowNull: false },
				requiredLevel: { type: DataTypes.INTEGER, allowNull: false },
				minHours: { type: DataTypes.FLOAT, allowNull: false },
				tools: { type: DataTypes.JSON, allowNull: false },
				cautions: { type: DataTypes.JSON, allowNull: false },
				serviceInfo: { type: DataTypes.JSON, allowNull: false },
				position: { type: DataTypes.INTEGER, allowNull: false }
			},
			{ sequelize, tableName: 'framework_tasks', timestamps: false }
		);
	}
}
