import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { dbAll, launch, openPage, shot, signIn } from './browser';

const TABLET = { width: 820, height: 1180 };

let browser: Browser;
let rosaId: string;

const signOffCount = async () =>
	(await dbAll<{ n: number }>('SELECT COUNT(*) AS n FROM sign_offs'))[0].n;

beforeAll(async () => {
	browser = await launch();
	const [rosa] = await dbAll<{ id: string }>(
		`SELECT id FROM users WHERE email = 'apprentice@example.org'`
	);
	rosaId = rosa.id;
});
afterAll(async () => {
	await browser?.close();
});

describe('assessment', () => {
	it('lets an apprentice take a knowledge check without seeing the answers', async () => {
		// A task with questions that Rosa has never attempted, so no retake wait applies.
		const [task] = await dbAll<{ code: string }>(
			`SELECT t.code FROM framework_tasks t
			   JOIN frameworks f ON f.id = t.framework_id AND f.status = 'published'
			  WHERE EXISTS (SELECT 1 FROM task_questions q WHERE q.task_id = t.id)
			    AND NOT EXISTS (SELECT 1 FROM quiz_attempts a JOIN framework_tasks t2 ON t2.id = a.task_id
			                     WHERE a.apprentice_id = ? AND t2.code = t.code)
			  ORDER BY f.id DESC, t.id LIMIT 1`,
			[rosaId]
		);
		const { page, context, errors } = await openPage(browser, 'phone');
		await signIn(page, 'apprentice@example.org');
		await page.goto(`/apprentice/tasks/${task.code}/check`);
		await page.getByRole('button', { name: 'Start the check' }).click();
		await page.getByTestId('deadline').waitFor();
		const questions = page.getByTestId('question');
		expect(await questions.count()).toBeGreaterThan(0);

		const html = await page.content();
		expect(html).not.toMatch(/explanation/i);
		expect(html).not.toContain('"correct"');
		expect(html).not.toMatch(/correct:\s*(true|false)/);
		await shot(page, 'assessment-check-phone');

		for (const question of await questions.all()) {
			await question.locator('input').first().check();
		}
		await page.getByRole('button', { name: 'Hand in my answers' }).click();
		const result = page.getByTestId('check-result');
		await result.waitFor();
		await expect(result.textContent()).resolves.toMatch(/\d of \d right/);
		await expect(result.textContent()).resolves.toMatch(/Pass mark 80\s*%/);
		await expect(result.textContent()).resolves.toMatch(/Passed|Not passed yet/);
		await shot(page, 'assessment-check-result-phone');
		expect(errors).toEqual([]);
		await context.close();
	});

	it('refuses a sign-off with a wrong password or too few hours and stores nothing', async () => {
		const { page, context, errors } = await openPage(browser, 'desktop');
		await page.setViewportSize(TABLET);
		await signIn(page, 'supervisor@example.org');
		const response = await context.request.get(`/api/apprentices/${rosaId}/matrix`);
		expect(response.status()).toBe(200);
		const { tasks } = (await response.json()) as {
			tasks: { code: string; verifiedTenths: number; requiredLevel: number }[];
		};
		const lacking = tasks.find((t) => t.verifiedTenths === 0);
		expect(lacking, 'a task without verified hours').toBeDefined();

		await page.goto(`/supervisor/sign-off/${rosaId}/${lacking!.code}`);
		for (const met of await page.getByRole('radio', { name: 'Met', exact: true }).all()) {
			await met.check({ force: true });
		}
		await page
			.getByRole('radio', { name: new RegExp(`^${lacking!.requiredLevel}`) })
			.check({ force: true });
		const before = await signOffCount();

		await page.getByLabel('Re-enter your password to sign').fill('not-my-password');
		await page.getByRole('button', { name: /^Sign off/ }).click();
		await page.getByText('That password is not right; nothing was signed.').waitFor();
		expect(await signOffCount()).toBe(before);

		await page.getByLabel('Re-enter your password to sign').fill('journeymark-demo');
		await page.getByRole('button', { name: /^Sign off/ }).click();
		const problems = page.getByTestId('sign-off-problems');
		await problems.waitFor();
		await expect(problems.textContent()).resolves.toMatch(/hours verified so far: 0 h/);
		expect(await signOffCount()).toBe(before);
		await shot(page, 'assessment-sign-off-refused-tablet');
		expect(errors).toEqual([]);
		await context.close();
	});

	for (const size of ['phone', 'desktop'] as const) {
		it(`shows the apprentice's matrix on a ${size}`, async () => {
			const { page, context, errors } = await openPage(browser, size);
			await signIn(page, 'apprentice@example.org');
			await page.goto('/apprentice/matrix');
			await expect(page.getByTestId('matrix-summary').textContent()).resolves.toMatch(
				/\d+ of \d+ tasks signed off/
			);
			expect(
				await page.locator('[data-testid^="matrix-"][data-testid*="-"]').count()
			).toBeGreaterThan(10);
			await shot(page, `assessment-matrix-${size}`);
			expect(errors).toEqual([]);
			await context.close();
		});
	}

	it('lets an admin check the audit chain', async () => {
		const { page, context, errors } = await openPage(browser, 'desktop');
		await signIn(page, 'admin@example.org');
		await page.goto('/admin/audit');
		await page.getByRole('button', { name: 'Check the chain now' }).click();
		await expect(page.getByTestId('chain-result').textContent()).resolves.toMatch(/Intact/);
		await shot(page, 'assessment-audit-desktop');
		expect(errors).toEqual([]);
		await context.close();
	});
});
