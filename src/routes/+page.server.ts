import { redirect } from '@sveltejs/kit';
import type { PageServerLoad } from './$types';
import { HOME } from '$lib/server/auth';

export const load = (({ locals }) => {
	if (locals.user) redirect(303, HOME[locals.user.role]);
}) satisfies PageServerLoad;
