import { error, fail, redirect } from '@sveltejs/kit';
import type { Actions, PageServerLoad } from './$types';
import { idParam } from '$lib/server/api';
import { requireRole } from '$lib/server/auth';
import * as programmes from '$lib/server/programmes';
import { keepValues, parseForm } from '$lib/schemas/forms';
import { PROGRAMME_DEFAULTS, probationCap, programmeRulesSchema } from '$lib/schemas/programme';

export const load = (async (event) => {
	requireRole(event, 'coordinator');
	const p = await programmes.get(idParam(event.params.id));
	if (!p) error(404, 'There is no programme with that number.');
	return {
		id: p.id,
		rules: programmes.toInput(p),
		defaults: PROGRAMME_DEFAULTS,
		probationCap: probationCap(p.ojlHours, p.termYears)
	};
}) satisfies PageServerLoad;

export const actions = {
	default: async (event) => {
		requireRole(event, 'coordinator');
		const id = idParam(event.params.id);
		const form = await event.request.formData();
		const parsed = parseForm(programmeRulesSchema, form);
		if (!parsed.ok) return fail(400, { values: keepValues(form), errors: parsed.errors });
		const saved = await programmes.update(id, parsed.data);
		if (!saved) error(404, 'There is no programme with that number.');
		redirect(303, `/coordinator/programmes/${id}?saved=1`);
	}
} satisfies Actions;
