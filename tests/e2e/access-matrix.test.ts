/**
 * Access-control matrix: every route of the app (pages, form actions, API routes, downloads)
 * × anonymous and each role, against the built server over HTTP, with the outcome expected.
 *
 * OWASP ASVS 4.0.3 V4.1.1 (access enforced on the server), V4.1.3 (least privilege),
 * V4.1.5 (fail securely), V4.2.1 (no insecure direct object references: another apprentice's
 * entry, file, matrix, progress, record and certificate are refused with 404/403).
 *
 * Allowed roles send an empty body to actions and write endpoints, so the guard lets them
 * through and validation refuses the request (400) or the item's state does (409): the walk
 * changes nothing a later test relies on. Rows whose allowed call would change shared state
 * aim at an unknown or settled item instead (noted on the row).
 */
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { readDb, send, signInCookie, type Reply } from '../helpers/http';

type Role = 'anon' | 'apprentice' | 'supervisor' | 'coordinator' | 'admin';
const ROLES: Role[] = ['anon', 'apprentice', 'supervisor', 'coordinator', 'admin'];

/**
 * Outcomes: a number is the exact status; LOGIN is a 303 to /login?next=… for pages and 401
 * for /api; HOME is a 303 to somewhere other than /login (a signed-in user sent home).
 */
const LOGIN = 'login';
const HOME = 'home';
type Outcome = number | typeof LOGIN | typeof HOME;
type Row = [method: string, path: string, ...outcomes: Outcome[]];

/**
 * Placeholders filled from the seeded database:
 *   :own* belong to the demo apprentice (Rosa, site 1, supervised by the demo journeyworker);
 *   :other* belong to Amir (another apprentice, another site, not supervised by the demo
 *   journeyworker); :bea is Bea's valid certificate.
 */
