import { DataTypes, type QueryInterface } from 'sequelize';

const id = { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true };
const stamps = {
	created_at: { type: DataTypes.DATE, allowNull: false },
	updated_at: { type: DataTypes.DATE, allowNull: false }
};
const userRef = (onDelete: 'CASCADE' | 'RESTRICT') => ({
	type: DataTypes.STRING(40),
	allowNull: false,
	references: { model: 'users', key: 'id' },
	onDelete
});

export async function up({ context: q }: { context: QueryInterface }) {
	await q.createTable('sites', {
		id,
		code: { type: DataTypes.STRING(12), allowNull: false, unique: true },
		name: { type: DataTypes.STRING(120), allowNull: false },
		town: { type: DataTypes.STRING(120), allowNull: false, defaultValue: '' },
		...stamps
	});
	await q.createTable('users', {
		id: { type: DataTypes.STRING(40), primaryKey: true },
		email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
		name: { type: DataTypes.STRING(120), allowNull: false },
		role: { type: DataTypes.STRING(20), allowNull: false },
		password_hash: { type: DataTypes.STRING(200), allowNull: true },
		active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
		is_demo: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
		site_id: {
			type: DataTypes.INTEGER,
			allowNull: true,
			references: { model: 'sites', key: 'id' },
			onDelete: 'SET NULL'
		},
		...stamps
	});
	await q.addIndex('users', ['role']);
	await q.addIndex('users', ['site_id']);
	await q.createTable('sessions', {
		id: { type: DataTypes.STRING(64), primaryKey: true },
		user_id: userRef('CASCADE'),
		expires_at: { type: DataTypes.DATE, allowNull: false }
	});
	await q.addIndex('sessions', ['user_id']);
	await q.createTable('programmes', {
		id,
		name: { type: DataTypes.STRING(160), allowNull: false },
		approach: { type: DataTypes.STRING(12), allowNull: false },
		term_years: { type: DataTypes.INTEGER, allowNull: false },
		ojl_hours: { type: DataTypes.INTEGER, allowNull: false },
		rti_hours_per_year: { type: DataTypes.INTEGER, allowNull: false },
		probation_hours: { type: DataTypes.INTEGER, allowNull: false },
		journeyworker_rate_cents: { type: DataTypes.INTEGER, allowNull: false },
		wage_schedule: { type: DataTypes.JSON, allowNull: false },
		ratio_apprentices: { type: DataTypes.INTEGER, allowNull: false },
		ratio_journeyworkers: { type: DataTypes.INTEGER, allowNull: false },
		tier_thresholds: { type: DataTypes.JSON, allowNull: false },
		certificate_validity_months: { type: DataTypes.INTEGER, allowNull: true },
		...stamps
	});
	await q.createTable('cohorts', {
		id,
		name: { type: DataTypes.STRING(120), allowNull: false },
		programme_id: {
			type: DataTypes.INTEGER,
			allowNull: false,
			references: { model: 'programmes', key: 'id' },
			onDelete: 'RESTRICT'
		},
		start_date: { type: DataTypes.DATEONLY, allowNull: false },
		planned_end_date: { type: DataTypes.DATEONLY, allowNull: false },
		...stamps
	});
	await q.addIndex('cohorts', ['programme_id']);
	await q.createTable('apprentice_profiles', {
		user_id: { ...userRef('CASCADE'), primaryKey: true },
		cohort_id: {
			type: DataTypes.INTEGER,
			allowNull: false,
			references: { model: 'cohorts', key: 'id' },
			onDelete: 'RESTRICT'
		},
		start_date: { type: DataTypes.DATEONLY, allowNull: false },
		planned_end_date: { type: DataTypes.DATEONLY, allowNull: false },
		prior_credit_hours: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 0 },
		...stamps
	});
	await q.addIndex('apprentice_profiles', ['cohort_id']);
	await q.createTable('supervisor_profiles', {
		user_id: { ...userRef('CASCADE'), primaryKey: true },
		qualification: { type: DataTypes.STRING(160), allowNull: false },
		qualified_since: { type: DataTypes.DATEONLY, allowNull: false },
		shift: { type: DataTypes.STRING(8), allowNull: false, defaultValue: 'day' },
		...stamps
	});
	await q.createTable('supervisions', {
		id,
		apprentice_id: userRef('CASCADE'),
		supervisor_id: userRef('CASCADE'),
		...stamps
	});
	await q.addIndex('supervisions', ['apprentice_id', 'supervisor_id'], { unique: true });
	await q.addIndex('supervisions', ['supervisor_id']);
	await q.createTable('user_tokens', {
		id,
		user_id: userRef('CASCADE'),
		purpose: { type: DataTypes.STRING(10), allowNull: false },
		token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
		expires_at: { type: DataTypes.DATE, allowNull: false },
		used_at: { type: DataTypes.DATE, allowNull: true },
		...stamps
	});
	await q.addIndex('user_tokens', ['user_id']);
	await q.createTable('login_throttles', {
		key: { type: DataTypes.STRING(300), primaryKey: true },
		failures: { type: DataTypes.INTEGER, allowNull: false },
		window_start: { type: DataTypes.DATE, allowNull: false },
		blocked_until: { type: DataTypes.DATE, allowNull: true }
	});
}

export async function down({ context: q }: { context: QueryInterface }) {
	for (const table of [
		'login_throttles',
		'user_tokens',
		'supervisions',
		'supervisor_profiles',
		'apprentice_profiles',
		'cohorts',
		'programmes',
		'sessions',
		'users',
		'sites'
	]) {
		await q.dropTable(table);
	}
}
