import { fail, redirect } from '@sveltejs/kit';
import type { Actions, PageServerLoad } from './$types';
import { requireRole } from '$lib/server/auth';
import * as worklog from '$lib/server/worklog';
import { keepValues, parseForm } from '$lib/schemas/forms';
import { rtiSchema } from '$lib/schemas/worklog';

export const load = (async (event) => {
	const user = requireRole(event, 'apprentice');
	const records = await worklog.rti.list(user.id);
	return {
		records: records.map((r) => ({
			id: r.id,
			course: r.course,
			provider: r.provider,
			completedOn: r.completedOn,
			tenths: r.tenths,
			result: r.result,
			confirmed: Boolean(r.confirmed)
		})),
		today: new Date().toISOString().slice(0, 10),
		added: event.url.searchParams.has('added')
	};
}) satisfies PageServerLoad;

export const actions = {
	add: async (event) => {
		const user = requireRole(event, 'apprentice');
		const form = await event.request.formData();
		// The record is always the apprentice's own, whatever the form says.
		form.delete('apprenticeId');
		const values = keepValues(form);
		const parsed = parseForm(rtiSchema, form);
		if (!parsed.ok) return fail(400, { values, errors: parsed.errors });
		try {
			await worklog.rti.record(user, parsed.data);
		} catch (err) {
			if (!(err instanceof worklog.EntryProblem)) throw err;
			return fail(err.status, { values, errors: err.errors });
		}
		redirect(303, '/apprentice/rti?added=1');
	}
} satisfies Actions;
