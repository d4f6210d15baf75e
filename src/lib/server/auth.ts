import { error, redirect, type RequestEvent } from '@sveltejs/kit';
import { Lucia, TimeSpan } from 'lucia';
import { config } from './config';
import { sequelizeAdapter, type UserAttributes } from './db/lucia-adapter';
import type { Role } from './db/models';

export const lucia = new Lucia(sequelizeAdapter, {
	sessionExpiresIn: new TimeSpan(12, 'h'),
	sessionCookie: {
		name: 'jm_session',
		attributes: { secure: config.ORIGIN.startsWith('https:'), sameSite: 'lax' }
	},
	getUserAttributes: (attributes) => attributes
});

declare module 'lucia' {
	interface Register {
		Lucia: typeof lucia;
		DatabaseUserAttributes: UserAttributes;
	}
}

export type SignedInUser = NonNullable<App.Locals['user']>;

/** Where each role lands after signing in. */
export const HOME: Record<Role, string> = {
	apprentice: '/apprentice',
	supervisor: '/supervisor',
	coordinator: '/coordinator',
	admin: '/admin'
};

/** The signed-in user, or a redirect to sign-in (pages) / 401 (API routes). */
export function requireUser(event: Pick<RequestEvent, 'locals' | 'url'>): SignedInUser {
	const user = event.locals.user;
	if (user) return user;
	if (event.url.pathname.startsWith('/api/')) error(401, 'Sign in first.');
	redirect(303, `/login?next=${encodeURIComponent(event.url.pathname + event.url.search)}`);
}

/** The signed-in user if their role is one of `roles`; otherwise 403. */
export function requireRole(
	event: Pick<RequestEvent, 'locals' | 'url'>,
	...roles: Role[]
): SignedInUser {
	const user = requireUser(event);
	if (!roles.includes(user.role)) error(403, 'Your role does not give access to this page.');
	return user;
}

export async function startSession(event: RequestEvent, userId: string) {
	const session = await lucia.createSession(userId, {});
	const cookie = lucia.createSessionCookie(session.id);
	event.cookies.set(cookie.name, cookie.value, { path: '/', ...cookie.attributes });
}

export async function endSession(event: RequestEvent) {
	if (event.locals.session) await lucia.invalidateSession(event.locals.session.id);
	const cookie = lucia.createBlankSessionCookie();
	event.cookies.set(cookie.name, cookie.value, { path: '/', ...cookie.attributes });
}
