import type { RequestHandler } from './$types';
import { answer, idParam, readJson } from '$lib/server/api';
import * as assessment from '$lib/server/assessment';
import { requireRole } from '$lib/server/auth';
import { revokeSchema } from '$lib/schemas/assessment';

export const POST = (async (event) => {
	const user = requireRole(event, 'coordinator');
	const id = idParam(event.params.id);
	return answer(async () =>
		assessment.revoke(user, id, await readJson(event.request, revokeSchema))
	);
}) satisfies RequestHandler;
