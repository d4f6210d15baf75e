import { error, fail, redirect } from '@sveltejs/kit';
import type { Actions, PageServerLoad, RequestEvent } from './$types';
import { idParam } from '$lib/server/api';
import { requireRole, type SignedInUser } from '$lib/server/auth';
import * as worklog from '$lib/server/worklog';
import { returnSchema } from '$lib/schemas/worklog';

/** The entry if this journeyworker supervises its apprentice; anyone else gets the same 404. */
async function entryFor(user: SignedInUser, event: RequestEvent) {
	const entry = await worklog.detail(idParam(event.params.id));
	if (!entry || !(await worklog.canView(user, entry))) error(404, 'No such entry.');
	return entry;
}

const when = (iso: string | null) =>
	iso ? new Date(iso).toLocaleString('en-GB', { dateStyle: 'long', timeStyle: 'short' }) : null;

export const load = (async (event) => {
	const user = requireRole(event, 'supervisor');
	const entry = await entryFor(user, event);
	return {
		entry,
		submittedAt: when(entry.submittedAt),
		reviewedAt: when(entry.reviewedAt),
		done: event.url.searchParams.get('done')
	};
}) satisfies PageServerLoad;

export const actions = {
	verify: async (event) => {
		const user = requireRole(event, 'supervisor');
		const entry = await entryFor(user, event);
		const result = await worklog.verify(user, [entry.id]);
		if (result.refused.length) return fail(409, { errors: { form: result.refused[0].reason } });
		redirect(303, `/supervisor/entries/${entry.id}?done=verified`);
	},
	return: async (event) => {
		const user = requireRole(event, 'supervisor');
		const entry = await entryFor(user, event);
		const form = await event.request.formData();
		const comment = String(form.get('comment') ?? '').slice(0, 1000);
		const parsed = returnSchema.safeParse({ comment });
		if (!parsed.success) {
			return fail(400, { comment, errors: { comment: parsed.error.issues[0].message } });
		}
		try {
			await worklog.giveBack(user, entry.id, parsed.data.comment);
		} catch (err) {
			if (!(err instanceof worklog.EntryProblem)) throw err;
			return fail(err.status, { comment, errors: err.errors });
		}
		redirect(303, `/supervisor/entries/${entry.id}?done=returned`);
	}
} satisfies Actions;
