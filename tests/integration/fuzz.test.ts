/**
 * Generated bad input (fast-check) to every `+server.ts` handler and every form action of the
 * app, called in-process the way SvelteKit calls them, on the seeded demo data. Malformed,
 * oversized, wrongly typed and hostile values: script tags, SQL fragments, path traversal,
 * huge numbers, NaN strings, unicode oddities, deeply nested JSON, wrong content types, files
 * that lie about their type.
 *
 * Checks: no case answers 5xx (OWASP ASVS 4.0.3 V5.1.3/V5.1.4 — input validated, refused
 * with a 4xx; V7.4.1 — a generic error, never a crash), then the database is intact
 * (SQLite `PRAGMA integrity_check` = ok and `PRAGMA foreign_key_check` empty, see
 * https://sqlite.org/pragma.html; on PostgreSQL, which enforces foreign keys itself, every
 * foreign key validated and every index valid), append-only tables kept their rows, and the
 * audit hash chain still verifies (`audit.verify()`, what `npm run audit:verify` runs).
 *
 * Every route file is found with `import.meta.glob`, so a new route is fuzzed without a change
 * here. Wrong content types to form actions are refused by SvelteKit itself before an action
 * runs (415); that path is checked over HTTP in tests/e2e/security.test.ts.
 */
import { isActionFailure, isHttpError, isRedirect } from '@sveltejs/kit';
import fc from 'fast-check';
import { mkdirSync } from 'node:fs';
import { QueryTypes } from 'sequelize';
import { beforeAll, describe, expect, it, vi } from 'vitest';

// SvelteKit's `sequence` needs the running server's request store; outside it, the app's
// handles are chained the same way (each one's `resolve` calls the next).
vi.mock('@sveltejs/kit/hooks', () => ({
	sequence:
		(...handles: ((input: { event: unknown; resolve: (e: unknown) => unknown }) => unknown)[]) =>
		({ event, resolve }: { event: unknown; resolve: (e: unknown) => unknown }) => {
			const step = (i: number, e: unknown): unknown =>
				i === handles.length
					? resolve(e)
					: handles[i]({ event: e, resolve: (n) => step(i + 1, n) });
			return step(0, event);
		}
}));

vi.hoisted(() => {
	// This file's temporary folder (its mail folder's parent); DATABASE_URL may be a URL.
	const dir = process.env.FAKE_MAIL_DIR!.replace(/[^/\\]+$/, '');
	process.env.KEYS_DIR = `${dir}keys`;
	process.env.CERTIFICATES_DIR = `${dir}pdf`;
	process.env.UPLOADS_DIR = `${dir}uploads`;
	process.env.DAILY_JOBS = 'off';
});

import { lucia, type SignedInUser } from '$lib/server/auth';
import * as audit from '$lib/server/audit';
import {
	Certificate,
	LogEntry,
	prepare,
	sequelize,
	Session,
	SignOff,
	Task,
	User
} from '$lib/server/db';
import * as framework from '$lib/server/framework';
import { seedCertificates } from '../../seed/certificates';
import { seedDemo } from '../../seed/demo';
import { seedSignOffs } from '../../seed/signoffs';
import { seedWorkLog } from '../../seed/worklog';
import { handle } from '../../src/hooks.server';
import { signed } from '../helpers/accounts';

type Handler = (event: never) => unknown;
type Role = 'anon' | SignedInUser['role'];

const serverModules = import.meta.glob<Record<string, Handler>>('../../src/routes/**/+server.ts', {
	eager: true
});
const pageModules = import.meta.glob<{ actions?: Record<string, Handler> }>(
	'../../src/routes/**/+page.server.ts',
	{ eager: true }
);

/** `/api/log-entries/[id]/+server.ts` → URL template and the names of its parameters. */
function routeOf(file: string) {
	const path =
		file
			.replace('../../src/routes', '')
			.replace(/\/\([^)]*\)/g, '')
			.replace(/\/\+(page\.server|server)\.ts$/, '') || '/';
	const params = [...path.matchAll(/\[([^\]]+)\]/g)].map((m) => m[1]);
	return { path, params };
}

