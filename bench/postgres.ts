/**
 * `bench --postgres`: a fresh PostgreSQL database holding a copy of the SQLite bench data, with
 * the schema made by the app's own migrations, so the built server can be measured on it.
 */
import { spawn } from 'node:child_process';
import pg from 'pg';
import { withoutPassword } from '../src/lib/server/config';
import { STATEMENTS } from '../src/lib/server/db/dialect';
import { RawDb } from './cohort-sql';

/** Rows read from SQLite and sent to PostgreSQL in one COPY, at most. */
const BATCH_ROWS = 10_000;

/** Applies the app's migrations to `database` (a SQLite file or postgres:// address) in a child process, as the app reads its config on import. */
export function migrate(root: string, database: string): Promise<void> {
	return new Promise((resolve, reject) => {
		const child = spawn(process.execPath, ['--import', 'tsx', 'bench/migrate.ts', database], {
			cwd: root,
			env: { ...process.env, DATABASE_URL: database },
			stdio: ['ignore', 'pipe', 'pipe']
		});
		let out = '';
		child.stdout.on('data', (d) => (out += d));
		child.stderr.on('data', (d) => (out += d));
		child.on('error', reject);
		child.on('exit', (code) =>
			code === 0
				? resolve()
				: reject(new Error(`Migrating ${withoutPassword(database)} failed:\n${out}`))
		);
	});
}

const COPY_ESCAPES: Record<string, string> = {
	'\\': '\\\\',
	'\n': '\\n',
	'\r': '\\r',
	'\t': '\\t'
};

/** One value in COPY's text format: \\N for NULL, backslash escapes for the separators. */
function copyField(value: unknown, boolean: boolean): string {
	if (value === null || value === undefined) return '\\N';
	if (boolean) return value === 1 || value === true ? 't' : 'f';
	if (Buffer.isBuffer(value)) return `\\\\x${value.toString('hex')}`;
	return String(value).replace(/[\\\n\r\t]/g, (c) => COPY_ESCAPES[c]);
}

/** The part of pg's connection a COPY FROM STDIN needs. */
interface CopyConnection {
	query(text: string): void;
	sendCopyFromChunk(chunk: Buffer): void;
	endCopyFrom(): void;
}

/**
 * Runs `COPY … FROM STDIN` with `data` (text format) through pg's query queue, as a
 * "submittable" (https://node-postgres.com/apis/client#clientquery): pg has no COPY helper of
 * its own, and this avoids adding a package for it.
 */
function copyIn(client: pg.Client, sql: string, data: Buffer): Promise<void> {
	return new Promise((resolve, reject) => {
		let failed = false;
		const submittable = {
			submit: (connection: CopyConnection) => connection.query(sql),
			handleCopyInResponse: (connection: CopyConnection) => {
				connection.sendCopyFromChunk(data);
				connection.endCopyFrom();
			},
			handleError: (err: Error) => {
				failed = true;
				reject(err);
			},
			handleReadyForQuery: () => {
				if (!failed) resolve();
			},
			handleCommandComplete: () => undefined,
			handleRowDescription: () => undefined,
			handleDataRow: () => undefined,
			handleEmptyQuery: () => undefined,
			handlePortalSuspended: () => undefined,
			handleCopyData: () => undefined
		};
		client.query(submittable as unknown as pg.QueryConfig);
	});
}

const quote = (name: string) => `"${name.replace(/"/g, '""')}"`;

/** Tables ordered so each comes after every table its foreign keys point to. */
function foreignKeyOrder(tables: string[], refs: { from: string; to: string }[]): string[] {
	const done = new Set<string>();
	const order: string[] = [];
	const visit = (table: string, path: string[]) => {
		if (done.has(table)) return;
		if (path.includes(table)) {
			throw new Error(`Foreign keys form a cycle: ${[...path, table].join(' → ')}`);
		}
		for (const r of refs) {
			if (r.from === table && r.to !== table) visit(r.to, [...path, table]);
		}
		done.add(table);
		order.push(table);
	};
	for (const t of [...tables].sort()) visit(t, []);
	return order;
}

export interface CopyResult {
	tables: number;
	rows: number;
	seconds: number;
}

