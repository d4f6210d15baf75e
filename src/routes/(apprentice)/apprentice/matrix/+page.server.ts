import type { PageServerLoad } from './$types';
import * as assessment from '$lib/server/assessment';
import { requireRole } from '$lib/server/auth';

export const load = (async (event) => {
	const user = requireRole(event, 'apprentice');
	return { name: user.name, cells: await assessment.matrix(user.id) };
}) satisfies PageServerLoad;
