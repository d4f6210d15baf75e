import type { FrameworkDef } from './schema';
import type { AreaDef, TaskDef } from './types';

export type FrameworkChange = {
	kind: 'added' | 'removed' | 'changed';
	level: 'area' | 'task';
	code: string;
	title: string;
	/** For a changed item, the fields that differ. */
	fields?: string[];
};

/** The task fields compared, in the order a task card shows them. */
export const TASK_FIELDS = [
	'title',
	'description',
	'tier',
	'requiredLevel',
	'minHours',
	'checklist',
	'specs',
	'tools',
	'cautions',
	'serviceInfo',
	'questions'
] as const satisfies readonly (keyof TaskDef)[];

/** Deep equality of plain data; a property set to undefined counts as absent. */
function same(x: unknown, y: unknown): boolean {
	if (x === y) return true;
	if (typeof x !== 'object' || typeof y !== 'object' || x === null || y === null) return false;
	if (Array.isArray(x) !== Array.isArray(y)) return false;
	if (Array.isArray(x) && Array.isArray(y)) {
		return x.length === y.length && x.every((item, index) => same(item, y[index]));
	}
	const a = x as Record<string, unknown>;
	const b = y as Record<string, unknown>;
	const keys = new Set([...Object.keys(a), ...Object.keys(b)]);
	return [...keys].every((key) => same(a[key], b[key]));
}

function tasksByCode(def: FrameworkDef): Map<string, TaskDef> {
	return new Map(def.areas.flatMap((area) => area.tasks.map((task) => [task.code, task] as const)));
}

function taskChange(
	kind: FrameworkChange['kind'],
	task: TaskDef,
	fields?: string[]
): FrameworkChange {
	return { kind, level: 'task', code: task.code, title: task.title, ...(fields && { fields }) };
}

function areaChange(
	kind: FrameworkChange['kind'],
	area: AreaDef,
	fields?: string[]
): FrameworkChange {
	return { kind, level: 'area', code: area.code, title: area.name, ...(fields && { fields }) };
}

/**
 * What changed from framework version `a` to version `b`: areas and tasks matched by code, in the
 * order of `b`, each area's removed tasks after its current ones and removed areas last.
 */
export function diffFrameworks(a: FrameworkDef, b: FrameworkDef): FrameworkChange[] {
	const changes: FrameworkChange[] = [];
	const oldAreas = new Map(a.areas.map((area) => [area.code, area]));
	const newAreas = new Set(b.areas.map((area) => area.code));
	const oldTasks = tasksByCode(a);
	const newTasks = tasksByCode(b);

	for (const area of b.areas) {
		const old = oldAreas.get(area.code);
		if (!old) changes.push(areaChange('added', area));
		else if (old.name !== area.name) {
			changes.push(areaChange('changed', area, ['name']));
		}
		for (const task of area.tasks) {
			const before = oldTasks.get(task.code);
			if (!before) {
				changes.push(taskChange('added', task));
				continue;
			}
			const fields = TASK_FIELDS.filter((field) => !same(before[field], task[field]));
			if (fields.length > 0) {
				changes.push(taskChange('changed', task, [...fields]));
			}
		}
		for (const task of old?.tasks ?? []) {
			if (!newTasks.has(task.code)) changes.push(taskChange('removed', task));
		}
	}
	for (const area of a.areas) {
		if (newAreas.has(area.code)) continue;
		changes.push(areaChange('removed', area));
		for (const task of area.tasks) {
			if (!newTasks.has(task.code)) changes.push(taskChange('removed', task));
		}
	}
	return changes;
}
