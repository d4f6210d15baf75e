import type { Browser, BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { waitForMail } from '../helpers/mail';
import { dbAll, launch, openPage, shot, signIn } from './browser';

const TABLET = { width: 820, height: 1180 };
// A Saturday: the demo shops log no work at weekends, so these small entries stay far below
// the 16 h daily limit, and entries without clock times never overlap anything.
const WORK_DATE = '2025-09-06';
// Repair orders and course names unique to this run, so the checks find only their own rows.
const RUN = Date.now().toString(36).slice(-5).toUpperCase();
// From seed/demo.ts: Ines Bauer works at another shop; Hollis Vance at Rosa's.
const OTHER_SITE_SUPERVISOR = 'ines.bauer@riverbend-training.example';
const SAME_SITE_SUPERVISOR = 'hollis.vance@riverbend-training.example';

let browser: Browser;
let apprentice: { context: BrowserContext; page: Page };
let ids: { dale: string; rosa: string };
let taskIds: number[];

async function logEntry(label: string): Promise<{ id: number; ro: string }> {
	const ro = `Q${RUN}-${label}`;
	const response = await apprentice.context.request.post('/api/log-entries', {
		data: {
			workDate: WORK_DATE,
			hours: 0.5,
			repairOrder: ro,
			vehicleYear: 2017,
			vehicleMake: 'Compact',
			vehicleModel: 'Hatchback',
			supervisorId: ids.dale,
			notes: `Queue check ${label}: front pads and rotor runout.`,
			tasks: [
				{ taskId: taskIds[0], hours: 0.3 },
				{ taskId: taskIds[1], hours: 0.2 }
			],
			intent: 'submit'
		}
	});
	expect(response.status(), await response.text()).toBe(201);
	return { id: (await response.json()).id, ro };
}

async function openQueue(size: 'tablet' | 'desktop') {
	const opened = await openPage(browser, 'desktop');
	if (size === 'tablet') await opened.page.setViewportSize(TABLET);
	await signIn(opened.page, 'supervisor@example.org');
	// Newest first and one apprentice, so this run's entries lead the demo backlog.
	await opened.page.goto(`/supervisor/queue?apprentice=${ids.rosa}&sort=newest`);
	await opened.page.locator('[data-enhanced="true"]').waitFor();
	return opened;
}

const headingCount = async (page: Page) =>
	Number((await page.getByTestId('queue-count').textContent())?.replace(/\D/g, ''));

beforeAll(async () => {
	browser = await launch();
	const users = await dbAll<{ id: string; email: string }>(
		`SELECT id, email FROM users WHERE email IN ('supervisor@example.org', 'apprentice@example.org')`
	);
	ids = {
		dale: users.find((u) => u.email === 'supervisor@example.org')!.id,
		rosa: users.find((u) => u.email === 'apprentice@example.org')!.id
	};
	// Another suite may publish a new framework version, so ask which one is current.
	const [framework] = await dbAll<{ id: number }>(
		`SELECT id FROM frameworks WHERE status = 'published' ORDER BY id DESC LIMIT 1`
	);
	const { context, page } = await openPage(browser, 'phone');
	await signIn(page, 'apprentice@example.org');
	apprentice = { context, page };
	const tasks = await context.request.get(`/api/frameworks/${framework.id}/tasks?size=2`);
	expect(tasks.status()).toBe(200);
	taskIds = (await tasks.json()).tasks.map((t: { id: number }) => t.id);
	expect(taskIds).toHaveLength(2);
});
afterAll(async () => {
	await apprentice?.context.close();
	await browser?.close();
});

describe('review queue', () => {
	it('verifies one entry and returns another in place on a tablet', async () => {
		const first = await logEntry('A');
		const second = await logEntry('B');
		const { page, context, errors } = await openQueue('tablet');

		const card = page.getByTestId(`entry-${first.id}`);
		await expect(card.textContent()).resolves.toMatch(first.ro);
		await expect(card.textContent()).resolves.toMatch('0.5 h');
		await expect(card.textContent()).resolves.toMatch('Hours only, no clock times');
		await expect(card.locator('li').count()).resolves.toBe(2);
		await shot(page, 'review-queue-tablet');

		const url = page.url();
		const before = await headingCount(page);
		await page.evaluate(() => Object.assign(window, { queueMarker: 'kept' }));
		await card.getByRole('button', { name: /^Verify 0\.5 h/ }).click();
		await card.locator('[data-status="verified"]').waitFor();
		expect(page.url()).toBe(url);
		await expect(
			page.evaluate(() => (window as { queueMarker?: string }).queueMarker)
		).resolves.toBe('kept');
		expect(await headingCount(page)).toBe(before - 1);

		const other = page.getByTestId(`entry-${second.id}`);
		await other.getByText('Return…').click();
		await other.getByText('The apprentice is e-mailed your comment.').waitFor();
		await other
			.getByLabel('What should Rosa fix?')
			.fill('Split the time: most of it was the rotor.');
		await other.getByRole('button', { name: 'Return to Rosa' }).click();
		await other.locator('[data-status="returned"]').waitFor();
		await expect(
			page.evaluate(() => (window as { queueMarker?: string }).queueMarker)
		).resolves.toBe('kept');
		expect(await headingCount(page)).toBe(before - 2);
		await shot(page, 'review-queue-tablet-done');

		const mail = await waitForMail(
			inject('mailDir'),
			'apprentice@example.org',
			new RegExp(`returned: RO ${second.ro}`)
		);
		expect(mail.text).toContain('Split the time: most of it was the rotor.');

		const stored = await context.request.get(`/api/log-entries/${first.id}`);
		expect((await stored.json()).status).toBe('verified');
		expect(errors).toEqual([]);
		await context.close();
	});

	it('verifies two selected entries at once on a desktop, and shows a refusal beside the third', async () => {
		const entries = [await logEntry('C'), await logEntry('D')];
		const taken = await logEntry('G');
		const { page, context, errors } = await openQueue('desktop');

		// Another journeyworker at Rosa's shop verifies one while this page is open.
		const colleague = await openPage(browser, 'desktop');
		await signIn(colleague.page, SAME_SITE_SUPERVISOR);
		const early = await colleague.context.request.post(`/api/log-entries/${taken.id}/verify`, {
			data: {}
		});
		expect(early.status()).toBe(200);
		await colleague.context.close();

		for (const e of [...entries, taken]) {
			await page.getByTestId(`entry-${e.id}`).getByRole('checkbox').check();
		}
		await page.getByText('1.5 h in 3 entries.').waitFor();
		await shot(page, 'review-queue-desktop-selected');
		await page.getByRole('button', { name: 'Verify 3 selected' }).click();
		for (const e of entries) {
			await page.getByTestId(`entry-${e.id}`).locator('[data-status="verified"]').waitFor();
			const stored = await context.request.get(`/api/log-entries/${e.id}`);
			expect((await stored.json()).status).toBe('verified');
		}
		const refused = page.getByTestId(`entry-${taken.id}`);
		await refused.getByText('Not done: This entry is verified, not waiting for review.').waitFor();
		// The card now shows what happened meanwhile and offers no review that cannot happen.
		await refused.locator('[data-status="verified"]').waitFor();
		expect(await refused.getByRole('button', { name: /^Verify/ }).count()).toBe(0);
		await shot(page, 'review-queue-desktop-refused');
		expect(errors).toEqual([]);
		await context.close();
	});

	it('works without JavaScript through the form actions', async () => {
		const entry = await logEntry('E');
		const context = await browser.newContext({
			javaScriptEnabled: false,
			baseURL: inject('baseUrl'),
			viewport: TABLET
		});
		const page = await context.newPage();
		await signIn(page, 'supervisor@example.org');
		await page.goto(`/supervisor/queue?apprentice=${ids.rosa}&sort=newest`);
		const card = page.getByTestId(`entry-${entry.id}`);
		await Promise.all([
			page.waitForURL(/verified=1/),
			card.getByRole('button', { name: /^Verify 0\.5 h/ }).click()
		]);
		await page.getByText('Verified 1 entry.').waitFor();
		expect(new URL(page.url()).searchParams.get('apprentice')).toBe(ids.rosa);
		expect(await page.getByTestId(`entry-${entry.id}`).count()).toBe(0);
		await context.close();
	});

	it('shows one entry in full, and hides it from a journeyworker at another shop', async () => {
		const entry = await logEntry('F');
		const { page, context, errors } = await openPage(browser, 'desktop');
		await signIn(page, 'supervisor@example.org');
		await page.goto(`/supervisor/entries/${entry.id}`);
		await page.getByRole('heading', { name: `Rosa Lindqvist: RO ${entry.ro}` }).waitFor();
		await page.getByText('Waiting for review').waitFor();
		await expect(page.getByRole('button', { name: 'Verify 0.5 h' }).isVisible()).resolves.toBe(
			true
		);
		await shot(page, 'review-entry-desktop');
		expect(errors).toEqual([]);
		await context.close();

		const outsider = await openPage(browser, 'desktop');
		await signIn(outsider.page, OTHER_SITE_SUPERVISOR);
		const verify = await outsider.context.request.post(`/api/log-entries/${entry.id}/verify`, {
			data: {}
		});
		expect(verify.status()).toBe(404);
		const view = await outsider.context.request.get(`/supervisor/entries/${entry.id}`);
		expect(view.status()).toBe(404);
		await outsider.context.close();
	});
});

describe('related instruction', () => {
	async function addInstruction(course: string) {
		const { page } = apprentice;
		await page.goto('/apprentice/rti');
		await page.getByLabel('Course or module').fill(course);
		await page.getByLabel('Provider').fill('Port Alder Technical College');
		await page.getByLabel('Hours').fill('3');
		await page.getByRole('button', { name: 'Add instruction' }).click();
		await page.getByText('Added. It waits for your coordinator to confirm it.').waitFor();
	}

	it('confirms what the apprentice entered, one and then two at once', async () => {
		const courses = ['one', 'two', 'three'].map((n) => `Brake hydraulics ${RUN} ${n}`);
		for (const course of courses) await addInstruction(course);

		const { page, context, errors } = await openPage(browser, 'desktop');
		await signIn(page, 'coordinator@example.org');
		await page.goto('/coordinator/rti');
		const row = (course: string) => page.locator('tr', { hasText: course });
		await row(courses[0]).waitFor();
		await shot(page, 'rti-waiting-desktop');

		await row(courses[0])
			.getByRole('button', { name: /^Confirm/ })
			.click();
		await page.getByText('Confirmed 1 record.').waitFor();
		expect(await row(courses[0]).count()).toBe(0);

		for (const course of courses.slice(1)) await row(course).getByRole('checkbox').check();
		await page.getByRole('button', { name: 'Confirm 2 selected' }).click();
		await page.getByText('Confirmed 2 records.').waitFor();
		for (const course of courses) expect(await row(course).count()).toBe(0);

		const stored = await dbAll<{ confirmed: number }>(
			`SELECT confirmed_at IS NOT NULL AS confirmed FROM rti_records WHERE course IN (?, ?, ?)`,
			courses
		);
		expect(stored.map((r) => r.confirmed)).toEqual([1, 1, 1]);
		expect(errors).toEqual([]);
		await context.close();
	});

	it('records instruction for an apprentice, confirmed at once', async () => {
		const course = `Shop safety refresher ${RUN}`;
		const { page, context, errors } = await openPage(browser, 'desktop');
		await signIn(page, 'coordinator@example.org');
		await page.goto('/coordinator/rti');
		const form = page.getByRole('form', { name: 'Record instruction' });
		await form.getByLabel('Apprentice').selectOption({ label: 'Rosa Lindqvist' });
		await form.getByLabel('Course or module').fill(course);
		await form.getByLabel('Provider').fill('Riverbend training office');
		await form.getByLabel('Hours').fill('2.5');
		await form.getByRole('button', { name: 'Record and confirm' }).click();
		await page.getByText(`Recorded and confirmed: ${course}, 2.5 h for Rosa Lindqvist.`).waitFor();
		const record = page.locator('li', { hasText: course });
		await expect(record.textContent()).resolves.toMatch('Confirmed');
		await shot(page, 'rti-recorded-desktop');
		expect(errors).toEqual([]);
		await context.close();
	});
});
