import { mkdirSync } from 'node:fs';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import sqlite3 from 'sqlite3';
import { inject } from 'vitest';

export const VIEWPORTS = {
	phone: { width: 390, height: 844 },
	desktop: { width: 1366, height: 900 }
} as const;
export type ViewportName = keyof typeof VIEWPORTS;

export const DEMO_PASSWORD = 'journeymark-demo';
export const SHOTS = 'test-results/screenshots';

export function launch(): Promise<Browser> {
	return chromium.launch({
		executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
		args: [
			'--headless',
			'--no-sandbox',
			'--disable-gpu',
			'--disable-quic',
			'--no-first-run',
			'--disable-background-networking',
			'--disable-component-update',
			'--disable-sync'
		]
	});
}

/** A page that records console errors, so a test can assert there were none. */
export async function openPage(browser: Browser, viewport: ViewportName = 'desktop') {
	const context: BrowserContext = await browser.newContext({
		viewport: VIEWPORTS[viewport],
		baseURL: inject('baseUrl')
	});
	const page: Page = await context.newPage();
	const errors: string[] = [];
	page.on('console', (m) => {
		if (m.type() === 'error') errors.push(`${page.url()}: ${m.text()}`);
	});
	page.on('pageerror', (e) => errors.push(`${page.url()}: ${e.message}`));
	return { context, page, errors };
}

export async function signIn(page: Page, email: string, password = DEMO_PASSWORD) {
	// Wait for the page's scripts so the form submits the same way every time.
	await page.goto('/login', { waitUntil: 'networkidle' });
	await page.getByLabel('E-mail').fill(email);
	await page.getByLabel('Password').fill(password);
	await Promise.all([
		page.waitForURL((url) => !url.pathname.startsWith('/login')),
		page.getByRole('button', { name: 'Sign in' }).click()
	]);
}

export async function shot(page: Page, name: string) {
	mkdirSync(SHOTS, { recursive: true });
	await page.screenshot({ path: `${SHOTS}/${name}.png`, fullPage: true });
}

/** Reads the test server's database (read-only); facts no API hands out come from here. */
export function dbAll<T>(sql: string, params: unknown[] = []): Promise<T[]> {
	return new Promise((resolve, reject) => {
		const db = new sqlite3.Database(inject('databasePath'), sqlite3.OPEN_READONLY);
		db.all(sql, params, (err, rows) => {
			db.close();
			if (err) reject(err);
			else resolve(rows as T[]);
		});
	});
}
