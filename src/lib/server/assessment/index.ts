import { createHash, randomUUID } from 'node:crypto';
import { QueryTypes, type Transaction } from 'sequelize';
import * as audit from '../audit';
import type { SignedInUser } from '../auth';
import { config } from '../config';
import {
	QuizAttempt,
	QuizResponse,
	sequelize,
	SignOff,
	SignOffPhoto,
	SupervisorProfile,
	Task,
	TaskQuestion,
	TaskStep,
	User,
	write,
	type StepResult
} from '../db';
import { COUNTED, STANDING } from '../db/sql';
import * as framework from '../framework';
import * as mail from '../mail';
import { processUpload } from '../evidence';
import { verifyPassword } from '../password';
import { storage as evidenceStorage } from '../worklog/evidence';
import { EntryProblem } from '../worklog/errors';
import { supervises } from '../worklog/access';
import { signatureDigest, signOffProblems } from './gates';
import { itemStatistics } from './item-stats';
import { drawAttempt, forBrowser, QuizTampered, score } from './quiz';

/** Knowledge-check settings from the environment; defaults are common practice, no published source. */
export const QUIZ = {
	questions: config.QUIZ_QUESTIONS,
	passMark: config.QUIZ_PASS_MARK,
	retakeWaitHours: config.QUIZ_RETAKE_WAIT_HOURS,
	timeLimitMinutes: config.QUIZ_TIME_LIMIT_MINUTES
} as const;

const problem = (status: 400 | 403 | 404 | 409 | 429, form: string) =>
	new EntryProblem(status, { form });

async function currentTask(code: string) {
	const current = await framework.current();
	if (!current) throw problem(404, 'No competency framework is published yet.');
	const task = await Task.findOne({ where: { frameworkId: current.id, code } });
	if (!task) throw problem(404, `There is no task ${code} in the current framework.`);
	return { task, framework: current };
}

/** Verified hours an apprentice logged on a task, across framework versions (matched by code). */
export async function verifiedTenths(apprenticeId: string, code: string): Promise<number> {
	const [row] = await sequelize.query<{ tenths: number | null }>(
		`SELECT SUM(lt.tenths) AS tenths FROM log_entry_tasks lt
		   JOIN log_entries e ON e.id = lt.entry_id AND ${COUNTED}
		   JOIN framework_tasks t ON t.id = lt.task_id
		  WHERE e.apprentice_id = :apprenticeId AND t.code = :code`,
		{ type: QueryTypes.SELECT, replacements: { apprenticeId, code } }
	);
	return row?.tenths ?? 0;
}

async function latestPass(apprenticeId: string, code: string) {
	return QuizAttempt.findOne({
		where: { apprenticeId, passed: true },
		include: [{ model: Task, as: 'task', where: { code }, attributes: [] }],
		order: [['submittedAt', 'DESC']]
	});
}

/** Draws a knowledge check for a task; the browser gets prompts and options, never the answers. */
export async function startAttempt(user: SignedInUser, code: string) {
	if (user.role !== 'apprentice') throw problem(403, 'Only apprentices take knowledge checks.');
	const { task } = await currentTask(code);
	const lastFail = await QuizAttempt.findOne({
		where: { apprenticeId: user.id, passed: false },
		include: [{ model: Task, as: 'task', where: { code }, attributes: [] }],
		order: [['submittedAt', 'DESC']]
	});
	if (lastFail?.submittedAt) {
		const next = lastFail.submittedAt.getTime() + QUIZ.retakeWaitHours * 3_600_000;
		if (next > Date.now()) {
			const hours = Math.ceil((next - Date.now()) / 3_600_000);
			throw problem(
				429,
				`You can take this check again in about ${hours} h. Use the time to review the task card.`
			);
		}
	}
	const bank = await TaskQuestion.findAll({
		where: { taskId: task.id },
		order: [['position', 'ASC']]
	});
	if (bank.length === 0) throw problem(404, 'This task has no knowledge-check questions yet.');
	const drawn = drawAttempt(bank, QUIZ.questions, Math.random);
	const startedAt = new Date();
	const attempt = await write((transaction) =>
		QuizAttempt.create(
			{
				apprenticeId: user.id,
				taskId: task.id,
				drawn,
				passMark: QUIZ.passMark,
				answers: null,
				correct: null,
				total: drawn.length,
				percent: null,
				passed: null,
				startedAt,
				submittedAt: null
			},
			{ transaction }
		)
	);
	return {
		attemptId: attempt.id,
		task: { code: task.code, title: task.title },
		passMark: QUIZ.passMark,
		deadline: new Date(startedAt.getTime() + QUIZ.timeLimitMinutes * 60_000).toISOString(),
		questions: forBrowser(drawn, bank)
	};
}

