import type { LayoutServerLoad } from './$types';
import * as outbox from '$lib/server/mail/outbox';

export const load = (({ locals }) => ({
	user: locals.user ? { name: locals.user.name, role: locals.user.role } : null,
	mailPage: outbox.available()
})) satisfies LayoutServerLoad;