// prettier-ignore
const MATRIX: Row[] = [
//  method   path                                                         anon   appr   sup    coord  admin
	// Public pages and endpoints
	['GET',  '/',                                                         200,   HOME,  HOME,  HOME,  HOME],
	['GET',  '/login',                                                    200,   HOME,  HOME,  HOME,  HOME],
	// signed in, the page's load sends the user home after the refused form
	['POST', '/login',                                                    400,   HOME,  HOME,  HOME,  HOME],
	// signed-in roles sign out a spare session here, never the one the walk uses
	['POST', '/logout',                                                   303,   303,   303,   303,   303],
	['GET',  '/forgot',                                                   200,   200,   200,   200,   200],
	['POST', '/forgot',                                                   400,   400,   400,   400,   400],
	['GET',  '/verify',                                                   200,   200,   200,   200,   200],
	['POST', '/verify',                                                   400,   400,   400,   400,   400],
	['GET',  '/verify/:ownCert',                                          200,   200,   200,   200,   200],
	['GET',  '/reset/:token',                                             404,   404,   404,   404,   404],
	['POST', '/reset/:token',                                             404,   404,   404,   404,   404],
	['GET',  '/welcome/:token',                                           404,   404,   404,   404,   404],
	['POST', '/welcome/:token',                                           404,   404,   404,   404,   404],
	['GET',  '/logout',                                                   HOME,  HOME,  HOME,  HOME,  HOME],
	['GET',  '/.well-known/jwks.json',                                    200,   200,   200,   200,   200],
	['GET',  '/api/health',                                               200,   200,   200,   200,   200],
	['GET',  '/api/ping',                                                 200,   200,   200,   200,   200],
	['GET',  '/api/verify/:ownCert',                                      200,   200,   200,   200,   200],
	['GET',  '/api/status-lists/1',                                       200,   200,   200,   200,   200],
	// Any signed-in user
	['GET',  '/tasks',                                                    LOGIN, 200,   200,   200,   200],
	['GET',  '/tasks/:task',                                              LOGIN, 200,   200,   200,   200],
	['GET',  '/api/frameworks/:framework/tasks',                          LOGIN, 200,   200,   200,   200],
	// Apprentice pages and actions
	['GET',  '/apprentice',                                               LOGIN, 200,   403,   403,   403],
	['GET',  '/apprentice/certificates',                                  LOGIN, 200,   403,   403,   403],
	['GET',  '/apprentice/log',                                           LOGIN, 200,   403,   403,   403],
	['GET',  '/apprentice/log/:ownEntry',                                 LOGIN, 200,   403,   403,   403],
	['GET',  '/apprentice/log/:otherEntry',                               LOGIN, 404,   403,   403,   403],
	['POST', '/apprentice/log/:ownEntry?/upload',                         LOGIN, 400,   403,   403,   403],
	['POST', '/apprentice/log/:otherEntry?/upload',                       LOGIN, 404,   403,   403,   403],
	['POST', '/apprentice/log/:ownEntry?/delete',                         LOGIN, 409,   403,   403,   403],
	['POST', '/apprentice/log/:otherEntry?/delete',                       LOGIN, 404,   403,   403,   403],
	['GET',  '/apprentice/log/new',                                       LOGIN, 200,   403,   403,   403],
	['POST', '/apprentice/log/new?/save',                                 LOGIN, 400,   403,   403,   403],
	['POST', '/apprentice/log/new?/submit',                               LOGIN, 400,   403,   403,   403],
	['POST', '/apprentice/log/new?/fill',                                 LOGIN, 200,   403,   403,   403],
	['GET',  '/apprentice/matrix',                                        LOGIN, 200,   403,   403,   403],
	['GET',  '/apprentice/rti',                                           LOGIN, 200,   403,   403,   403],
	['POST', '/apprentice/rti?/add',                                      LOGIN, 400,   403,   403,   403],
	['GET',  '/apprentice/tasks/:task',                                   LOGIN, 200,   403,   403,   403],
	// unknown task code: the allowed call would otherwise start a request or knowledge check
	['POST', '/apprentice/tasks/ZZZ-99?/request',                         LOGIN, 404,   403,   403,   403],
	['GET',  '/apprentice/tasks/:task/check',                             LOGIN, 200,   403,   403,   403],
	['POST', '/apprentice/tasks/ZZZ-99/check?/start',                     LOGIN, 404,   403,   403,   403],
	['POST', '/apprentice/tasks/ZZZ-99/check?/submit',                    LOGIN, 404,   403,   403,   403],
	// Journeyworker pages and actions
	['GET',  '/supervisor',                                               LOGIN, 403,   200,   403,   403],
	['GET',  '/supervisor/queue',                                         LOGIN, 403,   200,   403,   403],
	['POST', '/supervisor/queue?/verify',                                 LOGIN, 403,   400,   403,   403],
	['POST', '/supervisor/queue?/return',                                 LOGIN, 403,   400,   403,   403],
	['GET',  '/supervisor/apprentices/:own',                              LOGIN, 403,   200,   403,   403],
	['GET',  '/supervisor/apprentices/:other',                            LOGIN, 403,   404,   403,   403],
	['GET',  '/supervisor/entries/:ownEntry',                             LOGIN, 403,   200,   403,   403],
	['GET',  '/supervisor/entries/:otherEntry',                           LOGIN, 403,   404,   403,   403],
	// settled (verified) entry: the allowed call is refused by the entry's state
	['POST', '/supervisor/entries/:ownEntry?/verify',                     LOGIN, 403,   409,   403,   403],
	['POST', '/supervisor/entries/:otherEntry?/verify',                   LOGIN, 403,   404,   403,   403],
	['POST', '/supervisor/entries/:ownEntry?/return',                     LOGIN, 403,   400,   403,   403],
	['POST', '/supervisor/entries/:otherEntry?/return',                   LOGIN, 403,   404,   403,   403],
	['GET',  '/supervisor/sign-off/:own/:task',                           LOGIN, 403,   200,   403,   403],
	['GET',  '/supervisor/sign-off/:other/:task',                         LOGIN, 403,   404,   403,   403],
	['POST', '/supervisor/sign-off/:own/:task?/sign',                     LOGIN, 403,   400,   403,   403],
	['POST', '/supervisor/sign-off/:other/:task?/sign',                   LOGIN, 403,   404,   403,   403],
	// Coordinator pages and actions
	['GET',  '/coordinator',                                              LOGIN, 403,   403,   200,   403],
	['GET',  '/coordinator/apprentices/:own',                             LOGIN, 403,   403,   200,   403],
	['POST', '/coordinator/apprentices/:own?/revoke',                     LOGIN, 403,   403,   400,   403],
	['POST', '/coordinator/apprentices/:own?/credit',                     LOGIN, 403,   403,   400,   403],
	['GET',  '/coordinator/certificates',                                 LOGIN, 403,   403,   200,   403],
	['POST', '/coordinator/certificates?/issue',                          LOGIN, 403,   403,   400,   403],
	['GET',  '/coordinator/certificates/:bea',                            LOGIN, 403,   403,   200,   403],
	['POST', '/coordinator/certificates/:bea?/revoke',                    LOGIN, 403,   403,   400,   403],
	['GET',  '/coordinator/cohorts/:cohort',                              LOGIN, 403,   403,   200,   403],
	// on-demand digest exists outside production only
	['GET',  '/coordinator/digest',                                       LOGIN, 403,   403,   404,   403],
	['POST', '/coordinator/digest?/send',                                 LOGIN, 403,   403,   404,   403],
	['GET',  '/coordinator/frameworks',                                   LOGIN, 403,   403,   200,   403],
	['POST', '/coordinator/frameworks?/start',                            LOGIN, 403,   403,   400,   403],
	['POST', '/coordinator/frameworks?/publish',                          LOGIN, 403,   403,   400,   403],
	['POST', '/coordinator/frameworks?/discard',                          LOGIN, 403,   403,   400,   403],
	['GET',  '/coordinator/frameworks/:framework',                        LOGIN, 403,   403,   200,   403],
	['POST', '/coordinator/frameworks/:framework?/addArea',               LOGIN, 403,   403,   400,   403],
	['POST', '/coordinator/frameworks/:framework?/renameArea',            LOGIN, 403,   403,   400,   403],
	['POST', '/coordinator/frameworks/:framework?/addTask',               LOGIN, 403,   403,   400,   403],
	['POST', '/coordinator/frameworks/:framework?/move',                  LOGIN, 403,   403,   400,   403],
	['POST', '/coordinator/frameworks/:framework?/deleteTask',            LOGIN, 403,   403,   400,   403],
	['POST', '/coordinator/frameworks/:framework?/deleteArea',            LOGIN, 403,   403,   400,   403],
	['GET',  '/coordinator/frameworks/:framework/diff',                   LOGIN, 403,   403,   200,   403],
	['GET',  '/coordinator/frameworks/:framework/import',                 LOGIN, 403,   403,   200,   403],
	// a published version never changes: 409 before the form is read
	['POST', '/coordinator/frameworks/:framework/import?/check',          LOGIN, 403,   403,   409,   403],
	['POST', '/coordinator/frameworks/:framework/import?/apply',          LOGIN, 403,   403,   409,   403],
	['GET',  '/coordinator/frameworks/:framework/tasks/:task',            LOGIN, 403,   403,   200,   403],
	['POST', '/coordinator/frameworks/:framework/tasks/:task?/save',      LOGIN, 403,   403,   409,   403],
	['POST', '/coordinator/frameworks/:framework/tasks/:task?/rows',      LOGIN, 403,   403,   409,   403],
	// unknown version: the allowed call would otherwise open a draft
	['POST', '/coordinator/frameworks/999999/tasks/:task?/draft',         LOGIN, 403,   403,   404,   403],
	['GET',  '/coordinator/programmes',                                   LOGIN, 403,   403,   200,   403],
	['GET',  '/coordinator/programmes/:programme',                        LOGIN, 403,   403,   200,   403],
	['POST', '/coordinator/programmes/:programme',                        LOGIN, 403,   403,   400,   403],
	['GET',  '/coordinator/questions/:task',                              LOGIN, 403,   403,   200,   403],
	['GET',  '/coordinator/rti',                                          LOGIN, 403,   403,   200,   403],
	['POST', '/coordinator/rti?/confirm',                                 LOGIN, 403,   403,   400,   403],
	['POST', '/coordinator/rti?/record',                                  LOGIN, 403,   403,   400,   403],
	// Administrator pages and actions
	['GET',  '/admin',                                                    LOGIN, 403,   403,   403,   200],
	['POST', '/admin?/invite',                                            LOGIN, 403,   403,   403,   400],
	['POST', '/admin?/role',                                              LOGIN, 403,   403,   403,   400],
	['POST', '/admin?/active',                                            LOGIN, 403,   403,   403,   400],
	['GET',  '/admin/audit',                                              LOGIN, 403,   403,   403,   200],
	['POST', '/admin/audit?/verify',                                      LOGIN, 403,   403,   403,   200],
	['GET',  '/admin/mail',                                               LOGIN, 403,   403,   403,   200],
	// Work-log API
	['GET',  '/api/log-entries',                                          LOGIN, 200,   200,   403,   403],
	['POST', '/api/log-entries',                                          LOGIN, 400,   403,   403,   403],
	['GET',  '/api/log-entries/:ownEntry',                                LOGIN, 200,   200,   200,   200],
	['GET',  '/api/log-entries/:otherEntry',                              LOGIN, 404,   404,   200,   200],
	// empty PATCH body fails validation first (a valid body is tried below); a verified entry
	// cannot be deleted
	['PATCH', '/api/log-entries/:ownEntry',                               LOGIN, 400,   403,   403,   403],
	['PATCH', '/api/log-entries/:otherEntry',                             LOGIN, 400,   403,   403,   403],
	['DELETE', '/api/log-entries/:ownEntry',                              LOGIN, 409,   403,   403,   403],
	['DELETE', '/api/log-entries/:otherEntry',                            LOGIN, 404,   403,   403,   403],
	['POST', '/api/log-entries/:ownEntry/evidence',                       LOGIN, 400,   403,   403,   403],
	['POST', '/api/log-entries/:otherEntry/evidence',                     LOGIN, 400,   403,   403,   403],
	['POST', '/api/log-entries/:ownEntry/return',                         LOGIN, 403,   400,   403,   403],
	['POST', '/api/log-entries/:otherEntry/return',                       LOGIN, 403,   400,   403,   403],
	['POST', '/api/log-entries/:ownEntry/verify',                         LOGIN, 403,   409,   403,   403],
	['POST', '/api/log-entries/:otherEntry/verify',                       LOGIN, 403,   404,   403,   403],
	['POST', '/api/log-entries/verify',                                   LOGIN, 403,   400,   403,   403],
	// Evidence files and sign-off photos
	['GET',  '/api/evidence/:ownFile',                                    LOGIN, 200,   200,   200,   200],
	['GET',  '/api/evidence/:otherFile',                                  LOGIN, 404,   404,   200,   200],
	['GET',  '/api/evidence/:otherFile?size=thumb',                       LOGIN, 404,   404,   200,   200],
	['GET',  '/api/sign-off-photos/999999',                               LOGIN, 404,   404,   404,   404],
	// Progress, matrix, records
	['GET',  '/api/apprentices/:own/matrix',                              LOGIN, 200,   200,   200,   200],
	['GET',  '/api/apprentices/:other/matrix',                            LOGIN, 404,   404,   200,   200],
	['GET',  '/api/apprentices/:own/progress',                            LOGIN, 200,   200,   200,   200],
	['GET',  '/api/apprentices/:other/progress',                          LOGIN, 404,   404,   200,   200],
	['GET',  '/api/apprentices/:own/record.csv',                          LOGIN, 403,   403,   200,   403],
	['GET',  '/api/apprentices/:other/record.csv',                        LOGIN, 403,   403,   200,   403],
	['GET',  '/api/apprentices/:own/record.pdf',                          LOGIN, 403,   403,   200,   403],
	['GET',  '/api/apprentices/:other/record.pdf',                        LOGIN, 403,   403,   200,   403],
	['GET',  '/api/cohorts/:cohort/progress',                             LOGIN, 403,   403,   200,   403],
	['GET',  '/api/cohorts/:cohort/burn-up',                              LOGIN, 403,   403,   200,   403],
	['GET',  '/api/cohorts/:cohort/record.csv',                           LOGIN, 403,   403,   200,   403],
	['GET',  '/api/cohorts/:cohort/record.pdf',                           LOGIN, 403,   403,   200,   403],
	['GET',  '/api/frameworks/:framework/export.csv',                     LOGIN, 403,   403,   200,   403],
	['GET',  '/api/programmes/:programme',                                LOGIN, 403,   403,   200,   403],
	['PUT',  '/api/programmes/:programme',                                LOGIN, 403,   403,   400,   403],
	['GET',  '/api/sites/ratio',                                          LOGIN, 403,   403,   200,   403],
	// Assessment API (the attempt id is checked before the task; unknown task all the same)
	['POST', '/api/tasks/ZZZ-99/attempts',                                LOGIN, 400,   403,   403,   403],
	['POST', '/api/sign-offs',                                            LOGIN, 403,   400,   403,   403],
	['POST', '/api/sign-offs/:signOff/revoke',                            LOGIN, 403,   403,   400,   403],
	// Certificates: holder, coordinator and admin may download; nobody else's
	['GET',  '/api/certificates/:ownCert/pdf',                            LOGIN, 200,   404,   200,   200],
	['GET',  '/api/certificates/:bea/pdf',                                LOGIN, 404,   404,   200,   200],
	['GET',  '/api/certificates/:ownCert/credential',                     LOGIN, 200,   404,   200,   200],
	['GET',  '/api/certificates/:bea/credential',                         LOGIN, 404,   404,   200,   200]
];

