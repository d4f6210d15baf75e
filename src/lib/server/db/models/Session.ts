import {
	DataTypes,
	Model,
	type ForeignKey,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';
import type { User } from './User';

export class Session extends Model<InferAttributes<Session>, InferCreationAttributes<Session>> {
	declare id: string;
	declare userId: ForeignKey<User['id']>;
	declare expiresAt: Date;

	static initModel(sequelize: Sequelize) {
		Session.init(
			{
				id: { type: DataTypes.STRING(64), primaryKey: true },
				expiresAt: { type: DataTypes.DATE, allowNull: false }
			},
			{ sequelize, tableName: 'sessions', timestamps: false }
		);
	}
}
