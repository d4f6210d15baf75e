import { execFileSync } from 'node:child_process';
import sharp from 'sharp';
import { beforeAll, describe, expect, it } from 'vitest';
import * as assessment from '$lib/server/assessment';
import { GENESIS } from '$lib/server/assessment/chain';
import { stepField } from '$lib/server/assessment/gates';
import * as audit from '$lib/server/audit';
import type { SignedInUser } from '$lib/server/auth';
import {
	AuditEvent,
	prepare,
	QuizAttempt,
	sequelize,
	SignOff,
	SignOffPhoto,
	Supervision,
	Task,
	TaskQuestion,
	TaskStep,
	User
} from '$lib/server/db';
import * as framework from '$lib/server/framework';
import * as worklog from '$lib/server/worklog';
import { DEMO_PASSWORD, seedDemo } from '../../seed/demo';
import { waitForMail } from '../helpers/mail';
import { signed, byRole } from '../helpers/accounts';

let apprentice: SignedInUser;
let supervisor: SignedInUser;
let stranger: SignedInUser;
let coordinator: SignedInUser;
let task: Task;

const refusal = async (promise: Promise<unknown>) => {
	try {
		await promise;
	} catch (err) {
		if (err instanceof worklog.EntryProblem) return { status: err.status, errors: err.errors };
		throw err;
	}
	throw new Error('expected a refusal');
};

/** Answers every drawn question correctly (or wrongly), as the browser would send them. */
async function answer(attemptId: number, right: boolean) {
	const attempt = await QuizAttempt.findByPk(attemptId, { rejectOnEmpty: true });
	const bank = await TaskQuestion.findAll({
		where: { id: attempt.drawn.map((d) => d.questionId) }
	});
	const answers: Record<string, number[]> = {};
	for (const d of attempt.drawn) {
		const q = bank.find((b) => b.id === d.questionId)!;
		const positions = d.order.map((original, position) => ({ original, position }));
		answers[String(d.questionId)] = positions
			.filter(({ original }) => q.options[original].correct === right)
			.map(({ position }) => position)
			.slice(0, right ? undefined : 1);
	}
	return answers;
}

async function logVerifiedHours(hours: number) {
	const entry = await worklog.create(
		apprentice,
		{
			workDate: '2026-02-10',
			hours,
			repairOrder: 'RO-10001',
			vehicleMake: 'Compact hatch',
			vehicleModel: 'base',
			vinOverride: false,
			odometerUnit: 'mi',
			supervisorId: supervisor.id,
			notes: '',
			tasks: [{ taskId: task.id, hours }]
		},
		'submit'
	);
	await worklog.verify(supervisor, [entry.id]);
}

const allMet = async () => {
	const steps = await TaskStep.findAll({ where: { taskId: task.id } });
	return Object.fromEntries(steps.map((s) => [String(s.id), 'met' as const]));
};

beforeAll(async () => {
	await prepare();
	await framework.ensureDefault();
	await seedDemo();
	apprentice = await byRole('apprentice');
	supervisor = await byRole('supervisor');
	coordinator = await byRole('coordinator');
	for (const s of await User.findAll({ where: { role: 'supervisor' } })) {
		if (
			!(await Supervision.count({ where: { supervisorId: s.id, apprenticeId: apprentice.id } }))
		) {
			stranger = signed(s);
			break;
		}
	}
	const current = (await framework.current())!;
	task = await Task.findOne({
		where: { frameworkId: current.id, code: 'BRK-01' },
		rejectOnEmpty: true
	});
});

