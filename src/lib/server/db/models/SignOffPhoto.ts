import {
	DataTypes,
	Model,
	type CreationOptional,
	type ForeignKey,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';
import type { SignOff } from './SignOff';

/** A photo taken at the assessment; stored like work-log evidence, never changed. */
export class SignOffPhoto extends Model<
	InferAttributes<SignOffPhoto>,
	InferCreationAttributes<SignOffPhoto>
> {
	declare id: CreationOptional<number>;
	declare signOffId: ForeignKey<SignOff['id']>;
	declare mime: string;
	declare bytes: number;
	declare sha256: string;
	declare storageKey: string;
	declare thumbnailKey: string | null;

	static initModel(sequelize: Sequelize) {
		SignOffPhoto.init(
			{
				id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
				mime: { type: DataTypes.STRING(60), allowNull: false },
				bytes: { type: DataTypes.INTEGER, allowNull: false },
				sha256: { type: DataTypes.STRING(64), allowNull: false },
				storageKey: { type: DataTypes.STRING(80), allowNull: false, unique: true },
				thumbnailKey: { type: DataTypes.STRING(80), allowNull: true }
			},
			{ sequelize, tableName: 'sign_off_photos', timestamps: false }
		);
	}
}
