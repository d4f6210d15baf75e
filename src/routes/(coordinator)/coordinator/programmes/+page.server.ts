import type { PageServerLoad } from './$types';
import { requireRole } from '$lib/server/auth';
import * as programmes from '$lib/server/programmes';

export const load = (async (event) => {
	requireRole(event, 'coordinator');
	return { programmes: await programmes.list() };
}) satisfies PageServerLoad;
