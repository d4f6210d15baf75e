import {
	DataTypes,
	Model,
	type CreationOptional,
	type ForeignKey,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';
import type { User } from './User';

export const RTI_RESULTS = ['attended', 'passed', 'failed', 'in progress'] as const;
export type RtiResult = (typeof RTI_RESULTS)[number];

/** Related technical instruction: classroom or online hours, confirmed by the coordinator. */
export class RtiRecord extends Model<
	InferAttributes<RtiRecord>,
	InferCreationAttributes<RtiRecord>
> {
	declare id: CreationOptional<number>;
	declare apprenticeId: ForeignKey<User['id']>;
	declare course: string;
	declare provider: string;
	declare completedOn: string;
	declare tenths: number;
	declare result: RtiResult;
	declare enteredById: ForeignKey<User['id']>;
	declare confirmedById: ForeignKey<User['id']> | null;
	declare confirmedAt: Date | null;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		RtiRecord.init(
			{
				id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
				course: { type: DataTypes.STRING(160), allowNull: false },
				provider: { type: DataTypes.STRING(160), allowNull: false },
				completedOn: { type: DataTypes.DATEONLY, allowNull: false },
				tenths: { type: DataTypes.INTEGER, allowNull: false },
				result: { type: DataTypes.STRING(12), allowNull: false },
				confirmedAt: { type: DataTypes.DATE, allowNull: true },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'rti_records' }
		);
	}
}
