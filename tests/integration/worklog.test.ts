import { beforeAll, describe, expect, it } from 'vitest';
import type { SignedInUser } from '$lib/server/auth';
import { LogEntry, LogEntryTask, prepare, Supervision, User } from '$lib/server/db';
import * as framework from '$lib/server/framework';
import * as people from '$lib/server/people';
import * as worklog from '$lib/server/worklog';
import type { EntryInput } from '$lib/schemas/worklog';
import { DEMO_ACCOUNTS, seedDemo } from '../../seed/demo';
import { waitForMail } from '../helpers/mail';

let apprentice: SignedInUser;
let other: SignedInUser;
let supervisor: SignedInUser;
let stranger: SignedInUser;
let taskIds: number[];

const signed = (u: User): SignedInUser =>
	({
		id: u.id,
		email: u.email,
		name: u.name,
		role: u.role,
		active: true,
		siteId: u.siteId ?? null
	}) as SignedInUser;

beforeAll(async () => {
	await prepare();
	await framework.ensureDefault();
	await seedDemo();
	const byEmail = async (email: string) =>
		signed(await User.findOne({ where: { email }, rejectOnEmpty: true }));
	apprentice = await byEmail(DEMO_ACCOUNTS.find((a) => a.role === 'apprentice')!.email);
	supervisor = await byEmail(DEMO_ACCOUNTS.find((a) => a.role === 'supervisor')!.email);
	const mine = await Supervision.findAll({ where: { supervisorId: supervisor.id } });
	const others = await User.findAll({ where: { role: 'apprentice' } });
	other = signed(others.find((u) => u.id !== apprentice.id)!);
	const notMine = await User.findAll({ where: { role: 'supervisor' } });
	for (const s of notMine) {
		if (
			!(await Supervision.count({ where: { supervisorId: s.id, apprenticeId: apprentice.id } }))
		) {
			stranger = signed(s);
			break;
		}
	}
	expect(mine.length).toBeGreaterThan(0);
	const current = (await framework.current())!;
	taskIds = (await framework.tasks(current.id, { limit: 3, offset: 0 })).rows.map((t) => t.id);
});

let day = 0;
/** A past date no other test uses, so the overlap and daily rules only meet what a test sets up. */
const freshDate = () => new Date(Date.UTC(2026, 0, 5 + day++)).toISOString().slice(0, 10);

const input = (over: Partial<EntryInput> = {}): EntryInput => ({
	workDate: freshDate(),
	startTime: '08:00',
	endTime: '10:30',
	repairOrder: 'RO-48213',
	vehicleYear: 2019,
	vehicleMake: 'Compact hatch',
	vehicleModel: 'base',
	vin: '1J9RP1A36A1644345',
	vinOverride: false,
	odometerUnit: 'mi',
	supervisorId: supervisor.id,
	notes: '',
	tasks: [
		{ taskId: taskIds[0], hours: 1.5 },
		{ taskId: taskIds[1], hours: 1 }
	],
	...over
});

const refusal = async (promise: Promise<unknown>) => {
	try {
		await promise;
	} catch (err) {
		if (err instanceof worklog.EntryProblem) return { status: err.status, errors: err.errors };
		throw err;
	}
	throw new Error('expected a refusal');
};

describe('logging hours', () => {
	it('stores 2.5 h split over two tasks as exact tenths', async () => {
		const entry = await worklog.create(apprentice, input(), 'submit');
		expect(entry.tenths).toBe(25);
		expect(entry.status).toBe('submitted');
		const split = await LogEntryTask.findAll({
			where: { entryId: entry.id },
			order: [['id', 'ASC']]
		});
		expect(split.map((s) => s.tenths)).toEqual([15, 10]);
	});

	it('refuses a split that does not add up, and stores nothing', async () => {
		const before = await LogEntry.count();
		const problem = await refusal(
			worklog.create(apprentice, input({ tasks: [{ taskId: taskIds[0], hours: 2 }] }), 'submit')
		);
		expect(problem.status).toBe(400);
		expect(problem.errors.tasks).toMatch(/add up to 2.0 h but the entry is 2.5 h/);
		expect(await LogEntry.count()).toBe(before);
	});

	it('refuses overlapping times and more than 16 h a day', async () => {
		const date = freshDate();
		await worklog.create(apprentice, input({ workDate: date }), 'draft');
		const overlap = await refusal(
			worklog.create(
				apprentice,
				input({
					workDate: date,
					startTime: '10:00',
					endTime: '11:00',
					tasks: [{ taskId: taskIds[0], hours: 1 }]
				}),
				'draft'
			)
		);
		expect(overlap.errors.startTime).toMatch(/overlap your entry for RO RO-48213/);
		const long = await refusal(
			worklog.create(
				apprentice,
				input({
					workDate: date,
					startTime: undefined,
					endTime: undefined,
					hours: 14,
					tasks: [{ taskId: taskIds[0], hours: 14 }]
				}),
				'draft'
			)
		);
		expect(long.errors.hours).toMatch(/limit is 16 h a day/);
	});

	it('refuses future dates, unknown tasks, a supervisor not assigned, and a bad VIN unless overridden', async () => {
		const future = await refusal(
			worklog.create(apprentice, input({ workDate: '2999-01-01' }), 'draft')
		);
		expect(future.errors.workDate).toMatch(/future/);
		const unknownTask = await refusal(
			worklog.create(apprentice, input({ tasks: [{ taskId: 999999, hours: 2.5 }] }), 'draft')
		);
		expect(unknownTask.errors['tasks.0.taskId']).toMatch(/not in the current framework/);
		const wrongSupervisor = await refusal(
			worklog.create(apprentice, input({ supervisorId: stranger.id }), 'draft')
		);
		expect(wrongSupervisor.errors.supervisorId).toMatch(/assigned to you/);
		// 49 CFR 565.15: the check digit of 1J9RP1A36A1644345 is 6, so 1J9RP1A35A1644345 fails.
		const badVin = await refusal(
			worklog.create(apprentice, input({ vin: '1J9RP1A35A1644345' }), 'draft')
		);
		expect(badVin.errors.vin).toMatch(/check digit/i);
		const kept = await worklog.create(
			apprentice,
			input({ vin: '1J9RP1A35A1644345', vinOverride: true }),
			'draft'
		);
		expect(kept.vinCheckOverridden).toBe(true);
		const letterO = await refusal(
			worklog.create(apprentice, input({ vin: '1J9RP1A36A16443O5', vinOverride: true }), 'draft')
		);
		expect(letterO.errors.vin).toMatch(/I, O or Q/);
	});

	it('rounds to tenths of an hour', async () => {
		const entry = await worklog.create(
			apprentice,
			input({
				startTime: undefined,
				endTime: undefined,
				hours: 1.26,
				tasks: [{ taskId: taskIds[0], hours: 1.26 }]
			}),
			'draft'
		);
		expect(entry.tenths).toBe(13);
	});
});

