import { Op, QueryTypes } from 'sequelize';
import { beforeAll, describe, expect, it } from 'vitest';
import { LoginThrottle, prepare, sequelize, Site, write } from '$lib/server/db';
import { BUSY_TIMEOUT_MS } from '$lib/server/db/connection';
import { migrations } from '$lib/server/db/migrations';

beforeAll(() => prepare());

const pragma = async (name: string) => {
	const [row] = await sequelize.query<Record<string, unknown>>(`PRAGMA ${name}`, {
		type: QueryTypes.SELECT
	});
	return Object.values(row)[0];
};

describe('database', () => {
	it('runs in WAL mode with foreign keys and a busy timeout', async () => {
		expect(await pragma('journal_mode')).toBe('wal');
		expect(await pragma('foreign_keys')).toBe(1);
		expect(await pragma('busy_timeout')).toBe(BUSY_TIMEOUT_MS);
	});

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
				 VALUES ('x', 999, '2026-01-01', '2027-01-01', datetime(), datetime())`
			)
		).rejects.toThrow(/FOREIGN KEY/);
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
