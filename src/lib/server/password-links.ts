import { error, fail, redirect, type RequestEvent } from '@sveltejs/kit';
import { newPasswordSchema } from '$lib/schemas/account';
import { parseForm } from '$lib/schemas/forms';
import * as accounts from './accounts';
import { HOME, startSession } from './auth';
import * as tokens from './tokens';
import type { TokenProblem } from './tokens';

type Purpose = 'invite' | 'reset';

const PROBLEMS: Record<TokenProblem, { status: number; message: (p: Purpose) => string }> = {
	unknown: {
		status: 404,
		message: () => 'This link is not valid. Check that the whole link was copied from the e-mail.'
	},
	used: {
		status: 410,
		message: (p) =>
			p === 'invite'
				? 'This invitation has already been used. Sign in, or reset your password if you forgot it.'
				: 'This reset link has already been used. Ask for a new one if you still need it.'
	},
	expired: {
		status: 410,
		message: (p) =>
			p === 'invite'
				? 'This invitation has expired. Ask your administrator to send a new one.'
				: 'This reset link has expired. Ask for a new one.'
	}
};

/** Load for an invitation or reset page: the invitee's name, or a clear 4xx. */
export async function load(token: string, purpose: Purpose) {
	const found = await tokens.find(token, purpose);
	if ('problem' in found)
		error(PROBLEMS[found.problem].status, PROBLEMS[found.problem].message(purpose));
	return { name: found.row.user.name, email: found.row.user.email };
}

/** Action for both pages: set the password, sign in, go home. */
export async function action(event: RequestEvent, purpose: Purpose) {
	const parsed = parseForm(newPasswordSchema, await event.request.formData());
	if (!parsed.ok) return fail(400, { errors: parsed.errors });
	const result = await accounts.redeem(event.params.token ?? '', purpose, parsed.data.password);
	if ('problem' in result) {
		const problem = PROBLEMS[result.problem];
		return fail(problem.status, { errors: { form: problem.message(purpose) } });
	}
	if (!result.user.active) redirect(303, '/login');
	await startSession(event, result.user.id);
	redirect(303, HOME[result.user.role]);
}
