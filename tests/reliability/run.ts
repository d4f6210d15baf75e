/**
 * `npm run test:reliability [-- --short] [-- --clients N --seconds S --seed K --keep]`
 *
 * Against the built app (`node build`, or BUILD_DIR) on 127.0.0.1 with a freshly seeded
 * database, fake SMTP, ORIGIN set and DAILY_JOBS=off:
 *
 * 1. Load: N apprentices' clients (100 for 30 s; --short 20 for 8 s) post work-log entries while
 *    one journeyworker per shop verifies submitted ones. Zero 5xx, zero connection errors, zero
 *    4xx (every entry is valid by construction).
 * 2. Hot backup: part-way through (1), `npm run backup -- <file>` runs beside the load.
 * 3. Crash: the same load again; half-way the server gets SIGKILL, is restarted on the same
 *    database, and the load finishes. Only requests in flight at the kill may fail.
 * 4. Afterwards: every acknowledged entry (201 with its id) is in the database with the same
 *    apprentice, hours and task split; every acknowledged verification is stored;
 *    `PRAGMA integrity_check` = ok; foreign keys hold; the audit chain verifies
 *    (`verify()` of src/lib/server/audit.ts through `npm run audit:verify`).
 * 5. The backup: opens, integrity_check ok, chain verifies, holds every entry acknowledged
 *    before the backup started; then the documented restore (stop, remove -wal/-shm, copy over
 *    DATABASE_URL, start) gives a running app that serves those entries and takes new ones.
 *
 * Sources for the checks: SQLite, "Write-Ahead Logging" (https://sqlite.org/wal.html: a
 * committed transaction survives a process crash), "Atomic Commit In SQLite"
 * (https://sqlite.org/atomiccommit.html), "SQLite Backup API" (https://sqlite.org/backup.html),
 * PRAGMA integrity_check and foreign_key_check (https://sqlite.org/pragma.html). Exit code 1 on
 * any failure; the figures print either way, with one JSON summary line at the end.
 */
import { copyFileSync, rmSync } from 'node:fs';
import path from 'node:path';
import { parseArgs } from 'node:util';
import { App, auditVerify, Db, request, run as runCommand, signIn } from './harness';
import {
	Control,
	logger,
	newStats,
	percentile,
	Plan,
	reviewer,
	type Ack,
	type Run,
	type Stats
} from './workload';

const { values: args } = parseArgs({
	options: {
		short: { type: 'boolean', default: false },
		clients: { type: 'string' },
		seconds: { type: 'string' },
		seed: { type: 'string', default: '8' },
		keep: { type: 'boolean', default: false }
	}
});
const CLIENTS = Number(args.clients ?? (args.short ? 20 : 100));
const SECONDS = Number(args.seconds ?? (args.short ? 8 : 30));
const PASSWORD = 'journeymark-demo';

const failures: string[] = [];
const check = (ok: boolean, what: string) => {
	console.log(`  ${ok ? 'ok  ' : 'FAIL'} ${what}`);
	if (!ok) failures.push(what);
};
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));
const t0 = Date.now();
const elapsed = () => `${((Date.now() - t0) / 1000).toFixed(1)} s`;

type EntryRow = { id: number; a: string; t: number; status: string };
type SplitRow = { e: number; task: number; t: number };

/** Every acknowledged entry, with apprentice, tenths and split as acknowledged. */
async function entriesPresent(db: Db, acks: Ack[]): Promise<{ found: number; wrong: string[] }> {
	const rows = new Map(
		(
			await db.all<EntryRow>('SELECT id, apprentice_id AS a, tenths AS t, status FROM log_entries')
		).map((r) => [r.id, r])
	);
	const splits = new Map<number, SplitRow[]>();
	for (const s of await db.all<SplitRow>(
		'SELECT entry_id AS e, task_id AS task, tenths AS t FROM log_entry_tasks'
	))
		splits.set(s.e, [...(splits.get(s.e) ?? []), s]);
	let found = 0;
	const wrong: string[] = [];
	for (const ack of acks) {
		const row = rows.get(ack.id);
		if (!row) {
			wrong.push(`entry ${ack.id} (acknowledged at ${ack.at} ms) is missing`);
			continue;
		}
		const stored = (splits.get(ack.id) ?? []).map((s) => `${s.task}:${s.t}`).sort();
		const sent = ack.splits.map((s) => `${s.taskId}:${s.tenths}`).sort();
		if (row.a !== ack.apprenticeId || row.t !== ack.tenths || stored.join() !== sent.join()) {
			wrong.push(
				`entry ${ack.id}: stored ${row.a} ${row.t} [${stored}] vs acknowledged ${ack.apprenticeId} ${ack.tenths} [${sent}]`
			);
			continue;
		}
		found += 1;
	}
	return { found, wrong };
}