const base = inject('baseUrl');
/** Its own local address keeps the verify rate limit of other test files untouched. */
const FROM = '127.0.0.5';
const cookies: Partial<Record<Role, string>> = {};
const ids: Record<string, string> = {};
const db = readDb(inject('databasePath'));

const fill = (path: string) =>
	path.replace(/:([A-Za-z]+)/g, (_, name: string) => {
		if (!(name in ids)) throw new Error(`No value for :${name}`);
		return encodeURIComponent(ids[name]);
	});

async function png() {
	return sharp({
		create: { width: 48, height: 32, channels: 3, background: { r: 200, g: 90, b: 20 } }
	})
		.png()
		.toBuffer();
}

async function upload(cookie: string, entryId: string) {
	const form = new FormData();
	form.append('file', new Blob([new Uint8Array(await png())], { type: 'image/png' }), 'brake.png');
	const request = new Request(`${base}/api/log-entries/${entryId}/evidence`, {
		method: 'POST',
		body: form
	});
	const body = Buffer.from(await request.arrayBuffer());
	const reply = await send(base, 'POST', `/api/log-entries/${entryId}/evidence`, {
		cookie,
		from: FROM,
		headers: { origin: base, 'content-type': request.headers.get('content-type')! },
		body
	});
	if (reply.status !== 201 && reply.status !== 200)
		throw new Error(`Upload gave ${reply.status}: ${reply.text}`);
	return String((JSON.parse(reply.text) as { id: number }).id);
}

