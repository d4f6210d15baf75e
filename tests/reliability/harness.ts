/**
 * The reliability runs' machinery: a seeded database in a temporary folder, the fake SMTP
 * server, the built app (`node build`) on 127.0.0.1 that can be killed and restarted on the same
 * database, a keep-alive HTTP client, and read-only SQLite helpers for the checks.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { createWriteStream, existsSync, mkdtempSync, readFileSync, statSync } from 'node:fs';
import http from 'node:http';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import sqlite3 from 'sqlite3';
import { startFakeSmtp } from '../../fakes/smtp';

export const ROOT = path.resolve(import.meta.dirname, '../..');

export const freePort = () =>
	new Promise<number>((resolve) => {
		const server = net.createServer().listen(0, '127.0.0.1', () => {
			const { port } = server.address() as net.AddressInfo;
			server.close(() => resolve(port));
		});
	});

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/**
 * Runs a command to its end; resolves with its exit code and output. With `timeoutMs`, a
 * command still running then is killed (code null).
 */
export function run(
	command: string,
	args: string[],
	env: NodeJS.ProcessEnv,
	timeoutMs?: number
): Promise<{ code: number | null; out: string }> {
	return new Promise((resolve) => {
		const child = spawn(command, args, { cwd: ROOT, env, stdio: ['ignore', 'pipe', 'pipe'] });
		let out = '';
		child.stdout.on('data', (d) => (out += d));
		child.stderr.on('data', (d) => (out += d));
		const timer = timeoutMs ? setTimeout(() => child.kill('SIGKILL'), timeoutMs) : undefined;
		child.on('exit', (code) => {
			clearTimeout(timer);
			resolve({ code, out: out.trim() });
		});
	});
}

export class App {
	readonly dir: string;
	readonly databasePath: string;
	readonly logPath: string;
	baseUrl = '';
	env: NodeJS.ProcessEnv = {};
	#server: ChildProcess | null = null;
	#exited: Promise<void> = Promise.resolve();
	#mail: Awaited<ReturnType<typeof startFakeSmtp>> | null = null;
	#log;
	starts = 0;

	constructor() {
		this.dir = mkdtempSync(path.join(os.tmpdir(), 'journeymark-reliability-'));
		this.databasePath = path.join(this.dir, 'app.db');
		this.logPath = path.join(this.dir, 'server.log');
		this.#log = createWriteStream(this.logPath, { flags: 'a' });
	}

	/** Fake SMTP, a free port and the environment the app and the scripts share. */
	async prepare(): Promise<void> {
		const build = path.resolve(ROOT, process.env.BUILD_DIR || 'build');
		if (!existsSync(path.join(build, 'index.js')))
			throw new Error(`No built server in ${build}: run \`npm run build\` (or set BUILD_DIR).`);
		const mailDir = path.join(this.dir, 'mail');
		this.#mail = await startFakeSmtp({ port: 0, dir: mailDir });
		const port = await freePort();
		this.baseUrl = `http://127.0.0.1:${port}`;
		this.env = {
			...process.env,
			BUILD_DIR: build,
			NODE_ENV: 'production',
			PORT: String(port),
			HOST: '127.0.0.1',
			ORIGIN: this.baseUrl,
			DATABASE_URL: this.databasePath,
			SMTP_URL: `smtp://127.0.0.1:${this.#mail.port}`,
			FAKE_MAIL_DIR: mailDir,
			UPLOADS_DIR: path.join(this.dir, 'uploads'),
			KEYS_DIR: path.join(this.dir, 'keys'),
			CERTIFICATES_DIR: path.join(this.dir, 'certificates'),
			DAILY_JOBS: 'off'
		};
	}

	/** `tsx seed/index.ts` into the temporary database. */
	async seed(): Promise<void> {
		const result = await run(process.execPath, ['--import', 'tsx', 'seed/index.ts'], this.env);
		if (result.code !== 0) throw new Error(`Seeding failed:\n${result.out}`);
	}

