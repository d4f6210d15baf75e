import {
	DataTypes,
	Model,
	type CreationOptional,
	type ForeignKey,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';
import type { LogEntry } from './LogEntry';
import type { User } from './User';

/** A photo or PDF attached to a work-log entry; bytes live in storage under `storageKey`. */
export class Evidence extends Model<InferAttributes<Evidence>, InferCreationAttributes<Evidence>> {
	declare id: CreationOptional<number>;
	declare entryId: ForeignKey<LogEntry['id']>;
	declare uploadedById: ForeignKey<User['id']>;
	declare kind: 'image' | 'pdf';
	declare mime: string;
	declare bytes: number;
	declare storageKey: string;
	declare thumbnailKey: string | null;
	/** Shown to people only; never used as a path. */
	declare originalName: string;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		Evidence.init(
			{
				id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
				kind: { type: DataTypes.STRING(8), allowNull: false },
				mime: { type: DataTypes.STRING(60), allowNull: false },
				bytes: { type: DataTypes.INTEGER, allowNull: false },
				storageKey: { type: DataTypes.STRING(80), allowNull: false, unique: true },
				thumbnailKey: { type: DataTypes.STRING(80), allowNull: true },
				originalName: { type: DataTypes.STRING(120), allowNull: false },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'evidence' }
		);
	}
}
