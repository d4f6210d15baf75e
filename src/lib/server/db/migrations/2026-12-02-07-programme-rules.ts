import { DataTypes, type QueryInterface } from 'sequelize';

const COVERING = ['apprentice_id', 'status', 'work_date', 'tenths', 'standard_tenths'];

/**
 * Programme rules the progress engine needs beyond the foundation: how the ratio is counted
 * and when an apprentice is flagged at risk; plus the indexes its aggregate queries use.
 */
export async function up({ context: q }: { context: QueryInterface }) {
	await q.addColumn('programmes', 'ratio_rule', {
		type: DataTypes.STRING(20),
		allowNull: false,
		defaultValue: 'fixed'
	});
	await q.addColumn('programmes', 'ratio_every', {
		type: DataTypes.INTEGER,
		allowNull: false,
		defaultValue: 3
	});
	await q.addColumn('programmes', 'stall_weeks', {
		type: DataTypes.INTEGER,
		allowNull: false,
		defaultValue: 4
	});
	await q.addColumn('programmes', 'returned_limit', {
		type: DataTypes.INTEGER,
		allowNull: false,
		defaultValue: 5
	});
	// Covering indexes for the progress engine's aggregates: sums by status and apprentice, and
	// weekly sums over a date range, are read from the index without touching the table.
	// Replaces (apprentice_id, work_date): grouping by apprentice and status reads it in order.
	await q.removeIndex('log_entries', ['apprentice_id', 'work_date']);
	await q.addIndex('log_entries', COVERING);
	await q.addIndex('log_entries', ['corrects_id', 'status']);
	await q.addIndex('sign_offs', ['apprentice_id', 'task_id', 'kind', 'level']);
	await q.addIndex('rti_records', ['apprentice_id', 'confirmed_at']);
}

export async function down({ context: q }: { context: QueryInterface }) {
	await q.removeIndex('rti_records', ['apprentice_id', 'confirmed_at']);
	await q.removeIndex('sign_offs', ['apprentice_id', 'task_id', 'kind', 'level']);
	await q.removeIndex('log_entries', ['corrects_id', 'status']);
	await q.removeIndex('log_entries', COVERING);
	await q.addIndex('log_entries', ['apprentice_id', 'work_date']);
	for (const column of ['returned_limit', 'stall_weeks', 'ratio_every', 'ratio_rule']) {
		await q.removeColumn('programmes', column);
	}
}
