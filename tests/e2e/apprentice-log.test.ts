import sharp from 'sharp';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { validateVin } from '../../src/lib/vin';
import { launch, openPage, shot, signIn, VIEWPORTS } from './browser';

const APPRENTICE = 'apprentice@example.org';
// Another demo apprentice, at another shop (seed/demo.ts).
const OTHER_APPRENTICE = 'amir.haddad@riverbend-training.example';

let browser: Browser;
beforeAll(async () => {
	browser = await launch();
});
afterAll(() => browser?.close());

const today = () => new Date().toISOString().slice(0, 10);
const tomorrow = () => new Date(Date.now() + 86_400_000).toISOString().slice(0, 10);

/** How many entries the signed-in apprentice has, through the JSON API. */
async function entryCount(page: Page): Promise<number> {
	const response = await page.request.get('/api/log-entries?size=1');
	expect(response.status()).toBe(200);
	return (await response.json()).total;
}

/** Opens the log form and waits until its script runs (the task search only exists then). */
async function openForm(page: Page, path = '/apprentice/log/new') {
	await page.goto(path);
	await page.locator('#task-search').waitFor();
}

async function pickTaskBySearch(page: Page, words: string) {
	await page.locator('#task-search').fill(words);
	const first = page.locator('#task-search ~ ul button').first();
	await first.waitFor();
	const code = (await first.locator('.font-mono').textContent())!.trim();
	await first.click();
	return code;
}

async function secondTask(page: Page) {
	await page.getByRole('button', { name: 'Add another task' }).click();
	const first = await page.locator('#task-0').inputValue();
	const other = await page
		.locator('#task-1 option')
		.evaluateAll(
			(options: HTMLOptionElement[], taken) =>
				options.map((o) => o.value).find((v) => v && v !== taken),
			first
		);
	await page.locator('#task-1').selectOption(other!);
}

const jpeg = () =>
	sharp({ create: { width: 640, height: 480, channels: 3, background: '#b4532a' } })
		.jpeg()
		.toBuffer();

let entryId = 0;
let photoId = 0;

