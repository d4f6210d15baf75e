import { error } from '@sveltejs/kit';
import type { PageServerLoad } from './$types';
import { requireRole } from '$lib/server/auth';
import * as outbox from '$lib/server/mail/outbox';

export const load = (async (event) => {
	requireRole(event, 'admin');
	if (!outbox.available())
		error(404, 'Sent mail is only listed when the local mail server is in use.');
	return { messages: await outbox.list(50) };
}) satisfies PageServerLoad;