async function phase(
	app: App,
	plan: Plan,
	label: string,
	during: (control: Control, r: Run) => Promise<void>
): Promise<Run> {
	const control = new Control();
	const r: Run = { baseUrl: app.baseUrl, plan, control, stats: newStats(), acks: [], verified: [] };
	const clients = Array.from({ length: CLIENTS }, (_, i) =>
		logger(r, plan.apprentices[i % plan.apprentices.length], `${label}${i}`)
	);
	const reviewers = plan.reviewers.map((p) => reviewer(r, p));
	const began = Date.now();
	await during(control, r);
	control.stopped = true;
	await Promise.all([...clients, ...reviewers]);
	const secs = (Date.now() - began) / 1000;
	report(label, r.stats, r.acks.length, r.verified.length, secs);
	return r;
}

function report(label: string, s: Stats, acks: number, verified: number, secs: number) {
	console.log(
		`  ${label}: ${s.requests} requests in ${secs.toFixed(1)} s (${(s.requests / secs).toFixed(0)}/s), ` +
			`${s.posts} entries posted, ${acks} acknowledged, ${verified} verified, ` +
			`statuses ${JSON.stringify(s.byStatus)}, ${s.errors.length} errors, ${s.interrupted} cut off by the kill; ` +
			`latency p50 ${percentile(s.latencies, 50)} ms, p95 ${percentile(s.latencies, 95)} ms, max ${percentile(s.latencies, 100)} ms`
	);
	for (const e of s.errors.slice(0, 10)) console.log(`    error: ${e}`);
}