interface Target {
	name: string;
	kind: 'api' | 'action';
	method: string;
	action?: string;
	path: string;
	params: string[];
	handler: Handler;
	runs: number;
	allowed: Role[];
}

const targets: Target[] = [];
for (const [file, mod] of Object.entries(serverModules)) {
	const { path, params } = routeOf(file);
	for (const method of ['GET', 'POST', 'PUT', 'PATCH', 'DELETE']) {
		const handler = mod[method];
		if (typeof handler !== 'function') continue;
		// PDF renderers are the slow ones: fewer cases, still with hostile ids.
		const runs = /record\.pdf|\/pdf$/.test(path) ? 10 : 32;
		targets.push({
			name: `${method} ${path}`,
			kind: 'api',
			method,
			path,
			params,
			handler,
			runs,
			allowed: []
		});
	}
}
for (const [file, mod] of Object.entries(pageModules)) {
	const { path, params } = routeOf(file);
	for (const [action, handler] of Object.entries(mod.actions ?? {})) {
		const name = action === 'default' ? `POST ${path}` : `POST ${path}?/${action}`;
		targets.push({
			name,
			kind: 'action',
			method: 'POST',
			action,
			path,
			params,
			handler,
			runs: 32,
			allowed: []
		});
	}
}

// ---------------------------------------------------------------------------------------------
// Values

const HOSTILE = [
	'<script>alert(1)</script>',
	'"><img src=x onerror=alert(1)>',
	'javascript:alert(1)',
	"' OR '1'='1",
	'1; DROP TABLE users; --',
	"' UNION SELECT password_hash FROM users --",
	'../../../../etc/passwd',
	'..%2F..%2F..%2Fetc%2Fpasswd',
	'..\\..\\windows\\win.ini',
	'/dev/zero',
	'%00',
	'\u0000',
	'\u202e\u0645\u0631\u062d\u0628\u0627',
	'\ud800',
	'\uffff\ufeff',
	'Z\u0351\u0358\u0300\u0301\u0302\u0303\u0304',
	'👨‍👩‍👧‍👦🚗🔧',
	'𝕵𝖔𝖚𝖗𝖓𝖊𝖞',
	'NaN',
	'-NaN',
	'Infinity',
	'-Infinity',
	'1e309',
	'-1e309',
	'9007199254740993',
	'99999999999999999999999999999',
	'-1',
	'-0',
	'0',
	'0x10',
	'1.5e3',
	' 12 ',
	'2026-02-30',
	'0000-00-00',
	'9999-12-31',
	'2026-13-01',
	'25:61',
	'true',
	'null',
	'undefined',
	'[object Object]',
	'__proto__',
	'constructor',
	'{"__proto__":{"admin":true}}',
	'=HYPERLINK("http://x.example","x")',
	'@SUM(1+1)',
	'${7*7}',
	'{{7*7}}',
	'\r\nSet-Cookie: x=1',
	'A'.repeat(5_000),
	'é'.repeat(70_000),
	''
];

/** Real identifiers from the seeded data, so some cases reach past the lookups. */
const real: Record<string, string[]> = {};

const realFor = (key: string) => (Object.hasOwn(real, key) ? real[key] : real.id);

const hostileText = fc.oneof(
	{ weight: 4, arbitrary: fc.constantFrom(...HOSTILE) },
	{ weight: 2, arbitrary: fc.string({ maxLength: 40 }) },
	{ weight: 2, arbitrary: fc.string({ unit: 'binary', maxLength: 40 }) },
	{ weight: 1, arbitrary: fc.string({ unit: 'grapheme', maxLength: 20 }) },
	{ weight: 1, arbitrary: fc.double().map(String) },
	{ weight: 1, arbitrary: fc.bigInt().map(String) },
	{ weight: 1, arbitrary: fc.integer().map(String) }
);

const paramValue = (name: string) =>
	fc.oneof(
		// A URL cannot carry a lone surrogate: SvelteKit hands routes well-formed strings.
		{ weight: 3, arbitrary: hostileText.map((s) => s.toWellFormed()).filter((s) => s.length > 0) },
		{ weight: 2, arbitrary: fc.constantFrom(...realFor(name)) }
	);

