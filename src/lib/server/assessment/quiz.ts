/**
 * Knowledge checks: draw questions from a task's bank, show them without answers, score them.
 * The server stores the draw; the browser only ever sees prompts and option texts.
 */

export interface BankOption {
	text: string;
	correct: boolean;
}

export interface BankQuestion {
	id: number;
	options: BankOption[];
}

/** A bank question as shown: the prompt is needed only to render it. */
export interface PromptedQuestion extends BankQuestion {
	prompt: string;
}

/** One drawn question: `order[position]` is the original index of the option shown there. */
export interface DrawnQuestion {
	questionId: number;
	order: number[];
}

/** What the browser receives: no correct flags, no explanations. */
export interface BrowserQuestion {
	questionId: number;
	prompt: string;
	/** Option texts in display order; the browser answers with positions in this list. */
	options: string[];
	/** Tells the form to offer check boxes rather than radio buttons; it names no answer. */
	multiple: boolean;
}

export interface QuestionScore {
	questionId: number;
	correct: boolean;
	/** Original option indices chosen, ascending. */
	chosen: number[];
}

export interface QuizScore {
	correct: number;
	total: number;
	percent: number;
	passed: boolean;
	perQuestion: QuestionScore[];
}

/** Positions chosen per question id, as submitted from the browser. */
export type QuizAnswers = Record<number, readonly number[]>;

/** Answers that no honest form could have sent; the attempt is refused, not scored. */
export class QuizTampered extends Error {
	constructor(message: string) {
		super(message);
		this.name = 'QuizTampered';
	}
}

/** Mulberry32 (Tommy Ettinger, 2017, public domain; transcribed from memory): small and seedable. */
export function seededRandom(seed: number): () => number {
	let state = seed >>> 0;
	return () => {
		state = (state + 0x6d2b79f5) >>> 0;
		let t = state;
		t = Math.imul(t ^ (t >>> 15), t | 1);
		t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
		return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
	};
}

function below(n: number, random: () => number): number {
	const r = random();
	if (!(r >= 0 && r < 1)) throw new RangeError(`The random source returned ${r}, outside [0, 1).`);
	return Math.floor(r * n);
}

/** Fisher–Yates on a copy, so every order is equally likely. */
function shuffled<T>(items: readonly T[], random: () => number): T[] {
	const out = [...items];
	for (let i = out.length - 1; i > 0; i--) {
		const j = below(i + 1, random);
		[out[i], out[j]] = [out[j], out[i]];
	}
	return out;
}

/**
 * Chooses `count` different questions (all of them when the bank is smaller) and shuffles each
 * question's options. Store the result: scoring needs exactly this draw.
 */
export function drawAttempt(
	bank: readonly BankQuestion[],
	count: number,
	random: () => number
): DrawnQuestion[] {
	if (!Number.isInteger(count) || count < 0) {
		throw new RangeError(`A knowledge check draws a whole number of questions, not ${count}.`);
	}
	const ids = new Set(bank.map((question) => question.id));
	if (ids.size !== bank.length) throw new Error('The question bank lists a question id twice.');
	return shuffled(bank, random)
		.slice(0, count)
		.map((question) => ({
			questionId: question.id,
			order: shuffled(
				question.options.map((_, index) => index),
				random
			)
		}));
}

/** Pairs each drawn question with its bank entry, refusing a draw the bank no longer matches. */
function resolve<Q extends BankQuestion>(drawn: readonly DrawnQuestion[], bank: readonly Q[]) {
	const byId = new Map(bank.map((question) => [question.id, question]));
	const seen = new Set<number>();
	return drawn.map((entry) => {
		const question = byId.get(entry.questionId);
		if (!question) {
			throw new Error(`Question ${entry.questionId} of this attempt is not in the bank.`);
		}
		if (seen.has(entry.questionId)) {
			throw new Error(`Question ${entry.questionId} appears twice in this attempt.`);
		}
		seen.add(entry.questionId);
		const n = question.options.length;
		const isPermutation =
			entry.order.length === n &&
			new Set(entry.order).size === n &&
			entry.order.every((index) => Number.isInteger(index) && index >= 0 && index < n);
		if (!isPermutation) {
			throw new Error(`The stored option order of question ${entry.questionId} no longer fits it.`);
		}
		return { entry, question };
	});
}

/** Prompts and option texts in display order, built field by field so nothing else leaks. */
export function forBrowser(
	drawn: readonly DrawnQuestion[],
	bank: readonly PromptedQuestion[]
): BrowserQuestion[] {
	return resolve(drawn, bank).map(({ entry, question }) => ({
		questionId: entry.questionId,
		prompt: question.prompt,
		options: entry.order.map((index) => question.options[index].text),
		multiple: question.options.filter((option) => option.correct).length > 1
	}));
}

/** Checks the submitted positions are ones the form offered, each at most once. */
function chosenIndices(entry: DrawnQuestion, positions: unknown): number[] {
	if (!Array.isArray(positions)) {
		throw new QuizTampered(`The answer to question ${entry.questionId} is not a list of options.`);
	}
	const seen = new Set<number>();
	for (const position of positions) {
		if (!Number.isInteger(position) || position < 0 || position >= entry.order.length) {
			throw new QuizTampered(
				`Question ${entry.questionId} has no option at position ${String(position)}.`
			);
		}
		if (seen.has(position)) {
			throw new QuizTampered(`Question ${entry.questionId} lists option ${position} twice.`);
		}
		seen.add(position);
	}
	return [...seen].map((position) => entry.order[position]).sort((a, b) => a - b);
}

/**
 * Scores a submitted attempt. A question counts only when exactly its correct options are
 * chosen; an unanswered question counts as wrong; anything the form could not have sent throws.
 */
export function score(
	drawn: readonly DrawnQuestion[],
	bank: readonly BankQuestion[],
	answers: QuizAnswers,
	passMarkPercent = 80
): QuizScore {
	if (!(passMarkPercent >= 0 && passMarkPercent <= 100)) {
		throw new RangeError(`A pass mark is a percentage from 0 to 100, not ${passMarkPercent}.`);
	}
	const resolved = resolve(drawn, bank);
	const drawnIds = new Set(drawn.map((entry) => String(entry.questionId)));
	for (const key of Object.keys(answers)) {
		if (!drawnIds.has(key)) {
			throw new QuizTampered(
				`An answer was sent for question ${key}, which is not in this attempt.`
			);
		}
	}
	const given = answers as Record<string, unknown>;
	const perQuestion = resolved.map(({ entry, question }) => {
		const raw = given[String(entry.questionId)];
		const chosen = raw === undefined ? [] : chosenIndices(entry, raw);
		const key = question.options.flatMap((option, index) => (option.correct ? [index] : []));
		const correct =
			chosen.length > 0 &&
			chosen.length === key.length &&
			chosen.every((index, i) => index === key[i]);
		return { questionId: entry.questionId, correct, chosen };
	});
	const correct = perQuestion.filter((question) => question.correct).length;
	const total = perQuestion.length;
	return {
		correct,
		total,
		percent: total === 0 ? 0 : (100 * correct) / total,
		// Compared in whole numbers so 4 of 5 against 80 % never misses by a rounding error.
		passed: total > 0 && correct * 100 >= passMarkPercent * total,
		perQuestion
	};
}
