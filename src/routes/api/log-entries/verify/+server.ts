import type { RequestHandler } from './$types';
import { answer, readJson } from '$lib/server/api';
import { requireRole } from '$lib/server/auth';
import * as worklog from '$lib/server/worklog';
import { verifyManySchema } from '$lib/schemas/worklog';

/** Verifies several entries at once; each refusal is listed with its reason. */
export const POST = (async (event) => {
	const user = requireRole(event, 'supervisor');
	return answer(async () => {
		const { ids } = await readJson(event.request, verifyManySchema);
		return worklog.verify(user, [...new Set(ids)]);
	});
}) satisfies RequestHandler;
