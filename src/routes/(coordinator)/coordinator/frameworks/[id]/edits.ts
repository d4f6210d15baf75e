import { z } from 'zod';
import type { FrameworkDef } from '$lib/framework/schema';
import type { AreaDef, TaskDef } from '$lib/framework/types';

/** What an edit did: where to go next and which form field each schema path belongs to. */
export type Applied =
	| { to: string; fieldOf?: (path: PropertyKey[]) => string | null }
	| { errors: Record<string, string> };

const code = (what: string) =>
	z
		.string({ error: `Enter the ${what}.` })
		.trim()
		.toUpperCase()
		.min(1, `Enter the ${what}.`)
		.max(10, `The ${what} is at most 10 characters.`);
const words = (what: string, max: number) =>
	z
		.string({ error: `Enter the ${what}.` })
		.trim()
		.min(1, `Enter the ${what}.`)
		.max(max, `The ${what} is at most ${max} characters.`);
const move = z
	.string({ error: 'Say what to move.' })
	.regex(/^[A-Z]{3}(-\d{2})?:(up|down)$/, 'Say what to move, up or down.');

export const forms = {
	addArea: z.object({
		code: code('area code'),
		name: words('area name', 100),
		taskCode: code('first task code'),
		taskTitle: words('first task title', 200)
	}),
	renameArea: z.object({ area: code('area code'), name: words('area name', 100) }),
	addTask: z.object({
		area: code('area code'),
		code: code('task code'),
		title: words('task title', 200)
	}),
	move: z.object({ move }),
	task: z.object({ code: code('task code') }),
	area: z.object({ area: code('area code') })
};

/** A new task with values that pass validation, for the coordinator to fill in. */
export function starterTask(code: string, title: string): TaskDef {
	return {
		code,
		title,
		description: title,
		tier: 2,
		requiredLevel: 3,
		minHours: 1,
		checklist: [{ text: 'Look up and follow the repair procedure in the service information' }],
		specs: [],
		tools: [],
		cautions: [],
		serviceInfo: ['repair procedure'],
		questions: []
	};
}

/** The first free task code of an area: after the highest number, else the first gap. */
export function nextTaskCode(area: AreaDef): string {
	const used = new Set(area.tasks.map((t) => Number(t.code.slice(4))));
	const highest = Math.max(0, ...used);
	let n = highest < 99 ? highest + 1 : 1;
	while (used.has(n) && n < 99) n++;
	return `${area.code}-${String(n).padStart(2, '0')}`;
}

function swap<T>(list: T[], index: number, direction: 'up' | 'down'): boolean {
	const other = direction === 'up' ? index - 1 : index + 1;
	if (index < 0 || other < 0 || other >= list.length) return false;
	[list[index], list[other]] = [list[other], list[index]];
	return true;
}

const gone = (what: string) => ({
	errors: { form: `${what} is no longer in this draft. Someone may have changed it; reload.` }
});

/** Field names of a form, looked up by the schema path under one area or task. */
function fieldsAt(prefix: PropertyKey[], fields: Record<string, string>) {
	return (path: PropertyKey[]) => {
		if (!prefix.every((part, i) => path[i] === part)) return null;
		return fields[path.slice(prefix.length).join('.')] ?? null;
	};
}

export function addArea(def: FrameworkDef, input: z.infer<typeof forms.addArea>): Applied {
	if (def.areas.some((a) => a.code === input.code)) {
		return { errors: { code: `Area code ${input.code} is used already.` } };
	}
	const index = def.areas.push({
		code: input.code,
		name: input.name,
		tasks: [starterTask(input.taskCode, input.taskTitle)]
	});
	return {
		to: `#area-${input.code}`,
		fieldOf: fieldsAt(['areas', index - 1], {
			code: 'code',
			name: 'name',
			'tasks.0.code': 'taskCode',
			'tasks.0.title': 'taskTitle'
		})
	};
}

export function renameArea(def: FrameworkDef, input: z.infer<typeof forms.renameArea>): Applied {
	const index = def.areas.findIndex((a) => a.code === input.area);
	if (index < 0) return gone(`Area ${input.area}`);
	def.areas[index].name = input.name;
	return { to: `#area-${input.area}`, fieldOf: fieldsAt(['areas', index], { name: 'name' }) };
}

export function addTask(def: FrameworkDef, input: z.infer<typeof forms.addTask>): Applied {
	const index = def.areas.findIndex((a) => a.code === input.area);
	if (index < 0) return gone(`Area ${input.area}`);
	const tasks = def.areas[index].tasks;
	tasks.push(starterTask(input.code, input.title));
	return {
		to: `/tasks/${encodeURIComponent(input.code)}?added=1`,
		fieldOf: fieldsAt(['areas', index, 'tasks', tasks.length - 1], {
			code: 'code',
			title: 'title'
		})
	};
}

export function moveItem(def: FrameworkDef, input: z.infer<typeof forms.move>): Applied {
	const [target, direction] = input.move.split(':') as [string, 'up' | 'down'];
	if (target.length === 3) {
		const index = def.areas.findIndex((a) => a.code === target);
		if (index < 0) return gone(`Area ${target}`);
		swap(def.areas, index, direction);
		return { to: `#area-${target}` };
	}
	const area = def.areas.find((a) => a.tasks.some((t) => t.code === target));
	if (!area) return gone(`Task ${target}`);
	swap(
		area.tasks,
		area.tasks.findIndex((t) => t.code === target),
		direction
	);
	return { to: `#task-${target}` };
}

export function deleteTask(def: FrameworkDef, input: z.infer<typeof forms.task>): Applied {
	const area = def.areas.find((a) => a.tasks.some((t) => t.code === input.code));
	if (!area) return gone(`Task ${input.code}`);
	if (area.tasks.length === 1) {
		return {
			errors: {
				form: `${input.code} is the only task in ${area.name}, and an area needs at least one task. Delete the area instead.`
			}
		};
	}
	area.tasks = area.tasks.filter((t) => t.code !== input.code);
	return { to: `#area-${area.code}` };
}

export function deleteArea(def: FrameworkDef, input: z.infer<typeof forms.area>): Applied {
	if (!def.areas.some((a) => a.code === input.area)) return gone(`Area ${input.area}`);
	if (def.areas.length === 1) {
		return { errors: { form: 'A framework needs at least one area; this is the last one.' } };
	}
	def.areas = def.areas.filter((a) => a.code !== input.area);
	return { to: '' };
}
