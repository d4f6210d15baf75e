/**
 * Chart colours from the Journeymark palette, told apart by line style and marker as well as
 * colour so no chart relies on colour alone.
 */
export const SERIES = ['#143d4f', '#a84a00', '#1d6b40', '#6b3fa0', '#a3242b', '#4a5565'];
export const DASHES = [[], [6, 4], [2, 3], [10, 3, 2, 3], [1, 2], [8, 8]];
export const MARKERS = ['circle', 'triangle', 'rect', 'rectRot', 'star', 'crossRot'] as const;

/**
 * A shade from white to brand for a share from 0 to 1, with the text colour that reads on it.
 * The middle of the ramp is skipped: there neither dark nor white text reaches 4.5:1.
 */
export function heat(share: number): { background: string; text: string } {
	const s = Math.max(0, Math.min(1, share));
	const t = s < 0.5 ? s * 0.6 : 0.75 + (s - 0.5) * 0.5;
	const mix = (from: number, to: number) => Math.round(from + (to - from) * t);
	const background = `rgb(${mix(255, 20)}, ${mix(255, 61)}, ${mix(255, 79)})`;
	return { background, text: s >= 0.5 ? '#ffffff' : '#1b2430' };
}
