import { fail, redirect } from '@sveltejs/kit';
import { z } from 'zod';
import type { Actions, PageServerLoad } from './$types';
import { requireRole } from '$lib/server/auth';
import * as people from '$lib/server/people';
import * as worklog from '$lib/server/worklog';
import { returnSchema, verifyManySchema } from '$lib/schemas/worklog';
import { filterQuery, readFilter } from './filter';

const returnForm = returnSchema.extend({
	id: z.coerce.number().int().positive().max(2_147_483_647)
});

/** The entries themselves load through the API in `+page.ts`; this adds the filter's choices. */
export const load = (async (event) => {
	const user = requireRole(event, 'supervisor');
	const apprentices = await people.supervisedBy(user.id);
	return { apprentices: apprentices.map((a) => ({ id: a.id, name: a.name })) };
}) satisfies PageServerLoad;

const refuse = (status: number, errors: Record<string, string>) => fail(status, { errors });

const back = (url: URL, done: Record<string, string>) =>
	`/supervisor/queue?${filterQuery(readFilter(url.searchParams), done)}`;

/** The same review as the API, for a browser without JavaScript. */
export const actions = {
	verify: async (event) => {
		const user = requireRole(event, 'supervisor');
		const form = await event.request.formData();
		const parsed = verifyManySchema.safeParse({ ids: form.getAll('ids') });
		if (!parsed.success) return refuse(400, { form: parsed.error.issues[0].message });
		const result = await worklog.verify(user, [...new Set(parsed.data.ids)]);
		if (result.refused.length) return fail(409, result);
		redirect(303, back(event.url, { verified: String(result.verified.length) }));
	},
	return: async (event) => {
		const user = requireRole(event, 'supervisor');
		const form = await event.request.formData();
		const parsed = returnForm.safeParse(Object.fromEntries(form));
		const returnId = Number(form.get('id'));
		if (!parsed.success) {
			const issue = parsed.error.issues[0];
			const errors: Record<string, string> = {
				[issue.path[0] === 'comment' ? 'comment' : 'form']: issue.message
			};
			return fail(400, { returnId, comment: String(form.get('comment') ?? ''), errors });
		}
		try {
			await worklog.giveBack(user, parsed.data.id, parsed.data.comment);
		} catch (err) {
			if (!(err instanceof worklog.EntryProblem)) throw err;
			return fail(err.status, { returnId, comment: parsed.data.comment, errors: err.errors });
		}
		redirect(303, back(event.url, { returned: '1' }));
	}
} satisfies Actions;
