import type { RequestHandler } from './$types';
import { answer, idParam } from '$lib/server/api';
import { requireRole } from '$lib/server/auth';
import * as worklog from '$lib/server/worklog';

export const POST = (async (event) => {
	const user = requireRole(event, 'supervisor');
	const id = idParam(event.params.id);
	return answer(async () => {
		const result = await worklog.verify(user, [id]);
		if (result.refused.length) {
			throw new worklog.EntryProblem(
				result.refused[0].reason.startsWith('Not an entry') ? 404 : 409,
				{
					form: result.refused[0].reason
				}
			);
		}
		return worklog.detail(id);
	});
}) satisfies RequestHandler;
