import axe from 'axe-core';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { launch, openPage, shot, signIn } from './browser';

let browser: Browser;
beforeAll(async () => {
	browser = await launch();
});
afterAll(() => browser?.close());

/** Demo serials, fixed by seed/certificates.ts and listed in README.md. */
const VALID = 'JM-7RKB-DPEN-0XAA-8HNN-R';
const REVOKED = 'JM-307B-WR1M-3D6K-7RXV-1';
const EXPIRED = 'JM-3Y6X-8MB4-K7G9-D4EX-Y';

describe('an employer checks a certificate on a phone', () => {
	it('sees a valid certificate, its holder and the caution to check identity, with no sideways scroll', async () => {
		const { page, errors, context } = await openPage(browser, 'phone');
		const response = await page.goto(`/verify/${VALID.toLowerCase()}`);
		expect(response?.status()).toBe(200);
		expect(response?.headers()['cache-control']).toBe('no-store');
		await expect(page.getByTestId('status-word').textContent()).resolves.toMatch(/Valid/);
		await expect(page.getByTestId('holder').textContent()).resolves.toMatch(/Rosa Lindqvist/);
		await expect(page.getByTestId('serial').textContent()).resolves.toBe(VALID);
		await expect(page.getByText('Digital signature checks out').isVisible()).resolves.toBe(true);
		await expect(page.getByText(/ask for photo ID/).isVisible()).resolves.toBe(true);
		expect(await page.evaluate(() => document.documentElement.scrollWidth <= innerWidth)).toBe(
			true
		);
		// WCAG 2.2 AA rules, checked by axe-core in the page.
		await page.addScriptTag({ content: axe.source });
		const violations = await page.evaluate(async () => {
			const result = await (window as unknown as { axe: typeof axe }).axe.run(document, {
				runOnly: ['wcag2a', 'wcag2aa', 'wcag22aa']
			});
			return result.violations.map((v) => `${v.id}: ${v.nodes.length}`);
		});
		expect(violations).toEqual([]);
		await shot(page, 'verify-valid-phone');
		expect(errors).toEqual([]);
		await context.close();
	});

	it('sees withdrawn and lapsed certificates for what they are, and a typed serial finds the page', async () => {
		const { page, errors, context } = await openPage(browser, 'phone');
		await page.goto(`/verify/${REVOKED}`);
		await expect(page.getByTestId('status-word').textContent()).resolves.toMatch(/Withdrawn/);
		await expect(page.getByTestId('verdict').textContent()).resolves.toMatch(
			/Reason: Issued in error/
		);
		await shot(page, 'verify-revoked-phone');
		await page.goto(`/verify/${EXPIRED}`);
		await expect(page.getByTestId('status-word').textContent()).resolves.toMatch(/Lapsed/);

		await page.goto('/verify');
		await page.getByLabel('Certificate serial').fill(VALID.replace(/-/g, ' ').toLowerCase());
		await Promise.all([
			page.waitForURL(`**/verify/${VALID}`),
			page.getByRole('button', { name: 'Check certificate' }).click()
		]);
		await page.goto('/verify');
		await page.getByLabel('Certificate serial').fill('JM-1234');
		await page.getByRole('button', { name: 'Check certificate' }).click();
		await page.getByText(/not a Journeymark serial/).waitFor();
		expect(errors).toEqual([]);
		await context.close();
	});

	it('answers the JSON API with 404 for an unknown serial and 400 for a malformed one', async () => {
		const base = inject('baseUrl');
		const unknown = await fetch(`${base}/api/verify/JM-0000-0000-0000-0000-0`);
		expect(unknown.status).toBe(404);
		expect(await unknown.json()).toEqual({ status: 'unknown' });
		expect((await fetch(`${base}/api/verify/${'X'.repeat(300)}`)).status).toBe(400);
		const valid = await (await fetch(`${base}/api/verify/${VALID}`)).json();
		expect(valid).toMatchObject({ status: 'valid', signatureValid: true });
	});
});

describe('the apprentice and the coordinator', () => {
	it('the holder finds the certificate with its downloads', async () => {
		const { page, errors, context } = await openPage(browser, 'phone');
		await signIn(page, 'apprentice@example.org');
		await page.goto('/apprentice/certificates');
		await expect(page.getByText(VALID).isVisible()).resolves.toBe(true);
		const download = await page.request.get(`/api/certificates/${VALID}/pdf?paper=letter`);
		expect(download.status()).toBe(200);
		expect(download.headers()['content-type']).toBe('application/pdf');
		expect((await download.body()).subarray(0, 5).toString()).toBe('%PDF-');
		await shot(page, 'apprentice-certificates-phone');
		expect(errors).toEqual([]);
		await context.close();
	});

	it('the coordinator sees what is missing before issuing, and the issued list', async () => {
		const { page, errors, context } = await openPage(browser, 'desktop');
		await signIn(page, 'coordinator@example.org');
		await page.goto('/coordinator/certificates');
		await expect(page.getByText(REVOKED).isVisible()).resolves.toBe(true);
		await page.getByLabel('Apprentice').selectOption({ label: 'Rosa Lindqvist' });
		await Promise.all([
			page.waitForURL(/apprentice=/),
			page.getByRole('button', { name: 'See what can be issued' }).click()
		]);
		await expect(
			page.getByRole('heading', { name: 'Issue to Rosa Lindqvist' }).isVisible()
		).resolves.toBe(true);
		await expect(page.getByRole('heading', { name: 'Already held' }).isVisible()).resolves.toBe(
			true
		);
		await expect(page.getByRole('heading', { name: 'Not yet' }).isVisible()).resolves.toBe(true);
		await shot(page, 'coordinator-certificates-desktop');
		expect(errors).toEqual([]);
		await context.close();
	});

	it('the coordinator issues a certificate, and withdraws it with a reason the public check shows', async () => {
		const { page, errors, context } = await openPage(browser, 'desktop');
		await signIn(page, 'coordinator@example.org');
		await page.goto('/coordinator/certificates');
		await page.getByLabel('Apprentice').selectOption({ label: 'Pia Halvorsen' });
		await Promise.all([
			page.waitForURL(/apprentice=/),
			page.getByRole('button', { name: 'See what can be issued' }).click()
		]);
		await page.getByLabel('Interim credential: Shop safety and tools (SAF)').check();
		await Promise.all([
			page.waitForURL(/\/coordinator\/certificates\/JM-.*\?issued=1/),
			page.getByRole('button', { name: 'Sign and issue' }).click()
		]);
		const serial = decodeURIComponent(new URL(page.url()).pathname.split('/').pop()!);
		await expect(page.getByText('Issued and signed').isVisible()).resolves.toBe(true);
		await page.getByLabel('Reason category (shown publicly)').selectOption('superseded');
		await page.getByLabel('Note for the record (private)').fill('Replaced after a records review.');
		await Promise.all([
			page.waitForURL(/revoked=1/),
			page.getByRole('button', { name: 'Withdraw certificate' }).click()
		]);
		await shot(page, 'coordinator-withdrawn-desktop');
		await page.goto(`/verify/${serial}`);
		await expect(page.getByTestId('status-word').textContent()).resolves.toMatch(/Withdrawn/);
		await expect(page.getByTestId('verdict').textContent()).resolves.toMatch(/Replaced by a later/);
		await expect(page.getByText('records review').count()).resolves.toBe(0);
		expect(errors).toEqual([]);
		await context.close();
	});
});
