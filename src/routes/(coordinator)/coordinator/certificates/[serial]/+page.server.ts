import { error, fail, redirect } from '@sveltejs/kit';
import type { Actions, PageServerLoad } from './$types';
import { normaliseSerial } from '$lib/certificates';
import { requireRole } from '$lib/server/auth';
import * as certificates from '$lib/server/certificates';
import { EntryProblem } from '$lib/server/worklog/errors';

const serialOf = (param: string) => {
	const serial = normaliseSerial(param);
	if (!serial) error(404, 'That is not a Journeymark serial.');
	return serial;
};

export const load = (async (event) => {
	requireRole(event, 'coordinator');
	const certificate = await certificates.detail(serialOf(event.params.serial));
	if (!certificate) error(404, 'No certificate has that serial.');
	return {
		certificate,
		issued: event.url.searchParams.has('issued'),
		revoked: event.url.searchParams.has('revoked')
	};
}) satisfies PageServerLoad;

export const actions = {
	revoke: async (event) => {
		const user = requireRole(event, 'coordinator');
		const serial = serialOf(event.params.serial);
		const form = await event.request.formData();
		const values = {
			reason: String(form.get('reason') ?? '').slice(0, 40),
			note: String(form.get('note') ?? '').slice(0, 2000)
		};
		try {
			await certificates.revoke(user, serial, {
				...values,
				reason: values.reason || undefined
			});
		} catch (err) {
			if (err instanceof EntryProblem) return fail(err.status, { values, errors: err.errors });
			throw err;
		}
		redirect(303, `/coordinator/certificates/${serial}?revoked=1`);
	}
} satisfies Actions;
