import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';

/** A shop where apprentices work. */
export class Site extends Model<InferAttributes<Site>, InferCreationAttributes<Site>> {
	declare id: CreationOptional<number>;
	declare code: string;
	declare name: string;
	declare town: string;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		Site.init(
			{
				id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
				code: { type: DataTypes.STRING(12), allowNull: false, unique: true },
				name: { type: DataTypes.STRING(120), allowNull: false },
				town: { type: DataTypes.STRING(120), allowNull: false, defaultValue: '' },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'sites' }
		);
	}
}
