import {
	DataTypes,
	Model,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';

/** Failed sign-ins counted per account and per address, kept in the database so every instance sees them. */
export class LoginThrottle extends Model<
	InferAttributes<LoginThrottle>,
	InferCreationAttributes<LoginThrottle>
> {
	/** `account:<email>` or `address:<ip>`. */
	declare key: string;
	declare failures: number;
	declare windowStart: Date;
	declare blockedUntil: Date | null;

	static initModel(sequelize: Sequelize) {
		LoginThrottle.init(
			{
				key: { type: DataTypes.STRING(300), primaryKey: true },
				failures: { type: DataTypes.INTEGER, allowNull: false },
				windowStart: { type: DataTypes.DATE, allowNull: false },
				blockedUntil: { type: DataTypes.DATE, allowNull: true }
			},
			{ sequelize, tableName: 'login_throttles', timestamps: false }
		);
	}
}
