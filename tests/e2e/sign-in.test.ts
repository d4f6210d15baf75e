import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { waitForMail } from '../helpers/mail';
import { launch, openPage, shot, signIn, type ViewportName } from './browser';

let browser: Browser;
beforeAll(async () => {
	browser = await launch();
});
afterAll(() => browser?.close());

const ROLES = [
	{ email: 'apprentice@example.org', home: '/apprentice', nav: ['My progress'], not: ['Users'] },
	{ email: 'supervisor@example.org', home: '/supervisor', nav: ['My apprentices'], not: ['Users'] },
	{ email: 'coordinator@example.org', home: '/coordinator', nav: ['Cohorts'], not: ['Users'] },
	{ email: 'admin@example.org', home: '/admin', nav: ['Users', 'Sent mail'], not: ['My progress'] }
];

describe('signing in as each demo role', () => {
	for (const viewport of ['phone', 'desktop'] as ViewportName[]) {
		for (const role of ROLES) {
			it(`${role.email} lands on ${role.home} with its own navigation (${viewport})`, async () => {
				const { page, errors, context } = await openPage(browser, viewport);
				await signIn(page, role.email);
				expect(new URL(page.url()).pathname).toBe(role.home);
				const nav = page.getByRole('navigation', { name: 'Main' });
				for (const label of role.nav) {
					await expect(nav.getByRole('link', { name: label }).isVisible()).resolves.toBe(true);
				}
				for (const label of role.not) {
					expect(await nav.getByRole('link', { name: label }).count()).toBe(0);
				}
				await shot(page, `home-${role.home.slice(1)}-${viewport}`);
				expect(errors).toEqual([]);
				await context.close();
			});
		}
	}
});

describe('refusals', () => {
	it('refuses a wrong password with a clear message and a 400', async () => {
		const { page, errors, context } = await openPage(browser, 'phone');
		await page.goto('/login');
		await page.getByLabel('E-mail').fill('apprentice@example.org');
		await page.getByLabel('Password').fill('not the password');
		await page.getByRole('button', { name: 'Sign in' }).click();
		await expect(page.getByRole('alert').textContent()).resolves.toMatch(/do not match an account/);
		expect(new URL(page.url()).pathname).toBe('/login');
		await shot(page, 'login-refused-phone');
		expect(errors).toEqual([]);
		await context.close();

		// Without JavaScript the same refusal is a 400 page.
		const base = inject('baseUrl');
		const response = await fetch(`${base}/login`, {
			method: 'POST',
			headers: {
				origin: base,
				accept: 'text/html',
				'content-type': 'application/x-www-form-urlencoded'
			},
			body: 'email=nobody%40example.org&password=not+the+password'
		});
		expect(response.status).toBe(400);
		expect(await response.text()).toMatch(/do not match an account/);
	});

	it('sends a signed-out visitor to sign in, and refuses another role with 403', async () => {
		const base = inject('baseUrl');
		const anonymous = await fetch(`${base}/admin`, { redirect: 'manual' });
		expect(anonymous.status).toBe(303);
		expect(anonymous.headers.get('location')).toBe('/login?next=%2Fadmin');

		const { page, context } = await openPage(browser);
		await signIn(page, 'apprentice@example.org');
		const response = await page.goto('/admin');
		expect(response?.status()).toBe(403);
		await context.close();
	});

	it('refuses a cross-site form post and a cross-site JSON post', async () => {
		const base = inject('baseUrl');
		const form = await fetch(`${base}/login`, {
			method: 'POST',
			headers: {
				origin: 'https://elsewhere.example',
				'content-type': 'application/x-www-form-urlencoded'
			},
			body: 'email=admin%40example.org&password=journeymark-demo'
		});
		expect(form.status).toBe(403);
		const json = await fetch(`${base}/api/health`, {
			method: 'POST',
			headers: { origin: 'https://elsewhere.example', 'content-type': 'application/json' },
			body: '{}'
		});
		expect(json.status).toBe(403);
	});

	it('answers oversized and missing fields with a 400 and a message, never a 500', async () => {
		const base = inject('baseUrl');
		const post = (path: string, body: string) =>
			fetch(`${base}${path}`, {
				method: 'POST',
				headers: {
					origin: base,
					accept: 'text/html',
					'content-type': 'application/x-www-form-urlencoded'
				},
				body
			});
		const huge = await post(
			'/login',
			`email=${'a'.repeat(5000)}%40x.example&password=${'p'.repeat(5000)}`
		);
		expect(huge.status).toBe(400);
		expect(await huge.text()).toMatch(/too long|at most 128/);
		const missing = await post('/login', '');
		expect(missing.status).toBe(400);
		expect(await missing.text()).toMatch(/Enter your e-mail address/);
		const forgot = await post('/forgot', 'email=not-an-address');
		expect(forgot.status).toBe(400);
	});

	it('answers unknown and malformed invitation and reset links with 404', async () => {
		const base = inject('baseUrl');
		for (const path of [
			'/welcome/not-a-token',
			`/reset/${'A'.repeat(43)}`,
			'/welcome/..%2F..%2Fetc'
		]) {
			const response = await fetch(`${base}${path}`);
			expect(response.status).toBe(404);
			expect(await response.text()).toMatch(/not valid/);
		}
	});

	it('answers health with {"ok":true}', async () => {
		const response = await fetch(`${inject('baseUrl')}/api/health`);
		expect(response.status).toBe(200);
		expect(await response.json()).toEqual({ ok: true });
	});
});

