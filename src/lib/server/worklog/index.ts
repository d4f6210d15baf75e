import { Op, type Transaction } from 'sequelize';
import type { EntryInput } from '$lib/schemas/worklog';
import * as audit from '../audit';
import type { SignedInUser } from '../auth';
import {
	ApprenticeProfile,
	Evidence,
	Framework,
	LogEntry,
	LogEntryTask,
	Supervision,
	Task,
	User,
	write
} from '../db';
import * as mail from '../mail';
import { supervises } from './access';
import { EntryProblem, notFound } from './errors';
import { ruleErrors } from './rules';

export { EntryProblem } from './errors';
export { canView } from './access';
export * as queries from './queries';
export * as rti from './rti';
export { sendReviewDigests } from './digest';
export {
	attach,
	read as readEvidence,
	storage as evidenceStorage,
	MAX_UPLOAD_BYTES
} from './evidence';

type Intent = 'draft' | 'submit';

/** Checks an entry against the log rules (a correction is not compared with the entry it replaces). */
async function prepare(
	apprenticeId: string,
	input: EntryInput,
	transaction: Transaction,
	excludeId?: number
) {
	const [profile, tasks, supervisorOk, sameDay] = await Promise.all([
		ApprenticeProfile.findByPk(apprenticeId, { transaction }),
		Task.findAll({
			where: { id: input.tasks.map((t) => t.taskId) },
			include: [{ model: Framework, as: 'framework', attributes: ['status'] }],
			transaction
		}),
		supervises(input.supervisorId, apprenticeId, transaction),
		LogEntry.findAll({
			where: {
				apprenticeId,
				workDate: input.workDate,
				...(excludeId ? { id: { [Op.ne]: excludeId } } : {})
			},
			attributes: ['id', 'repairOrder', 'startTime', 'endTime', 'tenths'],
			transaction
		})
	]);
	if (!profile) throw new EntryProblem(403, { form: 'Only apprentices log hours.' });

	const known = new Set(
		tasks
			.filter((t) => (t as Task & { framework: Framework }).framework.status === 'published')
			.map((t) => t.id)
	);
	const { errors, tenths, splits } = ruleErrors(input, {
		today: new Date().toISOString().slice(0, 10),
		earliest: profile.startDate,
		sameDay: sameDay.map((e) => ({
			id: e.id,
			repairOrder: e.repairOrder,
			startTime: e.startTime,
			endTime: e.endTime,
			tenths: e.tenths
		}))
	});
	input.tasks.forEach((t, i) => {
		if (!known.has(t.taskId))
			errors[`tasks.${i}.taskId`] ??= 'That task is not in the current framework.';
	});
	if (!supervisorOk) {
		errors.supervisorId = 'Choose one of the journeyworkers assigned to you.';
	}
	if (Object.keys(errors).length) throw new EntryProblem(400, errors);

	const row = {
		apprenticeId,
		supervisorId: input.supervisorId,
		workDate: input.workDate,
		startTime: input.startTime ?? null,
		endTime: input.endTime ?? null,
		tenths,
		repairOrder: input.repairOrder.toUpperCase(),
		vehicleYear: input.vehicleYear ?? null,
		vehicleMake: input.vehicleMake,
		vehicleModel: input.vehicleModel,
		vin: input.vin ? input.vin.replace(/[\s-]/g, '').toUpperCase() : null,
		vinCheckOverridden: input.vinOverride,
		odometer: input.odometer ?? null,
		odometerUnit: input.odometerUnit,
		standardTenths: input.standardHours ? Math.round(input.standardHours * 10) : null,
		notes: input.notes
	};
	return { row, splits };
}

async function replaceTasks(
	entryId: number,
	splits: { taskId: number; tenths: number }[],
	transaction: Transaction
) {
	await LogEntryTask.destroy({ where: { entryId }, transaction });
	await LogEntryTask.bulkCreate(
		splits.map((s) => ({ entryId, ...s })),
		{ transaction }
	);
}

const submitted = (intent: Intent) =>
	intent === 'submit' ? { status: 'submitted' as const, submittedAt: new Date() } : {};