describe('the apprentice log on a phone', () => {
	it('logs 2.5 h on two tasks with a photo, submits it and lists it as Submitted', async () => {
		const { page, errors, context } = await openPage(browser, 'phone');
		await signIn(page, APPRENTICE);
		await openForm(page);
		await expect(page.getByLabel('Date of the work').inputValue()).resolves.toBe(today());
		// Early in the morning, so no demo entry of the day can overlap it.
		await page.getByLabel('Started at').fill('05:00');
		await page.getByLabel('Finished at').fill('07:30');
		await expect(page.getByTestId('entry-total').textContent()).resolves.toBe('2.5 h');
		await page.getByLabel('Repair order number').fill('E2E-2501');
		await page.getByLabel('Year').fill('2019');
		await page.getByLabel('Make').fill('Compact');
		await page.getByLabel('Model').fill('hatch base trim');

		const code = await pickTaskBySearch(page, 'brake');
		expect(code).toMatch(/^[A-Z]{3}-\d+/);
		// One task takes all the hours by itself.
		await expect(page.getByLabel('Hours on task 1').inputValue()).resolves.toBe('2.5');
		await secondTask(page);
		await page.getByLabel('Hours on task 1').fill('1.5');
		await page.getByLabel('Hours on task 2').fill('1.0');
		await expect(page.getByTestId('split-summary').textContent()).resolves.toMatch(
			/Split adds up to 2\.5 of 2\.5 h/
		);
		await shot(page, 'log-new-filled-phone');

		await Promise.all([
			page.waitForURL(/\/apprentice\/log\/\d+\?saved=1/),
			page.getByRole('button', { name: 'Save draft', exact: true }).click()
		]);
		entryId = Number(new URL(page.url()).pathname.split('/').pop());
		await expect(page.getByText('Saved as a draft').isVisible()).resolves.toBe(true);

		await page.getByLabel('Choose file').setInputFiles({
			name: 'bay-photo.jpg',
			mimeType: 'image/jpeg',
			buffer: await jpeg()
		});
		const thumb = page.getByAltText(/^Photo 1: bay-photo/);
		await thumb.waitFor();
		photoId = Number(/evidence\/(\d+)/.exec((await thumb.getAttribute('src'))!)![1]);
		const response = await page.request.get(`/api/evidence/${photoId}?size=thumb`);
		expect(response.status()).toBe(200);
		expect(response.headers()['content-type']).toBe('image/webp');
		await shot(page, 'log-entry-draft-phone');

		await Promise.all([
			page.waitForURL(/\/apprentice\/log\?sent=\d+/),
			page.getByRole('button', { name: 'Submit for review' }).click()
		]);
		const card = page.locator(`[data-entry-id="${entryId}"]`);
		await expect(card.locator('[data-status]').textContent()).resolves.toMatch(/Submitted/);
		await expect(card.textContent()).resolves.toMatch(/RO E2E-2501/);
		await expect(card.textContent()).resolves.toMatch(/2\.5\s*h/);
		await expect(card.textContent()).resolves.toContain(code);
		const image = card.locator('img');
		await expect
			.poll(() => image.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth))
			.toBeGreaterThan(0);
		await shot(page, 'log-list-phone');
		expect(errors).toEqual([]);
		await context.close();
	});

	it('refuses a split that does not add up, a future date and a tampered task; stores nothing', async () => {
		const { page, errors, context } = await openPage(browser, 'phone');
		await signIn(page, APPRENTICE);
		const before = await entryCount(page);
		await openForm(page);
		await page.getByRole('button', { name: '2.5 h' }).click();
		await page.getByLabel('Repair order number').fill('E2E-SPLIT');
		await pickTaskBySearch(page, 'rotor');
		await secondTask(page);
		await page.getByLabel('Hours on task 1').fill('1.5');
		await page.getByLabel('Hours on task 2').fill('1.5');
		await page.getByRole('button', { name: 'Submit for review' }).click();
		await page.getByTestId('entry-problems').waitFor();
		await expect(page.locator('#entry-tasks-error').textContent()).resolves.toMatch(
			/add up to 3\.0 h but the entry is 2\.5 h/
		);
		expect(new URL(page.url()).pathname).toBe('/apprentice/log/new');
		await shot(page, 'log-split-refused-phone');

		await page.getByLabel('Hours on task 2').fill('1.0');
		await page.getByLabel('Date of the work').fill(tomorrow());
		await page.getByRole('button', { name: 'Submit for review' }).click();
		await expect
			.poll(() => page.locator('#entry-workDate-error').textContent())
			.toMatch(/cannot be dated in the future/);

		// A task id that is in no published framework, as a hand-edited form would send it.
		await page.getByLabel('Date of the work').fill(today());
		await page
			.locator('#task-1')
			.evaluate((select: HTMLSelectElement) => (select.selectedOptions[0].value = '999999'));
		await page.getByRole('button', { name: 'Save draft', exact: true }).click();
		await expect
			.poll(() => page.getByText('That task is not in the current framework.').count())
			.toBeGreaterThan(0);

		// The same refusals as plain form posts: a 400 page with the server's words.
		const form = {
			workDate: tomorrow(),
			hours: '1',
			repairOrder: 'E2E-POST',
			'tasks.0.taskId': await page.locator('#task-0').inputValue(),
			supervisorId: 'not-my-journeyworker',
			odometerUnit: 'mi'
		};
		const post = (values: Record<string, string>) =>
			page.request.post('/apprentice/log/new?/submit', {
				form: values,
				headers: { origin: inject('baseUrl'), accept: 'text/html' }
			});
		const refused = await post(form);
		expect(refused.status()).toBe(400);
		const body = await refused.text();
		expect(body).toContain('Entries cannot be dated in the future.');
		expect(body).toContain('Choose one of the journeyworkers assigned to you.');
		// An entry that is not hers (the demo work log holds other apprentices' entries).
		let foreignId = 1;
		while ((await page.request.get(`/api/log-entries/${foreignId}`)).status() !== 404) foreignId++;
		const correction = await post({ ...form, workDate: today(), correctsId: String(foreignId) });
		expect(correction.status()).toBe(404);
		const edit = await page.request.post(`/apprentice/log/${foreignId}?/save`, {
			form: { ...form, workDate: today() },
			headers: { origin: inject('baseUrl'), accept: 'text/html' }
		});
		expect(edit.status()).toBe(404);
		expect(await entryCount(page)).toBe(before);
		expect(errors).toEqual([]);
		await context.close();
	});

	it('warns about a VIN whose check digit fails and keeps it when told to', async () => {
		const good = '1M8GDM9AXKP042788';
		const bad = '1M8GDM9A1KP042788';
		expect(validateVin(good).ok).toBe(true);
		expect(validateVin(bad)).toMatchObject({ ok: false, problem: 'check-digit' });

		const { page, errors, context } = await openPage(browser, 'phone');
		await signIn(page, APPRENTICE);
		await openForm(page);
		await page.getByRole('button', { name: '1 h', exact: true }).click();
		await page.getByLabel('Repair order number').fill('E2E-VIN');
		await pickTaskBySearch(page, 'wheel');
		await page.getByLabel('VIN (optional)').fill(bad);
		await expect(page.locator('#entry-vin-error').textContent()).resolves.toMatch(
			/check digit \(9th character\) should be X/
		);
		const keep = page.getByLabel('Pre-1981 or non-North-American vehicle: keep this VIN');
		await keep.check();
		await expect(page.locator('#entry-vin-error').count()).resolves.toBe(0);
		await shot(page, 'log-vin-override-phone');
		await Promise.all([
			page.waitForURL(/\/apprentice\/log\/\d+\?saved=1/),
			page.getByRole('button', { name: 'Save draft', exact: true }).click()
		]);
		await expect(page.getByLabel('VIN (optional)').inputValue()).resolves.toBe(bad);
		await expect(keep.isChecked()).resolves.toBe(true);

		// The draft goes again, after a confirmation.
		await page.getByRole('link', { name: 'Delete draft…' }).click();
		await Promise.all([
			page.waitForURL(/\/apprentice\/log\?deleted=1/),
			page.getByRole('button', { name: 'Yes, delete the draft' }).click()
		]);
		expect(errors).toEqual([]);
		await context.close();
	});

	it('keeps what was typed on the phone across a reload and a lost connection', async () => {
		const { page, errors, context } = await openPage(browser, 'phone');
		await signIn(page, APPRENTICE);
		const before = await entryCount(page);
		await openForm(page);
		await page.getByRole('button', { name: '1.5 h' }).click();
		await page.getByLabel('Repair order number').fill('E2E-RELOAD');
		await page.getByLabel('Notes (optional)').fill('Left front caliper slide pins');
		await page.reload();
		await page.locator('#task-search').waitFor();
		await expect(page.getByText('Restored what you typed on this phone').isVisible()).resolves.toBe(
			true
		);
		await expect(page.getByLabel('Repair order number').inputValue()).resolves.toBe('E2E-RELOAD');
		await expect(page.getByLabel('Hours', { exact: true }).inputValue()).resolves.toBe('1.5');
		await expect(page.getByLabel('Notes (optional)').inputValue()).resolves.toBe(
			'Left front caliper slide pins'
		);

		await pickTaskBySearch(page, 'brake');
		await context.setOffline(true);
		await page.getByRole('button', { name: 'Submit for review' }).click();
		await page.getByText('Not sent — saved on this phone').waitFor();
		await shot(page, 'log-not-sent-phone');
		await context.setOffline(false);
		expect(await entryCount(page)).toBe(before);

		await page.getByRole('button', { name: 'Throw the copy away' }).click();
		await expect(page.getByLabel('Repair order number').inputValue()).resolves.toBe('');
		await page.reload();
		await page.locator('#task-search').waitFor();
		await expect(page.getByLabel('Repair order number').inputValue()).resolves.toBe('');
		expect(errors.filter((e) => !e.includes('ERR_INTERNET_DISCONNECTED'))).toEqual([]);
		await context.close();
	});

	it('works without JavaScript: shortcuts, another task row, saving and a refused file', async () => {
		const context = await browser.newContext({
			javaScriptEnabled: false,
			viewport: VIEWPORTS.phone,
			baseURL: inject('baseUrl')
		});
		const page = await context.newPage();
		await signIn(page, APPRENTICE);
		await page.goto('/apprentice/log/new');
		await expect(page.locator('select[name^="tasks."]').count()).resolves.toBe(3);
		await page.getByLabel('Repair order number').fill('E2E-NOJS');
		await page.getByRole('button', { name: '2 h', exact: true }).click();
		await expect(page.getByLabel('Hours', { exact: true }).inputValue()).resolves.toBe('2');
		await expect(page.getByLabel('Repair order number').inputValue()).resolves.toBe('E2E-NOJS');
		await page.getByRole('button', { name: 'Add another task' }).click();
		await expect(page.locator('select[name^="tasks."]').count()).resolves.toBe(4);

		const options = await page
			.locator('#task-0 option')
			.evaluateAll((all: HTMLOptionElement[]) => all.map((o) => o.value).filter(Boolean));
		await page.locator('#task-0').selectOption(options[3]);
		await page.locator('#task-3').selectOption(options[4]);
		await page.getByLabel('Hours on task 1').fill('1.5');
		await page.getByLabel('Hours on task 4').fill('0.5');
		await Promise.all([
			page.waitForURL(/\/apprentice\/log\/\d+\?saved=1/),
			page.getByRole('button', { name: 'Save draft', exact: true }).click()
		]);
		await expect(page.getByLabel('Hours on task 2').inputValue()).resolves.toBe('0.5');

		await page.getByLabel('Choose file').setInputFiles({
			name: 'not-a-photo.jpg',
			mimeType: 'image/jpeg',
			buffer: Buffer.from('plain text pretending to be a photo')
		});
		await page.getByRole('button', { name: 'Upload the chosen file' }).click();
		await expect(page.getByRole('alert').first().textContent()).resolves.toMatch(
			/not a photo or a PDF/
		);
		await page.getByLabel('Choose file').setInputFiles({
			name: 'shop-floor.jpg',
			mimeType: 'image/jpeg',
			buffer: await jpeg()
		});
		await page.getByRole('button', { name: 'Upload the chosen file' }).click();
		await page.getByAltText(/^Photo 1: shop-floor/).waitFor();
		await shot(page, 'log-entry-no-script-phone');
		await context.close();
	});

	it("hides one apprentice's entry and photo from another apprentice", async () => {
		expect(photoId).toBeGreaterThan(0);
		const { page, errors, context } = await openPage(browser, 'phone');
		await signIn(page, OTHER_APPRENTICE);
		const thumb = await page.request.get(`/api/evidence/${photoId}?size=thumb`);
		expect(thumb.status()).toBe(404);
		const entry = await page.goto(`/apprentice/log/${entryId}`);
		expect(entry?.status()).toBe(404);
		expect(errors.filter((e) => !e.includes('404'))).toEqual([]);
		await context.close();
	});

	it('records related instruction, waiting for the coordinator', async () => {
		const { page, errors, context } = await openPage(browser, 'phone');
		await signIn(page, APPRENTICE);
		await page.goto('/apprentice/rti');
		await page.getByLabel('Course or module').fill('E2E hydraulic brake systems');
		await page.getByLabel('Provider').fill('Port Alder technical college');
		await page.getByLabel('Hours').fill('6');
		await Promise.all([
			page.waitForURL(/\/apprentice\/rti\?added=1/),
			page.getByRole('button', { name: 'Add instruction' }).click()
		]);
		const record = page.locator('li', { hasText: 'E2E hydraulic brake systems' });
		await expect(record.textContent()).resolves.toMatch(/Waiting for coordinator/);
		await expect(record.textContent()).resolves.toMatch(/6\.0\s*h/);
		expect(errors).toEqual([]);
		await context.close();
	});
});

describe('the apprentice log at desktop width', () => {
	it('shows the list, the form and an entry', async () => {
		const { page, errors, context } = await openPage(browser, 'desktop');
		await signIn(page, APPRENTICE);
		await page.goto('/apprentice/log');
		await expect(
			page.getByRole('link', { name: 'Log a repair' }).first().isVisible()
		).resolves.toBe(true);
		await shot(page, 'log-list-desktop');
		await openForm(page);
		await shot(page, 'log-new-desktop');
		await page.goto(`/apprentice/log/${entryId}`);
		await expect(page.locator('h1').textContent()).resolves.toBe('RO E2E-2501');
		await shot(page, 'log-entry-submitted-desktop');
		expect(errors).toEqual([]);
		await context.close();
	});
});
