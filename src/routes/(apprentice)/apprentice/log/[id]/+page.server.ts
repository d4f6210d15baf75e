import { error, fail, redirect } from '@sveltejs/kit';
import type { Actions, PageServerLoad } from './$types';
import { idParam } from '$lib/server/api';
import { requireRole } from '$lib/server/auth';
import * as worklog from '$lib/server/worklog';
import { fillEntry, formContext, saveEntry } from '../entry-form.server';
import { NO_SCRIPT_ROWS, entryToValues, rowCount } from '../entry-values';

export const load = (async (event) => {
	const user = requireRole(event, 'apprentice');
	const id = idParam(event.params.id);
	const [entry, context] = await Promise.all([worklog.detail(id), formContext(user.id)]);
	// Someone else's entry answers exactly like a missing one.
	if (!entry || entry.apprenticeId !== user.id)
		error(404, 'No such entry, or it is not yours to see.');
	const editable = entry.status === 'draft' || entry.status === 'returned';
	const values = entryToValues(entry);
	const flag = (name: string) => event.url.searchParams.has(name);
	return {
		entry,
		editable,
		context: editable ? context : null,
		start: {
			values,
			rows: Math.max(NO_SCRIPT_ROWS, rowCount(values)),
			errors: {} as Record<string, string>
		},
		draftKey: `${user.id}:entry-${id}`,
		saved: flag('saved'),
		uploaded: flag('uploaded'),
		confirmDelete: entry.status === 'draft' && event.url.searchParams.get('confirm') === 'delete'
	};
}) satisfies PageServerLoad;

export const actions = {
	save: (event) => saveEntry(event, 'draft', idParam(event.params.id)),
	submit: (event) => saveEntry(event, 'submit', idParam(event.params.id)),
	fill: fillEntry,
	/** Evidence without JavaScript: a multipart post of the chosen photo or PDF. */
	upload: async (event) => {
		const user = requireRole(event, 'apprentice');
		const id = idParam(event.params.id);
		let form: FormData;
		try {
			form = await event.request.formData();
		} catch {
			return fail(400, { uploadError: 'The upload did not arrive whole. Try again.' });
		}
		const file = form.getAll('file').find((f): f is File => f instanceof File && f.size > 0);
		if (!file) return fail(400, { uploadError: 'Take a photo or choose a file first.' });
		try {
			await worklog.attach(user, id, new Uint8Array(await file.arrayBuffer()), file.name);
		} catch (err) {
			if (!(err instanceof worklog.EntryProblem)) throw err;
			return fail(err.status, { uploadError: err.errors.file ?? err.message });
		}
		redirect(303, `/apprentice/log/${id}?uploaded=1#evidence`);
	},
	delete: async (event) => {
		const user = requireRole(event, 'apprentice');
		const id = idParam(event.params.id);
		let keys: string[];
		try {
			keys = await worklog.discard(user, id);
		} catch (err) {
			if (!(err instanceof worklog.EntryProblem)) throw err;
			return fail(err.status, { deleteError: err.message });
		}
		const store = worklog.evidenceStorage();
		await Promise.all(keys.map((key) => store.delete(key)));
		redirect(303, '/apprentice/log?deleted=1');
	}
} satisfies Actions;