beforeAll(async () => {
	const user = (email: string) =>
		db.one<{ id: string }>('SELECT id FROM users WHERE email = ?', [email]);
	const own = await user('apprentice@example.org');
	const other = await user('amir.haddad@riverbend-training.example');
	const bea = await user('bea.kowalczyk@riverbend-training.example');
	ids.own = own.id;
	ids.other = other.id;
	const entry = (apprentice: string, status: string) =>
		db.one<{ id: number }>(
			'SELECT id FROM log_entries WHERE apprentice_id = ? AND status = ? ORDER BY id LIMIT 1',
			[apprentice, status]
		);
	ids.ownEntry = String((await entry(own.id, 'verified')).id);
	ids.otherEntry = String((await entry(other.id, 'verified')).id);
	const cert = (holder: string) =>
		db.one<{ serial: string }>(
			"SELECT serial FROM certificates WHERE apprentice_id = ? AND revoked_at IS NULL AND (expires_at IS NULL OR expires_at > datetime('now')) ORDER BY id LIMIT 1",
			[holder]
		);
	ids.ownCert = (await cert(own.id)).serial;
	ids.bea = (await cert(bea.id)).serial;
	const profile = await db.one<{ cohort_id: number }>(
		'SELECT cohort_id FROM apprentice_profiles WHERE user_id = ?',
		[own.id]
	);
	ids.cohort = String(profile.cohort_id);
	const cohort = await db.one<{ programme_id: number }>(
		'SELECT programme_id FROM cohorts WHERE id = ?',
		[profile.cohort_id]
	);
	ids.programme = String(cohort.programme_id);
	const published = await db.one<{ id: number }>(
		"SELECT id FROM frameworks WHERE status = 'published' ORDER BY id LIMIT 1"
	);
	ids.framework = String(published.id);
	const signOff = await db.one<{ id: number; code: string }>(
		'SELECT s.id, t.code FROM sign_offs s JOIN framework_tasks t ON t.id = s.task_id WHERE s.apprentice_id = ? ORDER BY s.id LIMIT 1',
		[own.id]
	);
	ids.signOff = String(signOff.id);
	ids.task = signOff.code;
	ids.token = 'A'.repeat(43);

	for (const role of ROLES.slice(1)) {
		cookies[role] = await signInCookie(base, `${role}@example.org`, undefined, FROM);
	}
	// Evidence on a submitted (not yet verified) entry of each apprentice.
	const pending = async (apprentice: string, email: string) => {
		const row = await db.one<{ id: number }>(
			"SELECT id FROM log_entries WHERE apprentice_id = ? AND status IN ('submitted', 'returned', 'draft') ORDER BY id DESC LIMIT 1",
			[apprentice]
		);
		const cookie =
			email === 'apprentice@example.org'
				? cookies.apprentice!
				: await signInCookie(base, email, undefined, FROM);
		ids[email === 'apprentice@example.org' ? 'ownPending' : 'otherPending'] = String(row.id);
		return upload(cookie, String(row.id));
	};
	ids.ownFile = await pending(own.id, 'apprentice@example.org');
	ids.otherFile = await pending(other.id, 'amir.haddad@riverbend-training.example');
});

