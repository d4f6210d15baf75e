import type { RequestHandler } from './$types';
import { answer, readJson } from '$lib/server/api';
import * as assessment from '$lib/server/assessment';
import { requireRole } from '$lib/server/auth';
import { signOffSchema } from '$lib/schemas/assessment';

/** A journeyworker's e-signed sign-off; the password is checked again as the signature. */
export const POST = (async (event) => {
	const user = requireRole(event, 'supervisor');
	return answer(async () => {
		const input = await readJson(event.request, signOffSchema);
		const done = await assessment.signOff(user, input, event.locals.session!.id);
		return new Response(JSON.stringify(done), {
			status: 201,
			headers: { 'content-type': 'application/json' }
		});
	});
}) satisfies RequestHandler;
