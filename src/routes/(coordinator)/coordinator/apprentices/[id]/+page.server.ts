import { error, fail, redirect } from '@sveltejs/kit';
import type { Actions, PageServerLoad } from './$types';
import * as assessment from '$lib/server/assessment';
import { requireRole } from '$lib/server/auth';
import { ApprenticeProfile, User } from '$lib/server/db';
import { EntryProblem } from '$lib/server/worklog/errors';
import * as programmes from '$lib/server/programmes';
import { keepValues, parseForm } from '$lib/schemas/forms';
import { revokeSchema, taskCodeSchema } from '$lib/schemas/assessment';
import { priorCreditSchema } from '$lib/schemas/programme';

async function apprenticeOr404(id: string) {
	if (id.length > 40 || !(await ApprenticeProfile.findByPk(id))) error(404, 'No such apprentice.');
	return User.findByPk(id, { attributes: ['id', 'name'], rejectOnEmpty: true });
}

export const load = (async (event) => {
	requireRole(event, 'coordinator');
	const apprentice = await apprenticeOr404(event.params.id);
	const code = taskCodeSchema.safeParse(event.url.searchParams.get('task') ?? '');
	const [cells, history, profile] = await Promise.all([
		assessment.matrix(apprentice.id),
		code.success ? assessment.history(apprentice.id, code.data) : [],
		ApprenticeProfile.findByPk(apprentice.id, { attributes: ['priorCreditHours'] })
	]);
	const selected = code.success ? (cells.find((c) => c.code === code.data) ?? null) : null;
	return {
		apprentice: { id: apprentice.id, name: apprentice.name },
		cells,
		selected: selected && { code: selected.code, title: selected.title },
		history,
		priorCreditHours: profile?.priorCreditHours ?? 0
	};
}) satisfies PageServerLoad;

export const actions = {
	credit: async (event) => {
		const user = requireRole(event, 'coordinator');
		const apprentice = await apprenticeOr404(event.params.id);
		const form = await event.request.formData();
		const parsed = parseForm(priorCreditSchema, form);
		if (!parsed.ok)
			return fail(400, { credit: true, values: keepValues(form), errors: parsed.errors });
		const { priorCreditHours, reason } = parsed.data;
		const saved = await programmes.setPriorCredit(user, apprentice.id, priorCreditHours, reason);
		if (!saved.ok) {
			return fail(400, {
				credit: true,
				values: keepValues(form),
				errors: { priorCreditHours: saved.error }
			});
		}
		redirect(303, `${event.url.pathname}?credited=1`);
	},
	revoke: async (event) => {
		const user = requireRole(event, 'coordinator');
		const apprentice = await apprenticeOr404(event.params.id);
		const form = await event.request.formData();
		// An empty level means "revoke", not "correct to level 0".
		if (form.get('correctedLevel') === '') form.delete('correctedLevel');
		const signOffId = Number(form.get('signOffId'));
		if (!Number.isInteger(signOffId) || signOffId < 1) error(400, 'Choose a sign-off.');
		form.delete('signOffId');
		const parsed = parseForm(revokeSchema, form);
		if (!parsed.ok) return fail(400, { signOffId, errors: parsed.errors });
		const task = taskCodeSchema.safeParse(form.get('task'));
		if (!task.success) error(400, 'Choose a task.');
		const history = await assessment.history(apprentice.id, task.data);
		if (!history.some((h) => h.id === signOffId)) error(404, 'No such sign-off for this task.');
		try {
			await assessment.revoke(user, signOffId, parsed.data);
		} catch (err) {
			if (err instanceof EntryProblem) return fail(err.status, { signOffId, errors: err.errors });
			throw err;
		}
		redirect(303, `${event.url.pathname}?task=${task.data}&done=1`);
	}
} satisfies Actions;
