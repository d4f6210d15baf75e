import { DataTypes, type QueryInterface } from 'sequelize';

/** Photos a journeyworker attaches to a sign-off; their SHA-256 is part of the signed content. */
export async function up({ context: q }: { context: QueryInterface }) {
	await q.createTable('sign_off_photos', {
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		sign_off_id: {
			type: DataTypes.INTEGER,
			allowNull: false,
			references: { model: 'sign_offs', key: 'id' },
			onDelete: 'RESTRICT'
		},
		mime: { type: DataTypes.STRING(60), allowNull: false },
		bytes: { type: DataTypes.INTEGER, allowNull: false },
		sha256: { type: DataTypes.STRING(64), allowNull: false },
		storage_key: { type: DataTypes.STRING(80), allowNull: false, unique: true },
		thumbnail_key: { type: DataTypes.STRING(80), allowNull: true }
	});
	await q.addIndex('sign_off_photos', ['sign_off_id']);
}

export async function down({ context: q }: { context: QueryInterface }) {
	await q.dropTable('sign_off_photos');
}
