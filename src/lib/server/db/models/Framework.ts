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

export const FRAMEWORK_STATUSES = ['draft', 'published', 'retired'] as const;
export type FrameworkStatus = (typeof FRAMEWORK_STATUSES)[number];

/** One version of a competency framework; published versions never change. */
export class Framework extends Model<
	InferAttributes<Framework>,
	InferCreationAttributes<Framework>
> {
	declare id: CreationOptional<number>;
	declare name: string;
	declare version: number;
	declare status: FrameworkStatus;
	declare basedOnId: ForeignKey<Framework['id']> | null;
	declare createdById: ForeignKey<User['id']> | null;
	declare publishedAt: Date | null;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		Framework.init(
			{
				id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
				name: { type: DataTypes.STRING(160), allowNull: false },
				version: { type: DataTypes.INTEGER, allowNull: false },
				status: { type: DataTypes.STRING(10), allowNull: false },
				publishedAt: { type: DataTypes.DATE, allowNull: true },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'frameworks' }
		);
	}
}