describe('an invitation, end to end', () => {
	it('admin invites; the invitee follows the link from Sent mail, sets a password and signs in', async () => {
		const admin = await openPage(browser, 'desktop');
		await signIn(admin.page, 'admin@example.org');
		const email = `new.journeyworker.${Date.now()}@riverbend-training.example`;
		await admin.page.getByLabel('Name').fill('Noor Achterberg');
		await admin.page.getByLabel('E-mail').fill(email);
		await admin.page.getByLabel('Role', { exact: true }).selectOption('supervisor');
		await admin.page.getByRole('button', { name: 'Send invitation' }).click();
		await admin.page.getByText(`Invitation sent to ${email}`).waitFor();
		await shot(admin.page, 'admin-invite-desktop');

		await waitForMail(inject('mailDir'), email, /invited/);
		await admin.page.getByRole('link', { name: 'Sent mail' }).click();
		const mail = admin.page.getByTestId('mail').filter({ hasText: email }).first();
		const href = await mail.getByRole('link').getAttribute('href');
		expect(href).toMatch(/\/welcome\/[A-Za-z0-9_-]{43}$/);
		await shot(admin.page, 'admin-sent-mail-desktop');
		expect(admin.errors).toEqual([]);
		await admin.context.close();

		const invitee = await openPage(browser, 'phone');
		await invitee.page.goto(href!);
		await invitee.page.getByText('Welcome, Noor Achterberg').waitFor();
		await invitee.page.getByLabel('New password').fill('short');
		await invitee.page.getByLabel('Type it again').fill('short');
		await invitee.page.getByRole('button', { name: 'Save password and sign in' }).click();
		await invitee.page.getByText('Use at least 12 characters').waitFor();
		await invitee.page.getByLabel('New password').fill('lug nuts in a star pattern');
		await invitee.page.getByLabel('Type it again').fill('lug nuts in a star pattern');
		await Promise.all([
			invitee.page.waitForURL('**/supervisor'),
			invitee.page.getByRole('button', { name: 'Save password and sign in' }).click()
		]);
		await shot(invitee.page, 'invitee-home-phone');
		expect(invitee.errors).toEqual([]);

		// The link is single-use.
		const again = await invitee.page.goto(href!);
		expect(again?.status()).toBe(410);
		await invitee.context.close();
	});
});
