import { error, type Handle, type HandleServerError, type ServerInit } from '@sveltejs/kit';
import { sequence } from '@sveltejs/kit/hooks';
import { lucia } from '$lib/server/auth';
import { ring } from '$lib/server/certificates/keys';
import { dev } from '$app/environment';
import { checkDatabase, prepare } from '$lib/server/db';
import { checkStorage } from '$lib/server/storage';
import * as framework from '$lib/server/framework';
import { startDailyJobs } from '$lib/server/schedule';

export const init: ServerInit = async () => {
	try {
		// Both stores answer before anything is migrated, created or written.
		await checkDatabase();
		await checkStorage();
	} catch (err) {
		console.error(`Journeymark cannot start: ${(err as Error).message}`);
		// A served build stops with a non-zero code; the dev server shows the error instead.
		if (!dev) process.exit(1);
		throw err;
	}
	await prepare();
	await framework.ensureDefault();
	// Issuer keys exist before the first certificate or key-set request, not on it.
	await ring();
	if (process.env.DAILY_JOBS !== 'off') startDailyJobs();
};

const authenticate: Handle = async ({ event, resolve }) => {
	const sessionId = event.cookies.get(lucia.sessionCookieName);
	event.locals.user = null;
	event.locals.session = null;
	if (sessionId) {
		const { session, user } = await lucia.validateSession(sessionId);
		if (session && user?.active) {
			event.locals.user = user;
			event.locals.session = session;
			if (session.fresh) {
				const cookie = lucia.createSessionCookie(session.id);
				event.cookies.set(cookie.name, cookie.value, { path: '/', ...cookie.attributes });
			}
		} else {
			// A deactivated user's sessions end with the next request.
			if (session) await lucia.invalidateUserSessions(session.userId);
			const cookie = lucia.createBlankSessionCookie();
			event.cookies.set(cookie.name, cookie.value, { path: '/', ...cookie.attributes });
		}
	}
	return resolve(event);
};

const UNSAFE = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

/** SvelteKit's CSRF check covers form content types only; this covers JSON and the rest. */
const refuseCrossSite: Handle = async ({ event, resolve }) => {
	if (UNSAFE.has(event.request.method)) {
		const origin = event.request.headers.get('origin');
		const fetchSite = event.request.headers.get('sec-fetch-site');
		const crossOrigin = origin !== null && origin !== event.url.origin;
		if (crossOrigin || fetchSite === 'cross-site') {
			return new Response(JSON.stringify({ message: 'Cross-site requests are refused.' }), {
				status: 403,
				headers: { 'content-type': 'application/json' }
			});
		}
	}
	return resolve(event);
};

const secureHeaders: Handle = async ({ event, resolve }) => {
	const response = await resolve(event);
	response.headers.set('x-content-type-options', 'nosniff');
	response.headers.set('referrer-policy', 'same-origin');
	response.headers.set('x-frame-options', 'DENY');
	return response;
};

/**
 * A form post whose body cannot be read (a broken multipart body, or `text/plain`, which no
 * form of ours sends) is the sender's mistake. Every action reads its body through
 * `request.formData()`; wrapping that one call turns its failure into a 400 rather than a 500,
 * without parsing any body twice.
 */
const refuseUnreadableForms: Handle = async ({ event, resolve }) => {
	if (event.request.method === 'POST' && !event.url.pathname.startsWith('/api/')) {
		const read = event.request.formData.bind(event.request);
		event.request.formData = async () => {
			try {
				return await read();
			} catch {
				error(400, 'The form could not be read. Send it again from the page.');
			}
		};
	}
	return resolve(event);
};

export const handle = sequence(refuseCrossSite, authenticate, secureHeaders, refuseUnreadableForms);

export const handleError: HandleServerError = ({ error, event, status, message }) => {
	const errorId = crypto.randomUUID().slice(0, 8);
	if (status >= 500) {
		console.error(`[${errorId}] ${event.request.method} ${event.url.pathname}`, error);
		return { message: 'Something went wrong on our side.', errorId };
	}
	return { message };
};
