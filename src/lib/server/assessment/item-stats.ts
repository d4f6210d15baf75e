/**
 * Item statistics for knowledge-check questions, so coordinators can find and fix weak ones.
 * Each attempt's total is the number of its questions answered correctly.
 */

// common practice, no published source
export const TOO_HARD_BELOW = 0.2;
// common practice, no published source
export const TOO_EASY_ABOVE = 0.95;
// common practice, no published source
export const WEAK_DISCRIMINATION_BELOW = 0.2;
// common practice, no published source
export const NEGATIVE_DISCRIMINATION_BELOW = 0;
/** Below this many attempts at a question, its correlations are null and it is not flagged. */
export const MIN_ATTEMPTS = 5;

export type ItemFlag = 'too hard' | 'too easy' | 'weak discrimination' | 'negative discrimination';

export interface ItemResponse {
	attemptId: string | number;
	questionId: number;
	correct: boolean;
}

export interface ItemStatistic {
	questionId: number;
	attempts: number;
	/** Difficulty index p: the share of attempts that answered the question correctly. */
	proportionCorrect: number;
	/** Point-biserial r between the item score (0/1) and the attempt's total INCLUDING the item. */
	pointBiserial: number | null;
	/** Corrected item-rest r: the same, against the total EXCLUDING the item. */
	itemRest: number | null;
	flag: ItemFlag | null;
}

/** Pearson's r, or null when either side has no variance (the ratio would be 0/0). */
export function pearson(x: readonly number[], y: readonly number[]): number | null {
	const n = x.length;
	if (n !== y.length) throw new RangeError('Both lists need the same length.');
	if (n === 0) return null;
	const mx = x.reduce((sum, v) => sum + v, 0) / n;
	const my = y.reduce((sum, v) => sum + v, 0) / n;
	let sxy = 0;
	let sxx = 0;
	let syy = 0;
	for (let i = 0; i < n; i++) {
		sxy += (x[i] - mx) * (y[i] - my);
		sxx += (x[i] - mx) ** 2;
		syy += (y[i] - my) ** 2;
	}
	if (sxx === 0 || syy === 0) return null;
	return sxy / Math.sqrt(sxx * syy);
}

/**
 * The flag is taken from the item-rest correlation: in a quiz of five to ten questions the item
 * is a large share of its own total, which props up the uncorrected r even for a guessed item.
 * One flag per item, most serious first: a negative r usually means the key is wrong.
 */
function flagFor(attempts: number, p: number, itemRest: number | null): ItemFlag | null {
	if (attempts < MIN_ATTEMPTS) return null;
	if (itemRest !== null && itemRest < NEGATIVE_DISCRIMINATION_BELOW) {
		return 'negative discrimination';
	}
	if (p < TOO_HARD_BELOW) return 'too hard';
	if (p > TOO_EASY_ABOVE) return 'too easy';
	if (itemRest !== null && itemRest < WEAK_DISCRIMINATION_BELOW) return 'weak discrimination';
	return null;
}

/** Per question, ascending by id, over the given responses (one per question per attempt). */
export function itemStatistics(responses: readonly ItemResponse[]): ItemStatistic[] {
	const totals = new Map<string | number, number>();
	const byQuestion = new Map<number, Map<string | number, number>>();
	for (const response of responses) {
		const score = response.correct ? 1 : 0;
		totals.set(response.attemptId, (totals.get(response.attemptId) ?? 0) + score);
		const scores = byQuestion.get(response.questionId) ?? new Map<string | number, number>();
		if (scores.has(response.attemptId)) {
			throw new RangeError(
				`Attempt ${response.attemptId} answers question ${response.questionId} twice.`
			);
		}
		scores.set(response.attemptId, score);
		byQuestion.set(response.questionId, scores);
	}
	return [...byQuestion.entries()]
		.sort(([a], [b]) => a - b)
		.map(([questionId, scores]) => {
			const item = [...scores.values()];
			const total = [...scores.keys()].map((attemptId) => totals.get(attemptId) ?? 0);
			const rest = total.map((value, i) => value - item[i]);
			const attempts = item.length;
			const proportionCorrect = item.reduce((sum, v) => sum + v, 0) / attempts;
			const enough = attempts >= MIN_ATTEMPTS;
			const pointBiserial = enough ? pearson(item, total) : null;
			const itemRest = enough ? pearson(item, rest) : null;
			return {
				questionId,
				attempts,
				proportionCorrect,
				pointBiserial,
				itemRest,
				flag: flagFor(attempts, proportionCorrect, itemRest)
			};
		});
}
