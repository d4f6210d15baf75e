/**
 * Knowledge checks and sign-offs for the demo scenario, following the work log: a task is
 * assessed only once its verified hours are on file and its knowledge check is passed, levels
 * rise over time, and every record enters the audit hash chain the way the app writes it.
 *
 * `generateSignOffs` is pure and draws from seeded generators keyed by e-mail, so the same
 * people, work and `today` always give the same rows; `seedSignOffs` stores them.
 */
import { createHash } from 'node:crypto';
import { QueryTypes } from 'sequelize';
import { canonicalJson, GENESIS, linkHash } from '../src/lib/server/assessment/chain';
import { signatureDigest } from '../src/lib/server/assessment/gates';
import {
	drawAttempt,
	score,
	seededRandom,
	type BankQuestion
} from '../src/lib/server/assessment/quiz';
import { config } from '../src/lib/server/config';
import {
	AuditEvent,
	QuizAttempt,
	QuizResponse,
	sequelize,
	SignOff,
	write,
	type DrawnQuestion,
	type StepResult
} from '../src/lib/server/db';
import { syncIdSequences } from '../src/lib/server/db/connection';
import { DEMO_ACCOUNTS } from './demo';
import type { WorkLogTask } from './worklog';

/** Stands in for a browser session id: the seed signs nothing in a real session. */
export const SEED_SESSION_MARKER = 'journeymark-demo-seed-session';
export const SEED_SESSION_HASH = createHash('sha256').update(SEED_SESSION_MARKER).digest('hex');

export type Level = 1 | 2 | 3 | 4;

export interface SignOffPerson {
	id: string;
	email: string;
}

export interface SignOffApprentice extends SignOffPerson {
	/** ISO date, YYYY-MM-DD. */
	startDate: string;
	supervisors: SignOffPerson[];
}

/** A work-log task with what assessing it needs. */
export interface SignOffTask extends WorkLogTask {
	requiredLevel: Level;
	minHours: number;
	steps: { id: number; safety: boolean }[];
	questions: BankQuestion[];
}

/** Verified hours on one task of one entry, counted from the moment it was verified. */
export interface VerifiedWork {
	apprenticeId: string;
	taskId: number;
	tenths: number;
	/** Epoch milliseconds of the review that verified it. */
	reviewedAt: number;
}

export interface SignOffInput {
	today: Date;
	apprentices: SignOffApprentice[];
	tasks: SignOffTask[];
	framework: { id: number; version: number };
	coordinatorId: string | null;
	work: VerifiedWork[];
	/** Assessments a journeyworker makes a week for this apprentice; the demo story by default. */
	perWeek?: (apprentice: SignOffApprentice) => number;
}

export interface AttemptRow {
	id: number;
	apprenticeId: string;
	taskId: number;
	drawn: DrawnQuestion[];
	passMark: number;
	answers: Record<string, number[]>;
	correct: number;
	total: number;
	percent: number;
	passed: boolean;
	startedAt: Date;
	submittedAt: Date;
}

export interface ResponseRow {
	attemptId: number;
	questionId: number;
	correct: boolean;
}

export interface SignOffRow {
	id: number;
	kind: 'sign-off' | 'correction' | 'revocation';
	apprenticeId: string;
	taskId: number;
	frameworkId: number;
	supervisorId: string;
	level: Level | null;
	results: Record<string, StepResult> | null;
	quizAttemptId: number | null;
	verifiedTenths: number;
	notes: string;
	refersToId: number | null;
	reason: string | null;
	sessionHash: string;
	contentHash: string;
	signedAt: Date;
}

export interface AuditRow {
	id: number;
	at: Date;
	actorId: string | null;
	kind: string;
	subject: string;
	content: string;
	previousHash: string;
	hash: string;
}

export interface SignOffData {
	attempts: AttemptRow[];
	responses: ResponseRow[];
	signOffs: SignOffRow[];
	audit: AuditRow[];
}

/** Where the new rows start: the next free ids and the hash of the last audit event. */
export interface ChainStart {
	attemptId: number;
	signOffId: number;
	auditId: number;
	previousHash: string;
}

const EMPTY_START: ChainStart = { attemptId: 1, signOffId: 1, auditId: 1, previousHash: GENESIS };

