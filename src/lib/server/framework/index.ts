import { Op, QueryTypes, type Transaction } from 'sequelize';
import type { FrameworkDef } from '$lib/framework/schema';
import type { AreaDef, TaskDef } from '$lib/framework/types';
import { fromSI, toSI } from '$lib/units';
import {
	Area,
	Framework,
	sequelize,
	Task,
	TaskQuestion,
	TaskSpec,
	TaskStep,
	write,
	type FrameworkStatus
} from '../db';
import { DEFAULT_FRAMEWORK } from './default';

export class FrameworkError extends Error {}

/** Back from SI without float noise: 140 lbf·ft stays 140, not 140.00000000000003. */
const entered = (valueSi: number, unit: TaskDef['specs'][number]['unit']) =>
	Math.round(fromSI(valueSi, unit) * 1e6) / 1e6;

/** Writes a whole definition as one framework version, inside the caller's transaction. */
export async function insert(
	def: FrameworkDef,
	meta: {
		version: number;
		status: FrameworkStatus;
		basedOnId?: number | null;
		createdById?: string | null;
	},
	transaction: Transaction
): Promise<Framework> {
	const framework = await Framework.create(
		{
			name: def.name,
			version: meta.version,
			status: meta.status,
			basedOnId: meta.basedOnId ?? null,
			createdById: meta.createdById ?? null,
			publishedAt: meta.status === 'published' ? new Date() : null
		},
		{ transaction }
	);
	await fill(framework.id, def.areas, transaction);
	return framework;
}

async function fill(frameworkId: number, areas: AreaDef[], transaction: Transaction) {
	const areaRows = await Area.bulkCreate(
		areas.map((a, position) => ({ frameworkId, code: a.code, name: a.name, position })),
		{ transaction }
	);
	const taskInput = areas.flatMap((a, i) =>
		a.tasks.map((t, position) => ({ def: t, areaId: areaRows[i].id, position }))
	);
	const taskRows = await Task.bulkCreate(
		taskInput.map(({ def: t, areaId, position }) => ({
			frameworkId,
			areaId,
			position,
			code: t.code,
			title: t.title,
			description: t.description,
			tier: t.tier,
			requiredLevel: t.requiredLevel,
			minHours: t.minHours,
			tools: t.tools,
			cautions: t.cautions,
			serviceInfo: t.serviceInfo
		})),
		{ transaction }
	);
	const each = <T>(pick: (t: TaskDef, taskId: number) => T[]) =>
		taskInput.flatMap(({ def }, i) => pick(def, taskRows[i].id));
	await TaskStep.bulkCreate(
		each((t, taskId) =>
			t.checklist.map((s, position) => ({
				taskId,
				position,
				text: s.text,
				safety: Boolean(s.safety)
			}))
		),
		{ transaction }
	);
	await TaskSpec.bulkCreate(
		each((t, taskId) =>
			t.specs.map((s, position) => ({
				taskId,
				position,
				label: s.label,
				valueSi: toSI(s.value, s.unit),
				unit: s.unit,
				limitKind: s.limit
			}))
		),
		{ transaction }
	);
	await TaskQuestion.bulkCreate(
		each((t, taskId) =>
			t.questions.map((q, position) => ({
				taskId,
				position,
				prompt: q.prompt,
				explanation: q.explanation,
				options: q.options
			}))
		),
		{ transaction }
	);
}

/** The definition stored for one version: five queries whatever its size. */
export async function definition(
	frameworkId: number,
	transaction?: Transaction
): Promise<FrameworkDef> {
	const framework = await Framework.findByPk(frameworkId, { rejectOnEmpty: true, transaction });
	const byPosition = { order: [['position', 'ASC']] as [string, string][], transaction };
	const areas = await Area.findAll({ where: { frameworkId }, ...byPosition });
	const tasks = await Task.findAll({ where: { frameworkId }, ...byPosition });
	const taskIds = tasks.map((t) => t.id);
	const [steps, specs, questions] = await Promise.all([
		TaskStep.findAll({ where: { taskId: taskIds }, ...byPosition }),
		TaskSpec.findAll({ where: { taskId: taskIds }, ...byPosition }),
		TaskQuestion.findAll({ where: { taskId: taskIds }, ...byPosition })
	]);
	const group = <T extends { taskId: number }>(rows: T[]) => {
		const map = new Map<number, T[]>();
		for (const row of rows) map.set(row.taskId, [...(map.get(row.taskId) ?? []), row]);
		return map;
	};
	const [stepsBy, specsBy, questionsBy] = [group(steps), group(specs), group(questions)];
	return {
		name: framework.name,
		areas: areas.map((a) => ({
			code: a.code,
			name: a.name,
			tasks: tasks
				.filter((t) => t.areaId === a.id)
				.map((t) => ({
					code: t.code,
					title: t.title,
					description: t.description,
					tier: t.tier,
					requiredLevel: t.requiredLevel,
					minHours: t.minHours,
					checklist: (stepsBy.get(t.id) ?? []).map((s) =>
						s.safety ? { text: s.text, safety: true } : { text: s.text }
					),
					specs: (specsBy.get(t.id) ?? []).map((s) => ({
						label: s.label,
						value: entered(s.valueSi, s.unit),
						unit: s.unit,
						limit: s.limitKind
					})),
					tools: t.tools,
					cautions: t.cautions,
					serviceInfo: t.serviceInfo,
					questions: (questionsBy.get(t.id) ?? []).map((q) => ({
						prompt: q.prompt,
						options: q.options,
						explanation: q.explanation
					}))
				}))
		}))
	};
}

