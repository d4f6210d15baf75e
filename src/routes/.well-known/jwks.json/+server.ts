import { json } from '@sveltejs/kit';
import type { RequestHandler } from './$types';
import * as certificates from '$lib/server/certificates';

/** The issuer's public keys, current and retired, for anyone checking a certificate or credential. */
export const GET = (async () =>
	json(await certificates.jwks(), {
		headers: {
			'content-type': 'application/jwk-set+json',
			'cache-control': 'public, max-age=300',
			'access-control-allow-origin': '*'
		}
	})) satisfies RequestHandler;
