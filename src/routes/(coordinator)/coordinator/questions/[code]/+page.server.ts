import { error } from '@sveltejs/kit';
import type { PageServerLoad } from './$types';
import * as assessment from '$lib/server/assessment';
import { requireRole } from '$lib/server/auth';
import { EntryProblem } from '$lib/server/worklog/errors';
import { taskCodeSchema } from '$lib/schemas/assessment';

export const load = (async (event) => {
	requireRole(event, 'coordinator');
	const code = taskCodeSchema.safeParse(event.params.code);
	if (!code.success) error(404, code.error.issues[0].message);
	try {
		return await assessment.questionStatistics(code.data);
	} catch (err) {
		if (err instanceof EntryProblem) error(err.status, err.message);
		throw err;
	}
}) satisfies PageServerLoad;
