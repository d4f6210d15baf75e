import { error } from '@sveltejs/kit';
import type { PageServerLoad } from './$types';
import { normaliseSerial, SERIAL_MAX_INPUT } from '$lib/certificates';
import * as certificates from '$lib/server/certificates';
import { verifyLimiter } from '$lib/server/certificates/limit';

export const load = (async ({ params, getClientAddress, setHeaders }) => {
	const wait = await verifyLimiter.take(getClientAddress());
	if (wait) error(429, `Too many lookups from this address. Try again in ${wait} seconds.`);
	setHeaders({ 'cache-control': 'no-store' });
	const typed = params.serial.slice(0, SERIAL_MAX_INPUT);
	const serial = params.serial.length <= SERIAL_MAX_INPUT ? normaliseSerial(params.serial) : null;
	if (!serial) return { typed, view: null, malformed: true, checkedAt: new Date().toISOString() };
	const view = await certificates.lookup(serial);
	return { typed: serial, view, malformed: false, checkedAt: new Date().toISOString() };
}) satisfies PageServerLoad;
