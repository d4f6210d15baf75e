import {
	DataTypes,
	Model,
	type CreationOptional,
	type ForeignKey,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';
import { REVOCATION_REASONS, type RevocationReason } from '../../../certificates';
import type { Programme } from './Programme';
import type { User } from './User';

export const SCOPE_KINDS = ['programme', 'area'] as const;
export type ScopeKind = (typeof SCOPE_KINDS)[number];

export { REVOCATION_REASONS, type RevocationReason };

/**
 * A signed certificate. Never edited after issue except to record its revocation; the signed
 * `content` and `signature` never change.
 */
export class Certificate extends Model<
	InferAttributes<Certificate>,
	InferCreationAttributes<Certificate>
> {
	declare id: CreationOptional<number>;
	declare serial: string;
	declare apprenticeId: ForeignKey<User['id']>;
	declare programmeId: ForeignKey<Programme['id']>;
	declare scopeKind: ScopeKind;
	/** The area code for an interim credential; empty for programme completion. */
	declare scopeCode: string;
	declare holder: string;
	declare title: string;
	declare content: string;
	declare keyId: string;
	declare signature: string;
	/** Position in the revocation status list. */
	declare statusIndex: number;
	declare issuedAt: Date;
	declare expiresAt: Date | null;
	declare issuedById: ForeignKey<User['id']>;
	declare revokedAt: Date | null;
	declare revokedById: ForeignKey<User['id']> | null;
	declare revocationReason: RevocationReason | null;
	declare revocationNote: string | null;

	static initModel(sequelize: Sequelize) {
		Certificate.init(
			{
				id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
				serial: { type: DataTypes.STRING(32), allowNull: false, unique: true },
				scopeKind: { type: DataTypes.STRING(12), allowNull: false },
				scopeCode: { type: DataTypes.STRING(20), allowNull: false },
				holder: { type: DataTypes.STRING(120), allowNull: false },
				title: { type: DataTypes.STRING(240), allowNull: false },
				content: { type: DataTypes.TEXT, allowNull: false },
				keyId: { type: DataTypes.STRING(64), allowNull: false },
				signature: { type: DataTypes.STRING(128), allowNull: false },
				statusIndex: { type: DataTypes.INTEGER, allowNull: false, unique: true },
				issuedAt: { type: DataTypes.DATE, allowNull: false },
				expiresAt: { type: DataTypes.DATE, allowNull: true },
				revokedAt: { type: DataTypes.DATE, allowNull: true },
				revocationReason: { type: DataTypes.STRING(24), allowNull: true },
				revocationNote: { type: DataTypes.TEXT, allowNull: true }
			},
			{ sequelize, tableName: 'certificates', timestamps: false }
		);
	}
}
