import { Op } from 'sequelize';
import { beforeAll, describe, expect, it } from 'vitest';
import type { SignedInUser } from '$lib/server/auth';
import * as audit from '$lib/server/audit';
import {
	ApprenticeProfile,
	AuditEvent,
	LogEntry,
	LogEntryTask,
	prepare,
	Programme,
	RtiRecord,
	sequelize,
	Task,
	User
} from '$lib/server/db';
import * as framework from '$lib/server/framework';
import * as progress from '$lib/server/progress';
import { addDays } from '$lib/server/progress/engine';
import { GET as cohortRoute } from '../../src/routes/api/cohorts/[id]/progress/+server';
import { GET as apprenticeRoute } from '../../src/routes/api/apprentices/[id]/progress/+server';
import {
	GET as programmeGet,
	PUT as programmePut
} from '../../src/routes/api/programmes/[id]/+server';
import { seedDemo } from '../../seed/demo';
import { call } from '../helpers/route';
import { byRole } from '../helpers/accounts';
import { signOffRow } from '../helpers/records';

const TODAY = '2026-12-02';
let apprentice: SignedInUser;
let supervisor: SignedInUser;
let coordinator: SignedInUser;
let cohortId: number;
let programmeId: number;
let tasks: Task[];

async function entry(
	day: string,
	tenths: number,
	status: LogEntry['status'],
	extra: Partial<LogEntry> = {}
) {
	const e = await LogEntry.create({
		apprenticeId: apprentice.id,
		supervisorId: supervisor.id,
		workDate: day,
		startTime: null,
		endTime: null,
		tenths,
		repairOrder: `RO-${day}-${tenths}`,
		vehicleYear: 2019,
		vehicleMake: 'Compact hatch',
		vehicleModel: 'base',
		vin: null,
		vinCheckOverridden: false,
		odometer: null,
		odometerUnit: 'mi',
		standardTenths: null,
		notes: '',
		status,
		returnComment: status === 'returned' ? 'Split the hours by task.' : null,
		submittedAt: new Date(),
		reviewedAt: null,
		reviewedById: null,
		correctsId: null,
		...extra
	} as never);
	await LogEntryTask.create({ entryId: e.id, taskId: tasks[0].id, tenths } as never);
	return e;
}

const signOff = (
	task: Task,
	level: 1 | 2 | 3 | 4,
	refersToId: number | null = null,
	kind: 'sign-off' | 'revocation' = 'sign-off'
) =>
	signOffRow({
		apprenticeId: apprentice.id,
		supervisorId: supervisor.id,
		taskId: task.id,
		frameworkId: task.frameworkId,
		level,
		kind,
		refersToId,
		signedAt: new Date('2026-11-01T10:00:00Z')
	});

beforeAll(async () => {
	await prepare();
	await framework.ensureDefault();
	await seedDemo();
	apprentice = await byRole('apprentice');
	supervisor = await byRole('supervisor');
	coordinator = await byRole('coordinator');
	const profile = await ApprenticeProfile.findByPk(apprentice.id, { rejectOnEmpty: true });
	cohortId = profile.cohortId;
	await profile.update({
		startDate: '2025-06-02',
		plannedEndDate: '2029-06-01',
		priorCreditHours: 150
	});
	programmeId = (await Programme.findOne({ rejectOnEmpty: true })).id;
	const current = (await framework.current())!;
	tasks = await Task.findAll({
		where: { frameworkId: current.id },
		order: [['id', 'ASC']],
		limit: 4
	});
	// 26 weeks of 8.0 h every Monday, verified; one of them replaced by a verified 6.0 h correction.
	const mondays = Array.from({ length: 26 }, (_, i) => addDays('2026-06-08', i * 7));
	const verified = [];
	for (const day of mondays) verified.push(await entry(day, 80, 'verified'));
	await entry(mondays[3], 60, 'verified', { correctsId: verified[3].id });
	await entry('2026-12-01', 75, 'submitted');
	await entry('2026-11-20', 40, 'returned');
	await entry('2026-11-21', 40, 'draft');
	// Three tasks at their required level, one below it, one revoked.
	await signOff(tasks[0], tasks[0].requiredLevel);
	await signOff(tasks[1], 4);
	await signOff(tasks[2], tasks[2].requiredLevel);
	const revoked = await signOff(tasks[3], 4);
	await signOff(tasks[3], 4, revoked.id, 'revocation');
	// Related instruction: year 1 and year 2 confirmed, one not yet confirmed.
	const rti = (completedOn: string, tenths: number, confirmed: boolean) =>
		RtiRecord.create({
			apprenticeId: apprentice.id,
			course: 'Brake hydraulics',
			provider: 'Invented Technical College',
			completedOn,
			tenths,
			result: 'passed',
			enteredById: apprentice.id,
			confirmedById: confirmed ? coordinator.id : null,
			confirmedAt: confirmed ? new Date() : null
		} as never);
	await rti('2025-09-10', 1440, true);
	await rti('2026-09-10', 400, true);
	await rti('2026-10-10', 200, false);
});

