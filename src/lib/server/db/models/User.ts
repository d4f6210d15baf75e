import {
	DataTypes,
	Model,
	type CreationOptional,
	type ForeignKey,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';
import type { Site } from './Site';

export const ROLES = ['apprentice', 'supervisor', 'coordinator', 'admin'] as const;
export type Role = (typeof ROLES)[number];

export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
	declare id: string;
	declare email: string;
	declare name: string;
	declare role: Role;
	/** Null until the invitation is accepted. */
	declare passwordHash: string | null;
	declare active: CreationOptional<boolean>;
	declare isDemo: CreationOptional<boolean>;
	declare siteId: ForeignKey<Site['id']> | null;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		User.init(
			{
				id: { type: DataTypes.STRING(40), primaryKey: true },
				email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
				name: { type: DataTypes.STRING(120), allowNull: false },
				role: { type: DataTypes.STRING(20), allowNull: false },
				passwordHash: { type: DataTypes.STRING(200), allowNull: true },
				active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
				isDemo: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'users' }
		);
	}
}
