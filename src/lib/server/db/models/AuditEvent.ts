import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';

/** One link of the audit hash chain; `content` is the canonical JSON that was hashed. */
export class AuditEvent extends Model<
	InferAttributes<AuditEvent>,
	InferCreationAttributes<AuditEvent>
> {
	declare id: CreationOptional<number>;
	declare at: Date;
	declare actorId: string | null;
	declare kind: string;
	declare subject: string;
	declare content: string;
	declare previousHash: string;
	declare hash: string;

	static initModel(sequelize: Sequelize) {
		AuditEvent.init(
			{
				id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
				at: { type: DataTypes.DATE, allowNull: false },
				actorId: { type: DataTypes.STRING(40), allowNull: true },
				kind: { type: DataTypes.STRING(40), allowNull: false },
				subject: { type: DataTypes.STRING(60), allowNull: false },
				content: { type: DataTypes.TEXT, allowNull: false },
				previousHash: { type: DataTypes.STRING(64), allowNull: false },
				hash: { type: DataTypes.STRING(64), allowNull: false, unique: true }
			},
			{ sequelize, tableName: 'audit_events', timestamps: false }
		);
	}
}
