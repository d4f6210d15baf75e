/**
 * Sessions, sign-in, cross-site requests and uploads, against the built server over HTTP.
 * Each check names its OWASP ASVS 4.0.3 requirement. sign-in.test.ts covers the sign-in
 * pages themselves (wrong password, oversized fields, one cross-site form and JSON post).
 *
 * Throttling trips per-address limits, so those cases come from their own loopback addresses
 * (127.0.0.2, 127.0.0.3) and leave every other test file's address (127.0.0.1) alone. The
 * accounts whose password or sign-in state changes here are used by no other test.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import net from 'node:net';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { firstLink, waitForMail } from '../helpers/mail';
import {
	postForm,
	readDb,
	send,
	sessionFrom,
	signInCookie,
	SESSION_COOKIE,
	type Reply
} from '../helpers/http';

const base = inject('baseUrl');
const db = readDb(inject('databasePath'));
const EVIL = 'https://elsewhere.example';

afterAll(() => db.close());

const setCookie = (reply: Reply) =>
	(reply.headers['set-cookie'] ?? []).find((c) => c.startsWith(`${SESSION_COOKIE}=`)) ?? '';

/** Whether a cookie still opens a signed-in page. */
async function signedIn(cookie: string, page = '/tasks') {
	const reply = await send(base, 'GET', page, { cookie });
	return reply.status === 200;
}