	/** Starts `node build` and waits until /api/health answers 200. */
	async start(): Promise<number> {
		const started = Date.now();
		this.starts += 1;
		this.#log.write(`\n--- start ${this.starts} at ${new Date().toISOString()} ---\n`);
		const server = spawn(process.execPath, [this.env.BUILD_DIR as string], {
			cwd: ROOT,
			env: this.env,
			stdio: ['ignore', 'pipe', 'pipe']
		});
		server.stdout!.pipe(this.#log, { end: false });
		server.stderr!.pipe(this.#log, { end: false });
		this.#server = server;
		this.#exited = new Promise((resolve) => server.on('exit', () => resolve()));
		const deadline = Date.now() + 30_000;
		for (;;) {
			if (server.exitCode !== null || server.signalCode !== null)
				throw new Error(`The app exited during start-up; see ${this.logPath}`);
			try {
				const response = await request('GET', `${this.baseUrl}/api/health`);
				if (response.status === 200) return Date.now() - started;
			} catch {
				// not listening yet
			}
			if (Date.now() > deadline) throw new Error('The built server did not answer /api/health');
			await sleep(100);
		}
	}

	/** SIGKILL: no shutdown code runs, exactly like a power cut to the process. */
	async kill(): Promise<void> {
		this.#server?.kill('SIGKILL');
		await this.#exited;
		this.#server = null;
	}

	async stop(): Promise<void> {
		if (!this.#server) return;
		this.#server.kill('SIGTERM');
		const stopped = await Promise.race([this.#exited.then(() => true), sleep(10_000)]);
		if (!stopped) await this.kill();
		this.#server = null;
	}

	/** Bytes in the write-ahead log now (committed pages not yet checkpointed into the .db). */
	walBytes(): number {
		const wal = `${this.databasePath}-wal`;
		return existsSync(wal) ? statSync(wal).size : 0;
	}

	/** Lines of the server log with a SvelteKit error id: each is a 500 the app logged. */
	loggedErrors(): string[] {
		return readFileSync(this.logPath, 'utf8')
			.split('\n')
			.filter((l) => /^\[[0-9a-f]{8}\] /.test(l));
	}

	async close(): Promise<void> {
		await this.stop();
		await this.#mail?.close();
		await new Promise((r) => this.#log.end(r));
	}
}

// ---------------------------------------------------------------- HTTP

/** Keep-alive sockets without a cap, like a fleet of browsers each with its own connection. */
export const agent = new http.Agent({ keepAlive: true, maxSockets: Infinity });

export interface Reply {
	status: number;
	headers: http.IncomingHttpHeaders;
	text: string;
}

export function request(
	method: string,
	url: string,
	options: { headers?: Record<string, string>; body?: string } = {}
): Promise<Reply> {
	return new Promise((resolve, reject) => {
		const req = http.request(url, { method, agent, headers: options.headers, timeout: 30_000 });
		req.on('timeout', () => req.destroy(new Error('timed out after 30 s')));
		req.on('error', reject);
		req.on('response', (res) => {
			let text = '';
			res.setEncoding('utf8');
			res.on('data', (d) => (text += d));
			res.on('end', () => resolve({ status: res.statusCode ?? 0, headers: res.headers, text }));
			res.on('error', reject);
		});
		req.end(options.body);
	});
}

/** Signs in through the /login form action as a browser would; returns the Cookie header. */
export async function signIn(baseUrl: string, email: string, password: string): Promise<string> {
	const reply = await request('POST', `${baseUrl}/login`, {
		headers: {
			origin: baseUrl,
			'content-type': 'application/x-www-form-urlencoded',
			accept: 'text/html'
		},
		body: new URLSearchParams({ email, password }).toString()
	});
	const cookie = (reply.headers['set-cookie'] ?? [])
		.map((c) => c.split(';')[0])
		.find((c) => /=.+/.test(c));
	if (reply.status !== 303 || !cookie)
		throw new Error(`Sign-in of ${email} answered ${reply.status}: ${reply.text.slice(0, 200)}`);
	return cookie;
}

// ---------------------------------------------------------------- SQLite

export class Db {
	#db: sqlite3.Database;
	private constructor(db: sqlite3.Database) {
		this.#db = db;
	}

	static open(file: string): Promise<Db> {
		return new Promise((resolve, reject) => {
			const db = new sqlite3.Database(file, sqlite3.OPEN_READWRITE, (err) =>
				err ? reject(err) : resolve(new Db(db))
			);
		});
	}

	all<T>(sql: string, params: unknown[] = []): Promise<T[]> {
		return new Promise((resolve, reject) =>
			this.#db.all(sql, params, (err, rows) => (err ? reject(err) : resolve(rows as T[])))
		);
	}

	/** 'ok', or the problems `PRAGMA integrity_check` lists (https://sqlite.org/pragma.html). */
	async integrity(): Promise<string> {
		const rows = await this.all<{ integrity_check: string }>('PRAGMA integrity_check');
		return rows.map((r) => r.integrity_check).join('; ');
	}

	close(): Promise<void> {
		return new Promise((resolve, reject) => this.#db.close((e) => (e ? reject(e) : resolve())));
	}
}

/** `npm run audit:verify` (which calls `verify()` of src/lib/server/audit.ts) on one file. */
export async function auditVerify(
	env: NodeJS.ProcessEnv,
	databasePath: string
): Promise<{ ok: boolean; out: string }> {
	const result = await run(process.execPath, ['--import', 'tsx', 'seed/audit-verify.ts'], {
		...env,
		DATABASE_URL: databasePath
	});
	return { ok: result.code === 0 && /intact/.test(result.out), out: result.out };
}
