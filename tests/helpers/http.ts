import http from 'node:http';
import sqlite3 from 'sqlite3';

/**
 * Plain HTTP against the built server, with full control of the headers a browser would
 * refuse to set (Origin, Sec-Fetch-Site) and of the local address, so a test that trips the
 * per-address sign-in throttle can come from 127.0.0.x and leave other test files alone.
 */
export interface Reply {
	status: number;
	headers: http.IncomingHttpHeaders;
	body: Buffer;
	text: string;
}

export interface Send {
	cookie?: string;
	headers?: Record<string, string>;
	body?: string | Buffer;
	from?: string;
}

export function send(base: string, method: string, path: string, opts: Send = {}) {
	const url = new URL(path, base);
	const headers: Record<string, string> = { ...opts.headers };
	if (opts.cookie) headers.cookie = opts.cookie;
	if (opts.body !== undefined) headers['content-length'] = String(Buffer.byteLength(opts.body));
	return new Promise<Reply>((resolve, reject) => {
		const req = http.request(
			{
				host: url.hostname,
				port: url.port,
				path: url.pathname + url.search,
				method,
				headers,
				localAddress: opts.from,
				agent: false
			},
			(res) => {
				const chunks: Buffer[] = [];
				res.on('data', (c: Buffer) => chunks.push(c));
				res.on('end', () => {
					const body = Buffer.concat(chunks);
					resolve({
						status: res.statusCode ?? 0,
						headers: res.headers,
						body,
						text: body.toString('utf8')
					});
				});
				res.on('error', reject);
			}
		);
		req.on('error', reject);
		if (opts.body !== undefined) req.write(opts.body);
		req.end();
	});
}

/** A same-origin form post, as a browser without JavaScript would send it. */
export function postForm(
	base: string,
	path: string,
	fields: Record<string, string>,
	opts: Send = {}
) {
	return send(base, 'POST', path, {
		...opts,
		headers: {
			origin: base,
			accept: 'text/html',
			'content-type': 'application/x-www-form-urlencoded',
			...opts.headers
		},
		body: new URLSearchParams(fields).toString()
	});
}

export const SESSION_COOKIE = 'jm_session';

/** The `jm_session=…` pair from a response, or null. */
export function sessionFrom(reply: Reply): string | null {
	for (const line of reply.headers['set-cookie'] ?? []) {
		const m = line.match(/^jm_session=([^;]*)/);
		if (m && m[1]) return `${SESSION_COOKIE}=${m[1]}`;
	}
	return null;
}

/** Signs in through the login form and returns the session cookie. */
export async function signInCookie(
	base: string,
	email: string,
	password = 'journeymark-demo',
	from?: string
): Promise<string> {
	const reply = await postForm(base, '/login', { email, password }, { from });
	const cookie = sessionFrom(reply);
	if (reply.status !== 303 || !cookie)
		throw new Error(`Signing in as ${email} gave ${reply.status}: ${reply.text.slice(0, 200)}`);
	return cookie;
}

/** Read-only queries on the e2e server's database (WAL lets us read beside the server). */
export function readDb(file: string) {
	const db = new sqlite3.Database(file, sqlite3.OPEN_READONLY);
	return {
		all: <T = Record<string, unknown>>(sql: string, params: unknown[] = []) =>
			new Promise<T[]>((resolve, reject) =>
				db.all(sql, params, (err, rows) => (err ? reject(err) : resolve(rows as T[])))
			),
		one: async <T = Record<string, unknown>>(sql: string, params: unknown[] = []) => {
			const rows = await new Promise<T[]>((resolve, reject) =>
				db.all(sql, params, (err, rows) => (err ? reject(err) : resolve(rows as T[])))
			);
			if (!rows[0]) throw new Error(`No row for ${sql} ${JSON.stringify(params)}`);
			return rows[0];
		},
		close: () => new Promise<void>((r) => db.close(() => r()))
	};
}
