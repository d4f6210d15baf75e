/**
 * The scaled set-up end to end: two instances of the built server (`node build`) on different
 * ports, one PostgreSQL database, one S3-compatible bucket (the local stand-in in fakes/) and one
 * shared keys folder, as behind a reverse proxy. A session made on one works on the other and
 * ends on both; an entry and its photo written through one are read through the other; a
 * certificate issued on one verifies on the other; verify lookups are counted across both; the
 * weekly digest run by two hosts at once goes out once.
 * Then the refusals: an unreachable database or a missing bucket stops the server at start,
 * with a clear message, before anything is written.
 *
 * Needs TEST_POSTGRES_URL (a server it may create databases on) and a build (`npm run build`);
 * `npm run test:postgres` runs it, and `bash .ci/run` starts PostgreSQL for it.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import pg from 'pg';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FAKE_S3_KEYS, startFakeS3, type FakeS3 } from '../../fakes/s3';
import { startFakeSmtp } from '../../fakes/smtp';
import { freshPostgresDatabase, type FreshDatabase } from '../../seed/postgres';
import { freePort, run } from '../reliability/harness';

const SERVER = process.env.TEST_POSTGRES_URL;
const BUILD = path.resolve(process.env.BUILD_DIR || 'build');
const PUBLIC = 'http://journeymark.test';
const BUCKET = 'journeymark-scale';
const LOOKUPS_PER_MINUTE = 40;
const PASSWORD = 'journeymark-demo'; // seed/demo.ts
const HOLDER = 'Bea Kowalczyk'; // seed/demo.ts: has completed areas to certify

interface Instance {
	name: string;
	url: string;
	process: ChildProcess;
	output: string[];
}

/** Runs `node build` with `env`; resolves once /api/health answers. */
async function startInstance(name: string, env: NodeJS.ProcessEnv): Promise<Instance> {
	const port = await freePort();
	const child = spawn(process.execPath, [BUILD], {
		env: { ...env, PORT: String(port), HOST: '127.0.0.1' },
		stdio: ['ignore', 'pipe', 'pipe']
	});
	const output: string[] = [];
	child.stdout!.on('data', (d) => output.push(String(d)));
	child.stderr!.on('data', (d) => output.push(String(d)));
	const url = `http://127.0.0.1:${port}`;
	const deadline = Date.now() + 60_000;
	for (;;) {
		if (child.exitCode !== null) throw new Error(`${name} stopped: ${output.join('')}`);
		try {
			if ((await fetch(`${url}/api/health`)).ok) break;
		} catch {
			// not listening yet
		}
		if (Date.now() > deadline) throw new Error(`${name} did not answer: ${output.join('')}`);
		await new Promise((r) => setTimeout(r, 200));
	}
	return { name, url, process: child, output };
}

/** Starts the server expecting it to refuse; resolves with its exit code and output. */
const expectRefusal = (env: NodeJS.ProcessEnv) =>
	run(process.execPath, [BUILD], { ...env, PORT: '0', HOST: '127.0.0.1' }, 30_000);

/** A request as a browser behind the proxy sends it: the public origin, and the session cookie. */
function send(instance: Instance, pathname: string, init: RequestInit & { cookie?: string } = {}) {
	const headers = new Headers(init.headers);
	headers.set('origin', PUBLIC);
	// Form actions answer a browser's Accept with a redirect; `*/*` would get the action's JSON.
	if (!headers.has('accept')) headers.set('accept', 'text/html,application/json');
	if (init.cookie) headers.set('cookie', init.cookie);
	return fetch(`${instance.url}${pathname}`, { ...init, headers, redirect: 'manual' });
}

async function signIn(instance: Instance, email: string): Promise<string> {
	const response = await send(instance, '/login', {
		method: 'POST',
		headers: { 'content-type': 'application/x-www-form-urlencoded' },
		body: new URLSearchParams({ email, password: PASSWORD }).toString()
	});
	expect(response.status).toBe(303);
	const cookie = response.headers
		.getSetCookie()
		.map((c) => c.split(';')[0])
		.find((c) => /=.+/.test(c));
	expect(cookie).toBeDefined();
	return cookie!;
}

