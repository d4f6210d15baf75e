import { error } from '@sveltejs/kit';
import type { Actions, PageServerLoad } from './$types';
import { requireRole } from '$lib/server/auth';
import { config } from '$lib/server/config';
import * as digest from '$lib/server/progress-digest';

/** Sending on demand is for trying the digest out; production relies on the weekly run. */
function devOnly() {
	if (config.NODE_ENV === 'production') error(404, 'Not found.');
}

export const load = (async (event) => {
	const user = requireRole(event, 'coordinator');
	devOnly();
	const week = await digest.gather();
	return { subject: digest.subject(week), preview: digest.text(week, user.name) };
}) satisfies PageServerLoad;

export const actions = {
	send: async (event) => {
		requireRole(event, 'coordinator');
		devOnly();
		return { sent: await digest.sendCoordinatorDigests() };
	}
} satisfies Actions;