/** Logs a new entry (or a correction of a verified one) for the signed-in apprentice. */
export async function create(
	user: SignedInUser,
	input: EntryInput,
	intent: Intent,
	correctsId?: number
): Promise<LogEntry> {
	if (user.role !== 'apprentice')
		throw new EntryProblem(403, { form: 'Only apprentices log hours.' });
	return write(async (transaction) => {
		if (correctsId) {
			const original = await LogEntry.findByPk(correctsId, { transaction });
			if (!original || original.apprenticeId !== user.id) throw notFound();
			if (original.status !== 'verified') {
				throw new EntryProblem(409, {
					form: 'Only verified entries need a correction; edit this one instead.'
				});
			}
		}
		const { row, splits } = await prepare(user.id, input, transaction, correctsId);
		const entry = await LogEntry.create(
			{
				...row,
				status: 'draft',
				returnComment: null,
				submittedAt: null,
				reviewedAt: null,
				reviewedById: null,
				correctsId: correctsId ?? null,
				...submitted(intent)
			},
			{ transaction }
		);
		await replaceTasks(entry.id, splits, transaction);
		return entry;
	});
}

/** Changes a draft or returned entry; verified entries never change. */
export async function update(
	user: SignedInUser,
	id: number,
	input: EntryInput,
	intent: Intent
): Promise<LogEntry> {
	return write(async (transaction) => {
		const entry = await LogEntry.findByPk(id, { transaction });
		if (!entry || entry.apprenticeId !== user.id) throw notFound();
		if (entry.status === 'verified') {
			throw new EntryProblem(409, {
				form: 'Verified entries cannot change. Log a correction that points to this entry instead.'
			});
		}
		const { row, splits } = await prepare(user.id, input, transaction, id);
		await entry.update({ ...row, ...submitted(intent) }, { transaction });
		await replaceTasks(id, splits, transaction);
		return entry;
	});
}

export async function submit(user: SignedInUser, id: number): Promise<void> {
	await write(async (transaction) => {
		const entry = await LogEntry.findByPk(id, { transaction });
		if (!entry || entry.apprenticeId !== user.id) throw notFound();
		if (entry.status !== 'draft' && entry.status !== 'returned') {
			throw new EntryProblem(409, { form: `This entry is already ${entry.status}.` });
		}
		await entry.update({ status: 'submitted', submittedAt: new Date() }, { transaction });
	});
}

/** Deletes a draft (never a submitted or verified entry) with its evidence rows. */
export async function discard(user: SignedInUser, id: number): Promise<string[]> {
	return write(async (transaction) => {
		const entry = await LogEntry.findByPk(id, { transaction });
		if (!entry || entry.apprenticeId !== user.id) throw notFound();
		if (entry.status !== 'draft') {
			throw new EntryProblem(409, { form: 'Only drafts can be deleted.' });
		}
		const evidence = await Evidence.findAll({ where: { entryId: id }, transaction });
		await entry.destroy({ transaction });
		return evidence.flatMap((e) => [e.storageKey, ...(e.thumbnailKey ? [e.thumbnailKey] : [])]);
	});
}

export interface ReviewResult {
	verified: number[];
	refused: { id: number; reason: string }[];
}

/** A journeyworker verifies submitted entries of apprentices they supervise. */
export async function verify(user: SignedInUser, ids: number[]): Promise<ReviewResult> {
	if (user.role !== 'supervisor') {
		throw new EntryProblem(403, { form: 'Only journeyworkers verify hours.' });
	}
	return write(async (transaction) => {
		const [entries, supervisions] = await Promise.all([
			LogEntry.findAll({ where: { id: ids }, transaction }),
			Supervision.findAll({
				where: { supervisorId: user.id },
				attributes: ['apprenticeId'],
				transaction
			})
		]);
		// One lookup of whom this journeyworker supervises, not one per entry.
		const mine = new Set(supervisions.map((s) => s.apprenticeId).filter((id) => id !== user.id));
		const result: ReviewResult = { verified: [], refused: [] };
		for (const id of ids) {
			const entry = entries.find((e) => e.id === id);
			if (!entry || !mine.has(entry.apprenticeId)) {
				result.refused.push({ id, reason: 'Not an entry of an apprentice you supervise.' });
			} else if (entry.status !== 'submitted') {
				result.refused.push({
					id,
					reason: `This entry is ${entry.status}, not waiting for review.`
				});
			} else {
				await entry.update(
					{
						status: 'verified',
						reviewedAt: new Date(),
						reviewedById: user.id,
						returnComment: null
					},
					{ transaction }
				);
				await audit.append(transaction, {
					kind: 'hours.verified',
					subject: `log-entry:${id}`,
					actorId: user.id,
					content: {
						apprenticeId: entry.apprenticeId,
						workDate: entry.workDate,
						tenths: entry.tenths,
						repairOrder: entry.repairOrder
					}
				});
				result.verified.push(id);
			}
		}
		return result;
	});
}

