import { error } from '@sveltejs/kit';
import type { PageServerLoad } from './$types';
import { requireRole } from '$lib/server/auth';
import * as people from '$lib/server/people';
import { cohortParam } from '$lib/server/api';

/** The dashboard shell; its numbers and charts load from the progress APIs in the browser. */
export const load = (async (event) => {
	requireRole(event, 'coordinator');
	const cohortId = cohortParam(event.params.id);
	const cohorts = await people.cohortSummaries();
	const cohort = cohortId === 'all' ? null : cohorts.find((c) => c.id === cohortId);
	if (cohortId !== 'all' && !cohort) error(404, 'There is no cohort with that number.');
	return {
		cohortId,
		title: cohort ? cohort.name : 'All cohorts',
		programmeName: cohort?.programmeName ?? null,
		cohorts: cohorts.map((c) => ({ id: c.id, name: c.name }))
	};
}) satisfies PageServerLoad;
