/**
 * Journey 4 of issue 8, end to end in Chromium at phone and desktop width: the coordinator issues
 * an interim certificate to Bea Kowalczyk (the demo apprentice ahead of her cohort), an anonymous
 * visitor opens the address decoded from the QR code on the certificate's PDF and sees it valid,
 * the coordinator withdraws it, and the same address then shows it withdrawn. Each width issues
 * its own certificate, for an area Bea has complete and holds no certificate for.
 */
import jsQR from 'jsqr';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { enlarge, readPdf } from '../helpers/pdf';
import { launch, openPage, signIn } from './browser';
import { journeyShot, seriousAxeViolations } from './journey-support';

const HOLDER = 'Bea Kowalczyk';

let browser: Browser;
beforeAll(async () => {
	browser = await launch();
});
afterAll(() => browser?.close());

for (const size of ['phone', 'desktop'] as const) {
	describe(`journey 4 at ${size} width`, () => {
		it('a certificate verified through its QR code shows valid, and withdrawn after withdrawal', async () => {
			const coordinator = await openPage(browser, size);
			const { page } = coordinator;
			await signIn(page, 'coordinator@example.org');
			await page.goto('/coordinator/certificates');
			await page.getByLabel('Apprentice').selectOption({ label: HOLDER });
			await Promise.all([
				page.waitForURL(/apprentice=/),
				page.getByRole('button', { name: 'See what can be issued' }).click()
			]);
			await page.getByRole('heading', { name: `Issue to ${HOLDER}` }).waitFor();
			// seed/certificates.ts already gives Bea a valid BRK certificate and a lapsed SAF one;
			// the page offers only areas she completed and holds nothing valid for.
			const offered = page.locator('input[name="scope"]');
			const scopes = await offered.evaluateAll((all: HTMLInputElement[]) =>
				all.map((i) => i.value)
			);
			expect(scopes).not.toContain('area:BRK');
			const scope = scopes.find((s) => s.startsWith('area:') && s !== 'area:SAF');
			expect(scope, 'an area Bea completed and holds no certificate for').toBeDefined();
			await page.locator(`input[name="scope"][value="${scope}"]`).check();
			expect(await seriousAxeViolations(page)).toEqual([]);
			await journeyShot(page, 'certificate', size, '1-issue');
			await Promise.all([
				page.waitForURL(/\/coordinator\/certificates\/JM-[^?]+\?issued=1/),
				page.getByRole('button', { name: 'Sign and issue' }).click()
			]);
			const serial = decodeURIComponent(new URL(page.url()).pathname.split('/').pop()!);
			await page.getByText('Issued and signed').waitFor();
			await expect(page.getByText(serial).first().isVisible()).resolves.toBe(true);
			expect(await seriousAxeViolations(page)).toEqual([]);
			await journeyShot(page, 'certificate', size, '2-issued');

			// The PDF from the page's own link; its QR code, read by jsQR (ISO/IEC 18004), holds
			// the public check's address.
			const pdfHref = await page.getByRole('link', { name: 'PDF, US Letter' }).getAttribute('href');
			const pdf = await coordinator.context.request.get(pdfHref!);
			expect(pdf.status()).toBe(200);
			expect(pdf.headers()['content-type']).toBe('application/pdf');
			const [first] = await readPdf(await pdf.body());
			expect(first.text).toContain(HOLDER);
			expect(first.images.length).toBeGreaterThan(0);
			const decoded = first.images
				.map((image) => enlarge(image, 8))
				.map((big) => jsQR(big.rgba, big.width, big.height)?.data)
				.find(Boolean);
			expect(decoded).toBe(`${inject('baseUrl')}/verify/${serial}`);

			// An anonymous visitor: a fresh browser context, no cookies.
			const visitor = await openPage(browser, size);
			const opened = await visitor.page.goto(decoded!);
			expect(opened?.status()).toBe(200);
			await expect(visitor.page.getByTestId('status-word').textContent()).resolves.toMatch(
				/^\s*Valid\s*$/
			);
			await expect(visitor.page.getByTestId('holder').textContent()).resolves.toContain(HOLDER);
			await expect(visitor.page.getByTestId('serial').textContent()).resolves.toBe(serial);
			expect(await seriousAxeViolations(visitor.page)).toEqual([]);
			await journeyShot(visitor.page, 'certificate', size, '3-verify-valid');

			// The coordinator withdraws it.
			await page.getByLabel('Reason category (shown publicly)').selectOption('issued-in-error');
			await page.getByLabel('Note for the record (private)').fill('Journey test: withdrawn again.');
			await Promise.all([
				page.waitForURL(/revoked=1/),
				page.getByRole('button', { name: 'Withdraw certificate' }).click()
			]);
			await page.getByText('Withdrawn. The public check shows it from now on.').waitFor();
			expect(await seriousAxeViolations(page)).toEqual([]);
			await journeyShot(page, 'certificate', size, '4-withdrawn');

			// The same address, opened again by the visitor, now says withdrawn, with the public reason.
			await visitor.page.goto(decoded!);
			await expect(visitor.page.getByTestId('status-word').textContent()).resolves.toMatch(
				/^\s*Withdrawn\s*$/
			);
			await expect(visitor.page.getByTestId('verdict').textContent()).resolves.toMatch(
				/Reason: Issued in error/
			);
			await expect(visitor.page.getByText('Journey test').count()).resolves.toBe(0);
			const api = await visitor.context.request.get(`/api/verify/${serial}`);
			expect(await api.json()).toMatchObject({ serial, status: 'revoked' });
			expect(await seriousAxeViolations(visitor.page)).toEqual([]);
			await journeyShot(visitor.page, 'certificate', size, '5-verify-withdrawn');

			expect(coordinator.errors).toEqual([]);
			expect(visitor.errors).toEqual([]);
			await visitor.context.close();
			await coordinator.context.close();
		});
	});
}