/**
 * Copies every table's rows from the SQLite file into the migrated PostgreSQL database, parents
 * before children and each table in rowid order (a row's self-reference points to an earlier
 * row), in one transaction; then moves the id sequences past the copied ids and runs VACUUM
 * ANALYZE (statistics, and the visibility map a settled database has for index-only scans).
 */
export async function copyToPostgres(sqliteFile: string, url: string): Promise<CopyResult> {
	const started = performance.now();
	const source = new RawDb(sqliteFile);
	const target = new pg.Client({ connectionString: url });
	await target.connect();
	let rows = 0;
	let tables = 0;
	try {
		const columns = (
			await target.query<{ table: string; column: string; type: string }>(
				`SELECT table_name AS table, column_name AS column, data_type AS type
				   FROM information_schema.columns WHERE table_schema = current_schema()`
			)
		).rows;
		const refs = (
			await target.query<{ from: string; to: string }>(
				`SELECT conrelid::regclass::text AS from, confrelid::regclass::text AS to
				   FROM pg_constraint WHERE contype = 'f' AND connamespace = current_schema()::regnamespace`
			)
		).rows;
		const pgTables = [...new Set(columns.map((c) => c.table))].filter(
			(t) => t !== 'schema_migrations'
		);
		const sqliteTables = new Set(
			(
				await source.all<{ name: string }>(
					`SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%'`
				)
			).map((r) => r.name)
		);
		const missing = pgTables.filter((t) => !sqliteTables.has(t));
		const extra = [...sqliteTables].filter(
			(t) => t !== 'schema_migrations' && !pgTables.includes(t)
		);
		if (missing.length || extra.length) {
			throw new Error(
				`The SQLite file and the migrated PostgreSQL schema differ: ` +
					`only in PostgreSQL ${missing.join(', ') || '-'}; only in SQLite ${extra.join(', ') || '-'}.`
			);
		}

		await target.query('BEGIN');
		for (const table of foreignKeyOrder(pgTables, refs)) {
			const names = (await source.all<{ name: string }>(`PRAGMA table_info(${quote(table)})`)).map(
				(c) => c.name
			);
			const types = new Map(
				columns.filter((c) => c.table === table).map((c) => [c.column, c.type])
			);
			const unknown = names.filter((n) => !types.has(n));
			if (unknown.length) {
				throw new Error(`${table}: columns ${unknown.join(', ')} are not in PostgreSQL.`);
			}
			// SQLite stores booleans as 0/1; JSON, dates and times as text PostgreSQL reads as is.
			const booleans = names.map((n) => types.get(n) === 'boolean');
			const select = `SELECT rowid AS "__rowid", ${names.map(quote).join(', ')} FROM ${quote(table)}
			                 WHERE rowid > ? ORDER BY rowid LIMIT ${BATCH_ROWS}`;
			const copy = `COPY ${quote(table)} (${names.map(quote).join(', ')}) FROM STDIN`;
			const read = (after: number) => source.all<Record<string, unknown>>(select, [after]);
			let next = read(Number.MIN_SAFE_INTEGER);
			for (;;) {
				const chunk = await next;
				if (chunk.length === 0) break;
				// Read the next chunk from SQLite while PostgreSQL stores this one.
				next = read(chunk[chunk.length - 1].__rowid as number);
				next.catch(() => undefined); // awaited on the next turn; not unhandled if this one fails
				const text = chunk
					.map((row) => names.map((n, i) => copyField(row[n], booleans[i])).join('\t') + '\n')
					.join('');
				await copyIn(target, copy, Buffer.from(text, 'utf8'));
				rows += chunk.length;
			}
			tables++;
		}
		await target.query('COMMIT');
		const sequenced = await target.query<{ table: string }>(STATEMENTS.sequencedTables);
		for (const { table } of sequenced.rows) await target.query(STATEMENTS.advanceSequence(table));
		await target.query('VACUUM (ANALYZE)');
	} catch (err) {
		await target.query('ROLLBACK').catch(() => undefined);
		throw err;
	} finally {
		await target.end();
		await source.close();
	}
	return { tables, rows, seconds: Math.round((performance.now() - started) / 100) / 10 };
}
