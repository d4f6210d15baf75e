import { fail } from '@sveltejs/kit';
import type { Actions } from './$types';
import * as accounts from '$lib/server/accounts';
import { forgotSchema } from '$lib/schemas/account';
import { keepValues, parseForm } from '$lib/schemas/forms';

export const actions = {
	default: async ({ request }) => {
		const form = await request.formData();
		const parsed = parseForm(forgotSchema, form);
		if (!parsed.ok) return fail(400, { values: keepValues(form), errors: parsed.errors });
		await accounts.requestReset(parsed.data.email);
		return { sent: true };
	}
} satisfies Actions;
