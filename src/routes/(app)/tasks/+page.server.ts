import { error } from '@sveltejs/kit';
import type { PageServerLoad } from './$types';
import { requireUser } from '$lib/server/auth';
import * as framework from '$lib/server/framework';
import { taskFilterSchema } from '$lib/schemas/framework';

export const load = (async (event) => {
	requireUser(event);
	const current = await framework.current();
	if (!current)
		error(404, 'No competency framework is published yet. A coordinator publishes one.');
	const query = taskFilterSchema.safeParse(Object.fromEntries(event.url.searchParams));
	if (!query.success) error(400, query.error.issues[0].message);
	const { page, size, ...filter } = query.data;
	const [result, areas] = await Promise.all([
		framework.tasks(current.id, { ...filter, limit: size, offset: (page - 1) * size }),
		framework.areas(current.id)
	]);
	return {
		framework: { id: current.id, name: current.name, version: current.version },
		areas,
		filter: {
			area: filter.area ?? '',
			tier: filter.tier ? String(filter.tier) : '',
			q: filter.q ?? ''
		},
		page,
		size,
		total: result.total,
		tasks: result.rows
	};
}) satisfies PageServerLoad;
