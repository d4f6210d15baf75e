import { error } from '@sveltejs/kit';
import type { RequestHandler } from './$types';
import { answer } from '$lib/server/api';
import * as assessment from '$lib/server/assessment';
import { requireUser } from '$lib/server/auth';
import { ApprenticeProfile } from '$lib/server/db';
import * as worklog from '$lib/server/worklog';

/** An apprentice's matrix, for themselves, their journeyworkers and coordinators. */
export const GET = (async (event) => {
	const user = requireUser(event);
	const apprenticeId = event.params.id;
	if (apprenticeId.length > 40 || !(await ApprenticeProfile.findByPk(apprenticeId))) {
		error(404, 'No such apprentice.');
	}
	if (!(await worklog.canView(user, { apprenticeId }))) error(404, 'No such apprentice.');
	return answer(async () => ({ apprenticeId, tasks: await assessment.matrix(apprenticeId) }));
}) satisfies RequestHandler;
