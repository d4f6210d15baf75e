import { mkdtemp, readdir } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { QueryTypes } from 'sequelize';
import { beforeAll, describe, expect, it, vi } from 'vitest';
import { prepare, sequelize, write } from '$lib/server/db';
import * as keys from '$lib/server/certificates/keys';
import { SharedLookupLimiter } from '$lib/server/certificates/limit';
import { signContent, verifyContent } from '$lib/server/certificates/signing';

beforeAll(async () => {
	await prepare();
});

const tempDir = () => mkdtemp(path.join(os.tmpdir(), 'journeymark-keys-'));

describe('lookup limit shared through the database', () => {
	const db = { sequelize, write };
	// A fixed instant 10 s into a clock minute.
	const t = Math.floor(Date.UTC(2026, 11, 7, 9, 30) / 60_000) * 60_000 + 10_000;

	it('adds up the lookups of two instances in one window, per address', async () => {
		const a = new SharedLookupLimiter(5, db);
		const b = new SharedLookupLimiter(5, db);
		const address = '203.0.113.5';
		const first = await Promise.all([
			a.take(address, t),
			b.take(address, t),
			a.take(address, t + 1),
			b.take(address, t + 2),
			a.take(address, t + 3)
		]);
		expect(first).toEqual([0, 0, 0, 0, 0]);
		expect(await b.take(address, t + 1_000)).toBe(49);
		expect(await a.take(address, t + 2_000)).toBe(48);
		expect(await a.take('203.0.113.6', t + 2_000)).toBe(0);
		// The next clock minute starts afresh.
		expect(await b.take(address, t + 50_000)).toBe(0);
	});

	it('deletes finished windows', async () => {
		const a = new SharedLookupLimiter(5, db);
		await a.take('203.0.113.7', t);
		await a.sweep(t + 120_000);
		const rows = await sequelize.query<{ n: number }>(
			'SELECT COUNT(*) AS n FROM verify_lookups WHERE minute < :minute',
			{ type: QueryTypes.SELECT, replacements: { minute: Math.floor(t / 60_000) + 1 } }
		);
		expect(Number(rows[0].n)).toBe(0);
	});
});

describe('signing keys in a shared folder', () => {
	it('gives two instances starting at once on an empty folder the same keys', async () => {
		const dir = await tempDir();
		const rings = await Promise.all([keys.loadRing(dir), keys.loadRing(dir), keys.loadRing(dir)]);
		const kids = rings.map((r) => [r.ed25519.kid, r.rsa.kid]);
		expect(kids[1]).toEqual(kids[0]);
		expect(kids[2]).toEqual(kids[0]);
		// No temporary files left behind.
		expect((await readdir(dir)).sort()).toEqual([
			'ed25519-active.pem',
			'retired',
			'rsa-active.pem'
		]);
		await keys.forget(dir, true);
	});

	it('lets one instance see keys rotated by another', async () => {
		const dir = await tempDir();
		const mine = await keys.ring(dir);
		// The other instance: a fresh copy of the module, with its own cache, on the same folder.
		vi.resetModules();
		const other: typeof keys = await import('$lib/server/certificates/keys');
		expect((await other.ring(dir)).ed25519.kid).toBe(mine.ed25519.kid);
		const newKid = await other.rotate('ed25519', dir);
		expect(newKid).not.toBe(mine.ed25519.kid);
		// This instance's cached ring does not know the new key yet…
		expect((await keys.ring(dir)).published.has(newKid)).toBe(false);
		// …but a certificate signed with it verifies here.
		const { text, signature } = signContent((await other.ring(dir)).ed25519.privateKey, {
			serial: 'JM-TEST'
		});
		const key = await keys.publishedKey(newKid, dir);
		expect(key && verifyContent(key, text, signature)).toBe(true);
		expect(await keys.publishedKey(mine.ed25519.kid, dir)).toBeDefined();
		expect(await keys.publishedKey('no-such-key', dir)).toBeUndefined();
		expect((await keys.ring(dir)).ed25519.kid).toBe(newKid);

		// The key set follows a later rotation within RING_MAX_AGE_MS.
		vi.useFakeTimers({ toFake: ['Date'] });
		try {
			const third = await other.rotate('rsa', dir);
			expect((await keys.jwks(dir)).keys.map((k) => k.kid)).not.toContain(third);
			vi.setSystemTime(Date.now() + keys.RING_MAX_AGE_MS + 1);
			expect((await keys.jwks(dir)).keys.map((k) => k.kid)).toEqual(
				expect.arrayContaining([third, newKid, mine.ed25519.kid, mine.rsa.kid])
			);
		} finally {
			vi.useRealTimers();
		}
		await other.forget(dir);
		await keys.forget(dir, true);
	});

	it('gives two instances rotating at once a key each instance publishes', async () => {
		const dir = await tempDir();
		vi.resetModules();
		const other: typeof keys = await import('$lib/server/certificates/keys');
		const kids = await Promise.all([keys.rotate('ed25519', dir), other.rotate('ed25519', dir)]);
		const fresh = await keys.loadRing(dir);
		for (const kid of kids) expect(fresh.published.has(kid)).toBe(true);
		await other.forget(dir);
		await keys.forget(dir, true);
	});
});
