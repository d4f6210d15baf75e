import { error, fail } from '@sveltejs/kit';
import type { Actions, PageServerLoad } from './$types';
import * as assessment from '$lib/server/assessment';
import { requireRole } from '$lib/server/auth';
import * as framework from '$lib/server/framework';
import * as worklog from '$lib/server/worklog';
import { EntryProblem } from '$lib/server/worklog/errors';
import { parseForm } from '$lib/schemas/forms';
import { signOffRequestSchema, taskCodeSchema } from '$lib/schemas/assessment';

function taskCode(raw: string) {
	const code = taskCodeSchema.safeParse(raw);
	if (!code.success) error(404, code.error.issues[0].message);
	return code.data;
}

export const load = (async (event) => {
	const user = requireRole(event, 'apprentice');
	const code = taskCode(event.params.code);
	const current = await framework.current();
	if (!current) error(404, 'No competency framework is published yet.');
	const [card, cells, history, suggestions] = await Promise.all([
		framework.taskCard(current.id, code),
		assessment.matrix(user.id),
		assessment.history(user.id, code),
		worklog.queries.suggestions(user.id)
	]);
	const cell = cells.find((c) => c.code === code);
	if (!card || !cell) error(404, `There is no task ${code} in the current framework.`);
	return {
		task: {
			code: card.code,
			title: card.title,
			area: card.area,
			requiredLevel: card.requiredLevel,
			minHours: card.minHours,
			questionCount: card.questionCount
		},
		standing: {
			verifiedTenths: cell.verifiedTenths,
			level: cell.level,
			lastAssessed: cell.lastAssessed,
			quizPassed: Boolean(cell.quizPassed)
		},
		history: history.map((h) => ({
			id: h.id,
			kind: h.kind,
			level: h.level,
			by: h.by,
			signedAt: h.signedAt,
			reason: h.reason
		})),
		supervisors: suggestions.supervisors
	};
}) satisfies PageServerLoad;

export const actions = {
	request: async (event) => {
		const user = requireRole(event, 'apprentice');
		const code = taskCode(event.params.code);
		const parsed = parseForm(signOffRequestSchema, await event.request.formData());
		if (!parsed.ok) return fail(400, { errors: parsed.errors });
		try {
			await assessment.requestSignOff(user, code, parsed.data.supervisorId);
		} catch (err) {
			if (err instanceof EntryProblem) return fail(err.status, { errors: err.errors });
			throw err;
		}
		return { requested: true };
	}
} satisfies Actions;
