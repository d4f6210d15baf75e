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

/** A system of the vehicle (or shop safety) holding tasks, within one framework version. */
export class Area extends Model<InferAttributes<Area>, InferCreationAttributes<Area>> {
	declare id: CreationOptional<number>;
	declare frameworkId: ForeignKey<Framework['id']>;
	declare code: string;
	declare name: string;
	declare position: number;

	static initModel(sequelize: Sequelize) {
		Area.init(
			{
				id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
				code: { type: DataTypes.STRING(3), allowNull: false },
				name: { type: DataTypes.STRING(120), allowNull: false },
				position: { type: DataTypes.INTEGER, allowNull: false }
			},
			{ sequelize, tableName: 'framework_areas', timestamps: false }
		);
	}
}