describe('knowledge checks', () => {
	it('never sends the answers to the browser', async () => {
		const started = await assessment.startAttempt(apprentice, 'BRK-01');
		expect(started.questions.length).toBe(assessment.QUIZ.questions);
		expect(JSON.stringify(started)).not.toMatch(/"correct"|explanation/);
	});

	it('scores on the server, refuses tampering and a second submission', async () => {
		const started = await assessment.startAttempt(apprentice, 'BRK-01');
		const tampered = await refusal(
			assessment.submitAttempt(apprentice, started.attemptId, { '999999': [0] })
		);
		expect(tampered.status).toBe(400);
		const result = await assessment.submitAttempt(
			apprentice,
			started.attemptId,
			await answer(started.attemptId, true)
		);
		expect(result).toMatchObject({ passed: true, percent: 100 });
		const again = await refusal(assessment.submitAttempt(apprentice, started.attemptId, {}));
		expect(again.status).toBe(409);
	});

	it('after a fail, says what to review and makes the apprentice wait before a retake', async () => {
		const started = await assessment.startAttempt(apprentice, 'BRK-02');
		const result = await assessment.submitAttempt(
			apprentice,
			started.attemptId,
			await answer(started.attemptId, false)
		);
		expect(result.passed).toBe(false);
		expect(result.missed.length).toBe(result.total);
		expect((await refusal(assessment.startAttempt(apprentice, 'BRK-02'))).status).toBe(429);
	});

	it('refuses a submission after the time limit', async () => {
		const started = await assessment.startAttempt(apprentice, 'BRK-03');
		await sequelize.query(
			`UPDATE quiz_attempts SET started_at = '2020-01-01 00:00:00.000 +00:00' WHERE id = ${started.attemptId}`
		);
		expect(
			(await refusal(assessment.submitAttempt(apprentice, started.attemptId, {}))).status
		).toBe(409);
	});
});