/** Field names read by the app's forms and JSON schemas, plus some that are not. */
// prettier-ignore
const FIELDS = [
	'email', 'password', 'confirm', 'name', 'role', 'userId', 'siteId', 'active', 'id', 'ids',
	'ids.0', 'ids.1', 'serial', 'scope', 'reason', 'note', 'notes', 'comment', 'level',
	'correctedLevel', 'signOffId', 'apprentice', 'apprenticeId', 'task', 'taskId', 'code', 'area',
	'title', 'taskCode', 'taskTitle', 'move', 'op', 'csv', 'fileName', 'attemptId', 'answers',
	'answers.0', 'results.1', 'checklist.0', 'questions.0.text', 'specs.0.value', 'workDate',
	'startTime', 'endTime', 'hours', 'repairOrder', 'vehicleYear', 'vehicleMake', 'vehicleModel',
	'vin', 'vinOverride', 'odometer', 'odometerUnit', 'standardHours', 'supervisorId',
	'tasks.0.taskId', 'tasks.0.hours', 'tasks.1.taskId', 'tasks.1.hours', 'tasks.50.hours',
	'tasks.99.hours', 'intent', 'correctsId', 'fill', 'course', 'provider', 'completedOn', 'status',
	'sort', 'q', 'page', 'view', 'size', 'tier', 'approach', 'termYears', 'ojlHours',
	'rtiHoursPerYear', 'probationHours', 'journeyworkerRate', 'wageSchedule', 'ratioRule',
	'ratioApprentices', 'ratioJourneyworkers', 'ratioEvery', 'certificateValidityMonths',
	'returnedLimit', 'stallWeeks', 'priorCreditHours', 'requiredLevel', 'minHours', 'description', 'paper',
	'__proto__.polluted', 'constructor.prototype.polluted', 'a..b', '.', '$ACTION_ID'
];

const fieldValue = (field: string) =>
	fc.oneof(
		{ weight: 3, arbitrary: hostileText },
		{ weight: 2, arbitrary: fc.constantFrom(...realFor(field.replace(/\..*$/, ''))) }
	);

const PNG_AS_HTML = new TextEncoder().encode('<!doctype html><script>alert(1)</script>');
const SVG = new TextEncoder().encode(
	'<svg xmlns="http://www.w3.org/2000/svg" onload="alert(1)"><script>alert(2)</script></svg>'
);
const fileArb = fc.record({
	bytes: fc.oneof(
		fc.constant(PNG_AS_HTML),
		fc.constant(SVG),
		fc.constant(new Uint8Array(0)),
		fc.constant(new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0])),
		fc.constant(new TextEncoder().encode('%PDF-1.4\n%broken')),
		fc.uint8Array({ maxLength: 200 })
	),
	name: fc.oneof(
		fc.constantFrom('photo.png', '../../../etc/passwd', 'x.svg', 'a"b\r\n.png', 'é'.repeat(300)),
		hostileText
	),
	type: fc.constantFrom('image/png', 'image/svg+xml', 'text/html', 'application/pdf', '')
});

const formArb = fc.array(
	fc.oneof(
		{
			weight: 6,
			arbitrary: fc
				.constantFrom(...FIELDS)
				.chain((f) => fieldValue(f).map((v) => [f, v] as [string, string | File]))
		},
		{
			weight: 1,
			arbitrary: fc
				.tuple(fc.constantFrom('file', 'photos', 'csv'), fileArb)
				.map(
					([f, file]) =>
						[
							f,
							new File([file.bytes as Uint8Array<ArrayBuffer>], file.name, { type: file.type })
						] as [string, string | File]
				)
		},
		{ weight: 1, arbitrary: fc.tuple(hostileText, hostileText) }
	),
	{ maxLength: 14 }
);

/** Nested JSON as deep as `depth`, built as text so no recursion limit is hit building it. */
const deepJson = (depth: number) => '{"a":'.repeat(depth) + '1' + '}'.repeat(depth);

