import { error, fail, redirect } from '@sveltejs/kit';
import type { Actions, PageServerLoad } from './$types';
import { requireRole } from '$lib/server/auth';
import { Task } from '$lib/server/db';
import * as framework from '$lib/server/framework';
import { TASK_CODE, type FrameworkDef } from '$lib/framework/schema';
import type { TaskDef } from '$lib/framework/types';
import { formatSpec, toSI } from '$lib/units';
import { draftOnly, issueText, openDraft, saveDef, versionOf } from '../../../versions.server';
import { candidate, fieldFor, readForm } from './convert';
import { applyOp, parseOp, toForm } from './task-form';

/** Where the task sits in the definition; 404 when the code is not in this version. */
function locate(def: FrameworkDef, param: string) {
	const code = param.toUpperCase();
	if (TASK_CODE.test(code)) {
		for (const [a, area] of def.areas.entries()) {
			const t = area.tasks.findIndex((task) => task.code === code);
			if (t >= 0) return { a, t, area, task: area.tasks[t] };
		}
	}
	error(404, `There is no task ${param} in this version. Pick one from the version's list.`);
}

const view = (task: TaskDef) => ({
	...task,
	specs: task.specs.map((s) => ({ ...s, ...formatSpec(toSI(s.value, s.unit), s.unit) }))
});

export const load = (async (event) => {
	requireRole(event, 'coordinator');
	const version = await versionOf(event.params.id);
	const [def, draft] = await Promise.all([
		framework.definition(version.id),
		version.status === 'draft' ? null : openDraft(version.name)
	]);
	const { area, task } = locate(def, event.params.code);
	return {
		version,
		draftId: draft?.id ?? null,
		area: { code: area.code, name: area.name },
		task: version.status === 'draft' ? null : view(task),
		form: version.status === 'draft' ? toForm(task) : null,
		saved: event.url.searchParams.has('saved'),
		added: event.url.searchParams.has('added')
	};
}) satisfies PageServerLoad;

export const actions = {
	save: async (event) => {
		requireRole(event, 'coordinator');
		const version = await versionOf(event.params.id);
		const read = readForm(await event.request.formData());
		if (!read.ok) return fail(400, { values: null, errors: { form: read.message } });
		const values = read.form;
		const refused = draftOnly(version);
		if (refused) return fail(409, { values, errors: { form: refused } });
		const def = await framework.definition(version.id);
		const { a, t } = locate(def, event.params.code);
		const { task, origins } = candidate(values);
		// The schema judges the candidate inside the whole framework, so duplicate codes show too.
		def.areas[a].tasks[t] = task as unknown as TaskDef;
		const saved = await saveDef(version.id, def);
		if (!saved.ok) {
			const errors: Record<string, string> = {};
			for (const issue of saved.issues) {
				const [, ia, , it, ...rest] = issue.path;
				const other =
					typeof ia === 'number' && typeof it === 'number' ? def.areas[ia]?.tasks[it] : null;
				// A duplicate is reported on whichever copy comes second; either way it is this code.
				const clash = other && rest.join('.') === 'code' && other.code === task.code;
				const [field, message] =
					ia === a && it === t
						? fieldFor(rest, issue.message, origins)
						: clash
							? ['code', `Task code ${task.code} is already used by “${other.title}”.`]
							: ['form', issueText(def, issue)];
				errors[field] ??= message;
			}
			return fail(saved.status, { values, errors });
		}
		redirect(303, `/coordinator/frameworks/${version.id}/tasks/${task.code}?saved=1`);
	},
	/** Without JavaScript, adding or moving a row re-renders the form with the change; nothing is saved. */
	rows: async (event) => {
		requireRole(event, 'coordinator');
		const version = await versionOf(event.params.id);
		const form = await event.request.formData();
		const read = readForm(form);
		if (!read.ok) return fail(400, { values: null, errors: { form: read.message } });
		const refused = draftOnly(version);
		if (refused) return fail(409, { values: read.form, errors: { form: refused } });
		const op = parseOp(form.get('op'));
		if (!op)
			return fail(400, {
				values: read.form,
				errors: { form: 'That row button was not understood.' }
			});
		applyOp(read.form, op);
		return { values: read.form, errors: {} as Record<string, string> };
	},
	draft: async (event) => {
		const user = requireRole(event, 'coordinator');
		const version = await versionOf(event.params.id);
		const draft = await framework.draftFrom(version.id, user.id);
		const code = event.params.code.toUpperCase();
		const there = await Task.count({ where: { frameworkId: draft.id, code } });
		redirect(303, `/coordinator/frameworks/${draft.id}${there ? `/tasks/${code}` : ''}`);
	}
} satisfies Actions;
