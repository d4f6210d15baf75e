import { execFile } from 'node:child_process';
import { readdir, readFile } from 'node:fs/promises';
import path from 'node:path';
import { promisify } from 'node:util';
import { QueryTypes } from 'sequelize';
import { beforeAll, describe, expect, it } from 'vitest';
import type { SignedInUser } from '$lib/server/auth';
import {
	ApprenticeProfile,
	Cohort,
	prepare,
	Programme,
	sequelize,
	Task,
	User
} from '$lib/server/db';
import * as framework from '$lib/server/framework';
import * as progress from '$lib/server/progress';
import * as digest from '$lib/server/progress-digest';
import { seedDemo } from '../../seed/demo';
import { actions } from '../../src/routes/(coordinator)/coordinator/digest/+page.server';
import type { StoredMail } from '../../fakes/smtp';
import { waitForMail } from '../helpers/mail';
import { byRole } from '../helpers/accounts';
import { logHours } from '../helpers/records';

const run = promisify(execFile);

/** How many weekly digests the fake SMTP server holds for `to`. */
async function digestsTo(to: string): Promise<number> {
	const dir = process.env.FAKE_MAIL_DIR!;
	let n = 0;
	for (const name of await readdir(dir)) {
		const mail = JSON.parse(await readFile(path.join(dir, name), 'utf8')) as StoredMail;
		if (mail.to.includes(to) && mail.subject.startsWith('Week of ')) n++;
	}
	return n;
}

let apprentice: SignedInUser;
let supervisor: SignedInUser;
let coordinator: SignedInUser;
let taskId: number;
let steps: { fromHours: number; percent: number }[];
const today = new Date().toISOString().slice(0, 10);
const daysAgo = (n: number) => new Date(Date.now() - n * 86_400_000).toISOString().slice(0, 10);

const log = (day: string, hours: number, verify: boolean) =>
	logHours(apprentice, supervisor, { day, hours, verify, taskId, make: 'Light pickup' });

beforeAll(async () => {
	await prepare();
	await framework.ensureDefault();
	await seedDemo();
	apprentice = await byRole('apprentice');
	supervisor = await byRole('supervisor');
	coordinator = await byRole('coordinator');
	const current = (await framework.current())!;
	taskId = (
		await Task.findOne({
			where: { frameworkId: current.id, code: 'BRK-01' },
			rejectOnEmpty: true
		})
	).id;
	// Steady weekly hours and credit that leave half an hour to the programme's second wage step.
	for (const n of [35, 28, 21, 14, 7]) await log(daysAgo(n), 8, true);
	const profile = await ApprenticeProfile.findByPk(apprentice.id, { rejectOnEmpty: true });
	const cohort = await Cohort.findByPk(profile.cohortId, { rejectOnEmpty: true });
	const programme = await Programme.findByPk(cohort.programmeId, { rejectOnEmpty: true });
	steps = [...programme.wageSchedule].sort((a, b) => a.fromHours - b.fromHours);
	await profile.update({ priorCreditHours: steps[1].fromHours - 40 - 0.5 });
	// Two entries waiting for the journeyworker, the older one submitted first.
	await log(daysAgo(3), 6, false);
	await log(daysAgo(2), 5, false);
	// Someone else with a name that must not become markup in the HTML part.
	const other = await User.findOne({ where: { role: 'apprentice', name: 'Cal Mbeki' } });
	await other!.update({ name: 'Cal <b>Mbeki</b>' });
});

