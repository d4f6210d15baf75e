import { fail, redirect, type RequestEvent } from '@sveltejs/kit';
import { z } from 'zod';
import { requireRole } from '$lib/server/auth';
import * as framework from '$lib/server/framework';
import * as worklog from '$lib/server/worklog';
import { parseForm } from '$lib/schemas/forms';
import { entrySchema } from '$lib/schemas/worklog';
import {
	applyFill,
	compactRows,
	rowCount,
	singleTaskHours,
	type EntryValues
} from './entry-values';

const MAX_VALUE_LENGTH = 2100;
const correctsSchema = z.coerce.number().int().positive().max(2_147_483_647).optional();

/** The server's date, which is the date the log rules compare with. */
export const today = () => new Date().toISOString().slice(0, 10);

/** What the log form offers: recent choices, the journeyworkers and every task to pick from. */
export async function formContext(apprenticeId: string) {
	const [suggestions, current] = await Promise.all([
		worklog.queries.suggestions(apprenticeId),
		framework.current()
	]);
	const all = current ? await framework.tasks(current.id, { limit: 500, offset: 0 }) : null;
	return {
		today: today(),
		frameworkId: current?.id ?? null,
		taskOptions: (all?.rows ?? []).map((t) => ({
			id: t.id,
			code: t.code,
			title: t.title,
			areaName: t.areaName
		})),
		...suggestions
	};
}

/** The posted text fields, kept as typed so the form can show them again. */
function postedValues(form: FormData): EntryValues {
	const values: EntryValues = {};
	for (const [key, value] of form) {
		if (typeof value !== 'string' || key.startsWith('$ACTION') || key === 'fill') continue;
		if (key.length <= 40) values[key] = value.slice(0, MAX_VALUE_LENGTH);
	}
	return values;
}

function toFormData(values: EntryValues): FormData {
	const form = new FormData();
	for (const [key, value] of Object.entries(values)) form.append(key, value);
	return form;
}

/** Saves the posted entry as a draft or submits it; refusals come back on their fields. */
export async function saveEntry(event: RequestEvent, intent: 'draft' | 'submit', entryId?: number) {
	const user = requireRole(event, 'apprentice');
	const form = await event.request.formData();
	const posted = postedValues(form);
	const { values, rows } = compactRows(posted, rowCount(posted));
	const single = singleTaskHours(values, rows);
	if (single) values[single.key] = single.value;

	const parsed = parseForm(entrySchema, toFormData(values));
	const corrects = correctsSchema.safeParse(values.correctsId || undefined);
	if (!parsed.ok || !corrects.success) {
		const errors = parsed.ok ? {} : parsed.errors;
		if (!corrects.success) errors.form = 'The entry to correct is not a valid entry number.';
		return fail(400, { values, rows, errors });
	}
	let saved: { id: number };
	try {
		saved = entryId
			? await worklog.update(user, entryId, parsed.data, intent)
			: await worklog.create(user, parsed.data, intent, corrects.data);
	} catch (err) {
		if (!(err instanceof worklog.EntryProblem)) throw err;
		return fail(err.status, { values, rows, errors: err.errors });
	}
	redirect(
		303,
		intent === 'submit' ? `/apprentice/log?sent=${saved.id}` : `/apprentice/log/${saved.id}?saved=1`
	);
}

/** A shortcut tapped without JavaScript: the same form again with the shortcut applied. */
export async function fillEntry(event: RequestEvent) {
	const user = requireRole(event, 'apprentice');
	const form = await event.request.formData();
	const values = postedValues(form);
	const { vehicles } = await worklog.queries.suggestions(user.id);
	const filled = applyFill(values, rowCount(values), String(form.get('fill') ?? ''), vehicles);
	return { values: filled.values, rows: filled.rows, errors: {} as Record<string, string> };
}
