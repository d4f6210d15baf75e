import { DataTypes, type QueryInterface } from 'sequelize';

const id = { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true };
const stamps = {
	created_at: { type: DataTypes.DATE, allowNull: false },
	updated_at: { type: DataTypes.DATE, allowNull: false }
};
const user = (allowNull = false) => ({
	type: DataTypes.STRING(40),
	allowNull,
	references: { model: 'users', key: 'id' },
	onDelete: allowNull ? 'SET NULL' : 'RESTRICT'
});

export async function up({ context: q }: { context: QueryInterface }) {
	await q.createTable('log_entries', {
		id,
		apprentice_id: user(),
		supervisor_id: user(),
		work_date: { type: DataTypes.DATEONLY, allowNull: false },
		start_time: { type: DataTypes.STRING(5), allowNull: true },
		end_time: { type: DataTypes.STRING(5), allowNull: true },
		tenths: { type: DataTypes.INTEGER, allowNull: false },
		repair_order: { type: DataTypes.STRING(30), allowNull: false },
		vehicle_year: { type: DataTypes.INTEGER, allowNull: true },
		vehicle_make: { type: DataTypes.STRING(40), allowNull: false, defaultValue: '' },
		vehicle_model: { type: DataTypes.STRING(60), allowNull: false, defaultValue: '' },
		vin: { type: DataTypes.STRING(17), allowNull: true },
		vin_check_overridden: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
		odometer: { type: DataTypes.INTEGER, allowNull: true },
		odometer_unit: { type: DataTypes.STRING(2), allowNull: false, defaultValue: 'mi' },
		standard_tenths: { type: DataTypes.INTEGER, allowNull: true },
		notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
		status: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'draft' },
		return_comment: { type: DataTypes.TEXT, allowNull: true },
		submitted_at: { type: DataTypes.DATE, allowNull: true },
		reviewed_at: { type: DataTypes.DATE, allowNull: true },
		reviewed_by_id: user(true),
		corrects_id: {
			type: DataTypes.INTEGER,
			allowNull: true,
			references: { model: 'log_entries', key: 'id' },
			onDelete: 'RESTRICT'
		},
		...stamps
	});
	await q.addIndex('log_entries', ['apprentice_id', 'work_date']);
	await q.addIndex('log_entries', ['supervisor_id', 'status']);
	await q.addIndex('log_entries', ['status', 'work_date']);
	await q.createTable('log_entry_tasks', {
		id,
		entry_id: {
			type: DataTypes.INTEGER,
			allowNull: false,
			references: { model: 'log_entries', key: 'id' },
			onDelete: 'CASCADE'
		},
		task_id: {
			type: DataTypes.INTEGER,
			allowNull: false,
			references: { model: 'framework_tasks', key: 'id' },
			onDelete: 'RESTRICT'
		},
		tenths: { type: DataTypes.INTEGER, allowNull: false }
	});
	await q.addIndex('log_entry_tasks', ['entry_id', 'task_id'], { unique: true });
	await q.addIndex('log_entry_tasks', ['task_id']);
	await q.createTable('evidence', {
		id,
		entry_id: {
			type: DataTypes.INTEGER,
			allowNull: false,
			references: { model: 'log_entries', key: 'id' },
			onDelete: 'CASCADE'
		},
		uploaded_by_id: user(),
		kind: { type: DataTypes.STRING(8), allowNull: false },
		mime: { type: DataTypes.STRING(60), allowNull: false },
		bytes: { type: DataTypes.INTEGER, allowNull: false },
		storage_key: { type: DataTypes.STRING(80), allowNull: false, unique: true },
		thumbnail_key: { type: DataTypes.STRING(80), allowNull: true },
		original_name: { type: DataTypes.STRING(120), allowNull: false },
		...stamps
	});
	await q.addIndex('evidence', ['entry_id']);
	await q.createTable('rti_records', {
		id,
		apprentice_id: user(),
		course: { type: DataTypes.STRING(160), allowNull: false },
		provider: { type: DataTypes.STRING(160), allowNull: false },
		completed_on: { type: DataTypes.DATEONLY, allowNull: false },
		tenths: { type: DataTypes.INTEGER, allowNull: false },
		result: { type: DataTypes.STRING(12), allowNull: false },
		entered_by_id: user(),
		confirmed_by_id: user(true),
		confirmed_at: { type: DataTypes.DATE, allowNull: true },
		...stamps
	});
	await q.addIndex('rti_records', ['apprentice_id', 'completed_on']);
}

export async function down({ context: q }: { context: QueryInterface }) {
	for (const table of ['rti_records', 'evidence', 'log_entry_tasks', 'log_entries']) {
		await q.dropTable(table);
	}
}
