import {
	DataTypes,
	Model,
	type CreationOptional,
	type ForeignKey,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';
import type { Programme } from './Programme';

/** An intake of apprentices on one programme. */
export class Cohort extends Model<InferAttributes<Cohort>, InferCreationAttributes<Cohort>> {
	declare id: CreationOptional<number>;
	declare name: string;
	declare programmeId: ForeignKey<Programme['id']>;
	declare startDate: string;
	declare plannedEndDate: string;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		Cohort.init(
			{
				id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
				name: { type: DataTypes.STRING(120), allowNull: false },
				startDate: { type: DataTypes.DATEONLY, allowNull: false },
				plannedEndDate: { type: DataTypes.DATEONLY, allowNull: false },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'cohorts' }
		);
	}
}
