import { fail, redirect } from '@sveltejs/kit';
import type { Actions, PageServerLoad } from './$types';
import { requireRole } from '$lib/server/auth';
import * as certificates from '$lib/server/certificates';
import { User } from '$lib/server/db';
import { EntryProblem } from '$lib/server/worklog/errors';

export const load = (async (event) => {
	requireRole(event, 'coordinator');
	const wanted = event.url.searchParams.get('apprentice');
	const [list, people] = await Promise.all([
		certificates.listAll(),
		User.findAll({
			where: { role: 'apprentice', active: true },
			attributes: ['id', 'name'],
			order: [['name', 'ASC']],
			raw: true
		})
	]);
	const chosen = people.find((p) => p.id === wanted) ?? null;
	return {
		certificates: list,
		apprentices: people.map((p) => ({ id: p.id, name: p.name })),
		chosen: chosen ? { id: chosen.id, name: chosen.name } : null,
		options: chosen ? await certificates.options(chosen.id) : null
	};
}) satisfies PageServerLoad;

export const actions = {
	issue: async (event) => {
		const user = requireRole(event, 'coordinator');
		const form = await event.request.formData();
		const values = {
			apprenticeId: String(form.get('apprenticeId') ?? '').slice(0, 60),
			scope: String(form.get('scope') ?? '').slice(0, 40)
		};
		let serial: string;
		try {
			({ serial } = await certificates.issue(user, values));
		} catch (err) {
			if (err instanceof EntryProblem) return fail(err.status, { values, errors: err.errors });
			throw err;
		}
		redirect(303, `/coordinator/certificates/${serial}?issued=1`);
	}
} satisfies Actions;
