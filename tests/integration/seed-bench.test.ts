import { QueryTypes } from 'sequelize';
import { beforeAll, describe, expect, it } from 'vitest';
import { verify } from '$lib/server/audit';
import { prepare, sequelize, SignOff, User } from '$lib/server/db';
import { verifyPassword } from '$lib/server/password';
import { BENCH_COORDINATOR, buildBench, type BenchCounts } from '../../seed/bench-build';
import { DEMO_PASSWORD } from '../../seed/demo';

// A scaled-down bench: the full one (600 apprentices) is built by `npm run seed:bench`, not here.
const SCALE = { sites: 2, apprentices: 10, supervisors: 5, logDays: 30, assessmentsPerWeek: 3 };
const TODAY = new Date('2026-12-02T15:00:00Z');

const select = <T extends object>(sql: string) =>
	sequelize.query<T>(sql, { type: QueryTypes.SELECT });

let counts: BenchCounts;

// The bench loader writes SQLite files directly and is SQLite-only by design.
describe.skipIf(sequelize.getDialect() !== 'sqlite')('bench data at small scale', () => {
	beforeAll(async () => {
		await prepare();
		counts = await buildBench(SCALE, TODAY);
	}, 60_000);

	it('stores exactly the rows it reports', async () => {
		const tables: [keyof BenchCounts, string][] = [
			['sites', 'sites'],
			['users', 'users'],
			['supervisions', 'supervisions'],
			['entries', 'log_entries'],
			['entryTasks', 'log_entry_tasks'],
			['rti', 'rti_records'],
			['quizAttempts', 'quiz_attempts'],
			['quizResponses', 'quiz_responses'],
			['signOffs', 'sign_offs'],
			['auditEvents', 'audit_events']
		];
		for (const [key, table] of tables) {
			const [{ n }] = await select<{ n: number }>(`SELECT COUNT(*) AS n FROM ${table}`);
			expect(n, table).toBe(counts[key]);
		}
		expect(counts.sites).toBe(2);
		expect(counts.users).toBe(5 + 10 + 2);
		// About three entries a worked day over the last 30 days, for every apprentice.
		expect(counts.entries / 10).toBeGreaterThan(30);
		expect(counts.entries / 10).toBeLessThan(80);
		expect(counts.signOffs).toBeGreaterThan(10);
		expect(counts.auditEvents).toBe(counts.signOffs);
	});

	it('links each apprentice to two or three journeyworkers of their own shop', async () => {
		const rows = await select<{ n: number; elsewhere: number }>(
			`SELECT COUNT(*) AS n, SUM(s.site_id <> a.site_id) AS elsewhere FROM supervisions v
			   JOIN users a ON a.id = v.apprentice_id JOIN users s ON s.id = v.supervisor_id
			  GROUP BY v.apprentice_id`
		);
		expect(rows).toHaveLength(10);
		for (const r of rows) {
			expect(r.n).toBeGreaterThanOrEqual(2);
			expect(r.n).toBeLessThanOrEqual(3);
			expect(r.elsewhere).toBe(0);
		}
		const [{ cohorts, programmes }] = await select<{ cohorts: number; programmes: number }>(
			'SELECT COUNT(DISTINCT cohort_id) AS cohorts, (SELECT COUNT(*) FROM programmes) AS programmes FROM apprentice_profiles'
		);
		expect([cohorts, programmes]).toEqual([4, 1]);
	});

	it('keeps the audit chain intact and sign-offs within the hours gate', async () => {
		expect(await verify()).toEqual({ ok: true, count: counts.auditEvents });
		const [{ short }] = await select<{ short: number }>(
			`SELECT COUNT(*) AS short FROM sign_offs s JOIN framework_tasks t ON t.id = s.task_id
			  WHERE s.kind = 'sign-off' AND s.verified_tenths < ROUND(t.min_hours * 10)`
		);
		expect(short).toBe(0);
		// Rows written raw read back through the models like the app's own.
		const first = await SignOff.findOne({ order: [['id', 'ASC']], rejectOnEmpty: true });
		expect(first.signedAt).toBeInstanceOf(Date);
		expect(first.signedAt.getTime()).toBeLessThanOrEqual(TODAY.getTime());
		expect(Object.keys(first.results ?? {}).length).toBeGreaterThan(0);
	});

	it('lets the coordinator sign in with the demo password, and refuses a second build', async () => {
		const coordinator = await User.findOne({
			where: { email: BENCH_COORDINATOR },
			rejectOnEmpty: true
		});
		expect(coordinator.role).toBe('coordinator');
		expect(await verifyPassword(coordinator.passwordHash!, DEMO_PASSWORD)).toBe(true);
		const hashes = await select<{ n: number }>(
			'SELECT COUNT(DISTINCT password_hash) AS n FROM users'
		);
		expect(hashes[0].n).toBe(1);
		await expect(buildBench(SCALE, TODAY)).rejects.toThrow(/empty database/);
	});
});
