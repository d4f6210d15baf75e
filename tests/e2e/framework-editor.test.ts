import { mkdtempSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { launch, openPage, shot, signIn } from './browser';

let browser: Browser;
let page: Page;
let errors: string[];
let closeContext: () => Promise<void>;
let draft: string;

const NEW_TITLE = 'Replace disc brake pads and rotors on one axle, hub faces cleaned';
const files = mkdtempSync(path.join(os.tmpdir(), 'journeymark-fw-'));

beforeAll(async () => {
	browser = await launch();
	const opened = await openPage(browser, 'desktop');
	({ page, errors } = opened);
	closeContext = () => opened.context.close();
	await signIn(page, 'coordinator@example.org');
});
afterAll(async () => {
	await closeContext?.();
	await browser?.close();
});

/** The row index of the specification with this label in the task editor. */
async function specRow(label: string): Promise<number> {
	const labels = await page
		.locator('input[name^="specs."][name$=".label"]')
		.evaluateAll((inputs) => inputs.map((input) => (input as HTMLInputElement).value));
	const index = labels.indexOf(label);
	expect(index).toBeGreaterThanOrEqual(0);
	return index;
}

async function phoneShot(url: string, name: string) {
	await page.setViewportSize({ width: 390, height: 844 });
	await page.goto(url);
	const overflow = await page.evaluate(
		() => document.documentElement.scrollWidth > window.innerWidth + 1
	);
	await shot(page, name);
	await page.setViewportSize({ width: 1366, height: 900 });
	return overflow;
}

describe('the framework editor, as a coordinator', () => {
	it('refuses an apprentice with 403 and a signed-out export with 401', async () => {
		const other = await openPage(browser, 'phone');
		await signIn(other.page, 'apprentice@example.org');
		const response = await other.page.goto('/coordinator/frameworks');
		expect(response?.status()).toBe(403);
		const csv = await other.page.request.get('/api/frameworks/1/export.csv');
		expect(csv.status()).toBe(403);
		await other.context.close();
		const anonymous = await fetch(`${inject('baseUrl')}/api/frameworks/1/export.csv`);
		expect(anonymous.status).toBe(401);
	});

	it('lists the published version and starts a draft from it', async () => {
		await page.goto('/coordinator/frameworks');
		const published = page.getByTestId('version-1');
		await expect(published.getByText('Published').isVisible()).resolves.toBe(true);
		await shot(page, 'framework-list-desktop');
		await Promise.all([
			page.waitForURL(/\/coordinator\/frameworks\/\d+$/),
			page.getByRole('button', { name: 'Start editing' }).first().click()
		]);
		draft = new URL(page.url()).pathname.split('/').pop()!;
		await page.getByRole('heading', { name: /version 2/ }).waitFor();
		await expect(page.locator('header').last().textContent()).resolves.toContain('Draft');
		await shot(page, 'framework-draft-desktop');
		expect(await phoneShot(`/coordinator/frameworks/${draft}`, 'framework-draft-phone')).toBe(
			false
		);
		for (const missing of ['999999', 'not-a-number', `${draft}/tasks/XYZ-99`]) {
			const response = await page.request.get(`/coordinator/frameworks/${missing}`);
			expect(response.status()).toBe(404);
		}
	});

	it('adds a task with starter values, then deletes it after a confirmation', async () => {
		await page.goto(`/coordinator/frameworks/${draft}`);
		const brakes = page.locator('#area-BRK');
		await brakes.getByText('Add a task to BRK').click();
		const code = await page.locator('#add-BRK-code').inputValue();
		expect(code).toMatch(/^BRK-\d{2}$/);
		await page.locator('#add-BRK-title').fill('Inspect a parking brake cable');
		await Promise.all([
			page.waitForURL(new RegExp(`/tasks/${code}\\?added=1$`)),
			brakes.getByRole('button', { name: 'Add task' }).click()
		]);
		await page.getByText('Task added with starter values').waitFor();
		await page.goto(`/coordinator/frameworks/${draft}?delete=${code}`);
		await page.getByTestId('confirm').getByText('leaves Brakes in this draft').waitFor();
		await page.getByRole('button', { name: `Delete ${code}` }).click();
		await page.waitForURL(new RegExp(`/coordinator/frameworks/${draft}#area-BRK$`));
		expect(await page.locator(`#task-${code}`).count()).toBe(0);
	});

	it('saves a new title and spec, and refuses a 10 000 N·m wheel-nut torque with a clear message', async () => {
		const editor = `/coordinator/frameworks/${draft}/tasks/BRK-01`;
		await page.goto(editor);
		await page.getByLabel('Title', { exact: true }).fill(NEW_TITLE);
		const row = await specRow('Wheel nut torque');
		await page.locator(`#f-specs-${row}-value`).fill('150');
		await expect(
			page.locator(`#f-specs-${row}`).getByTestId('spec-preview').textContent()
		).resolves.toMatch(/150 N·m.*111 lbf·ft/);
		await page.getByRole('button', { name: 'Save task' }).first().click();
		await page.getByText('Saved. Apprentices see the change').waitFor();

		// Rows are added in place with JavaScript.
		const steps = await page.locator('input[name$=".text"][name^="checklist."]').count();
		await page.getByRole('button', { name: '+ Add a step' }).click();
		expect(await page.locator('input[name$=".text"][name^="checklist."]').count()).toBe(steps + 1);

		await page.locator(`#f-specs-${row}-value`).fill('10000');
		await page.getByRole('button', { name: 'Save task' }).first().click();
		const summary = page.getByTestId('error-summary');
		await summary.waitFor();
		await expect(summary.textContent()).resolves.toMatch(/Specification \d+, value/);
		await expect(page.locator(`#f-specs-${row}-value-error`).textContent()).resolves.toMatch(
			/torque above 3000 N·m is not believable/
		);
		// What was typed stays in the form.
		await expect(page.getByLabel('Title', { exact: true }).inputValue()).resolves.toBe(NEW_TITLE);
		await expect(page.locator(`#f-specs-${row}-value`).inputValue()).resolves.toBe('10000');
		await shot(page, 'framework-task-error-desktop');

		// The whole framework is checked too: a code another task uses is refused beside the field.
		await page.getByLabel('Code', { exact: true }).fill('BRK-02');
		await page.getByRole('button', { name: 'Save task' }).first().click();
		await expect(page.locator('#f-code-error').textContent()).resolves.toMatch(
			/Task code BRK-02 is already used by “Service drum brakes on one axle”/
		);

		// Nothing was written: the stored value is still 150.
		await page.goto(editor);
		await expect(page.locator(`#f-specs-${row}-value`).inputValue()).resolves.toBe('150');
		expect(await phoneShot(editor, 'framework-task-editor-phone')).toBe(false);
	});

	it('answers the same refusal with a 400 page without JavaScript, and adds rows on the server', async () => {
		const base = inject('baseUrl');
		const action = `/coordinator/frameworks/${draft}/tasks/SAF-05`;
		await page.goto(action);
		const form = await page
			.locator('form[action="?/save"]')
			.evaluate((el) =>
				Object.fromEntries([...new FormData(el as HTMLFormElement)].map(([k, v]) => [k, String(v)]))
			);
		const headers = { origin: base, accept: 'text/html' };
		const added = await page.request.post(`${action}?/rows`, {
			headers,
			form: { ...form, op: 'add:specs' }
		});
		expect(added.status()).toBe(200);
		const specs = Object.keys(form).filter((k) => /^specs\.\d+\.label$/.test(k)).length;
		expect(await added.text()).toContain(`name="specs.${specs}.label"`);
		const refused = await page.request.post(`${action}?/save`, {
			headers,
			form: { ...form, minHours: '-3' }
		});
		expect(refused.status()).toBe(400);
		expect(await refused.text()).toContain('Minimum hours cannot be negative.');
	});

	it('shows the change on the compare page', async () => {
		await page.goto(`/coordinator/frameworks/${draft}/diff`);
		const changes = page.getByTestId('changes');
		await changes.waitFor();
		const text = await changes.textContent();
		expect(text).toContain('BRK-01');
		expect(text).toContain(NEW_TITLE);
		expect(text).toMatch(/Wheel nut torque: Target 150 N·m/);
		await shot(page, 'framework-diff-desktop');
		expect(await phoneShot(`/coordinator/frameworks/${draft}/diff`, 'framework-diff-phone')).toBe(
			false
		);
	});

	let exported = '';
	it('exports the draft as CSV with its header row', async () => {
		const response = await page.request.get(`/api/frameworks/${draft}/export.csv`);
		expect(response.status()).toBe(200);
		expect(response.headers()['content-type']).toBe('text/csv; charset=utf-8');
		expect(response.headers()['content-disposition']).toBe(
			'attachment; filename="journeymark-framework-v2.csv"'
		);
		exported = (await response.text()).replace(/^\uFEFF/, '');
		expect(exported.split('\r\n')[0]).toBe(
			'record,area,task,question,text,detail,tier,required_level,min_hours,value,unit,limit,safety,correct'
		);
		expect(exported).toContain(NEW_TITLE);
	});

	it('lists every bad row of an import in a dry run and writes nothing', async () => {
		const lines = exported.split('\r\n');
		const bad = lines.findIndex((line) => line.startsWith('spec,BRK,BRK-01,,Wheel nut torque,'));
		expect(bad).toBeGreaterThan(0);
		lines[bad] = lines[bad].replace(',150,', ',lots,');
		const file = path.join(files, 'framework-bad.csv');
		writeFileSync(file, lines.join('\r\n'));

		await page.goto(`/coordinator/frameworks/${draft}/import`);
		await page.locator('input[type="file"]').setInputFiles(file);
		await page.getByRole('button', { name: /Check the file/ }).click();
		const problems = page.getByTestId('import-problems');
		await problems.waitFor();
		const row = problems.locator('tbody tr').filter({ hasText: 'not “lots”' });
		await expect(row.locator('td').first().textContent()).resolves.toBe(String(bad + 1));
		await expect(problems.textContent()).resolves.toContain('Nothing was written.');
		expect(await page.getByRole('button', { name: 'Replace draft with this file' }).count()).toBe(
			0
		);
		await shot(page, 'framework-import-problems-desktop');

		await page.goto(`/coordinator/frameworks/${draft}/tasks/BRK-01`);
		const spec = await specRow('Wheel nut torque');
		await expect(page.locator(`#f-specs-${spec}-value`).inputValue()).resolves.toBe('150');
	});

	it('applies a clean file only after its dry run', async () => {
		const file = path.join(files, 'framework-clean.csv');
		writeFileSync(file, exported);
		await page.goto(`/coordinator/frameworks/${draft}/import`);
		await page.locator('input[type="file"]').setInputFiles(file);
		await page.getByRole('button', { name: /Check the file/ }).click();
		const ready = page.getByTestId('import-ready');
		await ready.waitFor();
		await expect(ready.textContent()).resolves.toContain('has no problems');
		await shot(page, 'framework-import-ready-desktop');
		await Promise.all([
			page.waitForURL(new RegExp(`/coordinator/frameworks/${draft}\\?imported=1$`)),
			page.getByRole('button', { name: 'Replace draft with this file' }).click()
		]);
		await page.getByText('The draft now holds the imported file.').waitFor();
	});

	it('publishes after a confirmation; the task card then shows the new title', async () => {
		await page.goto('/coordinator/frameworks');
		await page.getByTestId('version-2').getByRole('link', { name: 'Publish…' }).click();
		const confirm = page.getByTestId('confirm');
		await confirm.waitFor();
		const text = (await confirm.textContent())?.replace(/\s+/g, ' ');
		expect(text).toContain(
			'Publishing version 2 makes it the version every apprentice is assessed against'
		);
		expect(text).toContain('Version 1 retires. Sign-offs already made keep pointing at version 1.');
		await shot(page, 'framework-publish-confirm-desktop');
		await page.getByRole('button', { name: 'Publish version 2' }).click();
		await page.getByText('Version 2 is published.').waitFor();
		await expect(page.getByTestId('version-1').textContent()).resolves.toContain('Retired');
		expect(await phoneShot('/coordinator/frameworks', 'framework-list-phone')).toBe(false);

		await page.goto('/tasks/BRK-01');
		await expect(page.getByRole('heading', { level: 1 }).textContent()).resolves.toBe(NEW_TITLE);

		// A published version refuses changes with 409 and keeps its title.
		const refused = await page.request.post(`/coordinator/frameworks/${draft}/tasks/BRK-01?/save`, {
			headers: { origin: inject('baseUrl'), accept: 'text/html' },
			form: { title: 'Changed' }
		});
		expect(refused.status()).toBe(409);
		expect(errors).toEqual([]);
	});
});