const DEMO_APPRENTICE = DEMO_ACCOUNTS.find((a) => a.role === 'apprentice')?.email;

// The cohort story of the work log: Bea ahead, Gus stalled, Nia behind.
const STORY_PER_WEEK: Record<string, number> = {
	'bea.kowalczyk@riverbend-training.example': 7,
	'gus.takahashi@riverbend-training.example': 2,
	'nia.obuya@riverbend-training.example': 1
};

// Our own progression rule, stricter than the app's gate (the task's minimum at every level):
// level 4 wants half as many hours again, and each level more time in the programme.
const HOURS_FACTOR: Record<Level, number> = { 1: 1, 2: 1, 3: 1, 4: 1.5 };
const MONTHS_IN: Record<Level, number> = { 1: 0, 2: 1, 3: 3, 4: 6 };
const DAYS_BETWEEN_LEVELS = 14;
// No assessment without recent work: a stalled apprentice's sign-offs stop with their entries.
const DAYS_AFTER_LAST_WORK = 7;
const QUIZ_FAIL_RATE = 0.15;

const NOTES: Record<Level, readonly string[]> = {
	1: [
		'Watched me do it first, then I talked through each step.',
		'Observed only; asked for the torque values before each step.',
		''
	],
	2: [
		'Needed prompting on the order of the final checks.',
		'Did most of it; I stepped in once at the specification lookup.',
		''
	],
	3: [
		'Worked through it with me nearby; no prompting needed on safety steps.',
		'Good job on a customer car; double-check the final road test next time.',
		''
	],
	4: [
		'Independent from set-up to final check, specifications looked up unprompted.',
		'Did it alone on a comeback job and found the cause. Ready.',
		''
	]
};

/* ---------- seeded randomness and calendar ---------- */

type Rng = () => number;

/** FNV-1a, to turn a key such as 'e-mail|sign-offs' into a seed. */
function fnv1a(text: string): number {
	let h = 0x811c9dc5;
	for (let i = 0; i < text.length; i++) h = Math.imul(h ^ text.charCodeAt(i), 0x01000193);
	return h >>> 0;
}

const rngFor = (key: string) => seededRandom(fnv1a(key));
const int = (rnd: Rng, min: number, max: number) => min + Math.floor(rnd() * (max - min + 1));
const pick = <T>(rnd: Rng, items: readonly T[]): T => items[Math.floor(rnd() * items.length)];

const DAY_MS = 86_400_000;
const dayOf = (iso: string) => Date.parse(`${iso}T00:00:00Z`) / DAY_MS;
const at = (day: number, minutes: number) => day * DAY_MS + minutes * 60_000;
/** Monday to Friday on or after `day`. */
function weekday(day: number): number {
	let d = day;
	while ([0, 6].includes(new Date(d * DAY_MS).getUTCDay())) d++;
	return d;
}

/* ---------- the generator ---------- */

/** Cumulative verified tenths on one task, by review time. */
class HoursOnTask {
	readonly times: number[] = [];
	readonly totals: number[] = [];

	add(time: number, tenths: number) {
		this.times.push(time);
		this.totals.push((this.totals[this.totals.length - 1] ?? 0) + tenths);
	}

	/** Verified tenths at `time` (inclusive). */
	at(time: number): number {
		let lo = 0;
		let hi = this.times.length;
		while (lo < hi) {
			const mid = (lo + hi) >> 1;
			if (this.times[mid] <= time) lo = mid + 1;
			else hi = mid;
		}
		return lo === 0 ? 0 : this.totals[lo - 1];
	}

	/** When the total first reached `tenths`, or null. */
	reached(tenths: number): number | null {
		const i = this.totals.findIndex((t) => t >= tenths);
		return i < 0 ? null : this.times[i];
	}
}

interface PendingAttempt extends Omit<AttemptRow, 'id'> {
	key: string;
}

interface PendingSignOff {
	apprentice: SignOffApprentice;
	task: SignOffTask;
	supervisorId: string;
	level: Level;
	results: Record<string, StepResult>;
	attemptKey: string;
	verifiedTenths: number;
	notes: string;
	signedAt: number;
}

