import { z } from 'zod';
import { formToObject } from '$lib/schemas/forms';
import type { TaskForm } from './task-form';

const text = (max: number) =>
	z
		.string({ error: 'Each field is sent once, as text.' })
		.max(max, `A field holds at most ${max} characters.`)
		.optional()
		.transform((value) => value ?? '');
const checked = z
	.string({ error: 'Each checkbox is sent once.' })
	.max(10, 'A checkbox sends a short value.')
	.optional()
	.transform((value) => value !== undefined && value !== '');
/** Rows as the form numbers them; gaps left by a hand-made request are dropped. */
const rows = <T extends z.ZodType>(item: T) =>
	z
		.array(item.optional(), { error: 'The rows of the form could not be read.' })
		.max(51, 'The form has too many rows.')
		.optional()
		.transform((list) => (list ?? []).filter((row): row is z.infer<T> => row !== undefined));

/** The editor's fields, still as typed: the task schema judges them after `candidate`. */
const taskFormSchema = z.object({
	code: text(20),
	title: text(1000),
	description: text(5000),
	tier: text(10),
	requiredLevel: text(10),
	minHours: text(20),
	checklist: rows(z.object({ text: text(1000), safety: checked })),
	specs: rows(z.object({ label: text(1000), value: text(50), unit: text(20), limit: text(20) })),
	tools: text(20_000),
	cautions: text(20_000),
	serviceInfo: z
		.union([z.string().max(100), z.array(z.string().max(100)).max(20)], {
			error: 'The service information choices could not be read.'
		})
		.optional()
		.transform((value) => (value === undefined ? [] : Array.isArray(value) ? value : [value])),
	questions: rows(
		z.object({
			prompt: text(2000),
			explanation: text(3000),
			options: rows(z.object({ text: text(1000), correct: checked }))
		})
	)
}) satisfies z.ZodType<TaskForm, unknown>;

export function readForm(
	form: FormData
): { ok: true; form: TaskForm } | { ok: false; message: string } {
	const parsed = taskFormSchema.safeParse(formToObject(form));
	if (parsed.success) return { ok: true, form: parsed.data };
	const issue = parsed.error.issues[0];
	return { ok: false, message: `${issue.message} (${issue.path.join('.') || 'form'})` };
}

/** Where each kept item came from: blank rows and lines are left out of the task. */
export type Origins = {
	checklist: number[];
	specs: number[];
	tools: number[];
	cautions: number[];
	questions: number[];
	options: number[][];
};

function kept<T>(items: T[], used: (item: T) => boolean) {
	const origin: number[] = [];
	const list = items.filter((item, index) => used(item) && origin.push(index) > 0);
	return { list, origin };
}

/** Spaces inside a number (10 000) are allowed; anything else that is not a plain decimal is NaN. */
function numberFrom(value: string): number | undefined {
	const compact = value.replace(/[\s\u00a0\u202f]/g, '');
	if (compact === '') return undefined;
	return /^[-+]?(\d+\.?\d*|\.\d+)$/.test(compact) ? Number(compact) : Number.NaN;
}

const lines = (value: string) => value.split(/\r?\n/).map((line) => line.trim());

/** The task the fields describe, for the schema to judge, and where its items came from. */
export function candidate(form: TaskForm): { task: Record<string, unknown>; origins: Origins } {
	const checklist = kept(form.checklist, (s) => s.text.trim() !== '');
	const specs = kept(form.specs, (s) => s.label.trim() !== '' || s.value.trim() !== '');
	const tools = kept(lines(form.tools), (line) => line !== '');
	const cautions = kept(lines(form.cautions), (line) => line !== '');
	const questions = kept(
		form.questions,
		(q) =>
			q.prompt.trim() !== '' ||
			q.explanation.trim() !== '' ||
			q.options.some((o) => o.text.trim() !== '')
	);
	const options = questions.list.map((q) => kept(q.options, (o) => o.text.trim() !== ''));
	const task = {
		code: form.code.trim().toUpperCase(),
		title: form.title,
		description: form.description,
		tier: numberFrom(form.tier),
		requiredLevel: numberFrom(form.requiredLevel),
		minHours: numberFrom(form.minHours),
		checklist: checklist.list.map((s) =>
			s.safety ? { text: s.text, safety: true } : { text: s.text }
		),
		specs: specs.list.map((s) => ({
			label: s.label,
			value: numberFrom(s.value),
			unit: s.unit,
			limit: s.limit
		})),
		tools: tools.list,
		cautions: cautions.list,
		serviceInfo: form.serviceInfo,
		questions: questions.list.map((q, i) => ({
			prompt: q.prompt,
			options: options[i].list.map((o) => ({ text: o.text, correct: o.correct })),
			explanation: q.explanation
		}))
	};
	return {
		task,
		origins: {
			checklist: checklist.origin,
			specs: specs.origin,
			tools: tools.origin,
			cautions: cautions.origin,
			questions: questions.origin,
			options: options.map((o) => o.origin)
		}
	};
}

/** The editor field a schema issue belongs to (a path under the task), and its message. */
export function fieldFor(path: PropertyKey[], message: string, origins: Origins): [string, string] {
	const [list, index, ...rest] = path;
	const at = (origin: number[]) =>
		typeof index === 'number' ? (origin[index] ?? index) : undefined;
	switch (list) {
		case 'checklist':
		case 'specs': {
			const row = at(origins[list]);
			return [[list, row, ...rest].filter((p) => p !== undefined).join('.'), message];
		}
		case 'tools':
		case 'cautions': {
			const line = at(origins[list]);
			return [list, line === undefined ? message : `Line ${line + 1}: ${message}`];
		}
		case 'questions': {
			const row = at(origins.questions);
			if (row === undefined) return ['questions', message];
			const [field, option, ...deeper] = rest;
			if (field !== 'options' || typeof option !== 'number' || typeof index !== 'number') {
				return [['questions', row, field].filter((p) => p !== undefined).join('.'), message];
			}
			const choice = origins.options[index]?.[option] ?? option;
			return [['questions', row, 'options', choice, ...deeper].join('.'), message];
		}
		case undefined:
			return ['form', message];
		default:
			return [String(list), message];
	}
}
