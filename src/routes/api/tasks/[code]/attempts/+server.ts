import { error } from '@sveltejs/kit';
import type { RequestHandler } from './$types';
import { answer, readJson } from '$lib/server/api';
import * as assessment from '$lib/server/assessment';
import { requireRole } from '$lib/server/auth';
import { answersSchema, taskCodeSchema } from '$lib/schemas/assessment';

/** Without a body: draws a new knowledge check. With `{ attemptId, answers }`: scores it. */
export const POST = (async (event) => {
	const user = requireRole(event, 'apprentice');
	const code = taskCodeSchema.safeParse(event.params.code);
	if (!code.success) error(404, code.error.issues[0].message);
	return answer(async () => {
		const length = Number(event.request.headers.get('content-length') ?? 0);
		if (length === 0) return assessment.startAttempt(user, code.data);
		const { attemptId, answers } = await readJson(event.request, answersSchema);
		return assessment.submitAttempt(user, attemptId, answers);
	});
}) satisfies RequestHandler;