const jsonValue: fc.Arbitrary<unknown> = fc.oneof(
	hostileText,
	fc.double(),
	fc.bigInt().map((n) => Number(n)),
	fc.constantFrom(null, true, false, [], {}, -0, 2 ** 53 + 1, Number.MAX_VALUE),
	fc.jsonValue({ maxDepth: 4 })
);

const jsonObjectArb = fc.dictionary(
	fc.oneof(
		{ weight: 4, arbitrary: fc.constantFrom(...FIELDS.map((f) => f.replace(/\..*$/, ''))) },
		{ weight: 1, arbitrary: hostileText }
	),
	fc.oneof(
		{ weight: 3, arbitrary: jsonValue },
		{
			weight: 1,
			arbitrary: fc.array(
				fc.oneof(
					jsonValue,
					fc.dictionary(fc.constantFrom('taskId', 'hours', 'id', 'level'), jsonValue)
				),
				{ maxLength: 4 }
			)
		},
		{
			weight: 1,
			arbitrary: fc.constant(0).chain(() => fc.constantFrom(...Object.values(real).flat()))
		}
	),
	{ maxKeys: 12 }
);

const apiBodyArb = fc.oneof(
	{
		weight: 6,
		arbitrary: jsonObjectArb.map((o) => ({ type: 'application/json', body: JSON.stringify(o) }))
	},
	{
		weight: 1,
		arbitrary: jsonValue.map((v) => ({
			type: 'application/json',
			body: JSON.stringify(v) ?? 'undefined'
		}))
	},
	{
		weight: 1,
		arbitrary: fc
			.constantFrom(
				deepJson(5_000),
				deepJson(50),
				'['.repeat(3_000),
				'{"a":',
				'{"a":1}}',
				'\ufeff{}',
				'x'.repeat(200_000)
			)
			.map((body) => ({ type: 'application/json', body }))
	},
	{
		weight: 1,
		arbitrary: fc
			.tuple(
				fc.constantFrom(
					'text/plain',
					'application/xml',
					'application/x-www-form-urlencoded',
					'multipart/form-data; boundary=zz',
					'multipart/form-data',
					'image/png',
					'',
					'application/json; charset=utf-16'
				),
				hostileText
			)
			.map(([type, body]) => ({ type, body }))
	},
	{ weight: 1, arbitrary: formArb.map((fields) => ({ type: 'form', fields })) }
);

/**
 * Form actions get form content types only: SvelteKit answers 415 to any other before an
 * action runs. A multipart body that does not parse is still theirs to handle.
 */
const actionBodyArb = fc.oneof(
	{ weight: 8, arbitrary: formArb.map((fields) => ({ type: 'form', fields })) },
	{
		weight: 1,
		arbitrary: fc
			.tuple(
				fc.constantFrom(
					'multipart/form-data; boundary=zz',
					'multipart/form-data',
					'application/x-www-form-urlencoded',
					'text/plain'
				),
				fc.oneof(
					hostileText,
					fc.constantFrom(
						'--zz\r\nContent-Disposition: form-data; name="email"\r\n\r\nx',
						'email=%E0%A4%A&password=%',
						'--zz--'
					)
				)
			)
			.map(([type, body]) => ({ type, body }))
	}
);

const queryArb = fc.array(
	fc.tuple(
		fc.oneof(
			fc.constantFrom(
				'status',
				'size',
				'paper',
				'page',
				'sort',
				'q',
				'from',
				'to',
				'cohort',
				'site',
				'corrects',
				'limit',
				'offset',
				'view'
			),
			hostileText
		),
		hostileText
	),
	{ maxLength: 4 }
);

// ---------------------------------------------------------------------------------------------
// Calling handlers the way SvelteKit does

const users: Partial<Record<Role, SignedInUser>> = {};
const sessions: Partial<Record<Role, string>> = {};

function cookies(role: Role) {
	const jar = new Map<string, string>();
	if (role !== 'anon') jar.set(lucia.sessionCookieName, sessions[role]!);
	return {
		get: (n: string) => jar.get(n),
		getAll: () => [...jar].map(([name, value]) => ({ name, value })),
		set: (n: string, v: string) => void jar.set(n, v),
		delete: (n: string) => void jar.delete(n),
		serialize: () => ''
	};
}

