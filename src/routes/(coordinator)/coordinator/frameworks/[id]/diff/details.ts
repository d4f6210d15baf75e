import type { FrameworkDef } from '$lib/framework/schema';
import { LEVELS, LIMIT_WORD, hours } from '$lib/framework/labels';
import type { TaskDef } from '$lib/framework/types';
import { formatSpec, toSI } from '$lib/units';

export type Detail = {
	label: string;
	before?: string;
	after?: string;
	removed?: string[];
	added?: string[];
};

export const FIELD_LABELS: Record<string, string> = {
	name: 'Name',
	title: 'Title',
	description: 'Description',
	tier: 'Priority tier',
	requiredLevel: 'Required level',
	minHours: 'Minimum hours',
	checklist: 'Checklist',
	specs: 'Specifications',
	tools: 'Tools',
	cautions: 'Cautions',
	serviceInfo: 'Service information',
	questions: 'Questions'
};

type Spec = TaskDef['specs'][number];
type Question = TaskDef['questions'][number];

function specText(s: Spec): string {
	const shown = formatSpec(toSI(s.value, s.unit), s.unit);
	return `${s.label}: ${LIMIT_WORD[s.limit]} ${shown.si}${shown.us ? ` (${shown.us})` : ''}`;
}

function questionText(q: Question): string {
	const right = q.options.filter((o) => o.correct).map((o) => o.text);
	return `${q.prompt} — ${q.options.length} options; correct: ${right.join(', ')}`;
}

/** Each list item as one line of text, so two versions compare line by line. */
function linesOf(field: string, value: unknown): string[] | null {
	if (!Array.isArray(value)) return null;
	switch (field) {
		case 'checklist':
			return value.map((s) => `${s.safety ? '◆ Safety: ' : ''}${s.text}`);
		case 'specs':
			return value.map(specText);
		case 'questions':
			return value.map(questionText);
		default:
			return value.map(String);
	}
}

function scalarText(field: string, value: unknown): string {
	if (field === 'tier') return `Tier ${value}`;
	if (field === 'requiredLevel') return `${value} · ${LEVELS[value as 1 | 2 | 3 | 4]}`;
	if (field === 'minHours') return hours(Number(value));
	return String(value);
}

/** Lines of `a` not matched one for one in `b`. */
function without(a: string[], b: string[]): string[] {
	const left = [...b];
	return a.filter((line) => {
		const at = left.indexOf(line);
		if (at >= 0) left.splice(at, 1);
		return at < 0;
	});
}

export function detailsOf(field: string, before: unknown, after: unknown): Detail {
	const label = FIELD_LABELS[field] ?? field;
	const [a, b] = [linesOf(field, before), linesOf(field, after)];
	if (!a || !b)
		return { label, before: scalarText(field, before), after: scalarText(field, after) };
	const removed = without(a, b);
	const added = without(b, a);
	return removed.length + added.length === 0
		? { label, before: 'same items', after: 'new order' }
		: { label, removed, added };
}

export function findTask(def: FrameworkDef, code: string): TaskDef | undefined {
	return def.areas.flatMap((a) => a.tasks).find((t) => t.code === code);
}