interface PendingChange {
	kind: 'revocation' | 'correction';
	of: PendingSignOff;
	level: Level | null;
	reason: string;
	signedAt: number;
}

/** Draws a check and answers it with `right` questions correct, the harder ones missed first. */
function takeCheck(
	rnd: Rng,
	apprentice: SignOffApprentice,
	task: SignOffTask,
	pass: boolean,
	submittedAt: number
): PendingAttempt {
	const drawn = drawAttempt(task.questions, config.QUIZ_QUESTIONS, rnd);
	const total = drawn.length;
	const needed = Math.ceil((config.QUIZ_PASS_MARK * total) / 100);
	const right = pass ? int(rnd, needed, total) : int(rnd, Math.max(0, needed - 2), needed - 1);
	// Some questions are harder than others, so the item statistics have something to show.
	const missed = new Set(
		drawn
			.map((d) => ({ id: d.questionId, weight: (fnv1a(`q${d.questionId}`) % 100) / 100 + rnd() }))
			.sort((a, b) => b.weight - a.weight)
			.slice(0, total - right)
			.map((d) => d.id)
	);
	const answers: Record<string, number[]> = {};
	for (const d of drawn) {
		const options = task.questions.find((q) => q.id === d.questionId)!.options;
		const positions = d.order.map((_, p) => p);
		const right = positions.filter((p) => options[d.order[p]].correct);
		const wrong = positions.filter((p) => !options[d.order[p]].correct);
		answers[String(d.questionId)] =
			missed.has(d.questionId) && wrong.length ? [pick(rnd, wrong)] : right;
	}
	const result = score(drawn, task.questions, answers, config.QUIZ_PASS_MARK);
	return {
		key: `${apprentice.id}|${task.id}|${submittedAt}`,
		apprenticeId: apprentice.id,
		taskId: task.id,
		drawn,
		passMark: config.QUIZ_PASS_MARK,
		answers,
		correct: result.correct,
		total: result.total,
		percent: result.percent,
		passed: result.passed,
		startedAt: new Date(submittedAt - int(rnd, 4, 18) * 60_000),
		submittedAt: new Date(submittedAt)
	};
}

function checklist(rnd: Rng, task: SignOffTask, level: Level): Record<string, StepResult> {
	const results: Record<string, StepResult> = {};
	for (const step of task.steps) {
		// Safety steps are always met here: the app refuses n/a on them and 'not met' from level 3.
		const roll = rnd();
		results[String(step.id)] = step.safety
			? 'met'
			: roll < 0.05
				? 'n/a'
				: level <= 2 && level < task.requiredLevel && roll < 0.25
					? 'not met'
					: 'met';
	}
	return results;
}

function story(apprentice: SignOffApprentice): number {
	return STORY_PER_WEEK[apprentice.email] ?? 2 + (fnv1a(apprentice.email) % 3);
}