interface Outcome {
	status: number;
	error?: unknown;
}

async function settle(work: () => unknown): Promise<Outcome> {
	try {
		const result = await work();
		if (result instanceof Response) {
			// Consume the body too: a stream that fails half-way is a 500 in the real server.
			await result.arrayBuffer();
			return { status: result.status };
		}
		if (isActionFailure(result)) return { status: result.status };
		return { status: 200 };
	} catch (err) {
		if (isRedirect(err)) return { status: err.status };
		if (isHttpError(err)) return { status: err.status, error: err.status >= 500 ? err : undefined };
		return { status: 500, error: err };
	}
}

function fillPath(path: string, values: Record<string, string>) {
	return path.replace(/\[([^\]]+)\]/g, (_, n: string) => encodeURIComponent(values[n]));
}

function event(
	target: Target,
	role: Role,
	params: Record<string, string>,
	request: Request,
	url: URL
) {
	return {
		request,
		url,
		params,
		route: { id: target.path },
		// Filled in by the app's own hook from the session cookie, as in the running server.
		locals: {},
		cookies: cookies(role),
		getClientAddress: () => '198.51.100.23',
		setHeaders: () => {},
		fetch,
		isDataRequest: false,
		isSubRequest: false,
		platform: undefined
	} as never;
}

function formData(fields: [string, string | File][]) {
	const form = new FormData();
	for (const [k, v] of fields) form.append(k, v);
	return form;
}

/**
 * Cases may sign a role out, switch its account off or change its role (they are allowed to):
 * put the four demo accounts and their sessions back before the next case.
 */
async function restoreAccounts() {
	const roles = ['apprentice', 'supervisor', 'coordinator', 'admin'] as const;
	const [accounts, live] = await Promise.all([
		User.findAll({
			where: { id: roles.map((r) => users[r]!.id) },
			attributes: ['id', 'role', 'active']
		}),
		Session.count({ where: { id: roles.map((r) => sessions[r]!) } })
	]);
	const changed = accounts.some(
		(a) => !a.active || a.role !== roles.find((r) => users[r]!.id === a.id)
	);
	if (!changed && live === roles.length) return;
	for (const role of roles) {
		await User.update({ active: true, role }, { where: { id: users[role]!.id } });
		if (!(await Session.count({ where: { id: sessions[role]! } })))
			sessions[role] = (await lucia.createSession(users[role]!.id, {})).id;
	}
}

async function run(
	target: Target,
	role: Role,
	params: Record<string, string>,
	body: { type: string; body?: string; fields?: [string, string | File][] },
	query: [string, string][] = []
): Promise<Outcome> {
	const url = new URL(`http://localhost:3999${fillPath(target.path, params)}`);
	for (const [k, v] of query) url.searchParams.append(k, v);
	if (target.action && target.action !== 'default')
		url.search += `${url.search ? '&' : '?'}/${target.action}`;
	let request: Request;
	if (target.method === 'GET') request = new Request(url);
	else if (body.type === 'form')
		request = new Request(url, { method: target.method, body: formData(body.fields ?? []) });
	else
		request = new Request(url, {
			method: target.method,
			body: body.body,
			headers: body.type ? { 'content-type': body.type } : {}
		});
	await restoreAccounts();
	// The request passes the app's hook chain (cross-site refusal, session, headers, unreadable
	// forms) before the handler, as in the running server.
	let outcome: Outcome = { status: 0 };
	const response = await settle(() =>
		handle({
			event: event(target, role, params, request, url),
			resolve: async (ev) => {
				const type = ev.request.headers.get('content-type') ?? '';
				// SvelteKit's own rule: form actions take form content types only (415).
				if (
					target.kind === 'action' &&
					!/^(application\/x-www-form-urlencoded|multipart\/form-data|text\/plain)/i.test(type)
				)
					outcome = { status: 415 };
				else outcome = await settle(() => target.handler(ev as never));
				return new Response(null, { status: outcome.status });
			}
		})
	);
	return outcome.status && response.status === outcome.status ? outcome : response;
}

