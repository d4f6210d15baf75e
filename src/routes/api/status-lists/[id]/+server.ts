import { error } from '@sveltejs/kit';
import type { RequestHandler } from './$types';
import { idParam } from '$lib/server/api';
import * as certificates from '$lib/server/certificates';

/** The W3C Bitstring Status List credential that portable credentials point to, as a VC-JWT. */
export const GET = (async ({ params }) => {
	const jwt = await certificates.statusList(idParam(params.id));
	if (!jwt) error(404, 'No such status list.');
	return new Response(jwt, {
		headers: {
			'content-type': 'application/vc+jwt',
			'cache-control': 'no-store',
			'access-control-allow-origin': '*'
		}
	});
}) satisfies RequestHandler;
