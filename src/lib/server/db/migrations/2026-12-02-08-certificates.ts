import { DataTypes, type QueryInterface } from 'sequelize';

const user = (allowNull = false) => ({
	type: DataTypes.STRING(40),
	allowNull,
	references: { model: 'users', key: 'id' },
	onDelete: 'RESTRICT'
});

/**
 * Issued certificates. `content` is the canonical JSON that `signature` covers; status words are
 * stored as issued/revoked only, since expiry follows from `expires_at` and the clock.
 */
export async function up({ context: q }: { context: QueryInterface }) {
	await q.createTable('certificates', {
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		serial: { type: DataTypes.STRING(32), allowNull: false, unique: true },
		apprentice_id: user(),
		programme_id: {
			type: DataTypes.INTEGER,
			allowNull: false,
			references: { model: 'programmes', key: 'id' },
			onDelete: 'RESTRICT'
		},
		scope_kind: { type: DataTypes.STRING(12), allowNull: false },
		scope_code: { type: DataTypes.STRING(20), allowNull: false },
		holder: { type: DataTypes.STRING(120), allowNull: false },
		title: { type: DataTypes.STRING(240), allowNull: false },
		content: { type: DataTypes.TEXT, allowNull: false },
		key_id: { type: DataTypes.STRING(64), allowNull: false },
		signature: { type: DataTypes.STRING(128), allowNull: false },
		status_index: { type: DataTypes.INTEGER, allowNull: false, unique: true },
		issued_at: { type: DataTypes.DATE, allowNull: false },
		expires_at: { type: DataTypes.DATE, allowNull: true },
		issued_by_id: user(),
		revoked_at: { type: DataTypes.DATE, allowNull: true },
		revoked_by_id: user(true),
		revocation_reason: { type: DataTypes.STRING(24), allowNull: true },
		revocation_note: { type: DataTypes.TEXT, allowNull: true }
	});
	await q.addIndex('certificates', ['apprentice_id', 'scope_kind', 'scope_code']);
}

export async function down({ context: q }: { context: QueryInterface }) {
	await q.dropTable('certificates');
}
