import { error } from '@sveltejs/kit';
import type { RequestHandler } from './$types';
import { answer, readJson } from '$lib/server/api';
import { requireRole } from '$lib/server/auth';
import * as worklog from '$lib/server/worklog';
import { entryBodySchema, entryListSchema } from '$lib/schemas/worklog-api';

/** An apprentice's own entries, or a journeyworker's review queue. */
export const GET = (async (event) => {
	const user = requireRole(event, 'apprentice', 'supervisor');
	const query = entryListSchema.safeParse(Object.fromEntries(event.url.searchParams));
	if (!query.success) error(400, query.error.issues[0].message);
	const { page, size, status, sort, apprenticeId } = query.data;
	const paging = { limit: size, offset: (page - 1) * size };
	const result =
		user.role === 'apprentice'
			? await worklog.queries.forApprentice(user.id, { status, ...paging })
			: await worklog.queries.queue(user.id, {
					status: status ?? 'submitted',
					sort,
					apprenticeId,
					...paging
				});
	const entries =
		query.data.view === 'full' ? await worklog.details(result.rows.map((r) => r.id)) : result.rows;
	return answer(async () => ({ page, size, total: result.total, entries }));
}) satisfies RequestHandler;

export const POST = (async (event) => {
	const user = requireRole(event, 'apprentice');
	return answer(async () => {
		const { intent, correctsId, ...input } = await readJson(event.request, entryBodySchema);
		const entry = await worklog.create(user, input, intent, correctsId);
		return new Response(JSON.stringify(await worklog.detail(entry.id)), {
			status: 201,
			headers: { 'content-type': 'application/json', location: `/api/log-entries/${entry.id}` }
		});
	});
}) satisfies RequestHandler;
