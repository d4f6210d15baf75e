import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * State several app instances share. `verify_lookups` counts public certificate lookups per
 * address and minute (`minute` = Unix time ÷ 60 s), used when the database is PostgreSQL.
 * `coordinator_digests` holds one row per week the coordinator digest went out, claimed before
 * sending so no two instances both send it.
 */
export async function up({ context: q }: { context: QueryInterface }) {
	await q.createTable('verify_lookups', {
		address: { type: DataTypes.STRING(100), allowNull: false, primaryKey: true },
		minute: { type: DataTypes.INTEGER, allowNull: false, primaryKey: true },
		lookups: { type: DataTypes.INTEGER, allowNull: false }
	});
	await q.createTable('coordinator_digests', {
		week: { type: DataTypes.DATEONLY, allowNull: false, primaryKey: true },
		claimed_at: { type: DataTypes.DATE, allowNull: false },
		recipients: { type: DataTypes.INTEGER, allowNull: true }
	});
}

export async function down({ context: q }: { context: QueryInterface }) {
	await q.dropTable('coordinator_digests');
	await q.dropTable('verify_lookups');
}