const failures: string[] = [];
const tally = new Map<string, number>();
const record = (target: Target, outcome: Outcome, input: unknown) => {
	tally.set(String(outcome.status), (tally.get(String(outcome.status)) ?? 0) + 1);
	if (outcome.status < 500) return true;
	const shown = JSON.stringify(input, (_, v) =>
		typeof v === 'string' && v.length > 80
			? `${v.slice(0, 80)}…(${v.length})`
			: v instanceof File
				? `File(${v.name}, ${v.size})`
				: v
	);
	failures.push(
		`${target.name}: ${outcome.status} ${(outcome.error as Error)?.stack?.split('\n').slice(0, 3).join(' | ')} for ${shown}`
	);
	return false;
};

// ---------------------------------------------------------------------------------------------

let cases = 0;

/** Tables the app only ever adds to: none may lose a row to bad input. */
const APPEND_ONLY = ['users', 'sign_offs', 'certificates', 'audit_events'] as const;
const rowCounts = async () => {
	const counts: Record<string, number> = {};
	for (const table of APPEND_ONLY) {
		const [{ n }] = await sequelize.query<{ n: number }>(`SELECT COUNT(*) AS n FROM ${table}`, {
			type: QueryTypes.SELECT
		});
		counts[table] = n;
	}
	return counts;
};
let seeded: Record<string, number> = {};

beforeAll(async () => {
	mkdirSync(process.env.UPLOADS_DIR!, { recursive: true });
	await prepare();
	await framework.ensureDefault();
	await seedDemo();
	await seedWorkLog();
	await seedSignOffs();
	await seedCertificates();
	seeded = await rowCounts();

	for (const role of ['apprentice', 'supervisor', 'coordinator', 'admin'] as const) {
		users[role] = signed(
			await User.findOne({ where: { email: `${role}@example.org` }, rejectOnEmpty: true })
		);
		sessions[role] = (await lucia.createSession(users[role].id, {})).id;
	}
	const others = await User.findAll({ attributes: ['id'], limit: 6, order: [['email', 'ASC']] });
	const entries = await LogEntry.findAll({ attributes: ['id'], order: [['id', 'DESC']], limit: 6 });
	const certs = await Certificate.findAll({ attributes: ['serial'] });
	const tasks = await Task.findAll({ attributes: ['id', 'code'], limit: 4 });
	const signOffs = await SignOff.findAll({ attributes: ['id'], limit: 3 });
	const current = (await framework.current())!;
	const userIds = [...Object.values(users).map((u) => u!.id), ...others.map((u) => u.id)];
	const entryIds = entries.map((e) => String(e.id));
	Object.assign(real, {
		id: [...entryIds, '1', '2', '999999', '0'],
		apprenticeId: userIds,
		userId: userIds,
		supervisorId: userIds,
		apprentice: userIds,
		serial: [...certs.map((c) => c.serial), 'JM-0000-0000-0000-0000-0'],
		code: [...tasks.map((t) => t.code), 'SAF', 'BRK', 'BRK-01'],
		task: tasks.map((t) => t.code),
		taskId: tasks.map((t) => String(t.id)),
		signOffId: signOffs.map((s) => String(s.id)),
		ids: entryIds,
		token: ['A'.repeat(43), 'not-a-token'],
		workDate: ['2026-11-30', '2026-12-01', '2027-01-01'],
		completedOn: ['2026-11-30'],
		hours: ['2.5', '0.1', '24', '16.01'],
		level: ['1', '2', '3', '4', '5'],
		role: ['apprentice', 'supervisor', 'coordinator', 'admin', 'root'],
		email: ['apprentice@example.org', 'nobody@example.org'],
		password: ['journeymark-demo', 'wrong password!'],
		intent: ['draft', 'submit'],
		frameworkId: [String(current.id)]
	});
	real.id.push(String(current.id));

	// Which roles get past each target's guard: an empty request per role.
	for (const target of targets) {
		const params = Object.fromEntries(target.params.map((p) => [p, realFor(p)[0]]));
		for (const role of ['anon', 'apprentice', 'supervisor', 'coordinator', 'admin'] as Role[]) {
			const outcome = await run(
				target,
				role,
				params,
				target.kind === 'action'
					? { type: 'form', fields: [] }
					: { type: 'application/json', body: '{}' }
			);
			cases++;
			record(target, outcome, { role, probe: true });
			if (![401, 403].includes(outcome.status)) target.allowed.push(role);
		}
		if (target.allowed.length === 0) target.allowed.push('admin');
	}
}, 180_000);