const app = new App();
const summary: Record<string, unknown> = { clients: CLIENTS, seconds: SECONDS };
try {
	console.log(
		`Reliability run: ${CLIENTS} clients, ${SECONDS} s per phase, seed ${args.seed}; work in ${app.dir}`
	);
	await app.prepare();
	await app.seed();
	console.log(`Seeded in ${elapsed()}.`);
	const plan = new Plan(Number(args.seed));
	{
		const db = await Db.open(app.databasePath);
		await plan.load(db);
		await db.close();
	}
	console.log(`Started in ${await app.start()} ms.`);
	for (const p of [...plan.apprentices, ...plan.reviewers])
		p.cookie = await signIn(app.baseUrl, p.email, PASSWORD);
	console.log(
		`${plan.apprentices.length} apprentices and ${plan.reviewers.length} journeyworkers signed in (${elapsed()}).`
	);

	// 1 + 2: load, with the hot backup a third of the way in.
	console.log('\nLoad with a hot backup:');
	const backupFile = path.join(app.dir, 'backups', 'during-load.db');
	let ackedBeforeBackup: Ack[] = [];
	let backupOut = { code: null as number | null, out: '' };
	const load = await phase(app, plan, 'L', async (_control, r) => {
		await sleep((SECONDS * 1000) / 3);
		ackedBeforeBackup = [...r.acks];
		const started = Date.now();
		backupOut = await runCommand('npm', ['run', '--silent', 'backup', '--', backupFile], app.env);
		summary.backupCommandMs = Date.now() - started;
		await sleep(Math.max(0, (SECONDS * 1000 * 2) / 3 - (Date.now() - started)));
	});
	console.log(`  backup: ${backupOut.out}`);
	check(backupOut.code === 0, '`npm run backup` exited 0 while the app was writing');

	// 3: crash half-way.
	console.log('\nLoad with SIGKILL half-way:');
	let walAtKill = 0;
	let restartMs = 0;
	const crash = await phase(app, plan, 'C', async (control) => {
		await sleep((SECONDS * 1000) / 2);
		control.close();
		walAtKill = app.walBytes();
		await app.kill();
		console.log(`  killed at ${elapsed()} with ${walAtKill} bytes in the WAL`);
		restartMs = await app.start();
		console.log(`  restarted in ${restartMs} ms`);
		control.open();
		await sleep((SECONDS * 1000) / 2);
	});
	await app.stop();

	// 4: the database after load and crash.
	console.log('\nDatabase after load and crash:');
	const acks = [...load.acks, ...crash.acks];
	const verified = [...load.verified, ...crash.verified];
	const db = await Db.open(app.databasePath);
	const integrity = await db.integrity();
	check(integrity === 'ok', `PRAGMA integrity_check: ${integrity}`);
	const fk = await db.all('PRAGMA foreign_key_check');
	check(fk.length === 0, `PRAGMA foreign_key_check: ${fk.length} violations`);
	const present = await entriesPresent(db, acks);
	for (const w of present.wrong.slice(0, 10)) console.log(`    ${w}`);
	check(
		present.found === acks.length && acks.length > 0,
		`${present.found} of ${acks.length} acknowledged entries stored with the same apprentice, hours and split`
	);
	// The checker itself must be able to fail: a made-up acknowledgement is reported missing.
	const [{ top }] = await db.all<{ top: number }>('SELECT max(id) AS top FROM log_entries');
	const madeUp = await entriesPresent(db, [
		{ ...acks[0], id: top + 1 },
		{ ...acks[0], tenths: -1 }
	]);
	check(
		madeUp.found === 0 && madeUp.wrong.length === 2,
		'the checker flags a missing and an altered entry'
	);
	const verifiedRows = await db.all<{ id: number }>(
		`SELECT id FROM log_entries WHERE status = 'verified' AND id IN (${verified.join(',') || 0})`
	);
	const events = await db.all<{ subject: string }>(
		`SELECT subject FROM audit_events WHERE kind = 'hours.verified'`
	);
	const eventSubjects = new Set(events.map((e) => e.subject));
	check(
		verifiedRows.length === verified.length &&
			verified.every((id) => eventSubjects.has(`log-entry:${id}`)),
		`${verifiedRows.length} of ${verified.length} acknowledged verifications stored, each with its audit event`
	);
	await db.close();
	const chain = await auditVerify(app.env, app.databasePath);
	check(chain.ok, `audit chain: ${chain.out}`);
	const errors = load.stats.errors.length + crash.stats.errors.length;
	check(errors === 0, `${errors} errors (5xx, 4xx, connection) outside the kill`);
	const logged = app.loggedErrors();
	check(logged.length === 0, `${logged.length} server errors logged`);
	check(
		crash.stats.interrupted <= CLIENTS + plan.reviewers.length,
		'only in-flight requests cut off'
	);

	// 5: the backup taken during load.
	console.log('\nThe backup taken during load:');
	const copy = await Db.open(backupFile);
	const copyIntegrity = await copy.integrity();
	check(copyIntegrity === 'ok', `backup PRAGMA integrity_check: ${copyIntegrity}`);
	const inCopy = await entriesPresent(copy, ackedBeforeBackup);
	const laterInCopy = (await entriesPresent(copy, load.acks)).found - inCopy.found;
	await copy.close();
	for (const w of inCopy.wrong.slice(0, 10)) console.log(`    ${w}`);
	check(
		inCopy.found === ackedBeforeBackup.length && ackedBeforeBackup.length > 0,
		`backup holds ${inCopy.found} of ${ackedBeforeBackup.length} entries acknowledged before it started (+${laterInCopy} acknowledged during it)`
	);
	const copyChain = await auditVerify(app.env, backupFile);
	check(copyChain.ok, `backup audit chain: ${copyChain.out}`);

	// Restore as DEVELOPERS.md says: app stopped, -wal/-shm gone, file copied, app started.
	console.log('\nRestore the backup:');
	for (const suffix of ['-wal', '-shm']) rmSync(app.databasePath + suffix, { force: true });
	copyFileSync(backupFile, app.databasePath);
	await app.start();
	const someone = plan.apprentices[0];
	const listed = await request('GET', `${app.baseUrl}/api/log-entries?size=1`, {
		headers: { cookie: someone.cookie! }
	});
	const restoredDb = await Db.open(app.databasePath);
	const [{ n }] = await restoredDb.all<{ n: number }>(
		'SELECT count(*) AS n FROM log_entries WHERE apprentice_id = ?',
		[someone.id]
	);
	await restoredDb.close();
	const total = listed.status === 200 ? (JSON.parse(listed.text) as { total: number }).total : -1;
	check(
		total === n,
		`restored app serves ${someone.email}'s ${total} entries (file holds ${n}) with the session from before the backup`
	);
	const planned = plan.next(someone, 'R');
	const posted = await request('POST', `${app.baseUrl}/api/log-entries`, {
		headers: {
			cookie: someone.cookie!,
			origin: app.baseUrl,
			'content-type': 'application/json'
		},
		body: JSON.stringify(planned.body)
	});
	check(posted.status === 201, `restored app takes a new entry (${posted.status})`);
	await app.stop();

	Object.assign(summary, {
		requests: load.stats.requests + crash.stats.requests,
		errors,
		interrupted: crash.stats.interrupted,
		acknowledged: acks.length,
		found: present.found,
		verified: verified.length,
		backup: { ackedBefore: ackedBeforeBackup.length, found: inCopy.found, laterFound: laterInCopy },
		walAtKill,
		restartMs,
		load: {
			rps: Math.round(load.stats.requests / SECONDS),
			p95: percentile(load.stats.latencies, 95)
		},
		seconds_total: Math.round((Date.now() - t0) / 1000)
	});
} catch (err) {
	failures.push(`run aborted: ${(err as Error).stack ?? err}`);
	console.error(err);
} finally {
	await app.close().catch(() => undefined);
	if (failures.length) {
		console.log(`\n${failures.length} check(s) failed; server log kept in ${app.logPath}`);
		for (const f of failures) console.log(`  - ${f}`);
		process.exitCode = 1;
	} else {
		console.log(`\nAll reliability checks passed in ${elapsed()}.`);
		if (!args.keep) rmSync(app.dir, { recursive: true, force: true });
	}
	console.log(JSON.stringify({ ok: failures.length === 0, failures: failures.length, ...summary }));
	// Keep-alive sockets would hold the process open.
	process.exit();
}
