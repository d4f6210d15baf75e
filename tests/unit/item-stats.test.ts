import { mean, sampleCorrelation } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import {
	MIN_ATTEMPTS,
	itemStatistics,
	pearson,
	type ItemResponse
} from '$lib/server/assessment/item-stats';

/** Responses from a matrix: one row per attempt, one column per question id. */
function responsesFrom(
	questionIds: number[],
	rows: number[][],
	attemptId: (row: number) => string | number = (row) => `attempt-${row + 1}`
): ItemResponse[] {
	return rows.flatMap((row, r) =>
		row.map((score, c) => ({
			attemptId: attemptId(r),
			questionId: questionIds[c],
			correct: score === 1
		}))
	);
}

describe('item statistics, worked by hand', () => {
	// Six attempts at three questions. Attempt totals: 3, 2, 2, 1, 1, 0.
	const rows = [
		[1, 1, 1],
		[1, 1, 0],
		[1, 0, 1],
		[0, 1, 0],
		[1, 0, 0],
		[0, 0, 0]
	];
	const stats = itemStatistics(responsesFrom([1, 2, 3], rows, (r) => r + 1));
	const first = stats.find((s) => s.questionId === 1)!;

	it('gives question 1 p = 4/6', () => {
		expect(first.attempts).toBe(6);
		expect(first.proportionCorrect).toBeCloseTo(4 / 6, 12);
	});

	it('matches r_pb = (M1 − M0) / s_n × √(pq) with the total including the item', () => {
		// Worked by hand for question 1 (right in attempts 1, 2, 3 and 5):
		//   M1 = mean total of those who got it right = (3 + 2 + 2 + 1) / 4 = 2
		//   M0 = mean total of those who got it wrong = (1 + 0) / 2 = 0.5
		//   mean of all totals = 9 / 6 = 1.5; squared deviations 2.25 + 0.25 × 4 + 2.25 = 5.5
		//   s_n, the population standard deviation (divide by n = 6): √(5.5 / 6) = 0.957427
		//   p = 4/6, q = 2/6, √(pq) = √(2/9) = 0.471405
		//   r_pb = (2 − 0.5) / 0.957427 × 0.471405 = 0.738549
		// With s_n and √(pq) this formula equals Pearson's r of the 0/1 item with the totals.
		expect(first.pointBiserial).toBeCloseTo(0.738549, 6);
	});

	it('matches the same formula against the rest of the attempt (total without the item)', () => {
		// Rest scores (total − item 1): 2, 1, 1, 1, 0, 0.
		//   M1 = (2 + 1 + 1 + 0) / 4 = 1;  M0 = (1 + 0) / 2 = 0.5
		//   mean 5/6 = 0.833333; squared deviations sum to 2.833333; s_n = √(2.833333 / 6) = 0.687184
		//   r = (1 − 0.5) / 0.687184 × 0.471405 = 0.342997
		expect(first.itemRest).toBeCloseTo(0.342997, 6);
	});
});

