import { DataTypes, type QueryInterface } from 'sequelize';

const id = { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true };
const ref = (model: string) => ({
	type: DataTypes.INTEGER,
	allowNull: false,
	references: { model, key: 'id' },
	onDelete: 'CASCADE'
});

export async function up({ context: q }: { context: QueryInterface }) {
	await q.createTable('frameworks', {
		id,
		name: { type: DataTypes.STRING(160), allowNull: false },
		version: { type: DataTypes.INTEGER, allowNull: false },
		status: { type: DataTypes.STRING(10), allowNull: false },
		based_on_id: {
			type: DataTypes.INTEGER,
			allowNull: true,
			references: { model: 'frameworks', key: 'id' }
		},
		created_by_id: {
			type: DataTypes.STRING(40),
			allowNull: true,
			references: { model: 'users', key: 'id' },
			onDelete: 'SET NULL'
		},
		published_at: { type: DataTypes.DATE, allowNull: true },
		created_at: { type: DataTypes.DATE, allowNull: false },
		updated_at: { type: DataTypes.DATE, allowNull: false }
	});
	await q.addIndex('frameworks', ['name', 'version'], { unique: true });
	await q.addIndex('frameworks', ['status']);
	await q.createTable('framework_areas', {
		id,
		framework_id: ref('frameworks'),
		code: { type: DataTypes.STRING(3), allowNull: false },
		name: { type: DataTypes.STRING(120), allowNull: false },
		position: { type: DataTypes.INTEGER, allowNull: false }
	});
	await q.addIndex('framework_areas', ['framework_id', 'code'], { unique: true });
	await q.createTable('framework_tasks', {
		id,
		framework_id: ref('frameworks'),
		area_id: ref('framework_areas'),
		code: { type: DataTypes.STRING(6), allowNull: false },
		title: { type: DataTypes.STRING(200), allowNull: false },
		description: { type: DataTypes.TEXT, allowNull: false },
		tier: { type: DataTypes.INTEGER, allowNull: false },
		required_level: { type: DataTypes.INTEGER, allowNull: false },
		min_hours: { type: DataTypes.FLOAT, allowNull: false },
		tools: { type: DataTypes.JSON, allowNull: false },
		cautions: { type: DataTypes.JSON, allowNull: false },
		service_info: { type: DataTypes.JSON, allowNull: false },
		position: { type: DataTypes.INTEGER, allowNull: false }
	});
	await q.addIndex('framework_tasks', ['framework_id', 'code'], { unique: true });
	await q.addIndex('framework_tasks', ['area_id']);
	await q.addIndex('framework_tasks', ['framework_id', 'tier']);
	await q.createTable('task_steps', {
		id,
		task_id: ref('framework_tasks'),
		position: { type: DataTypes.INTEGER, allowNull: false },
		text: { type: DataTypes.TEXT, allowNull: false },
		safety: { type: DataTypes.BOOLEAN, allowNull: false }
	});
	await q.addIndex('task_steps', ['task_id']);
	await q.createTable('task_specs', {
		id,
		task_id: ref('framework_tasks'),
		position: { type: DataTypes.INTEGER, allowNull: false },
		label: { type: DataTypes.STRING(200), allowNull: false },
		value_si: { type: DataTypes.DOUBLE, allowNull: false },
		unit: { type: DataTypes.STRING(8), allowNull: false },
		limit_kind: { type: DataTypes.STRING(8), allowNull: false }
	});
	await q.addIndex('task_specs', ['task_id']);
	await q.createTable('task_questions', {
		id,
		task_id: ref('framework_tasks'),
		position: { type: DataTypes.INTEGER, allowNull: false },
		prompt: { type: DataTypes.TEXT, allowNull: false },
		explanation: { type: DataTypes.TEXT, allowNull: false },
		options: { type: DataTypes.JSON, allowNull: false }
	});
	await q.addIndex('task_questions', ['task_id']);
}

export async function down({ context: q }: { context: QueryInterface }) {
	for (const table of [
		'task_questions',
		'task_specs',
		'task_steps',
		'framework_tasks',
		'framework_areas',
		'frameworks'
	]) {
		await q.dropTable(table);
	}
}
