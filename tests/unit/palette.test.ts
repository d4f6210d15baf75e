import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';

// WCAG 2.2, definitions of relative luminance and contrast ratio.
function luminance(hex: string): number {
	const [r, g, b] = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16) / 255);
	const linear = (c: number) => (c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4);
	return 0.2126 * linear(r) + 0.7152 * linear(g) + 0.0722 * linear(b);
}
export function contrast(a: string, b: string): number {
	const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x);
	return (hi + 0.05) / (lo + 0.05);
}

const css = readFileSync('src/app.css', 'utf8');
const color = (name: string) => {
	const match = css.match(new RegExp(`--color-${name}:\\s*(#[0-9a-f]{6})`, 'i'));
	if (!match) throw new Error(`--color-${name} is not in app.css`);
	return match[1];
};

describe('contrast formula', () => {
	it('matches the WCAG extremes', () => {
		// WCAG 2.2: black on white is 21:1, a colour on itself 1:1.
		expect(contrast('#000000', '#ffffff')).toBeCloseTo(21, 5);
		expect(contrast('#777777', '#777777')).toBe(1);
	});
});

describe('palette', () => {
	// Text pairs the screens use; WCAG 2.2 AA asks 4.5:1 for normal text.
	const pairs: [string, string][] = [
		['ink', 'paper'],
		['ink', 'card'],
		['muted', 'paper'],
		['muted', 'card'],
		['brand', 'paper'],
		['brand', 'card'],
		['brand', 'brand-soft'],
		['signal', 'card'],
		['signal', 'signal-soft'],
		['ok', 'card'],
		['ok', 'ok-soft'],
		['danger', 'card'],
		['danger', 'danger-soft']
	];
	for (const [fg, bg] of pairs) {
		it(`${fg} on ${bg} reaches 4.5:1`, () => {
			expect(contrast(color(fg), color(bg))).toBeGreaterThanOrEqual(4.5);
		});
	}
	it('white text on the brand header reaches 4.5:1', () => {
		expect(contrast('#ffffff', color('brand'))).toBeGreaterThanOrEqual(4.5);
	});
	it('the focus ring stands out from the page (3:1 for UI components)', () => {
		expect(contrast(color('signal'), color('paper'))).toBeGreaterThanOrEqual(3);
	});
});

describe('chart colours', () => {
	const hex = (rgb: string) =>
		'#' +
		rgb
			.match(/\d+/g)!
			.map((n) => Number(n).toString(16).padStart(2, '0'))
			.join('');

	it('keep every heat-map cell readable: 4.5:1 between its text and its shade (WCAG 2.2 AA)', async () => {
		const { heat } = await import('../../src/lib/chart-colours');
		for (let i = 0; i <= 100; i++) {
			const { background, text } = heat(i / 100);
			expect(contrast(hex(background), text), `share ${i} %`).toBeGreaterThanOrEqual(4.5);
		}
	});

	it('draw series that stand 3:1 against the card, as UI graphics must (WCAG 2.2 1.4.11)', async () => {
		const { SERIES } = await import('../../src/lib/chart-colours');
		for (const c of SERIES) expect(contrast(c, '#ffffff'), c).toBeGreaterThanOrEqual(3);
	});
});
