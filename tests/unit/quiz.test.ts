import { describe, expect, it } from 'vitest';
import {
	QuizTampered,
	drawAttempt,
	forBrowser,
	score,
	seededRandom,
	type DrawnQuestion,
	type PromptedQuestion
} from '$lib/server/assessment/quiz';

function question(id: number, correct: number[], optionCount = 4): PromptedQuestion {
	return {
		id,
		prompt: `Question ${id}: which of these is right?`,
		options: Array.from({ length: optionCount }, (_, i) => ({
			text: `Option ${String.fromCharCode(65 + i)} of question ${id}`,
			correct: correct.includes(i)
		}))
	};
}

const bank: PromptedQuestion[] = [
	question(11, [0]),
	question(12, [2]),
	question(13, [1, 3]),
	question(14, [0, 1, 2], 5),
	question(15, [3]),
	question(16, [1], 2)
];

/** Positions at which the drawn question shows the given original option indices. */
function positionsOf(entry: DrawnQuestion, originals: number[]): number[] {
	return originals.map((original) => entry.order.indexOf(original));
}

function correctPositions(drawn: DrawnQuestion[]): Record<number, number[]> {
	return Object.fromEntries(
		drawn.map((entry) => {
			const key = bank
				.find((q) => q.id === entry.questionId)!
				.options.flatMap((o, i) => (o.correct ? [i] : []));
			return [entry.questionId, positionsOf(entry, key)];
		})
	);
}

describe('seededRandom (mulberry32)', () => {
	// The C original (Tommy Ettinger, 2017, from memory) in 32-bit unsigned arithmetic, via BigInt.
	function referenceMulberry32(seed: number) {
		const M = 0xffffffffn;
		let state = BigInt(seed >>> 0);
		return () => {
			state = (state + 0x6d2b79f5n) & M;
			let z = state;
			z = ((z ^ (z >> 15n)) * (z | 1n)) & M;
			z = (z ^ ((z + (z ^ (z >> 7n)) * (z | 61n)) & M)) & M;
			return Number(z ^ (z >> 14n)) / 4294967296;
		};
	}

	it('matches a BigInt transcription of the C original for several seeds', () => {
		for (const seed of [0, 1, 42, 0x7fffffff, -1]) {
			const ours = seededRandom(seed);
			const reference = referenceMulberry32(seed);
			for (let i = 0; i < 200; i++) expect(ours()).toBe(reference());
		}
	});

	it('repeats for a seed, differs between seeds, and stays in [0, 1)', () => {
		const a = seededRandom(7);
		const b = seededRandom(7);
		const c = seededRandom(8);
		const fromA = Array.from({ length: 50 }, a);
		expect(Array.from({ length: 50 }, b)).toEqual(fromA);
		expect(Array.from({ length: 50 }, c)).not.toEqual(fromA);
		const many = Array.from({ length: 10_000 }, seededRandom(3));
		expect(many.every((r) => r >= 0 && r < 1)).toBe(true);
		const mean = many.reduce((s, r) => s + r, 0) / many.length;
		expect(mean).toBeGreaterThan(0.48);
		expect(mean).toBeLessThan(0.52);
	});
});

