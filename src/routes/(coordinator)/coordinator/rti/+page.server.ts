import { fail, redirect } from '@sveltejs/kit';
import { z } from 'zod';
import type { Actions, PageServerLoad } from './$types';
import { requireRole } from '$lib/server/auth';
import { User } from '$lib/server/db';
import * as worklog from '$lib/server/worklog';
import { keepValues, parseForm, type FieldErrors } from '$lib/schemas/forms';
import { rtiSchema } from '$lib/schemas/worklog';

const confirmForm = z.object({
	ids: z
		.array(z.coerce.number().int().positive().max(2_147_483_647), {
			error: 'Choose the records to confirm.'
		})
		.min(1, 'Choose the records to confirm.')
		.max(200, 'Confirm at most 200 records at once.')
});

const refuse = (status: number, errors: FieldErrors) => fail(status, { errors });

const apprentices = () =>
	User.findAll({
		where: { role: 'apprentice', active: true },
		attributes: ['id', 'name'],
		order: [['name', 'ASC']],
		raw: true
	});

export const load = (async (event) => {
	requireRole(event, 'coordinator');
	const query = event.url.searchParams;
	const [waiting, people] = await Promise.all([worklog.rti.list(null), apprentices()]);
	const chosen = people.find((p) => p.id === query.get('apprentice')) ?? null;
	return {
		waiting,
		apprentices: people.map((p) => ({ id: p.id, name: p.name })),
		chosen: chosen ? { id: chosen.id, name: chosen.name } : null,
		records: chosen ? await worklog.rti.list(chosen.id) : [],
		today: new Date().toISOString().slice(0, 10),
		confirmed: Number(query.get('confirmed')) || 0,
		recorded: Number(query.get('recorded')) || null
	};
}) satisfies PageServerLoad;

export const actions = {
	confirm: async (event) => {
		const user = requireRole(event, 'coordinator');
		const form = await event.request.formData();
		const parsed = confirmForm.safeParse({ ids: form.getAll('ids') });
		if (!parsed.success) return refuse(400, { form: parsed.error.issues[0].message });
		const ids = [...new Set(parsed.data.ids)];
		const refused: { id: number; reason: string }[] = [];
		for (const id of ids) {
			try {
				await worklog.rti.confirm(user, id);
			} catch (err) {
				if (!(err instanceof worklog.EntryProblem)) throw err;
				refused.push({ id, reason: err.message });
			}
		}
		if (refused.length) return fail(409, { refused });
		redirect(303, `/coordinator/rti?confirmed=${ids.length}`);
	},
	record: async (event) => {
		const user = requireRole(event, 'coordinator');
		const form = await event.request.formData();
		const values = keepValues(form);
		// An empty choice is a missing apprentice, not a too-short id.
		if (!form.get('apprenticeId')) form.delete('apprenticeId');
		const parsed = parseForm(rtiSchema, form);
		if (!parsed.ok) return fail(400, { values, errors: parsed.errors });
		if (!parsed.data.apprenticeId) {
			const errors: FieldErrors = { apprenticeId: 'Choose an apprentice.' };
			return fail(400, { values, errors });
		}
		let row;
		try {
			row = await worklog.rti.record(user, parsed.data);
		} catch (err) {
			if (!(err instanceof worklog.EntryProblem)) throw err;
			return fail(err.status, { values, errors: err.errors });
		}
		redirect(303, `/coordinator/rti?apprentice=${row.apprenticeId}&recorded=${row.id}`);
	}
} satisfies Actions;
