/**
 * What must hold before a journeyworker may sign a task off, and the digest that seals what
 * they signed. Pure: the route gathers the facts, this decides.
 */
import { LEVELS, hours } from '$lib/framework/labels';
import { hoursToTenths } from '$lib/hours';
import { canonicalJson, sha256Hex } from './chain';

export type Level = 1 | 2 | 3 | 4;
export type StepResult = 'met' | 'not met' | 'n/a';

/** From this level up every safety step must be met, whatever the task requires. */
export const SAFETY_MET_FROM_LEVEL: Level = 3;

const STEP_RESULTS: readonly string[] = ['met', 'not met', 'n/a'] satisfies StepResult[];

export interface SignOffFacts {
	level: Level;
	requiredLevel: Level;
	/** The task's minimum supervised hours, in hours. */
	minHours: number;
	/** Verified supervised hours on this task so far, in tenths of an hour. */
	verifiedTenths: number;
	quizPassed: boolean;
	checklist: readonly { stepId: number; safety: boolean }[];
	/** Keyed by step id. */
	results: Readonly<Record<string, StepResult>>;
	supervisorAssigned: boolean;
	supervisorQualified: boolean;
	selfSignOff: boolean;
}

/** The form field that carries a checklist step's result. */
export const stepField = (stepId: number) => `step-${stepId}`;

/**
 * Every reason the sign-off cannot be made, keyed by form field; empty when it can. Hours and the
 * knowledge check apply at every level. Safety steps must be met from level 3 up and in any
 * sign-off that reaches the task's required level, since that one completes the task.
 */
export function signOffProblems(facts: SignOffFacts): Record<string, string> {
	const problems: Record<string, string> = {};
	const validLevel = ([1, 2, 3, 4] as unknown[]).includes(facts.level);
	if (!validLevel) problems.level = 'Choose a level from 1 Observed to 4 Independent.';

	if (facts.verifiedTenths < hoursToTenths(facts.minHours)) {
		problems.hours = `RO hours verified so far: ${hours(facts.verifiedTenths / 10)} of the ${hours(facts.minHours)} this task needs.`;
	}
	if (!facts.quizPassed) {
		problems.quiz = 'No passing knowledge check is on file: the apprentice must pass one first.';
	}

	const safetyMustBeMet =
		validLevel && (facts.level >= SAFETY_MET_FROM_LEVEL || facts.level >= facts.requiredLevel);
	const results = facts.results as Readonly<Record<string, unknown>>;
	facts.checklist.forEach((step, index) => {
		const result = Object.hasOwn(results, String(step.stepId))
			? results[String(step.stepId)]
			: undefined;
		const name = `Checklist step ${index + 1}`;
		if (typeof result !== 'string' || !STEP_RESULTS.includes(result)) {
			problems[stepField(step.stepId)] = `${name} has no result: mark it met, not met or n/a.`;
		} else if (step.safety && result === 'n/a') {
			problems[stepField(step.stepId)] = `${name} is a safety step: it can never be marked n/a.`;
		} else if (step.safety && result === 'not met' && safetyMustBeMet) {
			const why =
				facts.level >= SAFETY_MET_FROM_LEVEL
					? `a sign-off at level ${facts.level} ${LEVELS[facts.level]}`
					: `a sign-off at the level this task requires`;
			problems[stepField(step.stepId)] =
				`${name} is a safety step and was not met: ${why} needs every safety step met.`;
		}
	});
	const known = new Set(facts.checklist.map((step) => String(step.stepId)));
	if (Object.keys(results).some((key) => !known.has(key))) {
		problems.results = "The results name a step that is not on this task's checklist.";
	}

	if (facts.selfSignOff) {
		problems.supervisor = 'Nobody signs off their own work: ask your journeyworker to assess it.';
	} else if (!facts.supervisorAssigned) {
		problems.supervisor = 'You are not assigned to supervise this apprentice.';
	}
	if (!facts.supervisorQualified) {
		problems.qualification =
			'Your account does not hold the journeyworker qualification needed to sign off.';
	}
	return problems;
}

/** What a journeyworker signs in a sign-off; corrections and revocations hash their own shapes. */
export interface SignOffContent {
	supervisorId: string;
	apprenticeId: string;
	taskCode: string;
	frameworkVersion: number;
	level: Level;
	results: Readonly<Record<string, StepResult>>;
	verifiedTenths: number;
	quizAttemptId: number | null;
	/** `toISOString()` text, so the same instant always hashes the same way. */
	signedAt: string;
	/** SHA-256 of the session id, as stored: the raw id is a bearer secret. */
	sessionHash: string;
}

/**
 * SHA-256 hex of the canonical JSON of exactly the fields given: key order and the way the
 * record was built do not matter, any changed value does.
 */
export function signatureDigest(record: object): string {
	return sha256Hex(canonicalJson(record));
}