/** Knowledge checks and sign-offs of one apprentice, from their own seeded generator. */
function apprenticeRecords(
	a: SignOffApprentice,
	input: SignOffInput,
	hours: Map<number, HoursOnTask>
): { attempts: PendingAttempt[]; signOffs: PendingSignOff[] } {
	const rnd = rngFor(`${a.email}|sign-offs`);
	const attempts: PendingAttempt[] = [];
	const signOffs: PendingSignOff[] = [];
	const supervisors = [...a.supervisors].sort((x, y) => x.email.localeCompare(y.email));
	if (supervisors.length === 0) return { attempts, signOffs };
	const primary = supervisors[fnv1a(a.email) % supervisors.length];
	const start = dayOf(a.startDate);
	const lastWork = Math.max(0, ...[...hours.values()].map((h) => h.times[h.times.length - 1]));
	const stop = Math.min(input.today.getTime(), lastWork + DAYS_AFTER_LAST_WORK * DAY_MS);

	// A check is passed a few days after the task's minimum hours are verified; some need a retake.
	const passed = new Map<number, PendingAttempt>();
	for (const task of input.tasks) {
		const reached = hours.get(task.id)?.reached(Math.round(task.minHours * 10));
		const delay = int(rnd, 1, 12);
		const fails = rnd() < QUIZ_FAIL_RATE;
		const retakeDays = int(rnd, 1, 5);
		if (reached == null || task.questions.length === 0) continue;
		const first = at(weekday(Math.floor(reached / DAY_MS) + delay), int(rnd, 12 * 60, 17 * 60));
		if (first > stop) continue;
		if (fails) {
			attempts.push(takeCheck(rnd, a, task, false, first));
			const retake = at(
				weekday(Math.floor(first / DAY_MS) + retakeDays),
				int(rnd, 12 * 60, 17 * 60)
			);
			if (retake > stop) continue;
			passed.set(task.id, takeCheck(rnd, a, task, true, retake));
		} else {
			passed.set(task.id, takeCheck(rnd, a, task, true, first));
		}
		attempts.push(passed.get(task.id)!);
	}

	// Once a week a journeyworker assesses what is ready: shop safety first, then everyday
	// (tier 1) work, finishing tasks already started before opening new ones.
	const held = new Map<number, { level: Level; at: number }>();
	const perWeek = (input.perWeek ?? story)(a);
	// Weeks before the first verified work have nothing to assess.
	const firstWork = Math.min(...[...hours.values()].map((h) => h.times[0]));
	const from = Math.max(start, Math.floor(firstWork / DAY_MS));
	const firstMonday = from - ((new Date(from * DAY_MS).getUTCDay() + 6) % 7);
	for (let monday = firstMonday + 7; at(monday, 0) <= stop; monday += 7) {
		const slot = at(monday + int(rnd, 0, 4), int(rnd, 8 * 60, 14 * 60));
		const months = (slot / DAY_MS - start) / 30.44;
		const ready = input.tasks.flatMap((task) => {
			const last = held.get(task.id);
			const level = ((last?.level ?? 0) + 1) as Level;
			const pass = passed.get(task.id);
			if (level > task.requiredLevel || !pass || pass.submittedAt.getTime() > slot) return [];
			if (last && slot - last.at < DAYS_BETWEEN_LEVELS * DAY_MS) return [];
			if (months < MONTHS_IN[level]) return [];
			const tenths = hours.get(task.id)?.at(slot) ?? 0;
			if (tenths < Math.round(task.minHours * 10 * HOURS_FACTOR[level])) return [];
			return [{ task, level, pass }];
		});
		ready.sort(
			(x, y) =>
				Number(y.task.area === 'SAF') - Number(x.task.area === 'SAF') ||
				x.task.tier - y.task.tier ||
				y.level - x.level ||
				x.task.code.localeCompare(y.task.code)
		);
		ready.slice(0, perWeek).forEach(({ task, level, pass }, i) => {
			const signedAt = slot + i * int(rnd, 20, 45) * 60_000;
			if (signedAt > stop) return;
			// Hours verified between the slot and the signature count too, as they do in the app.
			const tenths = hours.get(task.id)!.at(signedAt);
			signOffs.push({
				apprentice: a,
				task,
				supervisorId: rnd() < 0.7 ? primary.id : pick(rnd, supervisors).id,
				level,
				results: checklist(rnd, task, level),
				attemptKey: pass.key,
				verifiedTenths: tenths,
				notes: pick(rnd, NOTES[level]),
				signedAt
			});
			held.set(task.id, { level, at: signedAt });
		});
	}
	return { attempts, signOffs };
}

/**
 * One revocation and one correction by the coordinator, on the two steady apprentices first by
 * e-mail (never the demo apprentice), each on a task's newest sign-off so nothing later hangs on it.
 */
