import type { PageServerLoad } from './$types';
import { requireRole } from '$lib/server/auth';
import * as people from '$lib/server/people';

export const load = (async (event) => {
	const user = requireRole(event, 'supervisor');
	return { apprentices: await people.supervisedBy(user.id) };
}) satisfies PageServerLoad;