describe('sign-off', () => {
	const input = async (over: Partial<assessment.SignOffInput> = {}) => ({
		apprenticeId: apprentice.id,
		code: 'BRK-01',
		level: 3 as const,
		results: await allMet(),
		notes: '',
		password: DEMO_PASSWORD,
		...over
	});

	it('refuses without the verified hours, and stores nothing', async () => {
		const problem = await refusal(assessment.signOff(supervisor, await input(), 'session-a'));
		expect(problem.errors.hours).toMatch(/verified/);
		expect(await SignOff.count()).toBe(0);
	});

	it('refuses a wrong password, a supervisor not assigned, and a safety step not met', async () => {
		await logVerifiedHours(task.minHours);
		expect(
			(
				await refusal(
					assessment.signOff(supervisor, await input({ password: 'wrong password' }), 's')
				)
			).errors.password
		).toMatch(/not right/);
		expect(
			(await refusal(assessment.signOff(stranger, await input(), 's'))).errors.supervisor
		).toBeTruthy();
		const safety = await TaskStep.findOne({
			where: { taskId: task.id, safety: true },
			rejectOnEmpty: true
		});
		const results = { ...(await allMet()), [String(safety.id)]: 'not met' as const };
		const problem = await refusal(assessment.signOff(supervisor, await input({ results }), 's'));
		expect(problem.errors[stepField(safety.id)]).toBeTruthy();
		const missing = await allMet();
		delete missing[String(safety.id)];
		expect(
			(await refusal(assessment.signOff(supervisor, await input({ results: missing }), 's'))).status
		).toBe(400);
		expect(await SignOff.count()).toBe(0);
	});

	it('signs with a content hash and an audit link; twice in a row is refused', async () => {
		const done = await assessment.signOff(supervisor, await input(), 'session-b');
		expect(done.contentHash).toMatch(/^[0-9a-f]{64}$/);
		expect((await assessment.currentLevels(apprentice.id)).get('BRK-01')?.level).toBe(3);
		expect((await refusal(assessment.signOff(supervisor, await input(), 'session-b'))).status).toBe(
			409
		);
		const event = await AuditEvent.findOne({
			where: { subject: `sign-off:${done.id}` },
			rejectOnEmpty: true
		});
		expect(JSON.parse(event.content)).toMatchObject({ taskCode: 'BRK-01', level: 3 });
	});

	it('revocation is a new record pointing back; the level falls away; the original stays', async () => {
		const original = await SignOff.findOne({ where: { kind: 'sign-off' }, rejectOnEmpty: true });
		expect(
			(await refusal(assessment.revoke(supervisor, original.id, { reason: 'x' }))).status
		).toBe(403);
		await assessment.revoke(coordinator, original.id, { reason: 'Assessed on the wrong vehicle.' });
		expect((await assessment.currentLevels(apprentice.id)).get('BRK-01')).toBeUndefined();
		expect(await SignOff.findByPk(original.id)).not.toBeNull();
		expect(
			(await refusal(assessment.revoke(coordinator, original.id, { reason: 'again' }))).status
		).toBe(409);
		const history = await assessment.history(apprentice.id, 'BRK-01');
		expect(history.map((h) => h.kind)).toEqual(['sign-off', 'revocation']);
	});

	it('a photo taken at the assessment is stored without metadata and signed by its hash', async () => {
		const jpeg = await sharp({
			create: { width: 64, height: 48, channels: 3, background: '#c05020' }
		})
			.jpeg()
			.toBuffer();
		const pdf = Buffer.from('%PDF-1.4\n1 0 obj<<>>endobj\ntrailer<<>>\n%%EOF\n');
		const before = await SignOff.count();
		const refused = await refusal(
			assessment.signOff(supervisor, await input(), 's', [{ bytes: pdf, name: 'report.pdf' }])
		);
		expect(refused.errors.photos).toBeTruthy();
		expect(await SignOff.count()).toBe(before);

		const done = await assessment.signOff(supervisor, await input(), 'session-c', [
			{ bytes: jpeg, name: 'bay3.jpg' }
		]);
		expect(done.photos).toBe(1);
		const photo = await SignOffPhoto.findOne({
			where: { signOffId: done.id },
			rejectOnEmpty: true
		});
		const event = await AuditEvent.findOne({
			where: { subject: `sign-off:${done.id}` },
			rejectOnEmpty: true
		});
		expect(JSON.parse(event.content).photos).toEqual([photo.sha256]);
		const stored = await worklog.evidenceStorage().get(photo.storageKey);
		expect((await sharp(stored!).metadata()).exif).toBeUndefined();
	});

	it('the matrix shows every task with hours and levels', async () => {
		const cells = await assessment.matrix(apprentice.id);
		expect(cells.length).toBeGreaterThanOrEqual(120);
		const brk = cells.find((c) => c.code === 'BRK-01')!;
		expect(brk.verifiedTenths).toBe(Math.round(task.minHours * 10));
		expect(brk.level).toBe(3);
	});

	it('a sign-off request e-mails the journeyworker', async () => {
		await assessment.requestSignOff(apprentice, 'BRK-01', supervisor.id);
		const mail = await waitForMail(
			process.env.FAKE_MAIL_DIR!,
			supervisor.email,
			/Sign-off requested: BRK-01/
		);
		expect(mail.text).toMatch(/\/supervisor\/sign-off\//);
	});
});

describe('audit trail', () => {
	it('verifies, then finds a row edited directly in SQLite', async () => {
		const intact = await audit.verify();
		expect(intact).toMatchObject({ ok: true });
		expect((intact as { count: number }).count).toBeGreaterThanOrEqual(3);
		const first = await AuditEvent.findOne({ order: [['id', 'ASC']], rejectOnEmpty: true });
		expect(first.previousHash).toBe(GENESIS);
		const second = await AuditEvent.findOne({
			order: [['id', 'ASC']],
			offset: 1,
			rejectOnEmpty: true
		});
		await sequelize.query(
			`UPDATE audit_events SET content = replace(content, '"level":3', '"level":4') WHERE id = ${second.id}`
		);
		await sequelize.query(
			`UPDATE audit_events SET content = replace(content, 'RO-10001', 'RO-99999') WHERE id = ${second.id}`
		);
		const broken = await audit.verify();
		expect(broken).toMatchObject({ ok: false, brokenAt: second.id });
	});

	it('npm run audit:verify reports the break with a non-zero exit', () => {
		let output = '';
		let code = 0;
		try {
			execFileSync('npx', ['tsx', 'seed/audit-verify.ts'], {
				env: process.env,
				encoding: 'utf8',
				stdio: 'pipe'
			});
		} catch (err) {
			const e = err as { status: number; stderr: string };
			code = e.status;
			output = e.stderr;
		}
		expect(code).toBe(2);
		expect(output).toMatch(/BROKEN at event/);
	});
});
