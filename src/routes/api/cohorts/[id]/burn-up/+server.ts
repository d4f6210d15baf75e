import { error, json } from '@sveltejs/kit';
import type { RequestHandler } from './$types';
import { cohortParam } from '$lib/server/api';
import { requireRole } from '$lib/server/auth';
import { Cohort } from '$lib/server/db';
import * as progress from '$lib/server/progress';

/** Cumulative verified hours of a cohort by week beside its plan. */
export const GET = (async (event) => {
	requireRole(event, 'coordinator');
	const cohortId = cohortParam(event.params.id);
	if (cohortId !== 'all' && !(await Cohort.findByPk(cohortId, { attributes: ['id'] }))) {
		error(404, 'There is no cohort with that number.');
	}
	return json(await progress.burnUp(cohortId));
}) satisfies RequestHandler;