describe('weekly coordinator digest', () => {
	it('gathers at-risk apprentices, waiting entries per journeyworker and wage steps due', async () => {
		const engine = (await progress.apprentice(apprentice.id))!.progress;
		expect(engine.wage.next!.percent).toBe(steps[1].percent);
		expect(engine.wage.next!.dueDate! <= daysAgo(-digest.DUE_WITHIN_DAYS)).toBe(true);

		const week = await digest.gather(today);
		const cohort = await progress.cohort('all');
		expect(week.atRisk.map((a) => a.id).sort()).toEqual(
			cohort.apprentices
				.filter((a) => a.atRisk)
				.map((a) => a.id)
				.sort()
		);
		expect(week.atRisk.length).toBeGreaterThan(0);
		expect(week.atRisk.every((a) => a.reasons.length > 0)).toBe(true);
		expect(week.waiting).toEqual([
			{
				journeyworkerId: supervisor.id,
				journeyworker: 'Dale Okafor',
				entries: 2,
				oldestSubmitted: today,
				oldestWorkDate: daysAgo(3)
			}
		]);
		expect(week.wageDue.map((w) => [w.id, w.percent, w.nextPercent])).toEqual([
			[apprentice.id, steps[0].percent, steps[1].percent]
		]);
	});

	it('e-mails every active coordinator a text and HTML summary with links into the app', async () => {
		const second = await User.create({
			id: 'coordinator-two',
			email: 'second.coordinator@example.org',
			name: 'Second Coordinator',
			role: 'coordinator',
			passwordHash: null,
			siteId: null,
			isDemo: true
		});
		await User.create({
			id: 'coordinator-gone',
			email: 'gone.coordinator@example.org',
			name: 'Former Coordinator',
			role: 'coordinator',
			passwordHash: null,
			siteId: null,
			isDemo: true,
			active: false
		});
		try {
			expect(await digest.sendCoordinatorDigests()).toBe(2);
		} finally {
			await second.update({ active: false });
		}
		const dir = process.env.FAKE_MAIL_DIR!;
		const mail = await waitForMail(
			dir,
			coordinator.email,
			/^Week of .* at risk, 2 entries waiting/
		);
		await waitForMail(dir, second.email, /^Week of /);
		await expect(waitForMail(dir, 'gone.coordinator@example.org', /./, 500)).rejects.toThrow();

		expect(mail.text).toContain('Hello Priya Castellano');
		expect(mail.text).toMatch(/APPRENTICES AT RISK \(\d+\)/);
		expect(mail.text).toContain('- Rosa Lindqvist (Autumn 2025 intake, Harbor Street Garage)');
		expect(mail.text).toContain('ENTRIES WAITING FOR REVIEW (2)');
		expect(mail.text).toContain(`- Dale Okafor: 2 entries, oldest submitted ${today}`);
		expect(mail.text).toContain(
			`- Rosa Lindqvist: ${steps[0].percent} % → ${steps[1].percent} %, due `
		);
		expect(mail.text).toMatch(/Rosa Lindqvist: .*, due \d{4}-\d{2}-\d{2} \(0\.5 h to go/);
		expect(mail.text).toContain(`http://localhost:3999/coordinator/apprentices/${apprentice.id}`);
		expect(mail.html).toContain(
			`href="http://localhost:3999/coordinator/apprentices/${apprentice.id}"`
		);
		expect(mail.html).toContain('Cal &lt;b&gt;Mbeki&lt;/b&gt;');
		expect(mail.html).not.toContain('<b>Mbeki</b>');
	});

	it('sends from the development button for coordinators only', async () => {
		const event = (user: SignedInUser) =>
			({
				locals: { user, session: null },
				url: new URL('http://localhost:3999/coordinator/digest?/send')
			}) as never;
		expect(await actions.send(event(coordinator))).toEqual({ sent: 1 });
		await expect(actions.send(event(apprentice))).rejects.toMatchObject({ status: 403 });
	});

	it('sends the Monday digest once when several instances try at the same moment', async () => {
		const monday = new Date(2026, 11, 7, 9, 30);
		expect(digest.weekOf(monday)).toBe('2026-12-07');
		expect(digest.weekOf(new Date(2026, 11, 13, 23, 59))).toBe('2026-12-07');
		expect(digest.weekOf(new Date(2026, 11, 14, 0, 1))).toBe('2026-12-14');
		const before = await digestsTo(coordinator.email);
		const results = await Promise.all([
			digest.sendWeeklyDigest(monday),
			digest.sendWeeklyDigest(monday),
			digest.sendWeeklyDigest(new Date(2026, 11, 7, 9, 45))
		]);
		expect(results.filter((r) => r === 1)).toHaveLength(1);
		expect(results.filter((r) => r === null)).toHaveLength(2);
		// Later in the same week nothing more goes out.
		expect(await digest.sendWeeklyDigest(new Date(2026, 11, 9, 8, 0))).toBeNull();
		expect(await digestsTo(coordinator.email)).toBe(before + 1);
		const [row] = await sequelize.query<{ recipients: number }>(
			"SELECT recipients FROM coordinator_digests WHERE week = '2026-12-07'",
			{ type: QueryTypes.SELECT }
		);
		expect(Number(row.recipients)).toBe(1);
	});

	it('runs as `npm run digest` on the same settings, and exits non-zero when mail fails', async () => {
		const env = { ...process.env, DAILY_JOBS: 'off' };
		const ok = await run('npm', ['run', '--silent', 'digest'], { env });
		expect(ok.stdout).toContain('Weekly digest sent to 1 coordinator.');
		// `--once` claims the week like the Monday job: the second run sends nothing.
		const first = await run('npm', ['run', '--silent', 'digest', '--', '--once'], { env });
		expect(first.stdout).toContain('Weekly digest sent to 1 coordinator.');
		const second = await run('npm', ['run', '--silent', 'digest', '--', '--once'], { env });
		expect(second.stdout).toContain(
			`The digest for the week of ${digest.weekOf()} was already sent.`
		);
		const broken = run('npm', ['run', '--silent', 'digest'], {
			env: { ...env, SMTP_URL: 'smtp://127.0.0.1:9' }
		});
		await expect(broken).rejects.toMatchObject({ code: 1 });
	});
});
