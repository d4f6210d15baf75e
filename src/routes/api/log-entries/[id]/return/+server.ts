import type { RequestHandler } from './$types';
import { answer, idParam, readJson } from '$lib/server/api';
import { requireRole } from '$lib/server/auth';
import * as worklog from '$lib/server/worklog';
import { returnSchema } from '$lib/schemas/worklog';

export const POST = (async (event) => {
	const user = requireRole(event, 'supervisor');
	const id = idParam(event.params.id);
	return answer(async () => {
		const { comment } = await readJson(event.request, returnSchema);
		await worklog.giveBack(user, id, comment);
		return worklog.detail(id);
	});
}) satisfies RequestHandler;