/** Loads the default framework as version 1, published, when there is no framework yet. */
export async function ensureDefault(): Promise<void> {
	await write(async (transaction) => {
		if ((await Framework.count({ transaction })) > 0) return;
		await insert(DEFAULT_FRAMEWORK, { version: 1, status: 'published' }, transaction);
	});
}

export interface FrameworkSummary {
	id: number;
	name: string;
	version: number;
	status: FrameworkStatus;
	publishedAt: string | null;
	basedOnId: number | null;
	areas: number;
	tasks: number;
}

export async function list(): Promise<FrameworkSummary[]> {
	return sequelize.query<FrameworkSummary>(
		`SELECT f.id, f.name, f.version, f.status, f.published_at AS "publishedAt", f.based_on_id AS "basedOnId",
		        (SELECT COUNT(*) FROM framework_areas a WHERE a.framework_id = f.id) AS areas,
		        (SELECT COUNT(*) FROM framework_tasks t WHERE t.framework_id = f.id) AS tasks
		   FROM frameworks f ORDER BY f.name, f.version DESC`,
		{ type: QueryTypes.SELECT }
	);
}

/** The published version people work against (the newest, if several). */
export async function current(): Promise<Framework | null> {
	return Framework.findOne({ where: { status: 'published' }, order: [['version', 'DESC']] });
}

/**
 * Editing starts from a published version: this returns the open draft that follows it,
 * making one (a full copy, version + 1) when there is none.
 */
export async function draftFrom(frameworkId: number, userId: string): Promise<Framework> {
	const def = await definition(frameworkId);
	return write(async (transaction) => {
		const base = await Framework.findByPk(frameworkId, { rejectOnEmpty: true, transaction });
		if (base.status === 'draft') return base;
		const open = await Framework.findOne({
			where: { name: base.name, status: 'draft' },
			transaction
		});
		if (open) return open;
		const latest =
			(await Framework.max<number, Framework>('version', {
				where: { name: base.name },
				transaction
			})) ?? 0;
		return insert(
			def,
			{ version: latest + 1, status: 'draft', basedOnId: base.id, createdById: userId },
			transaction
		);
	});
}

/** Replaces everything in a draft with `def`, all or nothing. Published versions refuse. */
export async function replaceDraft(frameworkId: number, def: FrameworkDef): Promise<void> {
	await write(async (transaction) => {
		const framework = await Framework.findByPk(frameworkId, { rejectOnEmpty: true, transaction });
		if (framework.status !== 'draft') {
			throw new FrameworkError(
				`Version ${framework.version} is ${framework.status} and cannot change. Start a new draft to edit it.`
			);
		}
		await Area.destroy({ where: { frameworkId }, transaction });
		// The name ties versions together (publishing retires the same name), so a draft keeps it.
		await framework.changed('updatedAt', true);
		await framework.save({ transaction });
		await fill(frameworkId, def.areas, transaction);
	});
}

/** Publishes a draft: it becomes the version people work against; the previous one retires. */
export async function publish(frameworkId: number): Promise<void> {
	await write(async (transaction) => {
		const framework = await Framework.findByPk(frameworkId, { rejectOnEmpty: true, transaction });
		if (framework.status !== 'draft') throw new FrameworkError('Only a draft can be published.');
		if ((await Task.count({ where: { frameworkId }, transaction })) === 0) {
			throw new FrameworkError('A framework without tasks cannot be published.');
		}
		await Framework.update(
			{ status: 'retired' },
			{
				where: { name: framework.name, status: 'published', id: { [Op.ne]: frameworkId } },
				transaction
			}
		);
		await framework.update({ status: 'published', publishedAt: new Date() }, { transaction });
	});
}