describe('drawAttempt', () => {
	it('draws the asked number of different questions, each with a full option order', () => {
		const drawn = drawAttempt(bank, 4, seededRandom(1));
		expect(drawn).toHaveLength(4);
		expect(new Set(drawn.map((d) => d.questionId)).size).toBe(4);
		for (const entry of drawn) {
			const q = bank.find((b) => b.id === entry.questionId)!;
			expect([...entry.order].sort()).toEqual(q.options.map((_, i) => i));
		}
	});

	it('draws the whole bank, once each, when it is smaller than asked', () => {
		const drawn = drawAttempt(bank, 20, seededRandom(2));
		expect(drawn.map((d) => d.questionId).sort()).toEqual([11, 12, 13, 14, 15, 16]);
	});

	it('is reproducible from a seed', () => {
		expect(drawAttempt(bank, 5, seededRandom(99))).toEqual(drawAttempt(bank, 5, seededRandom(99)));
	});

	it('varies which questions are drawn and how options are ordered', () => {
		const draws = Array.from({ length: 30 }, (_, seed) => drawAttempt(bank, 3, seededRandom(seed)));
		const questionSets = new Set(draws.map((d) => d.map((q) => q.questionId).join(',')));
		const ordersOf11 = new Set(
			draws.flatMap((d) => d.filter((q) => q.questionId === 11).map((q) => q.order.join('')))
		);
		expect(questionSets.size).toBeGreaterThan(10);
		expect(ordersOf11.size).toBeGreaterThan(5);
	});

	it('makes every option order about equally likely (an unbiased shuffle)', () => {
		const random = seededRandom(2024);
		const counts = new Map<string, number>();
		const three = [question(1, [0], 3)];
		for (let i = 0; i < 6000; i++) {
			const [entry] = drawAttempt(three, 1, random);
			const key = entry.order.join('');
			counts.set(key, (counts.get(key) ?? 0) + 1);
		}
		// 3! = 6 orders, 1000 expected each; a biased shuffle (e.g. sort by random) skews this.
		expect(counts.size).toBe(6);
		for (const count of counts.values()) {
			expect(count).toBeGreaterThan(880);
			expect(count).toBeLessThan(1120);
		}
	});

	it('refuses a bank with a repeated id, a bad count or a broken random source', () => {
		expect(() => drawAttempt([question(1, [0]), question(1, [1])], 2, Math.random)).toThrow(
			/twice/
		);
		expect(() => drawAttempt(bank, -1, Math.random)).toThrow(RangeError);
		expect(() => drawAttempt(bank, 2.5, Math.random)).toThrow(RangeError);
		expect(() => drawAttempt(bank, 2, () => 1)).toThrow(/outside \[0, 1\)/);
	});

	it('draws nothing from an empty bank', () => {
		expect(drawAttempt([], 5, Math.random)).toEqual([]);
	});
});

describe('forBrowser', () => {
	const withSecrets = bank.map((q) => ({
		...q,
		explanation: `EXPLAINED-${q.id}: because the manual says so.`
	}));

	it('sends no correct flag and no explanation to the browser', () => {
		const drawn = drawAttempt(withSecrets, 6, seededRandom(5));
		const json = JSON.stringify(forBrowser(drawn, withSecrets));
		expect(json).not.toMatch(/correct/i);
		expect(json).not.toContain('EXPLAINED');
		expect(json).toContain('Option A of question 11');
		for (const shown of JSON.parse(json)) {
			expect(Object.keys(shown).sort()).toEqual(['multiple', 'options', 'prompt', 'questionId']);
			expect(shown.options.every((option: unknown) => typeof option === 'string')).toBe(true);
		}
	});

	it('shows option texts in the drawn order', () => {
		const drawn: DrawnQuestion[] = [{ questionId: 13, order: [3, 0, 2, 1] }];
		const [shown] = forBrowser(drawn, bank);
		expect(shown).toEqual({
			questionId: 13,
			prompt: 'Question 13: which of these is right?',
			options: [
				'Option D of question 13',
				'Option A of question 13',
				'Option C of question 13',
				'Option B of question 13'
			],
			multiple: true
		});
		expect(forBrowser([{ questionId: 12, order: [0, 1, 2, 3] }], bank)[0].multiple).toBe(false);
	});

	it('refuses a draw that no longer fits the bank', () => {
		expect(() => forBrowser([{ questionId: 99, order: [0, 1] }], bank)).toThrow(/not in the bank/);
		expect(() => forBrowser([{ questionId: 11, order: [0, 1, 2] }], bank)).toThrow(
			/no longer fits/
		);
		expect(() => forBrowser([{ questionId: 11, order: [0, 0, 1, 2] }], bank)).toThrow(
			/no longer fits/
		);
	});
});

