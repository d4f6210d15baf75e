import { json } from '@sveltejs/kit';
import type { RequestHandler } from './$types';
import { normaliseSerial, SERIAL_MAX_INPUT } from '$lib/certificates';
import * as certificates from '$lib/server/certificates';
import { verifyLimiter } from '$lib/server/certificates/limit';

const NO_STORE = { 'cache-control': 'no-store', 'access-control-allow-origin': '*' };

/** Public check of one serial: status, holder, programme, dates, scope and the signature. */
export const GET = (async ({ params, getClientAddress }) => {
	const wait = await verifyLimiter.take(getClientAddress());
	if (wait) {
		return json(
			{ message: `Too many lookups from this address. Try again in ${wait} s.` },
			{ status: 429, headers: { ...NO_STORE, 'retry-after': String(wait) } }
		);
	}
	const serial = params.serial.length <= SERIAL_MAX_INPUT ? normaliseSerial(params.serial) : null;
	if (!serial) {
		return json(
			{
				status: 'unknown',
				message: 'That is not a Journeymark serial (JM- followed by 20 letters and digits).'
			},
			{ status: 400, headers: NO_STORE }
		);
	}
	const view = await certificates.lookup(serial);
	if (!view) return json({ status: 'unknown' }, { status: 404, headers: NO_STORE });
	return json(
		{
			serial: view.serial,
			status: view.status,
			holder: view.holder,
			programme: view.programme,
			issuedAt: view.issuedAt,
			expiresAt: view.expiresAt,
			scope: view.scope.map((a) => ({ code: a.code, name: a.name, tasks: a.tasks })),
			signatureValid: view.signatureValid
		},
		{ headers: NO_STORE }
	);
}) satisfies RequestHandler;