describe.skipIf(!SERVER)('two instances on one PostgreSQL database and one bucket', () => {
	let dir: string;
	let s3: FakeS3;
	let mail: Awaited<ReturnType<typeof startFakeSmtp>>;
	let database: FreshDatabase;
	let sql: pg.Client;
	let env: NodeJS.ProcessEnv;
	let a: Instance;
	let b: Instance;

	beforeAll(async () => {
		if (!existsSync(path.join(BUILD, 'index.js'))) throw new Error('Run `npm run build` first.');
		dir = mkdtempSync(path.join(os.tmpdir(), 'journeymark-scale-'));
		s3 = await startFakeS3({ port: 0, dir: path.join(dir, 's3'), buckets: [BUCKET] });
		mail = await startFakeSmtp({ port: 0, dir: path.join(dir, 'mail') });
		database = await freshPostgresDatabase(SERVER!);
		env = {
			...process.env,
			NODE_ENV: 'production',
			ORIGIN: PUBLIC,
			DATABASE_URL: database.url,
			STORAGE: 's3',
			S3_BUCKET: BUCKET,
			S3_ENDPOINT: s3.endpoint,
			S3_FORCE_PATH_STYLE: 'true',
			S3_ACCESS_KEY_ID: FAKE_S3_KEYS.accessKeyId,
			S3_SECRET_ACCESS_KEY: FAKE_S3_KEYS.secretAccessKey,
			// One keys folder for both, as a shared secret mount would be.
			KEYS_DIR: path.join(dir, 'keys'),
			SMTP_URL: `smtp://127.0.0.1:${mail.port}`,
			FAKE_MAIL_DIR: path.join(dir, 'mail'),
			VERIFY_LOOKUPS_PER_MINUTE: String(LOOKUPS_PER_MINUTE),
			DAILY_JOBS: 'off',
			AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: 'true'
		};
		const seeded = spawn(process.execPath, ['--import', 'tsx', 'seed/index.ts'], {
			env: { ...env, UPLOADS_DIR: path.join(dir, 'seed-uploads') },
			stdio: 'inherit'
		});
		expect(await new Promise((r) => seeded.on('exit', r))).toBe(0);
		// Each instance gets folders of its own that must stay unused: bytes go to the bucket.
		const own = (name: string) => ({
			UPLOADS_DIR: path.join(dir, `${name}-uploads`),
			CERTIFICATES_DIR: path.join(dir, `${name}-certificates`)
		});
		[a, b] = await Promise.all([
			startInstance('instance A', { ...env, ...own('a') }),
			startInstance('instance B', { ...env, ...own('b') })
		]);
		sql = new pg.Client({ connectionString: database.url });
		await sql.connect();
	}, 180_000);

	afterAll(async () => {
		for (const instance of [a, b]) instance?.process.kill('SIGTERM');
		await Promise.all(
			[a, b].map((i) =>
				i && i.process.exitCode === null ? new Promise((r) => i.process.on('exit', r)) : undefined
			)
		);
		await sql?.end();
		await database?.drop();
		await mail?.close();
		await s3?.close();
	});

	it('takes a session made on one instance on the other, and ends it on both', async () => {
		const cookie = await signIn(a, 'apprentice@example.org');
		const onB = await send(b, '/api/log-entries?size=1', { cookie });
		expect(onB.status).toBe(200);
		expect((await onB.json()).total).toBeGreaterThan(0);

		const signOut = await send(b, '/logout', {
			method: 'POST',
			cookie,
			headers: { 'content-type': 'application/x-www-form-urlencoded' },
			body: ''
		});
		expect(signOut.status).toBe(303);
		for (const instance of [a, b]) {
			const after = await send(instance, '/api/log-entries?size=1', { cookie });
			expect(after.status, instance.name).toBe(401);
		}
	});

	it('reads through one instance the entry and photo written through the other', async () => {
		const cookie = await signIn(b, 'apprentice@example.org');
		const {
			rows: [ids]
		} = await sql.query<{ supervisorId: string; taskId: number }>(
			`SELECT v.supervisor_id AS "supervisorId",
			        (SELECT t.id FROM framework_tasks t JOIN frameworks f ON f.id = t.framework_id
			          WHERE f.status = 'published' ORDER BY t.id LIMIT 1) AS "taskId"
			   FROM supervisions v JOIN users u ON u.id = v.apprentice_id
			  WHERE u.email = 'apprentice@example.org' LIMIT 1`
		);
		const created = await send(b, '/api/log-entries', {
			method: 'POST',
			cookie,
			headers: { 'content-type': 'application/json' },
			body: JSON.stringify({
				workDate: new Date().toISOString().slice(0, 10),
				hours: 0.5,
				repairOrder: 'RO-SCALE-1',
				supervisorId: ids.supervisorId,
				tasks: [{ taskId: ids.taskId, hours: 0.5 }],
				intent: 'draft'
			})
		});
		expect(created.status, await created.clone().text()).toBe(201);
		const entry = (await created.json()) as { id: number };

		const photo = await sharp({
			create: { width: 64, height: 48, channels: 3, background: { r: 200, g: 40, b: 40 } }
		})
			.jpeg()
			.toBuffer();
		const form = new FormData();
		form.set('file', new Blob([new Uint8Array(photo)], { type: 'image/jpeg' }), 'brake.jpg');
		const uploaded = await send(a, `/api/log-entries/${entry.id}/evidence`, {
			method: 'POST',
			cookie,
			body: form
		});
		expect(uploaded.status, await uploaded.clone().text()).toBe(201);
		const evidence = (await uploaded.json()) as { id: number };

		const fromA = await send(a, `/api/evidence/${evidence.id}`, { cookie });
		const fromB = await send(b, `/api/evidence/${evidence.id}`, { cookie });
		expect(fromA.status).toBe(200);
		expect(fromB.status).toBe(200);
		const bytesA = Buffer.from(await fromA.arrayBuffer());
		expect(bytesA.length).toBeGreaterThan(100);
		expect(Buffer.from(await fromB.arrayBuffer()).equals(bytesA)).toBe(true);

		const listed = await send(a, `/api/log-entries/${entry.id}`, { cookie });
		expect(listed.status).toBe(200);
		expect(JSON.stringify(await listed.json())).toContain('RO-SCALE-1');
		// The bytes are in the bucket, and neither instance's own folder was ever made.
		expect(readdirSync(path.join(dir, 's3'))).toContain(BUCKET);
		for (const name of ['a', 'b'])
			expect(existsSync(path.join(dir, `${name}-uploads`))).toBe(false);
	});

	let serial: string;

	it('verifies on one instance a certificate issued on the other', async () => {
		const cookie = await signIn(b, 'coordinator@example.org');
		const {
			rows: [holder]
		} = await sql.query<{ id: string }>('SELECT id FROM users WHERE name = $1', [HOLDER]);
		const page = await send(a, `/coordinator/certificates?apprentice=${holder.id}`, { cookie });
		expect(page.status).toBe(200);
		const scopes = [...(await page.text()).matchAll(/name="scope"[^>]*value="(area:[A-Z]+)"/g)].map(
			(m) => m[1]
		);
		expect(
			scopes.length,
			'an area the holder completed and holds nothing valid for'
		).toBeGreaterThan(0);

		const issued = await send(a, '/coordinator/certificates?/issue', {
			method: 'POST',
			cookie,
			headers: { 'content-type': 'application/x-www-form-urlencoded' },
			body: new URLSearchParams({ apprenticeId: holder.id, scope: scopes[0] }).toString()
		});
		expect(issued.status).toBe(303);
		const location = issued.headers.get('location')!;
		serial = decodeURIComponent(location.match(/certificates\/(JM-[^?]+)/)![1]);

		const verified = await send(b, `/api/verify/${serial}`);
		expect(verified.status).toBe(200);
		const body = await verified.json();
		expect(body).toMatchObject({ serial, status: 'valid', holder: HOLDER, signatureValid: true });

		const [keysA, keysB] = await Promise.all(
			[a, b].map(async (i) => (await send(i, '/.well-known/jwks.json')).json())
		);
		expect(keysB).toEqual(keysA);

		// The PDF is rendered by one instance, cached in the bucket, and served alike by both.
		const pdfB = await send(b, `/api/certificates/${serial}/pdf`, { cookie });
		expect(pdfB.status).toBe(200);
		const bytesB = Buffer.from(await pdfB.arrayBuffer());
		expect(bytesB.subarray(0, 5).toString()).toBe('%PDF-');
		const pdfA = await send(a, `/api/certificates/${serial}/pdf`, { cookie });
		expect(Buffer.from(await pdfA.arrayBuffer()).equals(bytesB)).toBe(true);
		for (const name of ['a', 'b'])
			expect(existsSync(path.join(dir, `${name}-certificates`))).toBe(false);
	});

	it('counts public lookups across both instances', async () => {
		// A one-minute window: start well inside one so the count is not reset halfway.
		const intoMinute = Date.now() % 60_000;
		if (intoMinute > 45_000) await new Promise((r) => setTimeout(r, 61_000 - intoMinute));
		let answered = 0;
		let refused = false;
		for (let i = 0; i < 2 * LOOKUPS_PER_MINUTE + 2 && !refused; i++) {
			const response = await send(i % 2 ? b : a, `/api/verify/${serial}`);
			if (response.status === 429) refused = true;
			else {
				expect(response.status).toBe(200);
				answered += 1;
			}
		}
		// Counted per process, alternating requests would get twice the allowance through.
		expect(refused).toBe(true);
		expect(answered).toBeLessThanOrEqual(LOOKUPS_PER_MINUTE);
	});

	it('sends the weekly digest once when two hosts run the scheduled job together', async () => {
		const weekly = () =>
			readdirSync(path.join(dir, 'mail'))
				.map(
					(f) => JSON.parse(readFileSync(path.join(dir, 'mail', f), 'utf8')) as { subject: string }
				)
				.filter((m) => /^Week of \d{4}-\d{2}-\d{2}: /.test(m.subject)).length;
		const before = weekly();
		const job = () => run(process.execPath, ['--import', 'tsx', 'seed/digest.ts', '--once'], env);
		const runs = await Promise.all([job(), job()]);
		for (const r of runs) expect(r.code, r.out).toBe(0);
		const said = runs.map((r) => r.out).join('\n');
		expect(said).toMatch(/Weekly digest sent to \d+ coordinator/);
		expect(said).toMatch(/already sent/);
		const {
			rows: [{ n }]
		} = await sql.query<{ n: number }>(
			`SELECT COUNT(*)::int AS n FROM users WHERE role = 'coordinator' AND active`
		);
		// Delivery to the fake server may trail the job's exit by a moment.
		const deadline = Date.now() + 5_000;
		while (weekly() - before < n && Date.now() < deadline)
			await new Promise((r) => setTimeout(r, 100));
		expect(weekly() - before).toBe(n);
	});

	it('refuses to start on a database it cannot reach, writing nothing', async () => {
		const keys = path.join(dir, 'refused-keys');
		// A database that is not there (refused whatever the server's sign-in method), and a port
		// nothing listens on; the password in the address is never repeated.
		const missing = new URL(database.url);
		missing.password = 'not-the-password';
		missing.pathname = '/jm_no_such_database';
		const nowhere = new URL(missing);
		nowhere.port = '1';
		for (const url of [missing, nowhere]) {
			const { code, out: output } = await expectRefusal({
				...env,
				DATABASE_URL: url.toString(),
				KEYS_DIR: keys
			});
			expect(code, output).toBe(1);
			expect(output).toMatch(/Journeymark cannot start: The database at postgres:\/\/[^:@/]+@/);
			expect(output).not.toContain('not-the-password');
		}
		expect(existsSync(keys)).toBe(false);
	});

	it('refuses to start with a bucket that does not exist, before touching the database', async () => {
		const empty = await freshPostgresDatabase(SERVER!);
		const keys = path.join(dir, 'refused-keys-2');
		try {
			const { code, out: output } = await expectRefusal({
				...env,
				DATABASE_URL: empty.url,
				S3_BUCKET: 'no-such-bucket',
				KEYS_DIR: keys
			});
			expect(code).toBe(1);
			expect(output).toMatch(
				/Journeymark cannot start: Storage bucket "no-such-bucket".*does not exist/
			);
			const probe = new pg.Client({ connectionString: empty.url });
			await probe.connect();
			const tables = await probe.query(
				`SELECT COUNT(*)::int AS n FROM information_schema.tables WHERE table_schema = 'public'`
			);
			await probe.end();
			expect(tables.rows[0].n).toBe(0);
			expect(existsSync(keys)).toBe(false);
			expect(readdirSync(path.join(dir, 's3'))).not.toContain('no-such-bucket');
		} finally {
			await empty.drop();
		}
	});
});