/** Scores a submitted check on the server, stores it, and says what to review. */
export async function submitAttempt(
	user: SignedInUser,
	attemptId: number,
	answers: Record<string, number[]>
) {
	return write(async (transaction) => {
		const attempt = await QuizAttempt.findByPk(attemptId, { transaction });
		if (!attempt || attempt.apprenticeId !== user.id)
			throw problem(404, 'No such knowledge check.');
		if (attempt.submittedAt) throw problem(409, 'This check was already submitted.');
		// A minute of grace for a slow connection.
		const deadline = attempt.startedAt.getTime() + (QUIZ.timeLimitMinutes + 1) * 60_000;
		if (Date.now() > deadline)
			throw problem(409, 'The time for this check ran out. Start a new one.');
		const bank = await TaskQuestion.findAll({
			where: { id: attempt.drawn.map((d) => d.questionId) },
			transaction
		});
		let result;
		try {
			result = score(attempt.drawn, bank, answers, attempt.passMark);
		} catch (err) {
			if (err instanceof QuizTampered) throw problem(400, err.message);
			throw err;
		}
		await attempt.update(
			{
				answers,
				correct: result.correct,
				percent: result.percent,
				passed: result.passed,
				submittedAt: new Date()
			},
			{ transaction }
		);
		await QuizResponse.bulkCreate(
			result.perQuestion.map((q) => ({ attemptId, questionId: q.questionId, correct: q.correct })),
			{ transaction }
		);
		const missed = result.perQuestion
			.filter((q) => !q.correct)
			.map((q) => {
				const question = bank.find((b) => b.id === q.questionId)!;
				return { prompt: question.prompt, explanation: question.explanation };
			});
		return { ...result, passMark: attempt.passMark, missed };
	});
}

export interface SignOffInput {
	apprenticeId: string;
	code: string;
	level: 1 | 2 | 3 | 4;
	results: Record<string, StepResult>;
	notes: string;
	password: string;
}

/** The journeyworker's e-signed assessment, refused with every unmet gate listed. */
export interface PhotoUpload {
	bytes: Uint8Array;
	name: string;
}

export const MAX_SIGN_OFF_PHOTOS = 4;

