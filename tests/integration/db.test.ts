import { Op, QueryTypes, type Transaction } from 'sequelize';
import { beforeAll, describe, expect, it } from 'vitest';
import { LoginThrottle, prepare, sequelize, Site, write } from '$lib/server/db';
import { config } from '$lib/server/config';
import { BUSY_TIMEOUT_MS, openDatabase, WRITE_LOCK, WriteQueue } from '$lib/server/db/connection';
import { migrations } from '$lib/server/db/migrations';

beforeAll(() => prepare());

const onPostgres = sequelize.getDialect() === 'postgres';

const pragma = async (name: string) => {
	const [row] = await sequelize.query<Record<string, unknown>>(`PRAGMA ${name}`, {
		type: QueryTypes.SELECT
	});
	return Object.values(row)[0];
};

describe('database', () => {
	it.skipIf(onPostgres)('runs in WAL mode with foreign keys and a busy timeout', async () => {
		expect(await pragma('journal_mode')).toBe('wal');
		expect(await pragma('foreign_keys')).toBe(1);
		expect(await pragma('busy_timeout')).toBe(BUSY_TIMEOUT_MS);
	});

	it.skipIf(!onPostgres)(
		'holds the write lock in every write, so writers of two instances never interleave',
		async () => {
			// A second instance: its own pool and its own in-process queue.
			const other = openDatabase(config.database, false, 2);
			try {
				await write(async (transaction) => {
					const [held] = await sequelize.query<{ n: number }>(
						`SELECT COUNT(*) AS n FROM pg_locks WHERE locktype = 'advisory' AND granted
						    AND pid = pg_backend_pid() AND classid = 0 AND objid = :lock`,
						{ type: QueryTypes.SELECT, replacements: { lock: WRITE_LOCK }, transaction }
					);
					expect(held.n).toBe(1);
					const [taken] = await other.query<{ got: boolean }>(
						'SELECT pg_try_advisory_xact_lock(:lock) AS got',
						{ type: QueryTypes.SELECT, replacements: { lock: WRITE_LOCK } }
					);
					expect(taken.got).toBe(false);
				});

				const key = 'test:two-instances';
				await sequelize.query(
					`INSERT INTO login_throttles (key, failures, window_start) VALUES (:key, 0, :now)`,
					{ replacements: { key, now: new Date() } }
				);
				let inside = 0;
				let most = 0;
				const bump = (db: typeof sequelize) => async (transaction: Transaction) => {
					most = Math.max(most, ++inside);
					const [row] = await db.query<{ failures: number }>(
						'SELECT failures FROM login_throttles WHERE key = :key',
						{ type: QueryTypes.SELECT, replacements: { key }, transaction }
					);
					// A pause between read and write, so an interleaved writer would lose an update.
					await new Promise((resolve) => setTimeout(resolve, 2));
					await db.query('UPDATE login_throttles SET failures = :n WHERE key = :key', {
						replacements: { key, n: row.failures + 1 },
						transaction
					});
					inside--;
				};
				const otherQueue = new WriteQueue(other);
				const results = await Promise.allSettled(
					Array.from({ length: 60 }, (_, i) =>
						i % 2 ? otherQueue.run(bump(other)) : write(bump(sequelize))
					)
				);
				expect(results.filter((r) => r.status === 'rejected')).toEqual([]);
				expect(most).toBe(1);
				const [row] = await sequelize.query<{ failures: number }>(
					'SELECT failures FROM login_throttles WHERE key = :key',
					{ type: QueryTypes.SELECT, replacements: { key } }
				);
				expect(row.failures).toBe(60);
			} finally {
				await other.close();
			}
		}
	);

	it('applies migrations once and records them', async () => {
		await prepare();
		const [rows] = await sequelize.query('SELECT name FROM schema_migrations ORDER BY name');
		expect(rows).toEqual(migrations.map((m) => ({ name: m.name })));
		expect(migrations[0].name).toBe('2026-12-02-01-foundation');
	});

	it('refuses a row that points at nothing', async () => {
		await expect(
			sequelize.query(
				`INSERT INTO cohorts (name, programme_id, start_date, planned_end_date, created_at, updated_at)
				 VALUES ('x', 999, '2026-01-01', '2027-01-01', :now, :now)`,
				{ replacements: { now: new Date() } }
			)
			// SQLite says "FOREIGN KEY constraint failed", PostgreSQL "violates foreign key constraint".
		).rejects.toThrow(/FOREIGN KEY|foreign key constraint/);
	});

	it('keeps all of 200 concurrent read-then-write transactions', async () => {
		const key = 'test:counter';
		await write((t) =>
			LoginThrottle.create(
				{ key, failures: 0, windowStart: new Date(), blockedUntil: null },
				{ transaction: t }
			)
		);
		const results = await Promise.allSettled(
			Array.from({ length: 200 }, (_, i) =>
				write(async (transaction) => {
					// Read, then write what was read plus one: a lost update would show in the total.
					const row = await LoginThrottle.findByPk(key, { transaction, rejectOnEmpty: true });
					await row.update({ failures: row.failures + 1 }, { transaction });
					await Site.create({ code: `C${i}`, name: `Shop ${i}`, town: '' }, { transaction });
				})
			)
		);
		expect(results.filter((r) => r.status === 'rejected')).toEqual([]);
		expect((await LoginThrottle.findByPk(key, { rejectOnEmpty: true })).failures).toBe(200);
		expect(await Site.count({ where: { code: { [Op.like]: 'C%' } } })).toBe(200);
	});

	it('rolls back a failed write completely and keeps the queue going', async () => {
		const before = await Site.count();
		await expect(
			write(async (transaction) => {
				await Site.create({ code: 'ROLL', name: 'Rolled back', town: '' }, { transaction });
				await Site.create({ code: 'ROLL', name: 'Duplicate code', town: '' }, { transaction });
			})
		).rejects.toThrow();
		expect(await Site.count()).toBe(before);
		await write((transaction) =>
			Site.create({ code: 'AFTER', name: 'After', town: '' }, { transaction })
		);
		expect(await Site.count()).toBe(before + 1);
	});
});
