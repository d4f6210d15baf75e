import { beforeAll, describe, expect, it, vi } from 'vitest';

vi.hoisted(() => {
	// This file's temporary folder (its mail folder's parent); DATABASE_URL may be a URL.
	const dir = process.env.FAKE_MAIL_DIR!.replace(/[^/\\]+$/, '');
	process.env.KEYS_DIR = `${dir}keys`;
	process.env.CERTIFICATES_DIR = `${dir}pdf`;
});

import * as certificates from '$lib/server/certificates';
import { prepare } from '$lib/server/db';
import { ensureDefault } from '$lib/server/framework';
import { seedCertificates } from '../../seed/certificates';
import { seedDemo } from '../../seed/demo';
import { seedSignOffs } from '../../seed/signoffs';
import { seedWorkLog } from '../../seed/worklog';

// A fixed moment, as in the other seed tests, so the checks never depend on the day they run.
const TODAY = new Date('2026-12-02T15:00:00Z');

/** The serials README.md lists for the demo. */
const README = {
	valid: 'JM-7RKB-DPEN-0XAA-8HNN-R',
	'valid-brakes': 'JM-87PQ-W6V4-VYJC-P762-F',
	expired: 'JM-3Y6X-8MB4-K7G9-D4EX-Y',
	revoked: 'JM-307B-WR1M-3D6K-7RXV-1'
};

let result: Awaited<ReturnType<typeof seedCertificates>>;

beforeAll(async () => {
	await prepare();
	await ensureDefault();
	await seedDemo();
	await seedWorkLog(TODAY);
	await seedSignOffs(TODAY);
	result = await seedCertificates(TODAY);
}, 120_000);

describe('demo certificates', () => {
	it('are issued through the app for areas the demo sign-offs complete, with the README serials', async () => {
		if (result === 'already seeded') throw new Error('expected a fresh database');
		expect(result.skipped).toEqual([]);
		expect(result.issued.map((c) => c.serial).sort()).toEqual(Object.values(README).sort());
		const seen = await Promise.all(
			Object.values(README).map(async (serial) => (await certificates.lookup(serial, TODAY))!)
		);
		expect(seen.map((v) => v.status)).toEqual(['valid', 'valid', 'expired', 'revoked']);
		expect(seen.every((v) => v.signatureValid)).toBe(true);
		expect(await seedCertificates(TODAY)).toBe('already seeded');
	});
});
