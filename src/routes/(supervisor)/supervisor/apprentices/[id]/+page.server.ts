import { error } from '@sveltejs/kit';
import type { PageServerLoad } from './$types';
import * as assessment from '$lib/server/assessment';
import { requireRole } from '$lib/server/auth';
import { User } from '$lib/server/db';
import { supervises } from '$lib/server/worklog/access';

export const load = (async (event) => {
	const user = requireRole(event, 'supervisor');
	const apprenticeId = event.params.id;
	if (apprenticeId.length > 40 || !(await supervises(user.id, apprenticeId))) {
		error(404, 'No such apprentice among the ones you supervise.');
	}
	const [apprentice, cells] = await Promise.all([
		User.findByPk(apprenticeId, { attributes: ['name'], rejectOnEmpty: true }),
		assessment.matrix(apprenticeId)
	]);
	return { apprentice: { id: apprenticeId, name: apprentice.name }, cells };
}) satisfies PageServerLoad;
