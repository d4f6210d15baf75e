import type { RequestHandler } from './$types';
import { requireRole } from '$lib/server/auth';
import * as records from '$lib/server/exports';

/** One apprentice's record for the registration agency, as a PDF download (coordinators only). */
export const GET = (async (event) => {
	requireRole(event, 'coordinator');
	return records.apprenticeFile(event.params.id, 'pdf');
}) satisfies RequestHandler;
