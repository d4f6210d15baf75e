import type { PageServerLoad } from './$types';
import { requireRole } from '$lib/server/auth';
import * as certificates from '$lib/server/certificates';

export const load = (async (event) => {
	const user = requireRole(event, 'apprentice');
	return { certificates: await certificates.listForHolder(user.id) };
}) satisfies PageServerLoad;
