import { error, json } from '@sveltejs/kit';
import type { RequestHandler } from './$types';
import { requireUser } from '$lib/server/auth';
import { Framework } from '$lib/server/db';
import * as framework from '$lib/server/framework';
import { frameworkIdSchema, taskFilterSchema } from '$lib/schemas/framework';

export const GET = (async (event) => {
	const user = requireUser(event);
	const id = frameworkIdSchema.safeParse(event.params.id);
	if (!id.success) error(400, id.error.issues[0].message);
	const query = taskFilterSchema.safeParse(Object.fromEntries(event.url.searchParams));
	if (!query.success) error(400, query.error.issues[0].message);

	const version = await Framework.findByPk(id.data, { attributes: ['id', 'status'] });
	// Drafts are the coordinator's work in progress.
	if (!version || (version.status === 'draft' && user.role !== 'coordinator')) {
		error(404, 'No such framework.');
	}
	const { page, size, ...filter } = query.data;
	const result = await framework.tasks(id.data, {
		...filter,
		limit: size,
		offset: (page - 1) * size
	});
	return json({ page, size, total: result.total, tasks: result.rows });
}) satisfies RequestHandler;