function coordinatorChanges(signOffs: PendingSignOff[], input: SignOffInput): PendingChange[] {
	if (!input.coordinatorId) return [];
	const steady = input.apprentices
		.filter((a) => !(a.email in STORY_PER_WEEK) && a.email !== DEMO_APPRENTICE)
		.map((a) => a.email)
		.sort();
	const changes: PendingChange[] = [];
	const cutoff = input.today.getTime() - 10 * DAY_MS;
	(['revocation', 'correction'] as const).forEach((kind, i) => {
		const email = steady[i];
		const own = signOffs.filter((s) => s.apprentice.email === email);
		const newestOnTask = own.filter(
			(s) =>
				s.level >= 2 &&
				s.signedAt < cutoff &&
				!own.some((o) => o.task === s.task && o.signedAt > s.signedAt)
		);
		const of = newestOnTask[newestOnTask.length - 1];
		if (!of) return;
		const rnd = rngFor(`${email}|${kind}`);
		const signedAt = at(weekday(Math.floor(of.signedAt / DAY_MS) + int(rnd, 2, 6)), 10 * 60);
		const lower = (of.level - 1) as Level;
		changes.push(
			kind === 'revocation'
				? {
						kind,
						of,
						level: null,
						reason:
							'The checklist was recorded against the wrong repair order; the task will be assessed again.',
						signedAt
					}
				: {
						kind,
						of,
						level: lower,
						reason: `Level ${of.level} was chosen by mistake: the notes describe prompting, which is level ${lower}.`,
						signedAt
					}
		);
	});
	return changes;
}

/** Ids, hashes and the audit chain, in time order, the way `signOff()` and `revoke()` write them. */
function seal(
	attempts: PendingAttempt[],
	signOffs: PendingSignOff[],
	changes: PendingChange[],
	input: SignOffInput,
	start: ChainStart
): SignOffData {
	attempts.sort((x, y) => x.submittedAt.getTime() - y.submittedAt.getTime());
	const attemptIds = new Map<string, number>();
	const attemptRows: AttemptRow[] = attempts.map(({ key, ...row }, i) => {
		attemptIds.set(key, start.attemptId + i);
		return { id: start.attemptId + i, ...row };
	});
	const responses = attemptRows.flatMap((row) =>
		score(
			row.drawn,
			input.tasks.find((t) => t.id === row.taskId)!.questions,
			row.answers,
			row.passMark
		).perQuestion.map((q) => ({ attemptId: row.id, questionId: q.questionId, correct: q.correct }))
	);

	const records = [
		...signOffs.map((s) => ({ at: s.signedAt, signOff: s, change: null })),
		...changes.map((c) => ({ at: c.signedAt, signOff: null, change: c }))
	].sort((x, y) => x.at - y.at);
	const rows: SignOffRow[] = [];
	const audit: AuditRow[] = [];
	const made = new Map<PendingSignOff, SignOffRow>();
	let previousHash = start.previousHash;
	const chain = (
		kind: string,
		subject: string,
		actorId: string,
		signedAt: Date,
		content: Record<string, unknown>
	) => {
		const full = { ...content, kind, subject, actorId, at: signedAt.toISOString() };
		const hash = linkHash(previousHash, full);
		audit.push({
			id: start.auditId + audit.length,
			at: signedAt,
			actorId,
			kind,
			subject,
			content: canonicalJson(full),
			previousHash,
			hash
		});
		previousHash = hash;
	};

	for (const record of records) {
		const id = start.signOffId + rows.length;
		const signedAt = new Date(record.at);
		if (record.signOff) {
			const s = record.signOff;
			const quizAttemptId = attemptIds.get(s.attemptKey)!;
			const content = {
				supervisorId: s.supervisorId,
				apprenticeId: s.apprentice.id,
				taskCode: s.task.code,
				frameworkVersion: input.framework.version,
				level: s.level,
				results: s.results,
				verifiedTenths: s.verifiedTenths,
				quizAttemptId,
				signedAt: signedAt.toISOString(),
				sessionHash: SEED_SESSION_HASH,
				photos: [] as string[]
			};
			const row: SignOffRow = {
				id,
				kind: 'sign-off',
				apprenticeId: s.apprentice.id,
				taskId: s.task.id,
				frameworkId: input.framework.id,
				supervisorId: s.supervisorId,
				level: s.level,
				results: s.results,
				quizAttemptId,
				verifiedTenths: s.verifiedTenths,
				notes: s.notes,
				refersToId: null,
				reason: null,
				sessionHash: SEED_SESSION_HASH,
				contentHash: signatureDigest(content),
				signedAt
			};
			rows.push(row);
			made.set(s, row);
			chain('sign-off.made', `sign-off:${id}`, s.supervisorId, signedAt, {
				...content,
				contentHash: row.contentHash
			});
		} else if (record.change) {
			const c = record.change;
			const original = made.get(c.of)!;
			const by = input.coordinatorId!;
			const content = {
				kind: c.kind,
				refersTo: original.id,
				refersToHash: original.contentHash,
				level: c.level,
				reason: c.reason,
				by,
				signedAt: signedAt.toISOString()
			};
			rows.push({
				...original,
				id,
				kind: c.kind,
				supervisorId: by,
				level: c.level,
				results: null,
				notes: '',
				refersToId: original.id,
				reason: c.reason,
				contentHash: signatureDigest(content),
				signedAt
			});
			const event = c.kind === 'correction' ? 'sign-off.corrected' : 'sign-off.revoked';
			chain(event, `sign-off:${original.id}`, by, signedAt, content);
		}
	}
	return { attempts: attemptRows, responses, signOffs: rows, audit };
}

