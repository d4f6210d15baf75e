import { error } from '@sveltejs/kit';
import type { PageServerLoad } from './$types';
import { requireUser } from '$lib/server/auth';
import * as framework from '$lib/server/framework';
import { formatSpec } from '$lib/units';

export const load = (async (event) => {
	requireUser(event);
	const code = event.params.code.toUpperCase();
	if (!/^[A-Z]{3}-\d{2}$/.test(code)) error(404, 'Task codes look like BRK-01.');
	const current = await framework.current();
	if (!current) error(404, 'No competency framework is published yet.');
	const task = await framework.taskCard(current.id, code);
	if (!task) error(404, `There is no task ${code} in the current framework.`);
	return {
		framework: { name: current.name, version: current.version },
		task: {
			...task,
			specs: task.specs.map((s) => ({
				label: s.label,
				limit: s.limit,
				...formatSpec(s.valueSi, s.unit)
			}))
		}
	};
}) satisfies PageServerLoad;
