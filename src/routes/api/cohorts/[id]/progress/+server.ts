import { error, json } from '@sveltejs/kit';
import type { RequestHandler } from './$types';
import { cohortParam } from '$lib/server/api';
import { requireRole } from '$lib/server/auth';
import * as progress from '$lib/server/progress';

/** Every apprentice of a cohort (or `all`) with hours, coverage, wage step, forecast and risk. */
export const GET = (async (event) => {
	requireRole(event, 'coordinator');
	const cohortId = cohortParam(event.params.id);
	try {
		return json(await progress.cohort(cohortId));
	} catch (err) {
		if (err instanceof progress.ProgressProblem) error(err.status, err.message);
		throw err;
	}
}) satisfies RequestHandler;