/** Every knowledge check, sign-off and audit event of the scenario, as rows ready to store. */
export function generateSignOffs(
	input: SignOffInput,
	start: ChainStart = EMPTY_START
): SignOffData {
	const tasks = [...input.tasks].sort((x, y) => x.code.localeCompare(y.code));
	const sorted = { ...input, tasks };
	const hours = new Map<string, Map<number, HoursOnTask>>();
	const work = [...input.work].sort((x, y) => x.reviewedAt - y.reviewedAt || x.taskId - y.taskId);
	for (const w of work) {
		let own = hours.get(w.apprenticeId);
		if (!own) hours.set(w.apprenticeId, (own = new Map()));
		let onTask = own.get(w.taskId);
		if (!onTask) own.set(w.taskId, (onTask = new HoursOnTask()));
		onTask.add(w.reviewedAt, w.tenths);
	}
	const attempts: PendingAttempt[] = [];
	const signOffs: PendingSignOff[] = [];
	const apprentices = [...input.apprentices].sort((x, y) => x.email.localeCompare(y.email));
	for (const a of apprentices) {
		const own = apprenticeRecords(a, sorted, hours.get(a.id) ?? new Map());
		attempts.push(...own.attempts);
		signOffs.push(...own.signOffs);
	}
	return seal(attempts, signOffs, coordinatorChanges(signOffs, sorted), sorted, start);
}

/* ---------- storing it ---------- */

const select = <T extends object>(sql: string) =>
	sequelize.query<T>(sql, { type: QueryTypes.SELECT });

/** Verified work read back as the generator needs it; SQLite dates are 'YYYY-MM-DD hh:mm:ss.sss +00:00'. */
export const sqliteTime = (text: string) =>
	Date.parse(text.replace(' ', 'T').replace(' +00:00', 'Z'));

/** The published framework's tasks with their checklists and question banks. */
export async function loadSignOffTasks(): Promise<{
	framework: { id: number; version: number };
	tasks: SignOffTask[];
} | null> {
	const [framework] = await select<{ id: number; version: number }>(
		`SELECT id, version FROM frameworks WHERE status = 'published' ORDER BY version DESC LIMIT 1`
	);
	if (!framework) return null;
	const [tasks, steps, questions] = await Promise.all([
		select<Omit<SignOffTask, 'steps' | 'questions'>>(
			`SELECT t.id, t.code, t.title, a.code AS area, t.tier, t.required_level AS "requiredLevel",
			        t.min_hours AS "minHours"
			   FROM framework_tasks t JOIN framework_areas a ON a.id = t.area_id
			  WHERE t.framework_id = ${framework.id}`
		),
		select<{ taskId: number; id: number; safety: number }>(
			`SELECT s.task_id AS "taskId", s.id, s.safety FROM task_steps s
			   JOIN framework_tasks t ON t.id = s.task_id
			  WHERE t.framework_id = ${framework.id} ORDER BY s.task_id, s.position`
		),
		select<{ taskId: number; id: number; options: string | BankQuestion['options'] }>(
			`SELECT q.task_id AS "taskId", q.id, q.options FROM task_questions q
			   JOIN framework_tasks t ON t.id = q.task_id
			  WHERE t.framework_id = ${framework.id} ORDER BY q.task_id, q.position`
		)
	]);
	return {
		framework,
		tasks: tasks.map((t) => ({
			...t,
			steps: steps.filter((s) => s.taskId === t.id).map((s) => ({ id: s.id, safety: !!s.safety })),
			questions: questions
				.filter((q) => q.taskId === t.id)
				.map((q) => ({
					id: q.id,
					// A JSON column: text from SQLite, already parsed by PostgreSQL.
					options: (typeof q.options === 'string'
						? JSON.parse(q.options)
						: q.options) as BankQuestion['options']
				}))
		}))
	};
}

