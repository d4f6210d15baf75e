import {
	DataTypes,
	Model,
	type CreationOptional,
	type ForeignKey,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';
import type { Cohort } from './Cohort';
import type { User } from './User';

/** What an apprentice's record needs beyond the account. */
export class ApprenticeProfile extends Model<
	InferAttributes<ApprenticeProfile>,
	InferCreationAttributes<ApprenticeProfile>
> {
	declare userId: ForeignKey<User['id']>;
	declare cohortId: ForeignKey<Cohort['id']>;
	declare startDate: string;
	declare plannedEndDate: string;
	/** Advanced standing for prior experience, 29 CFR 29.5(b)(12). */
	declare priorCreditHours: CreationOptional<number>;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		ApprenticeProfile.init(
			{
				userId: { type: DataTypes.STRING(40), primaryKey: true },
				startDate: { type: DataTypes.DATEONLY, allowNull: false },
				plannedEndDate: { type: DataTypes.DATEONLY, allowNull: false },
				priorCreditHours: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 0 },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'apprentice_profiles' }
		);
	}
}
