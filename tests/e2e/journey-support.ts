/**
 * Shared by the journey files (`journey-*.test.ts`): the test database read directly, screenshots
 * under `test-results/journeys/`, and axe-core run inside the page.
 */
import { mkdirSync } from 'node:fs';
import axe from 'axe-core';
import type { Page } from 'playwright-core';
import type { ViewportName } from './browser';

export { dbAll } from './browser';

export const JOURNEY_SHOTS = 'test-results/journeys';

/** A full-page screenshot kept as a test artefact: `<journey>-<width>-<step>.png`. */
export async function journeyShot(page: Page, journey: string, width: ViewportName, step: string) {
	mkdirSync(JOURNEY_SHOTS, { recursive: true });
	await page.screenshot({
		path: `${JOURNEY_SHOTS}/${journey}-${width}-${step}.png`,
		fullPage: true
	});
}

/**
 * Serious and critical violations axe-core finds in the page as it stands, with every rule axe
 * runs by default (WCAG 2.0, 2.1 and 2.2 A/AA and its best practices; axe-core impact levels).
 * Returns `rule: selector…` lines, so a failing test says where to look.
 */
export async function seriousAxeViolations(page: Page): Promise<string[]> {
	if (!(await page.evaluate(() => 'axe' in window)))
		await page.addScriptTag({ content: axe.source });
	const violations = await page.evaluate(async () => {
		const engine = (window as unknown as { axe: typeof axe }).axe;
		const result = await engine.run(document, { resultTypes: ['violations'] });
		return result.violations.map((v) => ({
			id: v.id,
			impact: v.impact,
			targets: v.nodes.slice(0, 3).map((n) => n.target.join(' '))
		}));
	});
	return violations
		.filter((v) => v.impact === 'serious' || v.impact === 'critical')
		.map((v) => `${v.id} (${v.impact}): ${v.targets.join(', ')}`);
}

/** The most recent Sunday before today (UTC): the demo shops log no work at weekends. */
export function lastSunday(now = new Date()): string {
	const day = new Date(Date.UTC(now.getUTCFullYear(), now.getUTCMonth(), now.getUTCDate()));
	do day.setUTCDate(day.getUTCDate() - 1);
	while (day.getUTCDay() !== 0);
	return day.toISOString().slice(0, 10);
}
