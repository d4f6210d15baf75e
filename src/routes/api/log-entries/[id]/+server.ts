import { error } from '@sveltejs/kit';
import type { RequestHandler } from './$types';
import { answer, idParam, readJson } from '$lib/server/api';
import { requireRole, requireUser } from '$lib/server/auth';
import * as worklog from '$lib/server/worklog';
import { entryBodySchema } from '$lib/schemas/worklog-api';

export const GET = (async (event) => {
	const user = requireUser(event);
	const entry = await worklog.detail(idParam(event.params.id));
	if (!entry || !(await worklog.canView(user, entry))) error(404, 'No such entry.');
	return answer(async () => entry);
}) satisfies RequestHandler;

export const PATCH = (async (event) => {
	const user = requireRole(event, 'apprentice');
	const id = idParam(event.params.id);
	return answer(async () => {
		const { intent, ...input } = await readJson(
			event.request,
			entryBodySchema.omit({ correctsId: true })
		);
		await worklog.update(user, id, input, intent);
		return worklog.detail(id);
	});
}) satisfies RequestHandler;

export const DELETE = (async (event) => {
	const user = requireRole(event, 'apprentice');
	const id = idParam(event.params.id);
	return answer(async () => {
		const keys = await worklog.discard(user, id);
		const store = worklog.evidenceStorage();
		await Promise.all(keys.map((k) => store.delete(k)));
		return { deleted: id };
	});
}) satisfies RequestHandler;
