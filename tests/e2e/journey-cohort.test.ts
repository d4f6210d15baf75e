/**
 * Journey 3 of issue 8, end to end in Chromium at phone and desktop width: the coordinator opens
 * a cohort dashboard whose charts draw from the progress APIs, finds the at-risk list the engine
 * gives for the demo story, sorts and filters the apprentice table, and exports the cohort record
 * as CSV and PDF. The phone run takes the spring cohort (Nia Obuya behind), the desktop run the
 * autumn cohort (Gus Takahashi stalled, Bea Kowalczyk ahead).
 */
import { readFileSync } from 'node:fs';
import { parse } from 'csv-parse/sync';
import type { Browser, Page, Response } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { CohortProgress } from '../../src/lib/server/progress';
import { readPdf } from '../helpers/pdf';
import { launch, openPage, signIn, type ViewportName } from './browser';
import { dbAll, journeyShot, seriousAxeViolations } from './journey-support';

let browser: Browser;
beforeAll(async () => {
	browser = await launch();
});
afterAll(() => browser?.close());

/** The demo story (seed/worklog.ts, seed/signoffs.ts): who the engine should flag, and why. */
const STORY: Record<
	ViewportName,
	{ cohort: string; atRisk: { name: string; reason: RegExp }; onTrack?: string }
> = {
	phone: {
		cohort: 'Spring 2026 intake',
		atRisk: {
			name: 'Nia Obuya',
			reason: /^Forecast to finish \d{4}-\d\d-\d\d, after the planned end/
		}
	},
	desktop: {
		cohort: 'Autumn 2025 intake',
		atRisk: { name: 'Gus Takahashi', reason: /^No verified hours for \d+ weeks\.$/ },
		onTrack: 'Bea Kowalczyk'
	}
};

const json = async <T>(response: Response) => {
	expect(response.status(), response.url()).toBe(200);
	return (await response.json()) as T;
};

/** Apprentice names in the table, top to bottom, and one column's cells. */
const tableColumn = (page: Page, column: number) =>
	page
		.locator('section[aria-labelledby="table-heading"] tbody tr')
		.evaluateAll(
			(rows: HTMLTableRowElement[], n) => rows.map((r) => r.cells[n]?.textContent?.trim() ?? ''),
			column
		);