describe('review', () => {
	it('a journeyworker verifies entries of apprentices they supervise, never others', async () => {
		const entry = await worklog.create(apprentice, input(), 'submit');
		const refused = await worklog.verify(stranger, [entry.id]);
		expect(refused.verified).toEqual([]);
		expect(refused.refused[0].reason).toMatch(/apprentice you supervise/);
		const done = await worklog.verify(supervisor, [entry.id]);
		expect(done.verified).toEqual([entry.id]);
		const again = await worklog.verify(supervisor, [entry.id]);
		expect(again.refused[0].reason).toMatch(/verified, not waiting/);
	});

	it('verified entries are read-only; a correction points back to them', async () => {
		const entry = await worklog.create(apprentice, input(), 'submit');
		await worklog.verify(supervisor, [entry.id]);
		const edit = await refusal(worklog.update(apprentice, entry.id, input(), 'submit'));
		expect(edit.status).toBe(409);
		const correction = await worklog.create(apprentice, input(), 'submit', entry.id);
		expect(correction.correctsId).toBe(entry.id);
	});

	it('returning an entry e-mails the apprentice the comment; they fix and resubmit', async () => {
		const entry = await worklog.create(apprentice, input({ repairOrder: 'RO-77001' }), 'submit');
		await worklog.giveBack(supervisor, entry.id, 'Split more of this time to the diagnosis task.');
		const mail = await waitForMail(
			process.env.FAKE_MAIL_DIR!,
			apprentice.email,
			/returned: RO RO-77001/
		);
		expect(mail.text).toMatch(/Split more of this time/);
		expect(mail.text).toMatch(new RegExp(`/apprentice/log/${entry.id}`));
		await worklog.submit(apprentice, entry.id);
		expect((await LogEntry.findByPk(entry.id, { rejectOnEmpty: true })).status).toBe('submitted');
	});

	it('nobody reaches another apprentice’s entry', async () => {
		const entry = await worklog.create(apprentice, input(), 'draft');
		expect((await refusal(worklog.update(other, entry.id, input(), 'draft'))).status).toBe(404);
		expect((await refusal(worklog.submit(other, entry.id))).status).toBe(404);
		expect(await worklog.canView(other, entry)).toBe(false);
		expect(await worklog.canView(stranger, entry)).toBe(false);
		expect(await worklog.canView(supervisor, entry)).toBe(true);
	});

	it('sends each waiting journeyworker one digest a day', async () => {
		await worklog.create(apprentice, input(), 'submit');
		const now = new Date('2026-11-30T07:00:00Z');
		expect(await worklog.sendReviewDigests(now)).toBeGreaterThan(0);
		expect(await worklog.sendReviewDigests(now)).toBe(0);
		const mail = await waitForMail(
			process.env.FAKE_MAIL_DIR!,
			supervisor.email,
			/waiting for your review/
		);
		expect(mail.text).toMatch(/\/supervisor\/queue/);
	});
});

describe('queries', () => {
	it('lists an apprentice’s own entries and a journeyworker’s queue in SQL', async () => {
		const mine = await worklog.queries.forApprentice(apprentice.id, { limit: 100, offset: 0 });
		expect(mine.total).toBeGreaterThan(5);
		expect(mine.rows.every((r) => r.apprenticeId === apprentice.id)).toBe(true);
		const queue = await worklog.queries.queue(supervisor.id, {
			status: 'submitted',
			sort: 'oldest',
			limit: 100,
			offset: 0
		});
		expect(queue.rows.length).toBeGreaterThan(0);
		expect(queue.rows.every((r) => r.status === 'submitted')).toBe(true);
		const none = await worklog.queries.queue(stranger.id, {
			status: 'submitted',
			sort: 'oldest',
			limit: 100,
			offset: 0
		});
		expect(none.rows.some((r) => r.apprenticeId === apprentice.id)).toBe(false);
		const roster = await people.apprentices();
		expect(roster).toHaveLength(20);
		const mineRow = roster.find((r) => r.id === apprentice.id)!;
		const verified = await LogEntry.sum('tenths', {
			where: { apprenticeId: apprentice.id, status: 'verified' }
		});
		expect(mineRow.verifiedTenths).toBe(verified ?? 0);
		expect(mineRow.waiting).toBe(
			await LogEntry.count({ where: { apprenticeId: apprentice.id, status: 'submitted' } })
		);
	});
});
