import { fail, redirect } from '@sveltejs/kit';
import type { Actions } from './$types';
import { serialSchema } from '$lib/certificates';

export const actions = {
	default: async ({ request }) => {
		const typed = (await request.formData()).get('serial');
		const parsed = serialSchema.safeParse(typeof typed === 'string' ? typed : '');
		if (!parsed.success) {
			return fail(400, {
				value: typeof typed === 'string' ? typed.slice(0, 40) : '',
				error: parsed.error.issues[0].message
			});
		}
		redirect(303, `/verify/${parsed.data}`);
	}
} satisfies Actions;