/** Sends an entry back to the apprentice with a comment, and tells them by e-mail. */
export async function giveBack(user: SignedInUser, id: number, comment: string): Promise<void> {
	if (user.role !== 'supervisor') {
		throw new EntryProblem(403, { form: 'Only journeyworkers return hours.' });
	}
	const entry = await write(async (transaction) => {
		const entry = await LogEntry.findByPk(id, {
			include: [{ model: User, as: 'apprentice', attributes: ['email', 'name'] }],
			transaction
		});
		if (!entry || !(await supervises(user.id, entry.apprenticeId, transaction))) throw notFound();
		if (entry.status !== 'submitted') {
			throw new EntryProblem(409, {
				form: `This entry is ${entry.status}, not waiting for review.`
			});
		}
		await entry.update(
			{ status: 'returned', returnComment: comment, reviewedAt: new Date(), reviewedById: user.id },
			{ transaction }
		);
		await audit.append(transaction, {
			kind: 'hours.returned',
			subject: `log-entry:${id}`,
			actorId: user.id,
			content: { apprenticeId: entry.apprenticeId, comment }
		});
		return entry as LogEntry & { apprentice: User };
	});
	await mail.send({
		to: entry.apprentice.email,
		subject: `Hours returned: RO ${entry.repairOrder} on ${entry.workDate}`,
		text: [
			`Hello ${entry.apprentice.name},`,
			'',
			`${user.name} returned your entry for repair order ${entry.repairOrder} (${entry.workDate}, ${(entry.tenths / 10).toFixed(1)} h) with this comment:`,
			'',
			`  ${comment}`,
			'',
			'Fix it and submit it again:',
			mail.link(`/apprentice/log/${entry.id}`)
		].join('\n')
	});
}

/** One entry with its task split and evidence, for people allowed to see it. */
export async function detail(id: number) {
	const [entry] = await details([id]);
	return entry ?? null;
}

/** Several entries in full with one query, in the order of `ids` (unknown ids are left out). */
export async function details(ids: number[]) {
	const rows = await LogEntry.findAll({
		where: { id: ids },
		include: [
			{ model: User, as: 'apprentice', attributes: ['id', 'name'] },
			{ model: User, as: 'supervisor', attributes: ['id', 'name'] },
			{ model: User, as: 'reviewedBy', attributes: ['id', 'name'] },
			{
				model: LogEntryTask,
				as: 'tasks',
				include: [{ model: Task, as: 'task', attributes: ['id', 'code', 'title'] }]
			},
			{
				model: Evidence,
				as: 'evidence',
				attributes: ['id', 'kind', 'mime', 'bytes', 'originalName', 'thumbnailKey', 'createdAt']
			}
		],
		order: [
			[{ model: LogEntryTask, as: 'tasks' }, 'id', 'ASC'],
			[{ model: Evidence, as: 'evidence' }, 'id', 'ASC']
		]
	});
	const byId = new Map(rows.map((r) => [r.id, r]));
	return ids.flatMap((id) => {
		const row = byId.get(id);
		return row ? [shape(row)] : [];
	});
}

function shape(entry: LogEntry) {
	const e = entry as LogEntry & {
		apprentice: User;
		supervisor: User;
		reviewedBy: User | null;
		tasks: (LogEntryTask & { task: Task })[];
		evidence: Evidence[];
	};
	return {
		id: e.id,
		apprenticeId: e.apprenticeId,
		apprenticeName: e.apprentice.name,
		supervisorId: e.supervisorId,
		supervisorName: e.supervisor.name,
		reviewedByName: e.reviewedBy?.name ?? null,
		workDate: e.workDate,
		startTime: e.startTime,
		endTime: e.endTime,
		tenths: e.tenths,
		repairOrder: e.repairOrder,
		vehicleYear: e.vehicleYear,
		vehicleMake: e.vehicleMake,
		vehicleModel: e.vehicleModel,
		vin: e.vin,
		vinCheckOverridden: e.vinCheckOverridden,
		odometer: e.odometer,
		odometerUnit: e.odometerUnit,
		standardTenths: e.standardTenths,
		notes: e.notes,
		status: e.status,
		returnComment: e.returnComment,
		submittedAt: e.submittedAt?.toISOString() ?? null,
		reviewedAt: e.reviewedAt?.toISOString() ?? null,
		correctsId: e.correctsId,
		tasks: e.tasks.map((t) => ({
			taskId: t.taskId,
			code: t.task.code,
			title: t.task.title,
			tenths: t.tenths
		})),
		evidence: e.evidence.map((v) => ({
			id: v.id,
			kind: v.kind,
			mime: v.mime,
			bytes: v.bytes,
			name: v.originalName,
			hasThumbnail: Boolean(v.thumbnailKey)
		}))
	};
}

export type EntryDetail = ReturnType<typeof shape>;