describe('one apprentice', () => {
	it('sums verified, pending and credited hours, counting a correction instead of what it replaced', async () => {
		const found = (await progress.apprentice(apprentice.id, TODAY))!;
		const g = found.progress;
		expect(g.hours.verified).toBe(25 * 8 + 6);
		expect(g.hours.pending).toBe(7.5);
		expect(g.hours.credit).toBe(150);
		expect(g.hours.counted).toBe(206 + 150);
		expect(g.rti.byYear.slice(0, 2).map((y) => y.hours)).toEqual([144, 40]);
		expect(g.risk.reasons).not.toContain(expect.stringMatching(/returned/));
	});

	it('counts tasks at the required level, leaving out a revoked sign-off', async () => {
		const found = (await progress.apprentice(apprentice.id, TODAY))!;
		const expected = [tasks[0], tasks[1], tasks[2]].filter((t) => 4 >= t.requiredLevel).length;
		expect(found.progress.tasksMet).toBe(expected);
	});

	it('fits the forecast to the weekly verified hours in the window', async () => {
		const g = (await progress.apprentice(apprentice.id, TODAY))!.progress;
		// 8 h a week in every week but one (6 h); the fitted pace is close to 8 h.
		expect(g.forecast.hoursPerWeek).toBeGreaterThan(7.5);
		expect(g.forecast.hoursPerWeek).toBeLessThan(8.5);
		expect(g.risk.atRisk).toBe(true);
		expect(g.risk.reasons[0]).toMatch(/after the planned end/);
	});
});

describe('a cohort', () => {
	it('gives each apprentice the same figures as their own page, with a fixed number of queries', async () => {
		const before = (sequelize as unknown as { options: { logging: unknown } }).options.logging;
		let queries = 0;
		(sequelize as unknown as { options: { logging: unknown } }).options.logging = () => queries++;
		try {
			const cohort = await progress.cohort(cohortId, TODAY);
			const cohortQueries = queries;
			queries = 0;
			await progress.apprentice(apprentice.id, TODAY);
			expect(cohortQueries).toBe(queries + 1); // + the cohort's own row
			const row = cohort.apprentices.find((a) => a.id === apprentice.id)!;
			expect(row.verifiedHours).toBe(206);
			expect(row.countedHours).toBe(356);
			expect(cohort.apprentices.length).toBeGreaterThan(1);
			expect(cohort.totals.apprentices).toBe(cohort.apprentices.length);
		} finally {
			(sequelize as unknown as { options: { logging: unknown } }).options.logging = before;
		}
	});

	it('answers the API for coordinators only, and 404 for a cohort that does not exist', async () => {
		const ok = await call(cohortRoute, { id: String(cohortId) }, { user: coordinator });
		expect(ok.status).toBe(200);
		const body = await ok.json();
		expect(body.apprentices.some((a: { id: string }) => a.id === apprentice.id)).toBe(true);
		expect((await call(cohortRoute, { id: 'all' }, { user: coordinator })).status).toBe(200);
		expect((await call(cohortRoute, { id: String(cohortId) }, { user: apprentice })).status).toBe(
			403
		);
		expect((await call(cohortRoute, { id: String(cohortId) }, { user: supervisor })).status).toBe(
			403
		);
		expect((await call(cohortRoute, { id: String(cohortId) })).status).toBe(401);
		expect((await call(cohortRoute, { id: '99999' }, { user: coordinator })).status).toBe(404);
		expect(
			(await call(cohortRoute, { id: '1; DROP TABLE users' }, { user: coordinator })).status
		).toBe(404);
	});

	it('lets an apprentice read their own progress but not another’s', async () => {
		const other = await User.findOne({
			where: { role: 'apprentice', id: { [Op.ne]: apprentice.id } },
			rejectOnEmpty: true
		});
		expect((await call(apprenticeRoute, { id: apprentice.id }, { user: apprentice })).status).toBe(
			200
		);
		if (other) {
			expect((await call(apprenticeRoute, { id: other.id }, { user: apprentice })).status).toBe(
				404
			);
		}
		expect((await call(apprenticeRoute, { id: apprentice.id }, { user: coordinator })).status).toBe(
			200
		);
	});
});

