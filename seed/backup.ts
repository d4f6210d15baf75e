/**
 * `npm run backup -- [dest]`: a consistent copy of DATABASE_URL while the app keeps running.
 *
 * Uses SQLite's online backup API (sqlite3_backup_*, through node-sqlite3's Database#backup),
 * copying every page in one step: one read transaction, so the copy is a single snapshot of
 * committed data. In WAL mode a reader never blocks the app's writers, so the app keeps writing
 * meanwhile. Copying the .db file with `cp` is NOT safe while the app runs: committed pages may
 * still sit in the -wal file (https://www.sqlite.org/backup.html, https://www.sqlite.org/wal.html).
 *
 * The copy is written beside the destination under a temporary name, checked with
 * `PRAGMA integrity_check`, and only then renamed into place, so a half-written file never
 * carries the backup's name. Default destination: data/backups/<UTC timestamp>.db.
 * Restore: see "Reliability and backup" in DEVELOPERS.md.
 */
import { existsSync, mkdirSync, renameSync, rmSync, statSync } from 'node:fs';
import path from 'node:path';
import sqlite3 from 'sqlite3';
import { sqlitePath } from '../src/lib/server/config';

/** Node-sqlite3's Backup handle; its type definitions leave `Database#backup` out. */
interface BackupHandle {
	step(pages: number, callback: (err: (Error & { code?: string }) | null) => void): void;
	finish(callback: (err: Error | null) => void): void;
	readonly completed: boolean;
	readonly failed: boolean;
	readonly pageCount: number;
}

const BUSY_RETRY_MS = 100;
const GIVE_UP_AFTER_MS = 60_000;

function open(file: string, mode: number): Promise<sqlite3.Database> {
	return new Promise((resolve, reject) => {
		const db = new sqlite3.Database(file, mode, (err) => (err ? reject(err) : resolve(db)));
	});
}

const close = (db: sqlite3.Database) =>
	new Promise<void>((resolve, reject) => db.close((err) => (err ? reject(err) : resolve())));

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/** Copies `source` to `dest` with the online backup API; returns the pages copied. */
export async function backupDatabase(
	source: string,
	dest: string
): Promise<{ pages: number; bytes: number; ms: number }> {
	const started = Date.now();
	if (!existsSync(source)) throw new Error(`No database at ${source}.`);
	if (existsSync(dest)) throw new Error(`${dest} exists already; choose a new file.`);
	mkdirSync(path.dirname(dest), { recursive: true });
	const partial = `${dest}.partial-${process.pid}`;
	// Read-write without CREATE: a mistyped path fails instead of backing up an empty database,
	// and the connection can take part in WAL locking (a read-only one may need the -shm file).
	const db = await open(source, sqlite3.OPEN_READWRITE);
	try {
		db.configure('busyTimeout', 10_000);
		const backup = await new Promise<BackupHandle>((resolve, reject) => {
			const handle = (
				db as unknown as { backup(file: string, cb: (err: Error | null) => void): BackupHandle }
			).backup(partial, (err) => (err ? reject(err) : resolve(handle)));
		});
		// -1 copies all pages in one sqlite3_backup_step, under one read transaction on the
		// source: a single snapshot. BUSY/LOCKED are retried (node-sqlite3 keeps the handle).
		for (;;) {
			const err = await new Promise<(Error & { code?: string }) | null>((resolve) =>
				backup.step(-1, resolve)
			);
			if (backup.completed) break;
			if (err && (backup.failed || !/BUSY|LOCKED/.test(err.code ?? err.message))) throw err;
			if (Date.now() - started > GIVE_UP_AFTER_MS)
				throw new Error('The database stayed locked for a minute; no backup was taken.');
			await sleep(BUSY_RETRY_MS);
		}
		const pages = backup.pageCount;
		await new Promise<void>((resolve, reject) =>
			backup.finish((err) => (err ? reject(err) : resolve()))
		);
		const copy = await open(partial, sqlite3.OPEN_READWRITE);
		try {
			const rows = await new Promise<{ integrity_check: string }[]>((resolve, reject) =>
				copy.all('PRAGMA integrity_check', (err, r) =>
					err ? reject(err) : resolve(r as { integrity_check: string }[])
				)
			);
			const verdict = rows.map((r) => r.integrity_check).join('; ');
			if (verdict !== 'ok') throw new Error(`The copy failed PRAGMA integrity_check: ${verdict}`);
		} finally {
			await close(copy);
		}
		renameSync(partial, dest);
		return { pages, bytes: statSync(dest).size, ms: Date.now() - started };
	} catch (err) {
		for (const suffix of ['', '-wal', '-shm', '-journal'])
			rmSync(partial + suffix, { force: true });
		throw err;
	} finally {
		await close(db);
	}
}

/** data/backups/2026-12-02T15-23-19Z.db */
export function defaultDestination(now = new Date()): string {
	const stamp = now
		.toISOString()
		.replace(/\.\d+Z$/, 'Z')
		.replace(/:/g, '-');
	return path.join('data', 'backups', `${stamp}.db`);
}

const isMain =
	process.argv[1] && path.resolve(process.argv[1]) === path.resolve(import.meta.filename);
if (isMain && /^postgres(ql)?:\/\//i.test(process.env.DATABASE_URL ?? '')) {
	console.error(
		"No backup taken: DATABASE_URL is PostgreSQL. Use the server's own tools (pg_dump, or continuous archiving); see the README."
	);
	process.exitCode = 2;
} else if (isMain) {
	const source = sqlitePath(process.env.DATABASE_URL || 'data/journeymark.db');
	// npm runs scripts from the project root; a relative destination means where npm was called.
	const dest = process.argv[2]
		? path.resolve(process.env.INIT_CWD ?? '.', process.argv[2])
		: path.resolve(defaultDestination());
	try {
		const result = await backupDatabase(source, dest);
		console.log(
			`Backed up ${source} to ${dest}: ${result.pages} pages, ${result.bytes} bytes, ${result.ms} ms; integrity_check ok.`
		);
	} catch (err) {
		console.error(`No backup taken: ${(err as Error).message}`);
		process.exitCode = 1;
	}
}
