import type { TaskDef } from '$lib/framework/types';

/** A task as the editor's fields hold it: text as typed, so nothing is lost on a failed save. */
export type StepRow = { text: string; safety: boolean };
export type SpecRow = { label: string; value: string; unit: string; limit: string };
export type OptionRow = { text: string; correct: boolean };
export type QuestionRow = { prompt: string; explanation: string; options: OptionRow[] };
export type TaskForm = {
	code: string;
	title: string;
	description: string;
	tier: string;
	requiredLevel: string;
	minHours: string;
	checklist: StepRow[];
	specs: SpecRow[];
	tools: string;
	cautions: string;
	serviceInfo: string[];
	questions: QuestionRow[];
};

/** The most rows of each list the task schema allows. */
export const ROW_LIMITS = { checklist: 20, specs: 30, questions: 50, options: 6 } as const;

export function toForm(task: TaskDef): TaskForm {
	return {
		code: task.code,
		title: task.title,
		description: task.description,
		tier: String(task.tier),
		requiredLevel: String(task.requiredLevel),
		minHours: String(task.minHours),
		checklist: task.checklist.map((s) => ({ text: s.text, safety: Boolean(s.safety) })),
		specs: task.specs.map((s) => ({
			label: s.label,
			value: String(s.value),
			unit: s.unit,
			limit: s.limit
		})),
		tools: task.tools.join('\n'),
		cautions: task.cautions.join('\n'),
		serviceInfo: [...task.serviceInfo],
		questions: task.questions.map((q) => ({
			prompt: q.prompt,
			explanation: q.explanation,
			options: q.options.map((o) => ({ text: o.text, correct: o.correct }))
		}))
	};
}

const blank = {
	checklist: (): StepRow => ({ text: '', safety: false }),
	specs: (): SpecRow => ({ label: '', value: '', unit: 'N·m', limit: 'nominal' }),
	options: (): OptionRow => ({ text: '', correct: false }),
	questions: (): QuestionRow => ({
		prompt: '',
		explanation: '',
		options: Array.from({ length: 4 }, blank.options)
	})
};

type List = keyof typeof blank;
export type RowOp = { verb: 'add' | 'remove' | 'up' | 'down'; list: List; at: number[] };

/** Row buttons send `verb:list[:index[:index]]`, like `add:specs` or `remove:options:2:1`. */
const OP = /^(add|remove|up|down):(checklist|specs|questions|options)((?::\d{1,2}){0,2})$/;

export function parseOp(text: unknown): RowOp | null {
	const match = typeof text === 'string' ? OP.exec(text) : null;
	if (!match) return null;
	const at = match[3].split(':').slice(1).map(Number);
	return { verb: match[1] as RowOp['verb'], list: match[2] as List, at };
}

/**
 * Changes the rows in place, the same way in the browser and on the server; returns the id of the
 * field to focus next, or null when the operation does not apply.
 */
export function applyOp(form: TaskForm, op: RowOp): string | null {
	const question = op.list === 'options' ? form.questions[op.at[0]] : undefined;
	if (op.list === 'options' && !question) return null;
	const rows: unknown[] = question ? question.options : form[op.list as Exclude<List, 'options'>];
	const prefix = question ? `f-questions-${op.at[0]}-options` : `f-${op.list}`;
	const index = question ? op.at[1] : op.at[0];
	if (op.verb === 'add') {
		if (rows.length >= ROW_LIMITS[op.list]) return null;
		rows.push(blank[op.list]());
		return `${prefix}-${rows.length - 1}`;
	}
	if (index === undefined || index >= rows.length) return null;
	if (op.verb === 'remove') {
		rows.splice(index, 1);
		return rows.length > 0 ? `${prefix}-${Math.min(index, rows.length - 1)}` : `${prefix}-add`;
	}
	const other = op.verb === 'up' ? index - 1 : index + 1;
	if (other < 0 || other >= rows.length) return null;
	[rows[index], rows[other]] = [rows[other], rows[index]];
	return `${prefix}-${other}-${op.verb}`;
}