afterAll(() => db.close());

async function call(role: Role, method: string, path: string): Promise<Reply> {
	let cookie = role === 'anon' ? undefined : cookies[role];
	// Signing out ends the session: use a spare one (GET /logout never signs out, but alike).
	if (path === '/logout' && role !== 'anon')
		cookie = await signInCookie(base, `${role}@example.org`, undefined, FROM);
	const headers: Record<string, string> = { accept: 'text/html' };
	let body: string | undefined;
	if (method !== 'GET') {
		headers.origin = base;
		if (path.startsWith('/api/')) {
			headers['content-type'] = 'application/json';
			headers.accept = 'application/json';
			body = '{}';
		} else {
			headers['content-type'] = 'application/x-www-form-urlencoded';
			body = '';
		}
	}
	return send(base, method, path, { cookie, headers, body, from: FROM });
}

function verdict(reply: Reply, path: string): Outcome {
	if (reply.status === 303 || reply.status === 302) {
		const location = String(reply.headers.location ?? '');
		if (location.startsWith('/login?next=')) return LOGIN;
		return location.startsWith('/login') ? 303 : reply.status === 303 ? HOME : reply.status;
	}
	if (reply.status === 401 && path.startsWith('/api/')) return LOGIN;
	return reply.status;
}

describe('access-control matrix (OWASP ASVS 4.0.3 V4.1.1, V4.1.3, V4.2.1)', () => {
	it('covers every route file, every exported method and every form action', async () => {
		const { readdirSync, readFileSync } = await import('node:fs');
		const files = (readdirSync('src/routes', { recursive: true }) as string[])
			.map((f) => f.replace(/\\/g, '/'))
			.filter((f) => /\+(page\.server|server)\.ts$/.test(f));
		const rows = MATRIX.map(([method, path]) => ({
			method,
			path: path.replace(/:[A-Za-z]+/g, 'x').replace(/\?.*$/, ''),
			action: path.match(/\?\/(\w+)/)?.[1] ?? 'default'
		}));
		const missing: string[] = [];
		for (const file of files) {
			const path =
				('/' + file).replace(/\/\([^)]*\)/g, '').replace(/\/\+(page\.server|server)\.ts$/, '') ||
				'/';
			const route = new RegExp(
				'^' + path.replace(/\./g, '\\.').replace(/\[[^\]]+\]/g, '[^/]+') + '$'
			);
			const text = readFileSync(`src/routes/${file}`, 'utf8');
			const wanted: { method: string; action?: string }[] = [];
			if (file.endsWith('+server.ts')) {
				for (const m of text.matchAll(/export const (GET|POST|PUT|PATCH|DELETE)\b/g))
					wanted.push({ method: m[1] });
			} else {
				wanted.push({ method: 'GET' });
				const block = text.match(/export const actions = \{([\s\S]*?)\n\} satisfies Actions/);
				for (const m of block?.[1].matchAll(/^\t(\w+):/gm) ?? [])
					wanted.push({ method: 'POST', action: m[1] });
			}
			for (const w of wanted) {
				const found = rows.some(
					(r) =>
						r.method === w.method &&
						route.test(r.path) &&
						(w.action === undefined || r.action === w.action)
				);
				if (!found) missing.push(`${w.method} ${file}${w.action ? ` ?/${w.action}` : ''}`);
			}
		}
		expect(missing).toEqual([]);
	});

	it('walks every row with every role and gets the expected outcome', async () => {
		const wrong: string[] = [];
		for (const [method, template, ...expected] of MATRIX) {
			const path = fill(template);
			const replies = await Promise.all(ROLES.map((role) => call(role, method, path)));
			replies.forEach((reply, i) => {
				const got = verdict(reply, path);
				if (got !== expected[i]) {
					wrong.push(
						`${method} ${template} as ${ROLES[i]}: expected ${expected[i]}, got ${got} ${reply.text.slice(0, 120).replace(/\s+/g, ' ')}`
					);
				}
			});
		}
		expect(wrong).toEqual([]);
	});

	it('refuses writes to another apprentice’s pending entry even with a valid body', async () => {
		// OWASP ASVS 4.0.3 V4.2.1: the item is checked, not just the role
		const before = await db.one('SELECT * FROM log_entries WHERE id = ?', [ids.otherPending]);
		const supervisor = await db.one<{ id: string }>('SELECT id FROM users WHERE email = ?', [
			'supervisor@example.org'
		]);
		const task = await db.one<{ id: number }>(
			'SELECT id FROM framework_tasks WHERE framework_id = ? ORDER BY id LIMIT 1',
			[ids.framework]
		);
		const json = (role: Role, method: string, path: string, body: unknown) =>
			send(base, method, path, {
				cookie: cookies[role],
				from: FROM,
				headers: { origin: base, 'content-type': 'application/json' },
				body: JSON.stringify(body)
			});
		const entry = `/api/log-entries/${ids.otherPending}`;
		const valid = {
			workDate: '2026-11-30',
			hours: 1,
			repairOrder: 'RO-HIJACK',
			supervisorId: supervisor.id,
			tasks: [{ taskId: task.id, hours: 1 }]
		};
		expect((await json('apprentice', 'PATCH', entry, valid)).status).toBe(404);
		expect((await json('apprentice', 'DELETE', entry, {})).status).toBe(404);
		expect((await json('supervisor', 'POST', `${entry}/verify`, {})).status).toBe(404);
		expect(
			(await json('supervisor', 'POST', `${entry}/return`, { comment: 'Not yours to return.' }))
				.status
		).toBe(404);
		await expect(upload(cookies.apprentice!, ids.otherPending)).rejects.toThrow(/gave 404/);
		const after = await db.one('SELECT * FROM log_entries WHERE id = ?', [ids.otherPending]);
		expect(after).toEqual(before);
		const files = await db.all('SELECT id FROM evidence WHERE entry_id = ?', [ids.otherPending]);
		expect(files.map((f) => String(f.id))).toEqual([ids.otherFile]);
	});

	it('never serves another apprentice’s file bytes, whatever the id spelling', async () => {
		// OWASP ASVS 4.0.3 V4.2.1, V12.5.1
		for (const id of [
			ids.otherFile,
			`${ids.otherFile}.0`,
			`0${ids.otherFile}`,
			`+${ids.otherFile}`
		]) {
			const reply = await send(base, 'GET', `/api/evidence/${encodeURIComponent(id)}`, {
				cookie: cookies.apprentice,
				from: FROM
			});
			expect([400, 404]).toContain(reply.status);
			expect(reply.headers['content-type']).not.toMatch(/^image\//);
		}
	});
});
