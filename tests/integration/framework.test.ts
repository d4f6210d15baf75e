import { beforeAll, describe, expect, it } from 'vitest';
import { Framework, prepare, Task, TaskSpec } from '$lib/server/db';
import * as framework from '$lib/server/framework';
import { DEFAULT_FRAMEWORK } from '$lib/server/framework/default';

beforeAll(async () => {
	await prepare();
	await framework.ensureDefault();
});

const published = async () => (await framework.current())!;

describe('the default framework', () => {
	it('is loaded once, published, as version 1', async () => {
		await framework.ensureDefault();
		const all = await framework.list();
		expect(all).toHaveLength(1);
		expect(all[0]).toMatchObject({ version: 1, status: 'published', areas: 11 });
		expect(all[0].tasks).toBeGreaterThanOrEqual(120);
	});

	it('reads back exactly as written, specs converted through SI and back', async () => {
		expect(await framework.definition((await published()).id)).toEqual(DEFAULT_FRAMEWORK);
	});

	it('stores specification values in SI with the unit entered', async () => {
		const f = await published();
		const [code, entered] = DEFAULT_FRAMEWORK.areas
			.flatMap((a) => a.tasks.flatMap((t) => t.specs.map((s) => [t.code, s] as const)))
			.find(([, s]) => s.unit === 'lbf·ft')!;
		const task = await Task.findOne({ where: { frameworkId: f.id, code }, rejectOnEmpty: true });
		const stored = await TaskSpec.findOne({
			where: { taskId: task.id, label: entered.label },
			rejectOnEmpty: true
		});
		expect(stored.unit).toBe('lbf·ft');
		// NIST SP 811 App. B: 1 lbf·ft = 1.355818 N·m
		expect(stored.valueSi).toBeCloseTo(entered.value * 1.355818, 3);
	});
});

describe('task search', () => {
	it('filters by area, tier and words, with a total for paging', async () => {
		const f = await published();
		const brakes = await framework.tasks(f.id, { area: 'BRK', limit: 5, offset: 0 });
		expect(brakes.rows).toHaveLength(5);
		expect(brakes.total).toBeGreaterThan(5);
		expect(brakes.rows.every((t) => t.areaCode === 'BRK')).toBe(true);
		const tier1 = await framework.tasks(f.id, { tier: 1, limit: 500, offset: 0 });
		expect(tier1.rows.every((t) => t.tier === 1)).toBe(true);
		const words = await framework.tasks(f.id, { q: 'rotor pads', limit: 50, offset: 0 });
		expect(words.rows.map((t) => t.code)).toContain('BRK-01');
	});

	it('treats LIKE wildcards and quotes in the search as plain text', async () => {
		const f = await published();
		expect((await framework.tasks(f.id, { q: '%', limit: 50, offset: 0 })).total).toBe(0);
		expect((await framework.tasks(f.id, { q: "' OR 1=1 --", limit: 50, offset: 0 })).total).toBe(0);
	});
});

describe('versions', () => {
	it('edits a copy: a draft follows the published version, which never changes', async () => {
		const base = await published();
		const before = await framework.definition(base.id);
		const draft = await framework.draftFrom(base.id, null as unknown as string);
		expect(draft).toMatchObject({ status: 'draft', version: 2, basedOnId: base.id });
		// Asking again returns the same open draft.
		expect((await framework.draftFrom(base.id, null as unknown as string)).id).toBe(draft.id);

		const edited = structuredClone(before);
		edited.areas[0].tasks[0].title = 'A retitled task';
		await framework.replaceDraft(draft.id, edited);
		expect((await framework.definition(draft.id)).areas[0].tasks[0].title).toBe('A retitled task');
		expect(await framework.definition(base.id)).toEqual(before);

		await expect(framework.replaceDraft(base.id, edited)).rejects.toThrow(/cannot change/);
	});

	it('publishing a draft retires the version before it', async () => {
		const base = await published();
		const draft = await Framework.findOne({ where: { status: 'draft' }, rejectOnEmpty: true });
		await framework.publish(draft.id);
		expect((await published()).id).toBe(draft.id);
		expect((await Framework.findByPk(base.id, { rejectOnEmpty: true })).status).toBe('retired');
		await expect(framework.publish(draft.id)).rejects.toThrow(/Only a draft/);
	});

	it('a discarded draft leaves no rows behind', async () => {
		const tasksBefore = await Task.count();
		const draft = await framework.draftFrom((await published()).id, null as unknown as string);
		expect(await Task.count()).toBeGreaterThan(tasksBefore);
		await framework.discardDraft(draft.id);
		expect(await Task.count()).toBe(tasksBefore);
		expect(await TaskSpec.count({ where: { taskId: [] } })).toBe(0);
	});
});
