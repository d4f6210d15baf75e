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

export type TokenPurpose = 'invite' | 'reset';

/** A single-use, expiring link sent by e-mail; only the SHA-256 of the token is stored. */
export class UserToken extends Model<
	InferAttributes<UserToken>,
	InferCreationAttributes<UserToken>
> {
	declare id: CreationOptional<number>;
	declare userId: ForeignKey<User['id']>;
	declare purpose: TokenPurpose;
	declare tokenHash: string;
	declare expiresAt: Date;
	declare usedAt: Date | null;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		UserToken.init(
			{
				id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
				purpose: { type: DataTypes.STRING(10), allowNull: false },
				tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
				expiresAt: { type: DataTypes.DATE, allowNull: false },
				usedAt: { type: DataTypes.DATE, allowNull: true },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'user_tokens' }
		);
	}
}