describe('generated bad input to every route handler and form action', () => {
	it('finds the routes', () => {
		expect(targets.filter((t) => t.kind === 'api').length).toBeGreaterThanOrEqual(25);
		expect(targets.filter((t) => t.kind === 'action').length).toBeGreaterThanOrEqual(40);
	});

	it('answers every case below 500 (OWASP ASVS 4.0.3 V5.1.3, V7.4.1)', async () => {
		for (const target of targets) {
			const roleArb = fc.oneof(
				{ weight: 4, arbitrary: fc.constantFrom(...target.allowed) },
				{
					weight: 1,
					arbitrary: fc.constantFrom<Role>(
						'anon',
						'apprentice',
						'supervisor',
						'coordinator',
						'admin'
					)
				}
			);
			const paramsArb = fc.record(
				Object.fromEntries(target.params.map((p) => [p, paramValue(p)])) as Record<
					string,
					fc.Arbitrary<string>
				>
			);
			const bodyArb =
				target.kind === 'action'
					? actionBodyArb
					: target.method === 'GET'
						? fc.constant({ type: '' })
						: apiBodyArb;
			await fc.assert(
				fc.asyncProperty(
					roleArb,
					paramsArb,
					bodyArb,
					queryArb,
					async (role, params, body, query) => {
						cases++;
						const outcome = await run(target, role, params, body, query);
						// Collected rather than thrown, so one run reports every failing route at once.
						record(target, outcome, { role, params, body, query });
					}
				),
				{ numRuns: target.runs, seed: 82_026 }
			);
		}
		console.log(
			`fuzz: ${cases} cases over ${targets.length} handlers; statuses`,
			Object.fromEntries(tally)
		);
		expect(failures).toEqual([]);
		expect(cases).toBeGreaterThanOrEqual(2_000);
	}, 240_000);

	it('leaves the database intact and the audit chain verifiable', async () => {
		if (sequelize.getDialect() === 'sqlite') {
			// SQLite PRAGMA integrity_check / foreign_key_check (https://sqlite.org/pragma.html)
			const [integrity] = await sequelize.query('PRAGMA integrity_check', { type: 'SELECT' });
			expect(integrity).toEqual({ integrity_check: 'ok' });
			expect(await sequelize.query('PRAGMA foreign_key_check', { type: 'SELECT' })).toEqual([]);
		} else {
			// PostgreSQL refuses dangling references itself, as long as every foreign key is in
			// place and validated; an index left invalid would also show here.
			const [state] = await sequelize.query<{
				foreignKeys: number;
				unvalidated: number;
				invalidIndexes: number;
			}>(
				`SELECT (SELECT COUNT(*) FROM pg_constraint
				          WHERE connamespace = current_schema()::regnamespace AND contype = 'f') AS "foreignKeys",
				        (SELECT COUNT(*) FROM pg_constraint
				          WHERE connamespace = current_schema()::regnamespace AND contype = 'f'
				            AND NOT convalidated) AS unvalidated,
				        (SELECT COUNT(*) FROM pg_index i JOIN pg_class c ON c.oid = i.indrelid
				          WHERE c.relnamespace = current_schema()::regnamespace
				            AND NOT (i.indisvalid AND i.indisready)) AS "invalidIndexes"`,
				{ type: QueryTypes.SELECT }
			);
			expect(state.foreignKeys).toBeGreaterThanOrEqual(20);
			expect(state.unvalidated).toBe(0);
			expect(state.invalidIndexes).toBe(0);
		}
		const now = await rowCounts();
		for (const table of APPEND_ONLY)
			expect(now[table], table).toBeGreaterThanOrEqual(seeded[table]);
		const chain = await audit.verify();
		expect(chain).toMatchObject({ ok: true });
		expect((chain as { count: number }).count).toBe(now.audit_events);
	});
});