export async function signOff(
	user: SignedInUser,
	input: SignOffInput,
	sessionId: string,
	photos: PhotoUpload[] = []
) {
	if (user.role !== 'supervisor') throw problem(403, 'Only journeyworkers sign tasks off.');
	const account = await User.findByPk(user.id, { attributes: ['passwordHash'] });
	if (!account?.passwordHash || !(await verifyPassword(account.passwordHash, input.password))) {
		throw new EntryProblem(403, { password: 'That password is not right; nothing was signed.' });
	}
	const { task, framework: version } = await currentTask(input.code);
	const [steps, tenths, pass, assigned, profile, apprentice] = await Promise.all([
		TaskStep.findAll({ where: { taskId: task.id }, order: [['position', 'ASC']] }),
		verifiedTenths(input.apprenticeId, input.code),
		latestPass(input.apprenticeId, input.code),
		supervises(user.id, input.apprenticeId),
		SupervisorProfile.findByPk(user.id),
		User.findOne({ where: { id: input.apprenticeId, role: 'apprentice', active: true } })
	]);
	if (!apprentice) throw problem(404, 'No such apprentice.');
	const errors = signOffProblems({
		level: input.level,
		requiredLevel: task.requiredLevel,
		minHours: task.minHours,
		verifiedTenths: tenths,
		quizPassed: Boolean(pass),
		checklist: steps.map((s) => ({ stepId: s.id, safety: s.safety })),
		results: input.results,
		supervisorAssigned: assigned,
		supervisorQualified: Boolean(profile?.qualification),
		selfSignOff: user.id === input.apprenticeId
	});
	if (Object.keys(errors).length) throw new EntryProblem(400, errors);
	if (photos.length > MAX_SIGN_OFF_PHOTOS) {
		throw new EntryProblem(400, { photos: `Attach at most ${MAX_SIGN_OFF_PHOTOS} photos.` });
	}
	const processed = [];
	for (const photo of photos) {
		const result = await processUpload(photo.bytes, photo.name);
		if (!result.ok) throw new EntryProblem(result.status, { photos: result.message });
		if (result.kind !== 'image') throw new EntryProblem(415, { photos: 'Attach photos only.' });
		processed.push({ ...result, sha256: createHash('sha256').update(result.bytes).digest('hex') });
	}

	const signedAt = new Date();
	const sessionHash = createHash('sha256').update(sessionId).digest('hex');
	const content = {
		supervisorId: user.id,
		apprenticeId: input.apprenticeId,
		taskCode: task.code,
		frameworkVersion: version.version,
		level: input.level,
		results: input.results,
		verifiedTenths: tenths,
		quizAttemptId: pass!.id,
		signedAt: signedAt.toISOString(),
		sessionHash,
		photos: processed.map((p) => p.sha256)
	};
	const store = evidenceStorage();
	const stored = await Promise.all(
		processed.map(async (p) => {
			const storageKey = `sign-offs/${randomUUID()}`;
			const thumbnailKey = p.thumbnail ? `thumbs/${randomUUID()}` : null;
			await store.put(storageKey, p.bytes, p.mime);
			if (thumbnailKey && p.thumbnail) await store.put(thumbnailKey, p.thumbnail, 'image/webp');
			return { storageKey, thumbnailKey, mime: p.mime, bytes: p.bytes.length, sha256: p.sha256 };
		})
	);
	const removeStored = () =>
		Promise.all(
			stored.flatMap((p) => [
				store.delete(p.storageKey),
				...(p.thumbnailKey ? [store.delete(p.thumbnailKey)] : [])
			])
		);
	// Nothing half-stored: the photo files go again when the sign-off is refused.
	const record = await write(async (transaction) => {
		const current = await currentLevels(input.apprenticeId, transaction);
		const held = current.get(task.code);
		if (held && held.level >= input.level) {
			throw problem(
				409,
				`Already signed off at level ${held.level} on ${held.signedAt.slice(0, 10)}.`
			);
		}
		const row = await SignOff.create(
			{
				kind: 'sign-off',
				apprenticeId: input.apprenticeId,
				taskId: task.id,
				frameworkId: version.id,
				supervisorId: user.id,
				level: input.level,
				results: input.results,
				quizAttemptId: pass!.id,
				verifiedTenths: tenths,
				notes: input.notes,
				refersToId: null,
				reason: null,
				sessionHash,
				contentHash: signatureDigest(content),
				signedAt
			},
			{ transaction }
		);
		await SignOffPhoto.bulkCreate(
			stored.map((p) => ({ ...p, signOffId: row.id })),
			{ transaction }
		);
		await audit.append(transaction, {
			kind: 'sign-off.made',
			subject: `sign-off:${row.id}`,
			actorId: user.id,
			content: { ...content, contentHash: row.contentHash }
		});
		return row;
	}).catch(async (err) => {
		await removeStored();
		throw err;
	});
	return {
		id: record.id,
		contentHash: record.contentHash,
		signedAt: record.signedAt.toISOString(),
		photos: stored.length
	};
}

