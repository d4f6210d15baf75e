import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launch, openPage, shot, signIn } from './browser';

let browser: Browser;
let page: Page;
let errors: string[];
let closeContext: () => Promise<void>;

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

async function openRules() {
	await page.goto('/coordinator/programmes');
	await page.getByRole('link', { name: /Automotive Service Technician/ }).click();
	await page.waitForURL(/\/coordinator\/programmes\/\d+$/);
}

describe('programme rules, as a coordinator', () => {
	it('refuses wage steps that fall and a threshold over 100 %, saving nothing', async () => {
		await openRules();
		await expect.poll(() => page.getByText('registration agency’s rules govern').count()).toBe(1);
		const before = await page.locator('input[name="wageSchedule.1.percent"]').inputValue();
		await page.locator('input[name="wageSchedule.1.percent"]').fill('40');
		await page.getByLabel('Priority 1').fill('120');
		await page.getByRole('button', { name: 'Save the rules' }).click();
		await expect
			.poll(() => page.getByText('Nothing was saved. Fix the fields marked below.').count())
			.toBe(1);
		expect(await page.getByText(/Wages must rise: step 2/).count()).toBe(1);
		expect(await page.getByText('Priority 1 coverage: at most 100.').count()).toBe(1);
		await shot(page, 'programme-rules-refused');
		await openRules();
		expect(await page.locator('input[name="wageSchedule.1.percent"]').inputValue()).toBe(before);
		expect(await page.getByLabel('Priority 1').inputValue()).toBe('95');
	});

	it('saves a valid change and shows it, then puts it back', async () => {
		await openRules();
		const name = page.getByLabel('Programme name');
		const original = await name.inputValue();
		await name.fill(`${original} (renamed)`);
		await page.getByRole('button', { name: 'Save the rules' }).click();
		await page.waitForURL(/saved=1/);
		expect(await page.getByText('Saved. Dashboards now measure against these rules.').count()).toBe(
			1
		);
		expect(await page.getByLabel('Programme name').inputValue()).toBe(`${original} (renamed)`);
		await page.getByLabel('Programme name').fill(original);
		await page.getByRole('button', { name: 'Save the rules' }).click();
		await expect.poll(() => page.getByLabel('Programme name').inputValue()).toBe(original);
		expect(errors).toEqual([]);
	});
});
