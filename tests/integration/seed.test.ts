import { beforeAll, describe, expect, it } from 'vitest';
import { Cohort, prepare, Site, Supervision, User, write } from '$lib/server/db';
import { DEMO_ACCOUNTS, seedDemo } from '../../seed/demo';

beforeAll(() => prepare());

describe('demo data', () => {
	it('creates the invented scenario once, with the four demo accounts', async () => {
		expect(await seedDemo()).toBe('seeded');
		expect(await seedDemo()).toBe('already seeded');
		expect(await Site.count()).toBe(3);
		expect(await Cohort.count()).toBe(2);
		expect(await User.count({ where: { role: 'apprentice' } })).toBe(20);
		expect(await User.count({ where: { role: 'supervisor' } })).toBe(6);
		for (const a of DEMO_ACCOUNTS) {
			expect(await User.findOne({ where: { email: a.email, role: a.role } })).not.toBeNull();
		}
		// Every apprentice has at least one journeyworker at their own shop.
		const apprentices = await User.findAll({ where: { role: 'apprentice' } });
		for (const a of apprentices) {
			expect(await Supervision.count({ where: { apprenticeId: a.id } })).toBeGreaterThan(0);
		}
	});

	it('refuses to run against a database holding real accounts', async () => {
		await write((transaction) =>
			User.create(
				{
					id: 'real-1',
					email: 'real@shop.example',
					name: 'Real',
					role: 'admin',
					siteId: null,
					passwordHash: null
				},
				{ transaction }
			)
		);
		await expect(seedDemo()).rejects.toThrow(/real account/);
	});
});