/** The people, tasks and verified hours the generator needs, read from the seeded demo. */
export async function loadSignOffInput(today: Date): Promise<SignOffInput | null> {
	const current = await loadSignOffTasks();
	if (!current) return null;
	const [apprentices, supervisions, work, coordinators] = await Promise.all([
		select<{ id: string; email: string; startDate: string }>(
			`SELECT u.id, u.email, p.start_date AS "startDate"
			   FROM apprentice_profiles p JOIN users u ON u.id = p.user_id`
		),
		select<{ apprenticeId: string; id: string; email: string }>(
			`SELECT v.apprentice_id AS "apprenticeId", u.id, u.email
			   FROM supervisions v JOIN users u ON u.id = v.supervisor_id`
		),
		select<{ apprenticeId: string; taskId: number; tenths: number; reviewedAt: string }>(
			`SELECT e.apprentice_id AS "apprenticeId", lt.task_id AS "taskId", lt.tenths,
			        e.reviewed_at AS "reviewedAt"
			   FROM log_entry_tasks lt JOIN log_entries e ON e.id = lt.entry_id
			  WHERE e.status = 'verified' AND e.reviewed_at IS NOT NULL`
		),
		select<{ id: string }>(`SELECT id FROM users WHERE role = 'coordinator' ORDER BY email LIMIT 1`)
	]);
	return {
		today,
		...current,
		coordinatorId: coordinators[0]?.id ?? null,
		apprentices: apprentices.map((a) => ({
			...a,
			supervisors: supervisions
				.filter((s) => s.apprenticeId === a.id)
				.map((s) => ({ id: s.id, email: s.email }))
		})),
		work: work.map((w) => ({ ...w, reviewedAt: sqliteTime(w.reviewedAt) }))
	};
}

export interface SignOffCounts {
	attempts: number;
	signOffs: number;
	auditEvents: number;
}

const BATCH = 500;

/** Stores the generated records in one transaction; does nothing when sign-offs already exist. */
export async function seedSignOffs(today = new Date()): Promise<SignOffCounts | 'already seeded'> {
	if ((await SignOff.count()) > 0) return 'already seeded';
	const input = await loadSignOffInput(today);
	if (!input) return { attempts: 0, signOffs: 0, auditEvents: 0 };
	return write(async (transaction) => {
		const [next] = await sequelize.query<{ attempt: number; audit: number; hash: string | null }>(
			`SELECT (SELECT COALESCE(MAX(id), 0) + 1 FROM quiz_attempts) AS attempt,
			        (SELECT COALESCE(MAX(id), 0) + 1 FROM audit_events) AS audit,
			        (SELECT hash FROM audit_events ORDER BY id DESC LIMIT 1) AS hash`,
			{ type: QueryTypes.SELECT, transaction }
		);
		// The chain continues from whatever is already in it, in id order.
		const data = generateSignOffs(input, {
			attemptId: next.attempt,
			signOffId: 1,
			auditId: next.audit,
			previousHash: next.hash ?? GENESIS
		});
		const store = async <T extends object>(rows: T[], save: (batch: T[]) => Promise<unknown>) => {
			for (let i = 0; i < rows.length; i += BATCH) await save(rows.slice(i, i + BATCH));
		};
		await store(data.attempts, (b) => QuizAttempt.bulkCreate(b, { transaction }));
		await store(data.responses, (b) => QuizResponse.bulkCreate(b, { transaction }));
		await store(data.signOffs, (b) => SignOff.bulkCreate(b, { transaction }));
		await store(data.audit, (b) => AuditEvent.bulkCreate(b, { transaction }));
		await syncIdSequences(sequelize, transaction);
		return {
			attempts: data.attempts.length,
			signOffs: data.signOffs.length,
			auditEvents: data.audit.length
		};
	});
}
