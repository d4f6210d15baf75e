import { error, fail } from '@sveltejs/kit';
import type { Actions, PageServerLoad } from './$types';
import * as assessment from '$lib/server/assessment';
import { requireRole } from '$lib/server/auth';
import { Task, TaskStep, User } from '$lib/server/db';
import * as framework from '$lib/server/framework';
import { supervises } from '$lib/server/worklog/access';
import { EntryProblem } from '$lib/server/worklog/errors';
import { keepValues } from '$lib/schemas/forms';
import { signOffSchema, taskCodeSchema } from '$lib/schemas/assessment';

async function target(supervisorId: string, apprenticeId: string, rawCode: string) {
	const code = taskCodeSchema.safeParse(rawCode);
	if (!code.success) error(404, code.error.issues[0].message);
	// Someone else's apprentice gets the same answer as no apprentice at all.
	if (apprenticeId.length > 40 || !(await supervises(supervisorId, apprenticeId))) {
		error(404, 'No such apprentice among the ones you supervise.');
	}
	return { apprenticeId, code: code.data };
}

export const load = (async (event) => {
	const user = requireRole(event, 'supervisor');
	const { apprenticeId, code } = await target(
		user.id,
		event.params.apprenticeId,
		event.params.code
	);
	const current = await framework.current();
	if (!current) error(404, 'No competency framework is published yet.');
	const task = await Task.findOne({ where: { frameworkId: current.id, code } });
	if (!task) error(404, `There is no task ${code} in the current framework.`);
	const [apprentice, steps, cells] = await Promise.all([
		User.findByPk(apprenticeId, { attributes: ['name'], rejectOnEmpty: true }),
		TaskStep.findAll({ where: { taskId: task.id }, order: [['position', 'ASC']] }),
		assessment.matrix(apprenticeId)
	]);
	const cell = cells.find((c) => c.code === code);
	return {
		apprentice: { id: apprenticeId, name: apprentice.name },
		task: {
			code: task.code,
			title: task.title,
			requiredLevel: task.requiredLevel,
			minHours: task.minHours
		},
		steps: steps.map((s) => ({ id: s.id, text: s.text, safety: s.safety })),
		standing: {
			verifiedTenths: cell?.verifiedTenths ?? 0,
			quizPassed: Boolean(cell?.quizPassed),
			level: cell?.level ?? null
		}
	};
}) satisfies PageServerLoad;

export const actions = {
	sign: async (event) => {
		const user = requireRole(event, 'supervisor');
		const { apprenticeId, code } = await target(
			user.id,
			event.params.apprenticeId,
			event.params.code
		);
		const form = await event.request.formData();
		const values = keepValues(form);
		// formToObject reads numeric path parts as array indexes, so step ids are gathered here.
		const results: Record<string, FormDataEntryValue | null> = {};
		for (const key of new Set(form.keys())) {
			const stepId = /^results\.(\d{1,10})$/.exec(key)?.[1];
			if (stepId) results[stepId] = form.get(key);
		}
		const parsed = signOffSchema.safeParse({
			level: form.get('level') ?? undefined,
			notes: form.get('notes') ?? '',
			password: form.get('password') ?? undefined,
			results,
			apprenticeId,
			code
		});
		if (!parsed.success) {
			const errors: Record<string, string> = {};
			for (const issue of parsed.error.issues) {
				const [field, step] = issue.path.map(String);
				errors[field === 'results' && step ? `step-${step}` : field || 'form'] ??= issue.message;
			}
			return fail(400, { errors, values });
		}
		try {
			const files = form.getAll('photos').filter((f): f is File => f instanceof File && f.size > 0);
			const photos = await Promise.all(
				files.map(async (f) => ({ bytes: new Uint8Array(await f.arrayBuffer()), name: f.name }))
			);
			const receipt = await assessment.signOff(user, parsed.data, event.locals.session!.id, photos);
			return { receipt };
		} catch (err) {
			if (err instanceof EntryProblem) return fail(err.status, { errors: err.errors, values });
			throw err;
		}
	}
} satisfies Actions;
