import { DataTypes, type QueryInterface } from 'sequelize';

const id = { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true };
const user = (allowNull = false) => ({
	type: DataTypes.STRING(40),
	allowNull,
	references: { model: 'users', key: 'id' },
	onDelete: 'RESTRICT'
});
const task = {
	type: DataTypes.INTEGER,
	allowNull: false,
	references: { model: 'framework_tasks', key: 'id' },
	onDelete: 'RESTRICT'
};

export async function up({ context: q }: { context: QueryInterface }) {
	await q.createTable('quiz_attempts', {
		id,
		apprentice_id: user(),
		task_id: task,
		drawn: { type: DataTypes.JSON, allowNull: false },
		pass_mark: { type: DataTypes.INTEGER, allowNull: false },
		answers: { type: DataTypes.JSON, allowNull: true },
		correct: { type: DataTypes.INTEGER, allowNull: true },
		total: { type: DataTypes.INTEGER, allowNull: false },
		percent: { type: DataTypes.FLOAT, allowNull: true },
		passed: { type: DataTypes.BOOLEAN, allowNull: true },
		started_at: { type: DataTypes.DATE, allowNull: false },
		submitted_at: { type: DataTypes.DATE, allowNull: true }
	});
	await q.addIndex('quiz_attempts', ['apprentice_id', 'task_id']);
	await q.createTable('quiz_responses', {
		id,
		attempt_id: {
			type: DataTypes.INTEGER,
			allowNull: false,
			references: { model: 'quiz_attempts', key: 'id' },
			onDelete: 'CASCADE'
		},
		question_id: {
			type: DataTypes.INTEGER,
			allowNull: false,
			references: { model: 'task_questions', key: 'id' },
			onDelete: 'RESTRICT'
		},
		correct: { type: DataTypes.BOOLEAN, allowNull: false }
	});
	await q.addIndex('quiz_responses', ['question_id']);
	await q.addIndex('quiz_responses', ['attempt_id']);
	await q.createTable('sign_offs', {
		id,
		kind: { type: DataTypes.STRING(12), allowNull: false },
		apprentice_id: user(),
		task_id: task,
		framework_id: {
			type: DataTypes.INTEGER,
			allowNull: false,
			references: { model: 'frameworks', key: 'id' },
			onDelete: 'RESTRICT'
		},
		supervisor_id: user(),
		level: { type: DataTypes.INTEGER, allowNull: true },
		results: { type: DataTypes.JSON, allowNull: true },
		quiz_attempt_id: {
			type: DataTypes.INTEGER,
			allowNull: true,
			references: { model: 'quiz_attempts', key: 'id' },
			onDelete: 'RESTRICT'
		},
		verified_tenths: { type: DataTypes.INTEGER, allowNull: false },
		notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
		refers_to_id: {
			type: DataTypes.INTEGER,
			allowNull: true,
			references: { model: 'sign_offs', key: 'id' },
			onDelete: 'RESTRICT'
		},
		reason: { type: DataTypes.TEXT, allowNull: true },
		session_hash: { type: DataTypes.STRING(64), allowNull: false },
		content_hash: { type: DataTypes.STRING(64), allowNull: false },
		signed_at: { type: DataTypes.DATE, allowNull: false }
	});
	await q.addIndex('sign_offs', ['apprentice_id', 'task_id']);
	await q.addIndex('sign_offs', ['refers_to_id']);
	await q.createTable('audit_events', {
		id,
		at: { type: DataTypes.DATE, allowNull: false },
		actor_id: { type: DataTypes.STRING(40), allowNull: true },
		kind: { type: DataTypes.STRING(40), allowNull: false },
		subject: { type: DataTypes.STRING(60), allowNull: false },
		content: { type: DataTypes.TEXT, allowNull: false },
		previous_hash: { type: DataTypes.STRING(64), allowNull: false },
		hash: { type: DataTypes.STRING(64), allowNull: false, unique: true }
	});
	await q.addIndex('audit_events', ['subject']);
}

export async function down({ context: q }: { context: QueryInterface }) {
	for (const table of ['audit_events', 'sign_offs', 'quiz_responses', 'quiz_attempts']) {
		await q.dropTable(table);
	}
}
