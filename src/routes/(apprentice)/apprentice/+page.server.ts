import { error } from '@sveltejs/kit';
import type { PageServerLoad } from './$types';
import { requireRole } from '$lib/server/auth';
import * as people from '$lib/server/people';

export const load = (async (event) => {
	const user = requireRole(event, 'apprentice');
	const record = await people.apprenticeRecord(user.id);
	if (!record) error(404, 'Your apprentice record is not set up yet. Ask your coordinator.');
	return { record };
}) satisfies PageServerLoad;
