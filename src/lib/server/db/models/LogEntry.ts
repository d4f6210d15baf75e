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

export const ENTRY_STATUSES = ['draft', 'submitted', 'verified', 'returned'] as const;
export type EntryStatus = (typeof ENTRY_STATUSES)[number];

/** Supervised work on one repair; hours are integer tenths so sums are exact. */
export class LogEntry extends Model<InferAttributes<LogEntry>, InferCreationAttributes<LogEntry>> {
	declare id: CreationOptional<number>;
	declare apprenticeId: ForeignKey<User['id']>;
	declare supervisorId: ForeignKey<User['id']>;
	declare workDate: string;
	declare startTime: string | null;
	declare endTime: string | null;
	declare tenths: number;
	declare repairOrder: string;
	declare vehicleYear: number | null;
	declare vehicleMake: string;
	declare vehicleModel: string;
	declare vin: string | null;
	/** The apprentice confirmed a VIN whose check digit does not match (pre-1981, imports). */
	declare vinCheckOverridden: CreationOptional<boolean>;
	declare odometer: number | null;
	declare odometerUnit: CreationOptional<'km' | 'mi'>;
	/** Standard (flat-rate) labour time for the job, in tenths, for efficiency. */
	declare standardTenths: number | null;
	declare notes: CreationOptional<string>;
	declare status: CreationOptional<EntryStatus>;
	declare returnComment: string | null;
	declare submittedAt: Date | null;
	declare reviewedAt: Date | null;
	declare reviewedById: ForeignKey<User['id']> | null;
	/** A correction points at the verified entry it corrects. */
	declare correctsId: ForeignKey<LogEntry['id']> | null;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		LogEntry.init(
			{
				id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
				workDate: { type: DataTypes.DATEONLY, allowNull: false },
				startTime: { type: DataTypes.STRING(5), allowNull: true },
				endTime: { type: DataTypes.STRING(5), allowNull: true },
				tenths: { type: DataTypes.INTEGER, allowNull: false },
				repairOrder: { type: DataTypes.STRING(30), allowNull: false },
				vehicleYear: { type: DataTypes.INTEGER, allowNull: true },
				vehicleMake: { type: DataTypes.STRING(40), allowNull: false, defaultValue: '' },
				vehicleModel: { type: DataTypes.STRING(60), allowNull: false, defaultValue: '' },
				vin: { type: DataTypes.STRING(17), allowNull: true },
				vinCheckOverridden: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
				odometer: { type: DataTypes.INTEGER, allowNull: true },
				odometerUnit: { type: DataTypes.STRING(2), allowNull: false, defaultValue: 'mi' },
				standardTenths: { type: DataTypes.INTEGER, allowNull: true },
				notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
				status: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'draft' },
				returnComment: { type: DataTypes.TEXT, allowNull: true },
				submittedAt: { type: DataTypes.DATE, allowNull: true },
				reviewedAt: { type: DataTypes.DATE, allowNull: true },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'log_entries' }
		);
	}
}
