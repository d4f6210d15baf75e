import type { PageServerLoad } from './$types';
import { requireRole } from '$lib/server/auth';
import * as people from '$lib/server/people';

export const load = (async (event) => {
	requireRole(event, 'coordinator');
	const [cohorts, sites, apprentices] = await Promise.all([
		people.cohortSummaries(),
		people.siteSummaries(),
		people.apprentices()
	]);
	return { cohorts, sites, apprentices };
}) satisfies PageServerLoad;
