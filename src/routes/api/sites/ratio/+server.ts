import { error, json } from '@sveltejs/kit';
import { z } from 'zod';
import type { RequestHandler } from './$types';
import { requireRole } from '$lib/server/auth';
import * as progress from '$lib/server/progress';

const query = z.object({
	weeks: z.coerce
		.number()
		.int('Weeks must be a whole number.')
		.min(1, 'Ask for at least 1 week.')
		.max(104, 'Ask for at most 104 weeks.')
		.default(26)
});

/** Apprentices per journeyworker at each shop, week by week. */
export const GET = (async (event) => {
	requireRole(event, 'coordinator');
	const parsed = query.safeParse(Object.fromEntries(event.url.searchParams));
	if (!parsed.success) error(400, parsed.error.issues[0].message);
	return json(await progress.ratioBySite(parsed.data.weeks));
}) satisfies RequestHandler;