describe('score', () => {
	const drawn = drawAttempt(bank, 6, seededRandom(77));

	it('scores every question right when exactly the correct options are chosen', () => {
		const result = score(drawn, bank, correctPositions(drawn));
		expect(result).toMatchObject({ correct: 6, total: 6, percent: 100, passed: true });
		const multi = result.perQuestion.find((q) => q.questionId === 14)!;
		expect(multi.chosen).toEqual([0, 1, 2]);
	});

	it('reports the original option indices chosen, whatever the display order', () => {
		const entry: DrawnQuestion = { questionId: 12, order: [3, 2, 1, 0] };
		const result = score([entry], bank, { 12: [1] });
		expect(result.perQuestion).toEqual([{ questionId: 12, correct: true, chosen: [2] }]);
		const wrong = score([entry], bank, { 12: [0] });
		expect(wrong.perQuestion).toEqual([{ questionId: 12, correct: false, chosen: [3] }]);
	});

	it('gives a multiple-answer question no credit for a subset, a superset or a wrong set', () => {
		const entry: DrawnQuestion = { questionId: 13, order: [0, 1, 2, 3] };
		expect(score([entry], bank, { 13: [1, 3] }).correct).toBe(1);
		expect(score([entry], bank, { 13: [3, 1] }).correct).toBe(1);
		expect(score([entry], bank, { 13: [1] }).correct).toBe(0);
		expect(score([entry], bank, { 13: [1, 2, 3] }).correct).toBe(0);
		expect(score([entry], bank, { 13: [0, 1, 2, 3] }).correct).toBe(0);
		expect(score([entry], bank, { 13: [0, 2] }).correct).toBe(0);
	});

	it('gives a single-answer question no credit for two choices', () => {
		const entry: DrawnQuestion = { questionId: 11, order: [0, 1, 2, 3] };
		expect(score([entry], bank, { 11: [0, 1] }).perQuestion[0].correct).toBe(false);
	});

	it('counts missing and empty answers as wrong', () => {
		const answers = correctPositions(drawn);
		delete answers[11];
		answers[12] = [];
		const result = score(drawn, bank, answers);
		expect(result.correct).toBe(4);
		expect(result.perQuestion.find((q) => q.questionId === 11)).toMatchObject({
			correct: false,
			chosen: []
		});
	});

	it('passes at exactly the pass mark and fails just under it', () => {
		const five = drawn.filter((entry) => entry.questionId !== 16);
		const answers = correctPositions(five);
		answers[15] = [];
		expect(score(five, bank, answers)).toMatchObject({ correct: 4, percent: 80, passed: true });
		answers[14] = [];
		expect(score(five, bank, answers)).toMatchObject({ correct: 3, percent: 60, passed: false });
		expect(score(five, bank, answers, 60).passed).toBe(true);
	});

	it('does not pass an empty attempt and refuses an impossible pass mark', () => {
		expect(score([], bank, {})).toMatchObject({ correct: 0, total: 0, passed: false });
		expect(() => score(drawn, bank, {}, 120)).toThrow(RangeError);
		expect(() => score(drawn, bank, {}, Number.NaN)).toThrow(RangeError);
	});

	it('refuses tampered answers instead of scoring them', () => {
		const entry: DrawnQuestion = { questionId: 11, order: [0, 1, 2, 3] };
		const tampered: [Record<string, unknown>, RegExp][] = [
			[{ 99: [0] }, /question 99, which is not in this attempt/],
			[{ '011': [0] }, /question 011/],
			[{ 11: [4] }, /no option at position 4/],
			[{ 11: [-1] }, /no option at position -1/],
			[{ 11: [1.5] }, /no option at position 1.5/],
			[{ 11: ['0'] }, /no option at position 0/],
			[{ 11: [2, 2] }, /lists option 2 twice/],
			[{ 11: 0 }, /not a list/]
		];
		for (const [answers, message] of tampered) {
			const attempt = () => score([entry], bank, answers as Record<number, number[]>);
			expect(attempt).toThrow(QuizTampered);
			expect(attempt).toThrow(message);
		}
	});
});
