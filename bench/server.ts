/**
 * The built app (`node <BUILD_DIR>`) on a free 127.0.0.1 port for the benchmarks, with its own
 * database copy (SQLite file or PostgreSQL database) and temporary folders, and the small HTTP helpers the runner needs.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync, mkdirSync } from 'node:fs';
import net from 'node:net';
import path from 'node:path';

export const freePort = () =>
	new Promise<number>((resolve, reject) => {
		const server = net.createServer().listen(0, '127.0.0.1', () => {
			const { port } = server.address() as net.AddressInfo;
			server.close(() => resolve(port));
		});
		server.on('error', reject);
	});

export interface RunningServer {
	base: string;
	child: ChildProcess;
	/** The last lines the server wrote, for error messages. */
	log: () => string;
	stop: () => Promise<void>;
}

/**
 * Starts the build in `buildDir` against `database` (its DATABASE_URL: a SQLite file or a
 * postgres:// address), with mail, keys, uploads and the certificate cache under `scratch`.
 * Resolves once `/api/ping` answers.
 */
export async function startServer(
	root: string,
	buildDir: string,
	database: string,
	scratch: string
): Promise<RunningServer> {
	const entry = path.resolve(root, buildDir, 'index.js');
	if (!existsSync(entry)) {
		throw new Error(
			`No build at ${path.relative(root, entry)}: run \`npm run build\` first ` +
				'(or set BUILD_DIR to a private build).'
		);
	}
	for (const dir of ['mail', 'keys', 'uploads', 'certificates']) {
		mkdirSync(path.join(scratch, dir), { recursive: true });
	}
	const port = await freePort();
	const base = `http://127.0.0.1:${port}`;
	const child = spawn(process.execPath, [path.dirname(entry)], {
		cwd: root,
		env: {
			...process.env,
			NODE_ENV: 'production',
			HOST: '127.0.0.1',
			PORT: String(port),
			ORIGIN: base,
			DATABASE_URL: database,
			DAILY_JOBS: 'off',
			FAKE_MAIL_DIR: path.join(scratch, 'mail'),
			// Nothing the benchmarks call sends mail; a closed port makes any attempt fail fast.
			SMTP_URL: 'smtp://127.0.0.1:9',
			KEYS_DIR: path.join(scratch, 'keys'),
			UPLOADS_DIR: path.join(scratch, 'uploads'),
			CERTIFICATES_DIR: path.join(scratch, 'certificates')
		},
		stdio: ['ignore', 'pipe', 'pipe']
	});
	let output = '';
	const keep = (chunk: Buffer) => {
		output = (output + chunk.toString()).slice(-4000);
	};
	child.stdout?.on('data', keep);
	child.stderr?.on('data', keep);
	let exited = false;
	const exit = new Promise<void>((resolve) =>
		child.on('exit', () => {
			exited = true;
			resolve();
		})
	);
	const stop = async () => {
		if (exited) return;
		child.kill('SIGTERM');
		const timer = setTimeout(() => child.kill('SIGKILL'), 5000);
		await exit;
		clearTimeout(timer);
	};
	const deadline = Date.now() + 60_000;
	for (;;) {
		if (exited) throw new Error(`The server stopped at start-up:\n${output}`);
		try {
			if ((await fetch(`${base}/api/ping`)).ok) break;
		} catch {
			// not listening yet
		}
		if (Date.now() > deadline) {
			await stop();
			throw new Error(`The server did not answer within 60 s:\n${output}`);
		}
		await new Promise((r) => setTimeout(r, 100));
	}
	return { base, child, log: () => output, stop };
}

/** Signs in through the `/login` form action, as a browser would; returns the Cookie header. */
export async function signIn(base: string, email: string, password: string): Promise<string> {
	const res = await fetch(`${base}/login`, {
		method: 'POST',
		redirect: 'manual',
		headers: {
			accept: 'text/html',
			'content-type': 'application/x-www-form-urlencoded',
			origin: base
		},
		body: new URLSearchParams({ email, password })
	});
	const cookie = res.headers
		.getSetCookie()
		.map((c) => c.split(';')[0])
		.find((c) => c.startsWith('jm_session=') && c !== 'jm_session=');
	if (res.status !== 303 || !cookie) {
		throw new Error(
			`Signing in as ${email} answered ${res.status}: ${(await res.text()).slice(0, 300)}`
		);
	}
	return cookie;
}

/** Times one GET until its whole body has arrived; throws unless it answers 200. */
export async function timedGet(url: string, cookie: string): Promise<{ ms: number; body: string }> {
	const started = performance.now();
	const res = await fetch(url, { headers: { cookie }, redirect: 'manual' });
	const body = await res.text();
	const ms = performance.now() - started;
	if (res.status !== 200)
		throw new Error(`GET ${url} answered ${res.status}: ${body.slice(0, 300)}`);
	return { ms, body };
}