describe('sessions (OWASP ASVS 4.0.3 V3)', () => {
	it('issues a new session id at sign-in and ignores a planted one (V3.2.1)', async () => {
		const planted = `${SESSION_COOKIE}=attackerchosenid000000000000000000000000`;
		const reply = await postForm(
			base,
			'/login',
			{ email: 'apprentice@example.org', password: 'journeymark-demo' },
			{ cookie: planted }
		);
		expect(reply.status).toBe(303);
		const issued = sessionFrom(reply)!;
		expect(issued).toMatch(/^jm_session=[a-z0-9]{20,}$/);
		expect(issued).not.toBe(planted);
		expect(await signedIn(issued)).toBe(true);
		expect(await signedIn(planted)).toBe(false);
		// Every sign-in gets its own id.
		const again = await signInCookie(base, 'apprentice@example.org');
		expect(again).not.toBe(issued);
	});

	it('sets the session cookie HttpOnly, SameSite=Lax, path / (V3.4.2, V3.4.3, V3.4.5)', async () => {
		const reply = await postForm(base, '/login', {
			email: 'supervisor@example.org',
			password: 'journeymark-demo'
		});
		const cookie = setCookie(reply);
		expect(cookie).toMatch(/;\s*HttpOnly/i);
		expect(cookie).toMatch(/;\s*SameSite=Lax/i);
		expect(cookie).toMatch(/;\s*Path=\//i);
		// This server's ORIGIN is http://, so the cookie cannot be Secure here; see the next test.
		expect(cookie).not.toMatch(/;\s*Secure/i);
	});

	describe('behind an https ORIGIN', () => {
		let server: ChildProcess | undefined;
		let httpsBase = '';
		const ORIGIN = 'https://journeymark.example';
		beforeAll(async () => {
			const port = await new Promise<number>((resolve) => {
				const s = net.createServer().listen(0, '127.0.0.1', () => {
					const { port } = s.address() as net.AddressInfo;
					s.close(() => resolve(port));
				});
			});
			httpsBase = `http://127.0.0.1:${port}`;
			// A second instance on the same database, as behind a TLS-terminating proxy.
			server = spawn(process.execPath, [process.env.BUILD_DIR || 'build'], {
				env: {
					...process.env,
					NODE_ENV: 'production',
					PORT: String(port),
					HOST: '127.0.0.1',
					ORIGIN,
					DATABASE_URL: inject('databasePath'),
					DAILY_JOBS: 'off'
				},
				stdio: 'ignore'
			});
			const deadline = Date.now() + 30_000;
			for (;;) {
				const ok = await send(httpsBase, 'GET', '/api/health').then(
					(r) => r.status === 200,
					() => false
				);
				if (ok) break;
				if (Date.now() > deadline) throw new Error('The https-ORIGIN instance did not start');
				await new Promise((r) => setTimeout(r, 200));
			}
		});
		afterAll(async () => {
			// Wait for the second instance to be gone before the next file uses the database.
			const exited =
				server && server.exitCode === null ? new Promise((r) => server!.once('exit', r)) : null;
			server?.kill('SIGTERM');
			await exited;
		});

		it('marks the session cookie Secure (V3.4.1)', async () => {
			const reply = await postForm(
				httpsBase,
				'/login',
				{ email: 'coordinator@example.org', password: 'journeymark-demo' },
				{ headers: { origin: ORIGIN } }
			);
			expect(reply.status).toBe(303);
			const cookie = setCookie(reply);
			expect(cookie).toMatch(/;\s*Secure/i);
			expect(cookie).toMatch(/;\s*HttpOnly/i);
			expect(cookie).toMatch(/;\s*SameSite=Lax/i);
		});
	});

	it('ends the session on the server at sign-out: the old cookie no longer works (V3.3.1)', async () => {
		const cookie = await signInCookie(base, 'coordinator@example.org');
		const other = await signInCookie(base, 'coordinator@example.org');
		expect(await signedIn(cookie, '/coordinator')).toBe(true);
		const out = await postForm(base, '/logout', {}, { cookie });
		expect(out.status).toBe(303);
		expect(out.headers.location).toBe('/login');
		// The browser is told to forget it…
		expect(setCookie(out)).toMatch(/jm_session=;|Max-Age=0/i);
		// …and replaying it anyway gets nothing: the server no longer knows it.
		const replay = await send(base, 'GET', '/coordinator', { cookie });
		expect(replay.status).toBe(303);
		expect(replay.headers.location).toBe('/login?next=%2Fcoordinator');
		const api = await send(base, 'GET', '/api/cohorts/all/progress', { cookie });
		expect(api.status).toBe(401);
		// Signing out here leaves the same person's other session alone.
		expect(await signedIn(other, '/coordinator')).toBe(true);
	});

	it('ends every session of the account when its password is reset (V3.3.3, V2.5.x)', async () => {
		const email = 'eli.sorensen@riverbend-training.example';
		const first = await signInCookie(base, email);
		const second = await signInCookie(base, email);
		expect(await signedIn(first)).toBe(true);

		const asked = await postForm(base, '/forgot', { email });
		expect(asked.status).toBeLessThan(400);
		const link = new URL(firstLink(await waitForMail(inject('mailDir'), email, /password/i)));
		const password = 'torque to spec, then mark it';
		const reset = await postForm(base, link.pathname, { password, confirm: password });
		expect(reset.status).toBe(303);
		const fresh = sessionFrom(reset)!;
		expect(fresh).toBeTruthy();

		expect(await signedIn(first)).toBe(false);
		expect(await signedIn(second)).toBe(false);
		expect(await signedIn(fresh)).toBe(true);
		const rows = await db.all<{ id: string }>(
			'SELECT s.id FROM sessions s JOIN users u ON u.id = s.user_id WHERE u.email = ?',
			[email]
		);
		expect(rows.map((r) => `${SESSION_COOKIE}=${r.id}`)).toEqual([fresh]);
		// The old password is gone, the new one works.
		const old = await postForm(base, '/login', { email, password: 'journeymark-demo' });
		expect(old.status).toBe(400);
		await signInCookie(base, email, password);
	});
});

describe('sign-in throttling (OWASP ASVS 4.0.3 V2.2.1)', () => {
	it('answers 429 with Retry-After after 5 failures on one account, even for the right password', async () => {
		const email = 'fern.achebe@riverbend-training.example';
		const from = '127.0.0.2';
		for (let i = 0; i < 5; i++) {
			const wrong = await postForm(base, '/login', { email, password: `wrong ${i}` }, { from });
			expect(wrong.status).toBe(400);
		}
		const blocked = await postForm(
			base,
			'/login',
			{ email, password: 'journeymark-demo' },
			{ from }
		);
		expect(blocked.status).toBe(429);
		const retry = Number(blocked.headers['retry-after']);
		expect(Number.isInteger(retry)).toBe(true);
		expect(retry).toBeGreaterThan(0);
		expect(retry).toBeLessThanOrEqual(15 * 60);
		expect(blocked.text).toMatch(/Too many failed sign-ins/);
		expect(sessionFrom(blocked)).toBeNull();
		// The pause is per account: another person at the same address signs in.
		await signInCookie(base, 'apprentice@example.org', undefined, from);
	});

	it('answers 429 after 20 failures from one address across accounts', async () => {
		const from = '127.0.0.3';
		for (let i = 0; i < 20; i++) {
			const wrong = await postForm(
				base,
				'/login',
				{ email: `guess.${i}@nowhere.example`, password: 'guessing' },
				{ from }
			);
			expect(wrong.status).toBe(400);
		}
		const blocked = await postForm(
			base,
			'/login',
			{ email: 'admin@example.org', password: 'journeymark-demo' },
			{ from }
		);
		expect(blocked.status).toBe(429);
		expect(Number(blocked.headers['retry-after'])).toBeGreaterThan(0);
		// Other addresses are not affected.
		await signInCookie(base, 'admin@example.org', undefined, '127.0.0.4');
	});
});

describe('cross-site requests (OWASP ASVS 4.0.3 V4.2.2, V13.2.3)', () => {
	let coordinator: string;
	let apprentice: string;
	let entryId: number;
	let programmeId: number;
	beforeAll(async () => {
		coordinator = await signInCookie(base, 'coordinator@example.org');
		apprentice = await signInCookie(base, 'apprentice@example.org');
		const own = await db.one<{ id: number }>(
			"SELECT e.id FROM log_entries e JOIN users u ON u.id = e.apprentice_id WHERE u.email = 'apprentice@example.org' AND e.status = 'verified' ORDER BY e.id LIMIT 1"
		);
		entryId = own.id;
		programmeId = (await db.one<{ id: number }>('SELECT id FROM programmes ORDER BY id LIMIT 1'))
			.id;
	});

	it('refuses a signed-in cross-site form post of every form content type (SvelteKit CSRF check)', async () => {
		const before = await db.all('SELECT id FROM users');
		const bodies: [string, string][] = [
			['application/x-www-form-urlencoded', 'name=Mallory&email=mallory%40evil.example&role=admin'],
			[
				'multipart/form-data; boundary=b',
				'--b\r\nContent-Disposition: form-data; name="email"\r\n\r\nmallory@evil.example\r\n--b--\r\n'
			],
			['text/plain', 'email=mallory@evil.example']
		];
		const admin = await signInCookie(base, 'admin@example.org');
		for (const [type, body] of bodies) {
			const reply = await send(base, 'POST', '/admin?/invite', {
				cookie: admin,
				headers: { origin: EVIL, 'content-type': type },
				body
			});
			expect(reply.status, type).toBe(403);
		}
		expect(await db.all('SELECT id FROM users')).toEqual(before);
	});

	it('refuses cross-site JSON POST, PATCH, PUT and DELETE to +server.ts routes by Origin', async () => {
		const json = (method: string, path: string, cookie: string, headers: Record<string, string>) =>
			send(base, method, path, {
				cookie,
				headers: { 'content-type': 'application/json', ...headers },
				body: '{}'
			});
		const cases: [string, string, string][] = [
			['POST', '/api/log-entries', apprentice],
			['PATCH', `/api/log-entries/${entryId}`, apprentice],
			['DELETE', `/api/log-entries/${entryId}`, apprentice],
			['PUT', `/api/programmes/${programmeId}`, coordinator],
			['POST', `/api/sign-offs/1/revoke`, coordinator]
		];
		for (const [method, path, cookie] of cases) {
			const cross = await json(method, path, cookie, { origin: EVIL });
			expect(cross.status, `${method} ${path}`).toBe(403);
			expect(JSON.parse(cross.text)).toEqual({ message: 'Cross-site requests are refused.' });
			// A browser that sends no Origin but says where the request came from.
			const fetchSite = await json(method, path, cookie, { 'sec-fetch-site': 'cross-site' });
			expect(fetchSite.status, `${method} ${path} sec-fetch-site`).toBe(403);
			// The same request from the app's own origin reaches the handler (and fails validation
			// or the entry's state instead), so the refusal above is the cross-site check's.
			const same = await json(method, path, cookie, {
				origin: base,
				'sec-fetch-site': 'same-origin'
			});
			expect(same.status, `${method} ${path} same-origin`).not.toBe(403);
			expect(same.status).toBeLessThan(500);
		}
	});
});

describe('form bodies SvelteKit passes to actions (OWASP ASVS 4.0.3 V5.1.4, V13.1.5)', () => {
	it('answers a broken form body with 400 and a wrong content type with 415, never 500', async () => {
		const post = (type: string, body: string) =>
			send(base, 'POST', '/login', {
				headers: { origin: base, accept: 'text/html', 'content-type': type },
				body
			});
		// Regression: these reached `request.formData()` in the action and answered 500.
		expect((await post('text/plain', 'email=x')).status).toBe(400);
		expect((await post('multipart/form-data; boundary=zz', 'email=x')).status).toBe(400);
		expect((await post('multipart/form-data', '--zz--')).status).toBe(400);
		expect((await post('application/json', '{"email":"x"}')).status).toBe(415);
		expect((await post('application/xml', '<x/>')).status).toBe(415);
	});
});

describe('uploads (OWASP ASVS 4.0.3 V12)', () => {
	let cookie: string;
	let entryId: number;
	const multipart = (name: string, type: string, bytes: Buffer | Uint8Array) => {
		const boundary = 'journeymarkboundary';
		const head = Buffer.from(
			`--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="${name}"\r\nContent-Type: ${type}\r\n\r\n`
		);
		return {
			type: `multipart/form-data; boundary=${boundary}`,
			body: Buffer.concat([head, Buffer.from(bytes), Buffer.from(`\r\n--${boundary}--\r\n`)])
		};
	};
	const upload = (name: string, type: string, bytes: Buffer | Uint8Array, as = cookie) => {
		const form = multipart(name, type, bytes);
		return send(base, 'POST', `/api/log-entries/${entryId}/evidence`, {
			cookie: as,
			headers: { origin: base, 'content-type': form.type },
			body: form.body
		});
	};
	const files = async () =>
		(
			await db.all<{ n: number }>('SELECT COUNT(*) AS n FROM evidence WHERE entry_id = ?', [
				entryId
			])
		)[0].n;

	beforeAll(async () => {
		const email = 'hana.petrov@riverbend-training.example';
		cookie = await signInCookie(base, email);
		const row = await db.one<{ id: number }>(
			"SELECT e.id FROM log_entries e JOIN users u ON u.id = e.apprentice_id WHERE u.email = ? AND e.status IN ('submitted', 'returned', 'draft') ORDER BY e.id DESC LIMIT 1",
			[email]
		);
		entryId = row.id;
	});

	it('judges the type from the bytes: HTML named .png and SVG are refused (V12.2.1, V12.5.2)', async () => {
		const before = await files();
		const html = await upload(
			'brake-pads.png',
			'image/png',
			Buffer.from(
				'<!doctype html><html><body><script>alert(document.cookie)</script></body></html>'
			)
		);
		expect(html.status).toBeGreaterThanOrEqual(400);
		expect(html.status).toBeLessThan(500);
		const svg = await upload(
			'diagram.svg',
			'image/svg+xml',
			Buffer.from('<svg xmlns="http://www.w3.org/2000/svg"><script>alert(1)</script></svg>')
		);
		expect(svg.status).toBeGreaterThanOrEqual(400);
		expect(svg.status).toBeLessThan(500);
		expect(await files()).toBe(before);
	});

	it('refuses a file over the 10 MB limit (V12.1.1)', async () => {
		const before = await files();
		const big = Buffer.alloc(10 * 1024 * 1024 + 1024, 0);
		Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]).copy(big);
		const reply = await upload('huge.png', 'image/png', big);
		expect(reply.status).toBe(413);
		expect(await files()).toBe(before);
	});

	it('stores a photo under its own key and serves it as an image, never inline HTML (V12.3.1, V12.5.2, V14.4.4)', async () => {
		const png = await sharp({
			create: { width: 40, height: 30, channels: 3, background: { r: 30, g: 60, b: 200 } }
		})
			.png()
			.toBuffer();
		const stored = await upload('../../../etc/<b>caliper</b>.png', 'text/html', png);
		expect(stored.status).toBe(201);
		const { id } = JSON.parse(stored.text) as { id: number };
		const row = await db.one<{ storage_key: string }>(
			'SELECT storage_key FROM evidence WHERE id = ?',
			[id]
		);
		// Never the user's filename on disk: a folder and a random UUID.
		expect(row.storage_key).toMatch(
			/^[a-z]+\/[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/
		);

		for (const path of [`/api/evidence/${id}`, `/api/evidence/${id}?size=thumb`]) {
			const reply = await send(base, 'GET', path, { cookie });
			expect(reply.status).toBe(200);
			expect(reply.headers['content-type']).toMatch(/^image\/(png|jpeg|webp)$/);
			expect(reply.headers['x-content-type-options']).toBe('nosniff');
			expect(reply.headers['content-security-policy']).toMatch(/sandbox/);
			expect(String(reply.headers['content-disposition'])).not.toMatch(/[<>]|\.\.\//);
		}

		// Another apprentice, another shop's journeyworker: 404, not the bytes (V4.2.1, V12.5.1).
		const stranger = await signInCookie(base, 'amir.haddad@riverbend-training.example');
		const journeyworker = await signInCookie(base, 'supervisor@example.org');
		for (const other of [stranger, journeyworker]) {
			const reply = await send(base, 'GET', `/api/evidence/${id}`, { cookie: other });
			expect(reply.status).toBe(404);
			expect(reply.headers['content-type']).not.toMatch(/^image\//);
		}
	});

	it('refuses an upload to another apprentice’s entry (V4.2.1)', async () => {
		const stranger = await signInCookie(base, 'amir.haddad@riverbend-training.example');
		const before = await files();
		const png = await sharp({
			create: { width: 8, height: 8, channels: 3, background: { r: 0, g: 0, b: 0 } }
		})
			.png()
			.toBuffer();
		const reply = await upload('x.png', 'image/png', png, stranger);
		expect(reply.status).toBe(404);
		expect(await files()).toBe(before);
	});
});
