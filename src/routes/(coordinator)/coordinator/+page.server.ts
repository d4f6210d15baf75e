import type { PageServerLoad } from './$types';
import { requireRole } from '$lib/server/auth';
import * as people from '$lib/server/people';

export const load = (async (event) => {
	requireRole(event, 'coordinator');
	const [cohorts, sites] = await Promise.all([people.cohortSummaries(), people.siteSummaries()]);
	return { cohorts, sites };
}) satisfies PageServerLoad;
