import { Op, QueryTypes } from 'sequelize';
import { beforeAll, describe, expect, it } from 'vitest';
import { DEFAULT_DAILY_LIMIT_HOURS, durationTenths, hoursToTenths } from '$lib/hours';
import { LogEntry, prepare, sequelize } from '$lib/server/db';
import { dialectSql } from '$lib/server/db/dialect';
import { ensureDefault } from '$lib/server/framework';
import { validateVin } from '$lib/vin';
import { DEMO_ACCOUNTS, seedDemo } from '../../seed/demo';
import {
	generateWorkLog,
	loadWorkLogInput,
	seedWorkLog,
	type WorkLog,
	type WorkLogCounts
} from '../../seed/worklog';

// A fixed moment, so the scenario (and these checks) never depend on the day the suite runs.
const TODAY = new Date('2026-12-02T15:00:00Z');
const TODAY_ISO = '2026-12-02';
const DAY_MS = 86_400_000;

const select = <T extends object>(sql: string, replacements: Record<string, unknown> = {}) =>
	sequelize.query<T>(sql, { type: QueryTypes.SELECT, replacements });

const email = (role: string) => DEMO_ACCOUNTS.find((a) => a.role === role)?.email;

let counts: WorkLogCounts | 'already seeded';

beforeAll(async () => {
	await prepare();
	await ensureDefault();
	expect(await seedDemo()).toBe('seeded');
	const started = Date.now();
	counts = await seedWorkLog(TODAY);
	// The whole history is a few big batches, not thousands of single inserts.
	expect(Date.now() - started).toBeLessThan(15_000);
}, 60_000);