/** A coordinator revokes or corrects a sign-off with a new record that points back to it. */
export async function revoke(
	user: SignedInUser,
	signOffId: number,
	input: { reason: string; correctedLevel?: 1 | 2 | 3 | 4 }
) {
	if (user.role !== 'coordinator')
		throw problem(403, 'Only coordinators revoke or correct sign-offs.');
	return write(async (transaction) => {
		const original = await SignOff.findByPk(signOffId, { transaction });
		if (!original || original.kind === 'revocation') throw problem(404, 'No such sign-off.');
		if (await SignOff.count({ where: { refersToId: signOffId }, transaction })) {
			throw problem(409, 'This sign-off was already revoked or corrected.');
		}
		const kind = input.correctedLevel ? 'correction' : 'revocation';
		const signedAt = new Date();
		const content = {
			kind,
			refersTo: original.id,
			refersToHash: original.contentHash,
			level: input.correctedLevel ?? null,
			reason: input.reason,
			by: user.id,
			signedAt: signedAt.toISOString()
		};
		const row = await SignOff.create(
			{
				kind,
				apprenticeId: original.apprenticeId,
				taskId: original.taskId,
				frameworkId: original.frameworkId,
				supervisorId: user.id,
				level: input.correctedLevel ?? null,
				results: null,
				quizAttemptId: original.quizAttemptId,
				verifiedTenths: original.verifiedTenths,
				notes: '',
				refersToId: original.id,
				reason: input.reason,
				sessionHash: original.sessionHash,
				contentHash: signatureDigest(content),
				signedAt
			},
			{ transaction }
		);
		await audit.append(transaction, {
			kind: kind === 'correction' ? 'sign-off.corrected' : 'sign-off.revoked',
			subject: `sign-off:${original.id}`,
			actorId: user.id,
			content
		});
		return { id: row.id, kind };
	});
}

/** The level each task stands at: the highest sign-off or correction nothing later replaced. */
export async function currentLevels(apprenticeId: string, transaction?: Transaction) {
	const rows = await sequelize.query<{
		code: string;
		level: 1 | 2 | 3 | 4;
		signedAt: string | Date;
	}>(
		`SELECT t.code, MAX(s.level) AS level, MAX(s.signed_at) AS "signedAt"
		   FROM sign_offs s JOIN framework_tasks t ON t.id = s.task_id
		  WHERE s.apprentice_id = :apprenticeId AND ${STANDING}
		  GROUP BY t.code`,
		{ type: QueryTypes.SELECT, replacements: { apprenticeId }, transaction }
	);
	return new Map(rows.map((r) => [r.code, { level: r.level, signedAt: String(r.signedAt) }]));
}

/** Asks a journeyworker to assess a task once the hours and a passing check are on file. */
export async function requestSignOff(user: SignedInUser, code: string, supervisorId: string) {
	if (user.role !== 'apprentice') throw problem(403, 'Only apprentices ask for sign-off.');
	const { task } = await currentTask(code);
	const [tenths, pass, assigned, supervisor] = await Promise.all([
		verifiedTenths(user.id, code),
		latestPass(user.id, code),
		supervises(supervisorId, user.id),
		User.findByPk(supervisorId, { attributes: ['email', 'name'] })
	]);
	const errors: Record<string, string> = {};
	if (tenths < Math.round(task.minHours * 10)) {
		errors.form = `This task needs ${task.minHours} h of verified hours first; you have ${(tenths / 10).toFixed(1)} h.`;
	} else if (!pass) {
		errors.form = 'Pass the knowledge check for this task first.';
	}
	if (!assigned || !supervisor) errors.supervisorId = 'Choose one of your journeyworkers.';
	if (Object.keys(errors).length) throw new EntryProblem(400, errors);
	await mail.send({
		to: supervisor!.email,
		subject: `Sign-off requested: ${task.code} ${task.title}`,
		text: [
			`Hello ${supervisor!.name},`,
			'',
			`${user.name} asks you to assess ${task.code} "${task.title}".`,
			`Verified hours on this task: ${(tenths / 10).toFixed(1)} h (minimum ${task.minHours} h). Knowledge check passed (${pass!.percent} %).`,
			'',
			'Open the sign-off form beside the vehicle:',
			mail.link(`/supervisor/sign-off/${user.id}/${task.code}`)
		].join('\n')
	});
}

export interface MatrixCell {
	code: string;
	title: string;
	areaCode: string;
	areaName: string;
	tier: 1 | 2 | 3;
	requiredLevel: 1 | 2 | 3 | 4;
	minHours: number;
	verifiedTenths: number;
	level: 1 | 2 | 3 | 4 | null;
	lastAssessed: string | null;
	quizPassed: number;
}