describe('programme rules', () => {
	const put = (body: unknown, user = coordinator) =>
		call(
			programmePut,
			{ id: String(programmeId) },
			{
				user,
				request: new Request('http://localhost:3999/api/programmes/1', {
					method: 'PUT',
					headers: { 'content-type': 'application/json' },
					body: JSON.stringify(body)
				})
			}
		);

	it('refuses rules that contradict each other, saving nothing', async () => {
		const before = await (
			await call(programmeGet, { id: String(programmeId) }, { user: coordinator })
		).json();
		const { id: _id, ...rules } = before;
		void _id;
		const cases: [Record<string, unknown>, string][] = [
			[
				{
					wageSchedule: [
						{ fromHours: 0, percent: 60 },
						{ fromHours: 2000, percent: 55 }
					]
				},
				'wageSchedule.1.percent'
			],
			[
				{
					wageSchedule: [
						{ fromHours: 0, percent: 60 },
						{ fromHours: 0, percent: 70 }
					]
				},
				'wageSchedule.1.fromHours'
			],
			[{ tier1: 120 }, 'tier1'],
			[{ ratioApprentices: 0 }, 'ratioApprentices'],
			[{ probationHours: 2500 }, 'probationHours'],
			[
				{ approach: 'time', ojlHours: 1500, wageSchedule: [{ fromHours: 0, percent: 50 }] },
				'ojlHours'
			]
		];
		for (const [change, field] of cases) {
			const res = await put({ ...rules, ...change });
			expect(res.status, field).toBe(400);
			expect((await res.json()).errors[field], field).toBeTruthy();
		}
		const after = await (
			await call(programmeGet, { id: String(programmeId) }, { user: coordinator })
		).json();
		expect(after).toEqual(before);
		expect((await put(rules, apprentice)).status).toBe(403);
	});

	it('saves valid rules, and progress follows them', async () => {
		const before = await (
			await call(programmeGet, { id: String(programmeId) }, { user: coordinator })
		).json();
		const { id: _id, ...rules } = before;
		void _id;
		const res = await put({
			...rules,
			wageSchedule: [
				{ fromHours: 0, percent: 50, minTasks: 0 },
				{ fromHours: 300, percent: 60, minTasks: 1 }
			]
		});
		expect(res.status).toBe(200);
		const g = (await progress.apprentice(apprentice.id, TODAY))!.progress;
		expect(g.wage.percent).toBe(60);
		await put(rules);
	});
});

describe('credit for prior experience', () => {
	const post = async (fields: Record<string, string>, user = coordinator) => {
		const { actions } =
			await import('../../src/routes/(coordinator)/coordinator/apprentices/[id]/+page.server');
		const body = new FormData();
		for (const [k, v] of Object.entries(fields)) body.set(k, v);
		try {
			return await actions.credit({
				params: { id: apprentice.id },
				url: new URL(`http://localhost:3999/coordinator/apprentices/${apprentice.id}?/credit`),
				locals: { user },
				request: new Request('http://localhost:3999/x', { method: 'POST', body })
			} as never);
		} catch (thrown) {
			return thrown as { status: number; location?: string };
		}
	};

	it('refuses negative, oversized and unexplained credit, saving nothing', async () => {
		const before = (await ApprenticeProfile.findByPk(apprentice.id))!.priorCreditHours;
		const audits = await AuditEvent.count();
		for (const fields of [
			{ priorCreditHours: '-5', reason: 'Previous employer' },
			{ priorCreditHours: '50000', reason: 'Previous employer' },
			{ priorCreditHours: '7000', reason: 'More than the programme' },
			{ priorCreditHours: '10.25', reason: 'Previous employer' },
			{ priorCreditHours: '200', reason: '' }
		]) {
			const res = (await post(fields)) as { status: number };
			expect(res.status, JSON.stringify(fields)).toBe(400);
		}
		expect((await ApprenticeProfile.findByPk(apprentice.id))!.priorCreditHours).toBe(before);
		expect(await AuditEvent.count()).toBe(audits);
		expect(
			((await post({ priorCreditHours: '10', reason: 'x' }, apprentice)) as { status: number })
				.status
		).toBe(403);
	});

	it('saves credit with its reason in the audit trail, and progress counts it', async () => {
		const res = (await post({
			priorCreditHours: '480',
			reason: 'College lube-and-tyre course, 2024'
		})) as {
			status: number;
		};
		expect(res.status).toBe(303);
		const g = (await progress.apprentice(apprentice.id, TODAY))!.progress;
		expect(g.hours.credit).toBe(480);
		expect(g.hours.counted).toBe(206 + 480);
		const last = await AuditEvent.findOne({ order: [['id', 'DESC']] });
		expect(last!.kind).toBe('credit.set');
		expect(last!.content).toContain('College lube-and-tyre course');
		expect((await audit.verify()).ok).toBe(true);
	});
});