describe('demo work log', () => {
	it('stores every generated row once and refuses to add a second copy', async () => {
		expect(counts).not.toBe('already seeded');
		if (counts === 'already seeded') return;
		expect(counts.entries).toBeGreaterThan(5_000);
		expect(await LogEntry.count()).toBe(counts.entries);
		const [{ tasks }] = await select<{ tasks: number }>(
			'SELECT COUNT(*) AS tasks FROM log_entry_tasks'
		);
		expect(tasks).toBe(counts.tasks);
		expect(await seedWorkLog(TODAY)).toBe('already seeded');
		expect(await LogEntry.count()).toBe(counts.entries);
	});

	it('has entries for every apprentice, none before their start or after today', async () => {
		const perApprentice = await select<{ entries: number }>(
			`SELECT COUNT(e.id) AS entries FROM apprentice_profiles p
			   LEFT JOIN log_entries e ON e.apprentice_id = p.user_id GROUP BY p.user_id`
		);
		expect(perApprentice).toHaveLength(20);
		for (const row of perApprentice) expect(row.entries).toBeGreaterThan(0);

		const [{ outside }] = await select<{ outside: number }>(
			`SELECT COUNT(*) AS outside FROM log_entries e
			   JOIN apprentice_profiles p ON p.user_id = e.apprentice_id
			  WHERE e.work_date > :today OR e.work_date < p.start_date`,
			{ today: TODAY_ISO }
		);
		expect(outside).toBe(0);
		const [{ weekend }] = await select<{ weekend: number }>(
			`SELECT COUNT(*) AS weekend FROM log_entries WHERE ${dialectSql.dayOfWeek('work_date')} IN (0, 6)`
		);
		expect(weekend).toBe(0);

		// PostgreSQL sorts NULLs first in descending order: only rows with a time.
		const latest = await LogEntry.findOne({
			where: { reviewedAt: { [Op.ne]: null } },
			order: [['reviewedAt', 'DESC']]
		});
		const lastSent = await LogEntry.findOne({
			where: { submittedAt: { [Op.ne]: null } },
			order: [['submittedAt', 'DESC']]
		});
		expect(latest?.reviewedAt?.getTime()).toBeLessThanOrEqual(TODAY.getTime());
		expect(lastSent?.submittedAt?.getTime()).toBeLessThanOrEqual(TODAY.getTime());
	});

	it('never overlaps an apprentice’s entries nor passes 16 h in a day', async () => {
		const [{ clashes }] = await select<{ clashes: number }>(
			`SELECT COUNT(*) AS clashes FROM log_entries a
			   JOIN log_entries b ON b.apprentice_id = a.apprentice_id AND b.work_date = a.work_date
			    AND b.id > a.id AND a.start_time < b.end_time AND b.start_time < a.end_time`
		);
		expect(clashes).toBe(0);
		const [{ most }] = await select<{ most: number }>(
			`SELECT MAX(total) AS most FROM
			   (SELECT SUM(tenths) AS total FROM log_entries GROUP BY apprentice_id, work_date) AS daily`
		);
		// The app's own daily limit (common practice, no published source).
		expect(most).toBeLessThanOrEqual(hoursToTenths(DEFAULT_DAILY_LIMIT_HOURS));
		// Our own shape for the demo: a shop day of at most 9 h between 07:00 and 17:30.
		expect(most).toBeLessThanOrEqual(90);

		const times = await select<{ startTime: string; endTime: string; tenths: number }>(
			'SELECT start_time AS "startTime", end_time AS "endTime", tenths FROM log_entries'
		);
		for (const t of times) {
			expect(t.startTime >= '07:00' && t.endTime <= '17:30').toBe(true);
			expect(durationTenths(t.startTime, t.endTime)).toEqual({ ok: true, tenths: t.tenths });
			expect(t.tenths).toBeGreaterThanOrEqual(5);
			expect(t.tenths).toBeLessThanOrEqual(40);
		}
	});

	it('splits every entry exactly across one to three published tasks', async () => {
		const [{ off }] = await select<{ off: number }>(
			`SELECT COUNT(*) AS off FROM log_entries e
			  WHERE e.tenths <> (SELECT COALESCE(SUM(lt.tenths), 0) FROM log_entry_tasks lt WHERE lt.entry_id = e.id)
			     OR (SELECT COUNT(*) FROM log_entry_tasks lt WHERE lt.entry_id = e.id) NOT BETWEEN 1 AND 3`
		);
		expect(off).toBe(0);
		const [{ bad }] = await select<{ bad: number }>(
			`SELECT COUNT(*) AS bad FROM log_entry_tasks lt
			   JOIN framework_tasks t ON t.id = lt.task_id
			   JOIN frameworks f ON f.id = t.framework_id
			  WHERE lt.tenths < 1 OR f.status <> 'published'`
		);
		expect(bad).toBe(0);
	});

	it('logs real-looking vehicles: valid VINs, odometers that only grow, some repeat visits', async () => {
		const rows = await select<{
			vin: string;
			workDate: string;
			odometer: number | null;
			repairOrder: string | null;
			status: string;
		}>(
			`SELECT vin, work_date AS "workDate", odometer, repair_order AS "repairOrder", status
			   FROM log_entries ORDER BY vin, work_date, id`
		);
		let repeats = 0;
		for (let i = 0; i < rows.length; i++) {
			expect(validateVin(rows[i].vin).ok, rows[i].vin).toBe(true);
			const prev = rows[i - 1];
			if (!prev || prev.vin !== rows[i].vin) continue;
			if (prev.workDate !== rows[i].workDate) repeats++;
			if (prev.odometer !== null && rows[i].odometer !== null) {
				expect(rows[i].odometer).toBeGreaterThanOrEqual(prev.odometer);
			}
		}
		expect(repeats).toBeGreaterThan(100);
		// Returned entries may carry a repair order the apprentice still has to correct.
		const badRo = rows.filter(
			(r) =>
				r.status !== 'returned' && r.repairOrder !== null && !/^RO-[0-9]{5}$/.test(r.repairOrder)
		);
		expect(badRo).toEqual([]);
		const [{ years }] = await select<{ years: number }>(
			`SELECT COUNT(CASE WHEN vehicle_year NOT BETWEEN 2008 AND 2025 THEN 1 END) AS years
			   FROM log_entries`
		);
		expect(years).toBe(0);
	});

	it('gives standard labour time on about 60 % of entries, at 70–130 % efficiency', async () => {
		const [row] = await select<{ share: number; low: number; high: number }>(
			`SELECT AVG(CASE WHEN standard_tenths IS NOT NULL THEN 1.0 ELSE 0.0 END) AS share,
			        MIN(standard_tenths * 1.0 / tenths) AS low, MAX(standard_tenths * 1.0 / tenths) AS high
			   FROM log_entries`
		);
		expect(row.share).toBeGreaterThan(0.55);
		expect(row.share).toBeLessThan(0.65);
		expect(row.low).toBeGreaterThanOrEqual(0.7);
		expect(row.high).toBeLessThanOrEqual(1.3);
	});

	it('names one of the apprentice’s own journeyworkers, who also did the review', async () => {
		const [{ strangers, wrongReviewer, early }] = await select<{
			strangers: number;
			wrongReviewer: number;
			early: number;
		}>(
			`SELECT COUNT(CASE WHEN NOT EXISTS (SELECT 1 FROM supervisions v
			                       WHERE v.apprentice_id = e.apprentice_id AND v.supervisor_id = e.supervisor_id)
			                   THEN 1 END) AS strangers,
			        COUNT(CASE WHEN e.status IN ('verified', 'returned')
			                    AND e.reviewed_by_id IS DISTINCT FROM e.supervisor_id THEN 1 END) AS "wrongReviewer",
			        COUNT(CASE WHEN e.reviewed_at IS NOT NULL AND e.reviewed_at <= e.submitted_at THEN 1 END) AS early
			   FROM log_entries e`
		);
		expect(strangers).toBe(0);
		expect(wrongReviewer).toBe(0);
		expect(early).toBe(0);
	});

	it('verifies nearly all older work and leaves the last two weeks in review', async () => {
		const rows = await select<{ recent: number; status: string; n: number }>(
			`SELECT CASE WHEN work_date >= :since THEN 1 ELSE 0 END AS recent, status, COUNT(*) AS n
			   FROM log_entries GROUP BY 1, 2`,
			{ since: new Date(TODAY.getTime() - 14 * DAY_MS).toISOString().slice(0, 10) }
		);
		const n = (recent: number, status: string) =>
			rows.find((r) => r.recent === recent && r.status === status)?.n ?? 0;
		const older = rows.filter((r) => r.recent === 0).reduce((sum, r) => sum + r.n, 0);
		expect(n(0, 'verified') / older).toBeGreaterThan(0.99);
		expect(n(0, 'submitted') + n(0, 'draft')).toBe(0);
		expect(n(1, 'submitted')).toBeGreaterThan(50);
		expect(n(1, 'draft')).toBeGreaterThan(0);
		const returned = await LogEntry.findAll({ where: { status: 'returned' } });
		expect(returned.length).toBeGreaterThan(5);
		for (const e of returned) expect(e.returnComment?.length).toBeGreaterThan(10);
	});

	it('gives the demo apprentice work waiting for the demo journeyworker, a returned entry and drafts', async () => {
		const [row] = await select<{ waiting: number; returned: number; drafts: number }>(
			`SELECT COUNT(CASE WHEN e.status = 'submitted' AND s.email = :supervisor THEN 1 END) AS waiting,
			        COUNT(CASE WHEN e.status = 'returned' THEN 1 END) AS returned,
			        COUNT(CASE WHEN e.status = 'draft' THEN 1 END) AS drafts
			   FROM log_entries e
			   JOIN users a ON a.id = e.apprentice_id
			   JOIN users s ON s.id = e.supervisor_id
			  WHERE a.email = :apprentice`,
			{ apprentice: email('apprentice'), supervisor: email('supervisor') }
		);
		expect(row.waiting).toBeGreaterThanOrEqual(3);
		expect(row.returned).toBeGreaterThanOrEqual(1);
		expect(row.drafts).toBeGreaterThanOrEqual(2);
	});

	it('tells a cohort story: most steady, one ahead, one stalled, one at about 10 h a week', async () => {
		// Average hours a week from the start date to three weeks ago, before the review backlog.
		const until = new Date(TODAY.getTime() - 21 * DAY_MS).toISOString().slice(0, 10);
		const stalledSince = new Date(TODAY.getTime() - 35 * DAY_MS).toISOString().slice(0, 10);
		const rows = await select<{ email: string; perWeek: number; recent: number }>(
			`SELECT u.email,
			        SUM(CASE WHEN e.status = 'verified' AND e.work_date < :until THEN e.tenths ELSE 0 END) / 10.0
			          / (${dialectSql.days(':until', 'p.start_date')} / 7.0) AS "perWeek",
			        SUM(CASE WHEN e.status = 'verified' AND e.work_date >= :stalledSince THEN e.tenths ELSE 0 END) AS recent
			   FROM apprentice_profiles p JOIN users u ON u.id = p.user_id
			   LEFT JOIN log_entries e ON e.apprentice_id = p.user_id
			  GROUP BY p.user_id, u.email, p.start_date`,
			{ until, stalledSince }
		);
		const stalled = rows.filter((r) => r.recent === 0);
		const slow = rows.filter((r) => r.recent > 0 && r.perWeek < 15);
		const ahead = rows.filter((r) => r.perWeek > 38);
		const steady = rows.filter((r) => r.perWeek >= 27 && r.perWeek <= 37 && r.recent > 0);
		expect(stalled.map((r) => r.email)).toEqual(['gus.takahashi@riverbend-training.example']);
		expect(slow.map((r) => r.email)).toEqual(['nia.obuya@riverbend-training.example']);
		expect(ahead.map((r) => r.email)).toEqual(['bea.kowalczyk@riverbend-training.example']);
		expect(steady).toHaveLength(17);
		for (const r of slow) expect(r.perWeek).toBeGreaterThan(6);
	});

	it('records a few instruction courses per apprentice, most confirmed', async () => {
		const rows = await select<{ n: number; waiting: number; future: number }>(
			`SELECT COUNT(*) AS n, COUNT(CASE WHEN confirmed_at IS NULL THEN 1 END) AS waiting,
			        COUNT(CASE WHEN completed_on > :today THEN 1 END) AS future
			   FROM rti_records GROUP BY apprentice_id`,
			{ today: TODAY_ISO }
		);
		expect(rows).toHaveLength(20);
		const total = rows.reduce((sum, r) => sum + r.n, 0);
		const waiting = rows.reduce((sum, r) => sum + r.waiting, 0);
		for (const r of rows) {
			expect(r.n).toBeGreaterThanOrEqual(3);
			expect(r.future).toBe(0);
		}
		expect(waiting).toBeGreaterThan(0);
		expect(waiting / total).toBeLessThan(0.25);
	});

	it('is deterministic: the same people and day give the same rows, whatever their ids', async () => {
		const input = await loadWorkLogInput(TODAY);
		const first = generateWorkLog(input);
		expect(generateWorkLog(input)).toEqual(first);

		// A fresh demo draws new random user ids; rename them all and map back.
		const renamed = new Map<string, string>();
		const rename = (id: string) => {
			if (!renamed.has(id)) renamed.set(id, `fresh-${renamed.size}`);
			return renamed.get(id) as string;
		};
		const fresh = generateWorkLog({
			...input,
			apprentices: input.apprentices.map((a) => ({
				...a,
				id: rename(a.id),
				supervisors: a.supervisors.map((s) => ({ ...s, id: rename(s.id) }))
			})),
			coordinatorId: input.coordinatorId && rename(input.coordinatorId)
		});
		const back = new Map([...renamed].map(([id, alias]) => [alias, id]));
		const restore = (id: string | null) => (id === null ? null : (back.get(id) ?? id));
		const restored: WorkLog = {
			entries: fresh.entries.map((e) => ({
				...e,
				row: {
					...e.row,
					apprenticeId: restore(e.row.apprenticeId) as string,
					supervisorId: restore(e.row.supervisorId) as string,
					reviewedById: restore(e.row.reviewedById)
				}
			})),
			rti: fresh.rti.map((r) => ({
				...r,
				apprenticeId: restore(r.apprenticeId) as string,
				enteredById: restore(r.enteredById) as string,
				confirmedById: restore(r.confirmedById)
			}))
		};
		expect(restored).toEqual(first);

		// What was stored is exactly what the generator gives.
		const [stored] = await select<{ entries: number; tenths: number; verified: number }>(
			`SELECT COUNT(*) AS entries, SUM(tenths) AS tenths,
			        COUNT(CASE WHEN status = 'verified' THEN 1 END) AS verified
			   FROM log_entries`
		);
		expect(stored).toEqual({
			entries: first.entries.length,
			tenths: first.entries.reduce((sum, e) => sum + e.row.tenths, 0),
			verified: first.entries.filter((e) => e.row.status === 'verified').length
		});
	});
});
