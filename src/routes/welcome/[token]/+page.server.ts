import type { Actions, PageServerLoad } from './$types';
import * as passwordLinks from '$lib/server/password-links';

export const load = (({ params }) =>
	passwordLinks.load(params.token, 'invite')) satisfies PageServerLoad;

export const actions = {
	default: (event) => passwordLinks.action(event, 'invite')
} satisfies Actions;
