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

/** Which journeyworker supervises which apprentice. */
export class Supervision extends Model<
	InferAttributes<Supervision>,
	InferCreationAttributes<Supervision>
> {
	declare id: CreationOptional<number>;
	declare apprenticeId: ForeignKey<User['id']>;
	declare supervisorId: ForeignKey<User['id']>;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		Supervision.init(
			{
				id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'supervisions' }
		);
	}
}
