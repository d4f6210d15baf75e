import { fail, redirect, type RequestEvent } from '@sveltejs/kit';
import type { z } from 'zod';
import type { Actions, PageServerLoad } from './$types';
import { requireRole } from '$lib/server/auth';
import * as framework from '$lib/server/framework';
import type { FrameworkDef } from '$lib/framework/schema';
import { keepValues, parseForm } from '$lib/schemas/forms';
import {
	draftOnly,
	findVersion,
	issueText,
	openDraft,
	saveDef,
	versionOf
} from '../versions.server';
import * as edits from './edits';

export const load = (async (event) => {
	requireRole(event, 'coordinator');
	const version = await versionOf(event.params.id);
	const [def, draft, basedOn] = await Promise.all([
		framework.definition(version.id),
		version.status === 'draft' ? null : openDraft(version.name),
		findVersion(version.basedOnId)
	]);
	const ask = event.url.searchParams;
	const deleting = def.areas
		.flatMap((a) => a.tasks.map((t) => ({ area: a.name, code: t.code, title: t.title })))
		.find((t) => t.code === ask.get('delete'));
	const deletingArea = def.areas.find((a) => a.code === ask.get('deleteArea'));
	return {
		version,
		draftId: draft?.id ?? null,
		basedOn: basedOn && { id: basedOn.id, version: basedOn.version },
		areas: def.areas.map((a) => ({
			code: a.code,
			name: a.name,
			nextCode: edits.nextTaskCode(a),
			tasks: a.tasks.map((t) => ({
				code: t.code,
				title: t.title,
				tier: t.tier,
				requiredLevel: t.requiredLevel,
				minHours: t.minHours
			}))
		})),
		confirm:
			version.status !== 'draft'
				? null
				: deleting
					? { kind: 'task' as const, ...deleting }
					: deletingArea
						? {
								kind: 'area' as const,
								code: deletingArea.code,
								name: deletingArea.name,
								tasks: deletingArea.tasks.length
							}
						: null,
		imported: ask.has('imported')
	};
}) satisfies PageServerLoad;

/** Every change follows one path: read the whole draft, change it, validate it, replace it. */
function edit<S extends z.ZodType>(
	action: string,
	schema: S,
	apply: (def: FrameworkDef, input: z.infer<S>) => edits.Applied,
	hiddenFields = false
) {
	return async (event: RequestEvent<{ id: string }>) => {
		requireRole(event, 'coordinator');
		const version = await versionOf(event.params.id);
		const form = await event.request.formData();
		const values = keepValues(form);
		const parsed = parseForm(schema, form);
		if (!parsed.ok) {
			// Buttons and hidden inputs have no place to show a message beside them.
			const errors = hiddenFields ? { form: Object.values(parsed.errors)[0] } : parsed.errors;
			return fail(400, { action, values, errors });
		}
		const refused = draftOnly(version);
		if (refused) return fail(409, { action, values, errors: { form: refused } });
		const def = await framework.definition(version.id);
		const applied = apply(def, parsed.data);
		if ('errors' in applied) return fail(400, { action, values, errors: applied.errors });
		const saved = await saveDef(version.id, def);
		if (!saved.ok) {
			const errors: Record<string, string> = {};
			const page: string[] = [];
			for (const issue of saved.issues) {
				const field = applied.fieldOf?.(issue.path);
				if (field) errors[field] ??= issue.message;
				else page.push(issueText(def, issue));
			}
			if (page.length > 0) errors.form = page.join(' ');
			return fail(saved.status, { action, values, errors });
		}
		redirect(303, `/coordinator/frameworks/${version.id}${applied.to}`);
	};
}

export const actions = {
	addArea: edit('addArea', edits.forms.addArea, edits.addArea),
	renameArea: edit('renameArea', edits.forms.renameArea, edits.renameArea),
	addTask: edit('addTask', edits.forms.addTask, edits.addTask),
	move: edit('move', edits.forms.move, edits.moveItem, true),
	deleteTask: edit('deleteTask', edits.forms.task, edits.deleteTask, true),
	deleteArea: edit('deleteArea', edits.forms.area, edits.deleteArea, true)
} satisfies Actions;