for (const size of ['phone', 'desktop'] as const) {
	describe(`journey 3 at ${size} width`, () => {
		it('the coordinator reads the cohort dashboard, sorts and filters it, and exports the record', async () => {
			const story = STORY[size];
			const [{ id: cohortId }] = await dbAll<{ id: number }>(
				`SELECT id FROM cohorts WHERE name = ?`,
				[story.cohort]
			);
			const { page, context, errors } = await openPage(browser, size);
			await signIn(page, 'coordinator@example.org');

			// The charts draw from these three requests; each answers 200 with data.
			const wait = (path: string) =>
				page.waitForResponse((r) => new URL(r.url()).pathname === path);
			const [progressRes, burnUpRes, ratioRes] = await Promise.all([
				wait(`/api/cohorts/${cohortId}/progress`),
				wait(`/api/cohorts/${cohortId}/burn-up`),
				wait('/api/sites/ratio'),
				page.goto(`/coordinator/cohorts/${cohortId}`)
			]);
			const progress = await json<CohortProgress>(progressRes);
			const burnUp = await json<{ weeks: string[]; actual: number[]; plan: number[] }>(burnUpRes);
			const ratio = await json<{ weeks: string[]; sites: unknown[] }>(ratioRes);
			expect(progress.apprentices.length).toBeGreaterThan(0);
			expect(burnUp.weeks.length).toBeGreaterThan(0);
			expect(burnUp.actual.at(-1)).toBeGreaterThan(0);
			expect(ratio.weeks.length).toBeGreaterThan(0);
			expect(ratio.sites.length).toBeGreaterThan(0);
			await page.getByRole('heading', { level: 1, name: story.cohort }).waitFor();

			// Every chart canvas has been drawn on: some pixels are no longer transparent.
			const canvases = page.locator('canvas');
			await expect.poll(() => canvases.count()).toBe(3);
			for (const canvas of await canvases.all()) {
				await expect
					.poll(() =>
						canvas.evaluate((c: HTMLCanvasElement) => {
							const { data } = c.getContext('2d')!.getImageData(0, 0, c.width, c.height);
							let painted = 0;
							for (let i = 3; i < data.length; i += 4) if (data[i] > 0) painted++;
							return painted;
						})
					)
					.toBeGreaterThan(500);
			}
			// The burn-up chart's caption carries the API's last week.
			const last = burnUp.weeks.length - 1;
			await expect(
				page.locator('section[aria-labelledby="burn-heading"] p').first().textContent()
			).resolves.toContain(
				`Week of ${burnUp.weeks[last]}: ${burnUp.actual[last].toLocaleString('en-US')} h verified`
			);
			const tile = (label: string) =>
				page
					.locator('li.card', { has: page.getByText(label, { exact: true }) })
					.locator('p')
					.nth(1);
			await expect(tile('Apprentices').textContent()).resolves.toBe(
				String(progress.totals.apprentices)
			);
			await expect(tile('At risk').textContent()).resolves.toBe(String(progress.totals.atRisk));

			// The at-risk list is the engine's, and it names who the demo story says is behind.
			const expected = progress.apprentices.filter((a) => a.atRisk);
			const risk = page.locator('section[aria-labelledby="risk-heading"]');
			await expect(risk.locator('h2').textContent()).resolves.toBe(`At risk (${expected.length})`);
			const listed = await risk.locator(':scope > ul > li > a').allTextContents();
			expect(listed.sort()).toEqual(expected.map((a) => a.name).sort());
			const flagged = expected.find((a) => a.name === story.atRisk.name);
			expect(flagged, `${story.atRisk.name} at risk`).toBeDefined();
			expect(flagged!.reasons.some((r) => story.atRisk.reason.test(r))).toBe(true);
			const item = risk.locator(':scope > ul > li', { hasText: story.atRisk.name });
			for (const reason of flagged!.reasons) {
				await expect(item.textContent()).resolves.toContain(reason);
			}
			if (story.onTrack) {
				expect(progress.apprentices.find((a) => a.name === story.onTrack)?.atRisk).toBe(false);
				expect(listed).not.toContain(story.onTrack);
			}
			expect(await seriousAxeViolations(page)).toEqual([]);
			await journeyShot(page, 'cohort', size, '1-dashboard');

			// Sorting: completion ascending, then descending, as the column header says.
			const table = page.locator('section[aria-labelledby="table-heading"]');
			const header = table.getByRole('button', { name: /^Completion/ });
			const completion = async () =>
				(await tableColumn(page, 4)).map((cell) => Number(cell.replace(/[^\d.]/g, '')));
			await header.click();
			await expect(table.locator('th[aria-sort="ascending"]').textContent()).resolves.toMatch(
				/Completion/
			);
			const up = await completion();
			expect(up).toEqual([...up].sort((a, b) => a - b));
			await header.click();
			await expect(table.locator('th[aria-sort="descending"]').textContent()).resolves.toMatch(
				/Completion/
			);
			const down = await completion();
			expect(down).toEqual([...down].sort((a, b) => b - a));
			expect(down.length).toBe(Math.min(25, progress.apprentices.length));

			// Filtering: at risk only gives the same people as the list; a name search finds one.
			await table.getByLabel('At risk only').check();
			await expect
				.poll(async () => (await tableColumn(page, 0)).sort())
				.toEqual(expected.map((a) => a.name).sort());
			await journeyShot(page, 'cohort', size, '2-at-risk-only');
			await table.getByLabel('At risk only').uncheck();
			await table.getByLabel('Find by name').fill(story.atRisk.name.split(' ')[1]);
			await expect.poll(() => tableColumn(page, 0)).toEqual([story.atRisk.name]);
			await expect(tableColumn(page, 7)).resolves.toEqual([expect.stringMatching(/At risk$/)]);
			await table.getByLabel('Find by name').fill('');
			const shop = flagged!.siteName!;
			await table.getByLabel('Shop').selectOption(shop);
			await expect.poll(async () => new Set(await tableColumn(page, 1))).toEqual(new Set([shop]));
			expect((await tableColumn(page, 0)).sort()).toEqual(
				progress.apprentices
					.filter((a) => a.siteName === shop)
					.map((a) => a.name)
					.sort()
			);

			// Exports from the dashboard's own links: a CSV row per apprentice, and a PDF.
			const csvLink = page.getByRole('link', { name: 'Agency record (CSV)' });
			const [csvDownload] = await Promise.all([page.waitForEvent('download'), csvLink.click()]);
			expect(csvDownload.suggestedFilename()).toMatch(
				new RegExp(`^journeymark-cohort-${cohortId}-.*\\.csv$`)
			);
			const csvBytes = readFileSync((await csvDownload.path())!);
			const csvHead = await context.request.get((await csvLink.getAttribute('href'))!);
			expect(csvHead.headers()['content-type']).toMatch(/^text\/csv/);
			const rows = parse(csvBytes, { bom: true, columns: true }) as Record<string, string>[];
			expect(rows.map((r) => r.apprentice_name).sort()).toEqual(
				progress.apprentices.map((a) => a.name).sort()
			);
			for (const a of progress.apprentices) {
				const row = rows.find((r) => r.apprentice_id === a.id);
				expect(row?.at_risk, a.name).toBe(a.atRisk ? 'yes' : 'no');
				expect(row?.cohort).toBe(story.cohort);
			}

			const pdfLink = page.getByRole('link', { name: 'Agency record (PDF)' });
			const [pdfDownload] = await Promise.all([page.waitForEvent('download'), pdfLink.click()]);
			expect(pdfDownload.suggestedFilename()).toMatch(
				new RegExp(`^journeymark-cohort-${cohortId}-.*\\.pdf$`)
			);
			const pdfBytes = readFileSync((await pdfDownload.path())!);
			expect(pdfBytes.subarray(0, 5).toString()).toBe('%PDF-');
			const pdfHead = await context.request.get((await pdfLink.getAttribute('href'))!);
			expect(pdfHead.headers()['content-type']).toBe('application/pdf');
			const pages = await readPdf(pdfBytes);
			const text = pages.map((p) => p.text).join('\n');
			for (const a of progress.apprentices) expect(text).toContain(a.name);
			await journeyShot(page, 'cohort', size, '3-filtered-exported');
			expect(errors).toEqual([]);
			await context.close();
		});
	});
}