/** Areas × tasks of the current framework for one apprentice, in one query. */
export async function matrix(apprenticeId: string): Promise<MatrixCell[]> {
	const current = await framework.current();
	if (!current) return [];
	return sequelize.query<MatrixCell>(
		`WITH hours AS (
		   SELECT t.code, SUM(lt.tenths) AS tenths FROM log_entry_tasks lt
		     JOIN log_entries e ON e.id = lt.entry_id AND e.apprentice_id = :apprenticeId AND ${COUNTED}
		     JOIN framework_tasks t ON t.id = lt.task_id GROUP BY t.code),
		 levels AS (
		   SELECT t.code, MAX(s.level) AS level, MAX(s.signed_at) AS "lastAssessed" FROM sign_offs s
		     JOIN framework_tasks t ON t.id = s.task_id
		    WHERE s.apprentice_id = :apprenticeId AND ${STANDING}
		    GROUP BY t.code),
		 quiz AS (
		   SELECT t.code, MAX(CASE WHEN q.passed THEN 1 ELSE 0 END) AS passed FROM quiz_attempts q JOIN framework_tasks t ON t.id = q.task_id
		    WHERE q.apprentice_id = :apprenticeId AND q.submitted_at IS NOT NULL GROUP BY t.code)
		 SELECT t.code, t.title, a.code AS "areaCode", a.name AS "areaName", t.tier,
		        t.required_level AS "requiredLevel", t.min_hours AS "minHours",
		        COALESCE(h.tenths, 0) AS "verifiedTenths", l.level, l."lastAssessed",
		        COALESCE(qz.passed, 0) AS "quizPassed"
		   FROM framework_tasks t JOIN framework_areas a ON a.id = t.area_id
		   LEFT JOIN hours h ON h.code = t.code LEFT JOIN levels l ON l.code = t.code
		   LEFT JOIN quiz qz ON qz.code = t.code
		  WHERE t.framework_id = :frameworkId ORDER BY a.position, t.position`,
		{ type: QueryTypes.SELECT, replacements: { apprenticeId, frameworkId: current.id } }
	);
}

/** Every record behind one task's level, oldest first. */
export async function history(apprenticeId: string, code: string) {
	return sequelize.query<{
		id: number;
		kind: string;
		level: number | null;
		by: string;
		signedAt: string;
		reason: string | null;
		refersToId: number | null;
		contentHash: string;
		frameworkVersion: number;
	}>(
		`SELECT s.id, s.kind, s.level, u.name AS by, s.signed_at AS "signedAt", s.reason,
		        s.refers_to_id AS "refersToId", s.content_hash AS "contentHash", f.version AS "frameworkVersion"
		   FROM sign_offs s JOIN framework_tasks t ON t.id = s.task_id JOIN users u ON u.id = s.supervisor_id
		   JOIN frameworks f ON f.id = s.framework_id
		  WHERE s.apprentice_id = :apprenticeId AND t.code = :code ORDER BY s.id`,
		{ type: QueryTypes.SELECT, replacements: { apprenticeId, code } }
	);
}

/** Difficulty and discrimination per question of one task's bank, from every submitted attempt. */
export async function questionStatistics(code: string) {
	const { task } = await currentTask(code);
	const [questions, responses] = await Promise.all([
		TaskQuestion.findAll({
			where: { taskId: task.id },
			order: [['position', 'ASC']],
			attributes: ['id', 'prompt']
		}),
		sequelize.query<{ attemptId: number; questionId: number; correct: number }>(
			`SELECT r.attempt_id AS "attemptId", r.question_id AS "questionId", r.correct
			   FROM quiz_responses r JOIN task_questions q ON q.id = r.question_id
			   JOIN framework_tasks t ON t.id = q.task_id WHERE t.code = :code`,
			{ type: QueryTypes.SELECT, replacements: { code } }
		)
	]);
	const stats = new Map(
		itemStatistics(responses.map((r) => ({ ...r, correct: Boolean(r.correct) }))).map((s) => [
			s.questionId,
			s
		])
	);
	return {
		task: { code: task.code, title: task.title },
		questions: questions.map((q) => ({
			id: q.id,
			prompt: q.prompt,
			stats: stats.get(q.id) ?? null
		}))
	};
}
