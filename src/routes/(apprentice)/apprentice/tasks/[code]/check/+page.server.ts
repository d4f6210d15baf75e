import { error, fail } from '@sveltejs/kit';
import type { Actions, PageServerLoad } from './$types';
import * as assessment from '$lib/server/assessment';
import { requireRole } from '$lib/server/auth';
import * as framework from '$lib/server/framework';
import { EntryProblem } from '$lib/server/worklog/errors';
import { answersSchema, taskCodeSchema } from '$lib/schemas/assessment';

function taskCode(raw: string) {
	const code = taskCodeSchema.safeParse(raw);
	if (!code.success) error(404, code.error.issues[0].message);
	return code.data;
}

/** Refusals from the assessment module become a form failure with their own status. */
async function refusing<T>(work: () => Promise<T>) {
	try {
		return await work();
	} catch (err) {
		if (err instanceof EntryProblem) return fail(err.status, { errors: err.errors });
		throw err;
	}
}

export const load = (async (event) => {
	requireRole(event, 'apprentice');
	const code = taskCode(event.params.code);
	const current = await framework.current();
	const card = current ? await framework.taskCard(current.id, code) : null;
	if (!card) error(404, `There is no task ${code} in the current framework.`);
	return {
		task: { code: card.code, title: card.title, questionCount: card.questionCount },
		quiz: assessment.QUIZ
	};
}) satisfies PageServerLoad;

export const actions = {
	start: async (event) => {
		const user = requireRole(event, 'apprentice');
		const code = taskCode(event.params.code);
		return refusing(async () => ({ started: await assessment.startAttempt(user, code) }));
	},
	submit: async (event) => {
		const user = requireRole(event, 'apprentice');
		taskCode(event.params.code);
		const form = await event.request.formData();
		// Each `answers.<questionId>` field may repeat (checkboxes); positions arrive as text.
		const answers: Record<string, number[]> = {};
		for (const key of new Set(form.keys())) {
			const id = /^answers\.(\d{1,10})$/.exec(key)?.[1];
			if (id) answers[id] = form.getAll(key).map((v) => Number(v));
		}
		const parsed = answersSchema.safeParse({ attemptId: form.get('attemptId'), answers });
		if (!parsed.success) {
			return fail(400, { errors: { form: 'The answers could not be read. Start a new check.' } });
		}
		const { attemptId } = parsed.data;
		return refusing(async () => ({
			result: await assessment.submitAttempt(user, attemptId, parsed.data.answers)
		}));
	}
} satisfies Actions;
