import { fail, redirect } from '@sveltejs/kit';
import type { Actions, PageServerLoad } from './$types';
import * as accounts from '$lib/server/accounts';
import { HOME, startSession } from '$lib/server/auth';
import { loginSchema } from '$lib/schemas/account';
import { keepValues, parseForm } from '$lib/schemas/forms';

export const load = (({ locals }) => {
	if (locals.user) redirect(303, HOME[locals.user.role]);
}) satisfies PageServerLoad;

/** Only same-site paths may follow sign-in. */
const safeNext = (next: string | null) =>
	next && next.startsWith('/') && !next.startsWith('//') ? next : null;

export const actions = {
	default: async (event) => {
		const form = await event.request.formData();
		const values = keepValues(form);
		const parsed = parseForm(loginSchema, form);
		if (!parsed.ok) return fail(400, { values, errors: parsed.errors });

		const result = await accounts.signIn(
			parsed.data.email,
			parsed.data.password,
			event.getClientAddress()
		);
		if (!result.ok) {
			if (result.reason === 'throttled') {
				event.setHeaders({ 'retry-after': String(result.retryAfter) });
				const minutes = Math.ceil(result.retryAfter / 60);
				return fail(429, {
					values,
					errors: {
						form: `Too many failed sign-ins. Wait ${minutes} minute${minutes === 1 ? '' : 's'} and try again, or reset your password.`
					}
				});
			}
			const message =
				result.reason === 'inactive'
					? 'This account is switched off. Ask your coordinator to switch it on again.'
					: 'That e-mail and password do not match an account.';
			return fail(result.reason === 'inactive' ? 403 : 400, { values, errors: { form: message } });
		}
		await startSession(event, result.user.id);
		redirect(303, safeNext(event.url.searchParams.get('next')) ?? HOME[result.user.role]);
	}
} satisfies Actions;
