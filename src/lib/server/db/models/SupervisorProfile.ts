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

/** A journeyworker's qualification, checked before they may sign off tasks. */
export class SupervisorProfile extends Model<
	InferAttributes<SupervisorProfile>,
	InferCreationAttributes<SupervisorProfile>
> {
	declare userId: ForeignKey<User['id']>;
	declare qualification: string;
	declare qualifiedSince: string;
	declare shift: CreationOptional<'day' | 'late'>;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		SupervisorProfile.init(
			{
				userId: { type: DataTypes.STRING(40), primaryKey: true },
				qualification: { type: DataTypes.STRING(160), allowNull: false },
				qualifiedSince: { type: DataTypes.DATEONLY, allowNull: false },
				shift: { type: DataTypes.STRING(8), allowNull: false, defaultValue: 'day' },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'supervisor_profiles' }
		);
	}
}
