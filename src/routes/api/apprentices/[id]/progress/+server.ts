import { error, json } from '@sveltejs/kit';
import type { RequestHandler } from './$types';
import { requireUser } from '$lib/server/auth';
import * as progress from '$lib/server/progress';
import * as worklog from '$lib/server/worklog';

/** One apprentice's progress, for themselves, their journeyworkers and coordinators. */
export const GET = (async (event) => {
	const user = requireUser(event);
	const apprenticeId = event.params.id;
	if (apprenticeId.length > 40) error(404, 'No such apprentice.');
	if (!(await worklog.canView(user, { apprenticeId }))) error(404, 'No such apprentice.');
	const found = await progress.apprentice(apprenticeId);
	if (!found) error(404, 'No such apprentice.');
	return json({
		apprentice: { id: found.person.id, name: found.person.name, cohort: found.person.cohortName },
		...found.progress,
		areas: found.areaTotals.map((a) => ({
			...a,
			...(found.areas[a.code] ?? { met: 0, signed: 0, levels: 0 })
		}))
	});
}) satisfies RequestHandler;
