import { error } from '@sveltejs/kit';
import type { RequestHandler } from './$types';
import { normaliseSerial } from '$lib/certificates';
import { requireUser } from '$lib/server/auth';
import * as certificates from '$lib/server/certificates';

/** The Open Badges 3.0 credential as a VC-JWT, for its holder (and coordinators) to carry away. */
export const GET = (async (event) => {
	const user = requireUser(event);
	const serial = normaliseSerial(event.params.serial);
	if (!serial) error(400, 'That is not a Journeymark serial.');
	const certificate = await certificates.bySerial(serial);
	if (!certificate || !certificates.mayDownload(user, certificate)) {
		error(404, 'No such certificate, or it is not yours to download.');
	}
	const jwt = await certificates.credentialFor(certificate);
	return new Response(jwt, {
		headers: {
			'content-type': 'application/vc+jwt',
			'content-disposition': `attachment; filename="${serial}.jwt"`,
			'cache-control': 'private, no-store'
		}
	});
}) satisfies RequestHandler;