describe('item statistics on a fixed data set of 12 attempts × 6 questions', () => {
	const questionIds = [101, 102, 103, 104, 105, 106];
	const rows = [
		[1, 1, 1, 0, 1, 1],
		[1, 1, 0, 0, 0, 1],
		[1, 1, 0, 0, 0, 1],
		[1, 1, 0, 0, 1, 1],
		[1, 1, 0, 1, 0, 1],
		[1, 1, 0, 0, 1, 1],
		[0, 1, 0, 1, 0, 1],
		[1, 1, 0, 1, 1, 1],
		[0, 1, 0, 1, 1, 0],
		[0, 1, 0, 1, 0, 0],
		[0, 1, 0, 1, 1, 0],
		[0, 1, 0, 0, 0, 0]
	];
	const totals = rows.map((row) => row.reduce((sum, v) => sum + v, 0));
	// Reversed: the order responses arrive in must not matter.
	const responses = responsesFrom(questionIds, rows).reverse();
	const stats = itemStatistics(responses);

	it('lists each question once, in id order, with its attempt count', () => {
		expect(stats.map((s) => [s.questionId, s.attempts])).toEqual(questionIds.map((id) => [id, 12]));
	});

	it('agrees with simple-statistics on p and on both correlations', () => {
		for (const [c, stat] of stats.entries()) {
			const item = rows.map((row) => row[c]);
			const rest = totals.map((total, r) => total - item[r]);
			// simple-statistics mean: p is the mean of the 0/1 item scores.
			expect(stat.proportionCorrect).toBeCloseTo(mean(item), 12);
			// simple-statistics sampleCorrelation of the 0/1 item with the totals is the point-biserial.
			const reference = sampleCorrelation(item, totals);
			const referenceRest = sampleCorrelation(item, rest);
			if (Number.isNaN(reference)) expect(stat.pointBiserial).toBeNull();
			else expect(stat.pointBiserial).toBeCloseTo(reference, 12);
			if (Number.isNaN(referenceRest)) expect(stat.itemRest).toBeNull();
			else expect(stat.itemRest).toBeCloseTo(referenceRest, 12);
		}
	});

	it('flags too hard, too easy, weak and negative items, on the item-rest correlation', () => {
		expect(Object.fromEntries(stats.map((s) => [s.questionId, s.flag]))).toEqual({
			101: null,
			102: 'too easy',
			103: 'too hard',
			104: 'negative discrimination',
			105: 'weak discrimination',
			106: null
		});
		// 105 would pass on the uncorrected r; its own score props the total up.
		const q105 = stats.find((s) => s.questionId === 105)!;
		expect(q105.pointBiserial).toBeGreaterThan(0.5);
		expect(q105.itemRest).toBeLessThan(0.2);
	});

	it('gives no correlation for a question everyone answered right', () => {
		const q102 = stats.find((s) => s.questionId === 102)!;
		expect(q102.proportionCorrect).toBe(1);
		expect(q102.pointBiserial).toBeNull();
		expect(q102.itemRest).toBeNull();
	});
});

describe('item statistics edge cases', () => {
	it(`gives no correlation and no flag below ${MIN_ATTEMPTS} attempts`, () => {
		const rows = [
			[0, 1],
			[0, 0],
			[0, 1],
			[1, 1]
		];
		const [stat] = itemStatistics(responsesFrom([7, 8], rows));
		expect(stat).toEqual({
			questionId: 7,
			attempts: 4,
			proportionCorrect: 0.25,
			pointBiserial: null,
			itemRest: null,
			flag: null
		});
	});

	it('gives no correlation when every attempt has the same total', () => {
		const rows = [
			[1, 0],
			[0, 1],
			[1, 0],
			[0, 1],
			[1, 0]
		];
		const [stat] = itemStatistics(responsesFrom([1, 2], rows));
		expect(stat.pointBiserial).toBeNull();
		expect(stat.itemRest).not.toBeNull();
	});

	it('handles attempts that drew different questions from the bank', () => {
		const responses: ItemResponse[] = [
			{ attemptId: 1, questionId: 5, correct: true },
			{ attemptId: 1, questionId: 6, correct: true },
			{ attemptId: 2, questionId: 6, correct: false },
			{ attemptId: 2, questionId: 7, correct: true }
		];
		expect(
			itemStatistics(responses).map((s) => [s.questionId, s.attempts, s.proportionCorrect])
		).toEqual([
			[5, 1, 1],
			[6, 2, 0.5],
			[7, 1, 1]
		]);
	});

	it('refuses two answers to one question in one attempt', () => {
		const twice: ItemResponse[] = [
			{ attemptId: 'x', questionId: 1, correct: true },
			{ attemptId: 'x', questionId: 1, correct: false }
		];
		expect(() => itemStatistics(twice)).toThrow(/answers question 1 twice/);
	});

	it('returns nothing for no responses', () => {
		expect(itemStatistics([])).toEqual([]);
	});

	it('computes Pearson r like simple-statistics and refuses lists of unequal length', () => {
		const x = [1, 2, 3, 4, 5, 6];
		const y = [2, 2, 3, 4, 5, 60];
		// simple-statistics sampleCorrelation documents this pair as 0.69.
		expect(pearson(x, y)).toBeCloseTo(sampleCorrelation(x, y), 12);
		expect(pearson(x, y)!.toFixed(2)).toBe('0.69');
		expect(() => pearson([1, 2], [1])).toThrow(RangeError);
	});
});
