import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';

export const APPROACHES = ['time', 'competency', 'hybrid'] as const;
export type Approach = (typeof APPROACHES)[number];

export const RATIO_RULES = ['fixed', 'first-then-every'] as const;
export type RatioRuleKind = (typeof RATIO_RULES)[number];

/**
 * A wage step: percentage of the journeyworker rate from the given verified hours, and from a
 * number of tasks standing at their required level when `minTasks` is set.
 */
export interface WageStep {
	fromHours: number;
	percent: number;
	minTasks?: number;
}

/** The apprenticeship standard a sponsor runs; defaults follow 29 CFR 29.5. */
export class Programme extends Model<
	InferAttributes<Programme>,
	InferCreationAttributes<Programme>
> {
	declare id: CreationOptional<number>;
	declare name: string;
	declare approach: Approach;
	declare termYears: number;
	declare ojlHours: number;
	declare rtiHoursPerYear: number;
	declare probationHours: number;
	declare journeyworkerRateCents: number;
	declare wageSchedule: WageStep[];
	/** Maximum apprentices per journeyworker on one site and shift. */
	declare ratioApprentices: number;
	declare ratioJourneyworkers: number;
	/** `fixed`: apprentices per journeyworkers; `first-then-every`: 1, then 1 more per `ratioEvery`. */
	declare ratioRule: CreationOptional<RatioRuleKind>;
	declare ratioEvery: CreationOptional<number>;
	/** At-risk flags: weeks without verified hours, returned entries waiting. */
	declare stallWeeks: CreationOptional<number>;
	declare returnedLimit: CreationOptional<number>;
	declare tierThresholds: [number, number, number];
	declare certificateValidityMonths: number | null;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		Programme.init(
			{
				id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
				name: { type: DataTypes.STRING(160), allowNull: false },
				approach: { type: DataTypes.STRING(12), allowNull: false },
				termYears: { type: DataTypes.INTEGER, allowNull: false },
				ojlHours: { type: DataTypes.INTEGER, allowNull: false },
				rtiHoursPerYear: { type: DataTypes.INTEGER, allowNull: false },
				probationHours: { type: DataTypes.INTEGER, allowNull: false },
				journeyworkerRateCents: { type: DataTypes.INTEGER, allowNull: false },
				wageSchedule: { type: DataTypes.JSON, allowNull: false },
				ratioApprentices: { type: DataTypes.INTEGER, allowNull: false },
				ratioJourneyworkers: { type: DataTypes.INTEGER, allowNull: false },
				ratioRule: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'fixed' },
				ratioEvery: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 3 },
				stallWeeks: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 4 },
				returnedLimit: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 5 },
				tierThresholds: { type: DataTypes.JSON, allowNull: false },
				certificateValidityMonths: { type: DataTypes.INTEGER, allowNull: true },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'programmes' }
		);
	}
}