/** Deletes a draft nobody has published; published and retired versions stay forever. */
export async function discardDraft(frameworkId: number): Promise<void> {
	await write(async (transaction) => {
		const framework = await Framework.findByPk(frameworkId, { rejectOnEmpty: true, transaction });
		if (framework.status !== 'draft') throw new FrameworkError('Only a draft can be discarded.');
		await framework.destroy({ transaction });
	});
}

export interface TaskFilter {
	area?: string;
	tier?: 1 | 2 | 3;
	q?: string;
	limit: number;
	offset: number;
}

export interface TaskRow {
	id: number;
	code: string;
	title: string;
	areaCode: string;
	areaName: string;
	tier: 1 | 2 | 3;
	requiredLevel: 1 | 2 | 3 | 4;
	minHours: number;
	steps: number;
	questions: number;
}

/** Tasks of one version, filtered by area, tier and words in code, title or description. */
export async function tasks(frameworkId: number, filter: TaskFilter) {
	const where = ['t.framework_id = :frameworkId'];
	const replacements: Record<string, unknown> = {
		frameworkId,
		limit: filter.limit,
		offset: filter.offset
	};
	if (filter.area) {
		where.push('a.code = :area');
		replacements.area = filter.area;
	}
	if (filter.tier) {
		where.push('t.tier = :tier');
		replacements.tier = filter.tier;
	}
	for (const [i, word] of (filter.q ?? '')
		.trim()
		.split(/\s+/)
		.filter(Boolean)
		.slice(0, 8)
		.entries()) {
		where.push(
			`(t.code LIKE :w${i} ESCAPE '\\' OR t.title LIKE :w${i} ESCAPE '\\' OR t.description LIKE :w${i} ESCAPE '\\')`
		);
		replacements[`w${i}`] = `%${word.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
	}
	const clause = where.join(' AND ');
	const [rows, [{ total }]] = await Promise.all([
		sequelize.query<TaskRow>(
			`SELECT t.id, t.code, t.title, a.code AS "areaCode", a.name AS "areaName", t.tier,
			        t.required_level AS "requiredLevel", t.min_hours AS "minHours",
			        (SELECT COUNT(*) FROM task_steps s WHERE s.task_id = t.id) AS steps,
			        (SELECT COUNT(*) FROM task_questions q WHERE q.task_id = t.id) AS questions
			   FROM framework_tasks t JOIN framework_areas a ON a.id = t.area_id
			  WHERE ${clause}
			  ORDER BY a.position, t.position LIMIT :limit OFFSET :offset`,
			{ type: QueryTypes.SELECT, replacements }
		),
		sequelize.query<{ total: number }>(
			`SELECT COUNT(*) AS total FROM framework_tasks t JOIN framework_areas a ON a.id = t.area_id WHERE ${clause}`,
			{ type: QueryTypes.SELECT, replacements }
		)
	]);
	return { rows, total };
}

export async function areas(frameworkId: number) {
	return Area.findAll({
		where: { frameworkId },
		attributes: ['code', 'name'],
		order: [['position', 'ASC']],
		raw: true
	});
}

/** One task card with its area, steps and specs (questions stay on the server). */
export async function taskCard(frameworkId: number, code: string) {
	const task = await Task.findOne({
		where: { frameworkId, code },
		include: [
			{ model: Area, as: 'area', attributes: ['code', 'name'] },
			{ model: TaskStep, as: 'steps' },
			{ model: TaskSpec, as: 'specs' }
		],
		order: [
			[{ model: TaskStep, as: 'steps' }, 'position', 'ASC'],
			[{ model: TaskSpec, as: 'specs' }, 'position', 'ASC']
		]
	});
	if (!task) return null;
	const t = task as Task & { area: Area; steps: TaskStep[]; specs: TaskSpec[] };
	return {
		code: t.code,
		title: t.title,
		description: t.description,
		tier: t.tier,
		requiredLevel: t.requiredLevel,
		minHours: t.minHours,
		area: { code: t.area.code, name: t.area.name },
		tools: t.tools,
		cautions: t.cautions,
		serviceInfo: t.serviceInfo,
		steps: t.steps.map((s) => ({ text: s.text, safety: s.safety })),
		specs: t.specs.map((s) => ({
			label: s.label,
			valueSi: s.valueSi,
			unit: s.unit,
			limit: s.limitKind
		})),
		questionCount: await TaskQuestion.count({ where: { taskId: t.id } })
	};
}
