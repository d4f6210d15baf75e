import { describe, expect, it } from 'vitest';
import { frameworkDefSchema } from '../../src/lib/framework/schema';
import { DEFAULT_FRAMEWORK } from '../../src/lib/server/framework/default';
import { plausible, toSI } from '../../src/lib/units';

const tasks = DEFAULT_FRAMEWORK.areas.flatMap((area) => area.tasks);

describe('default framework', () => {
	it('passes the framework schema', () => {
		const parsed = frameworkDefSchema.safeParse(DEFAULT_FRAMEWORK);
		expect(parsed.error?.issues ?? []).toEqual([]);
		expect(parsed.data).toEqual(DEFAULT_FRAMEWORK);
	});

	it('has eleven areas, safety first, and at least 120 tasks', () => {
		expect(DEFAULT_FRAMEWORK.areas.map((area) => area.code)).toEqual([
			'SAF',
			'HVS',
			'MLR',
			'ENG',
			'ATX',
			'MDA',
			'SUS',
			'BRK',
			'ELE',
			'HAC',
			'EPF'
		]);
		expect(tasks.length).toBeGreaterThanOrEqual(120);
		expect(new Set(tasks.map((task) => task.code)).size).toBe(tasks.length);
	});

	it('gives every task 4 to 10 checklist steps', () => {
		const outside = tasks.filter((task) => task.checklist.length < 4 || task.checklist.length > 10);
		expect(outside.map((task) => task.code)).toEqual([]);
	});

	it('gives every tier-1 task at least five questions', () => {
		const short = tasks.filter((task) => task.tier === 1 && task.questions.length < 5);
		expect(short.map((task) => task.code)).toEqual([]);
		expect(tasks.some((task) => task.tier === 1)).toBe(true);
	});

	it('has only plausible specifications', () => {
		const specs = tasks.flatMap((task) => task.specs.map((spec) => ({ code: task.code, ...spec })));
		const absurd = specs.filter((spec) => plausible(toSI(spec.value, spec.unit), spec.unit));
		expect(absurd).toEqual([]);
		expect(specs.length).toBeGreaterThan(100);
	});

	it('has a brake pad-and-rotor task that checks runout and torque', () => {
		const brakes = DEFAULT_FRAMEWORK.areas.find((area) => area.code === 'BRK');
		const padsAndRotors = brakes?.tasks.find(
			(task) => /pad/i.test(task.title) && /rotor/i.test(task.title)
		);
		const steps = padsAndRotors?.checklist.map((step) => step.text.toLowerCase()).join('\n') ?? '';
		expect(steps).toContain('runout');
		expect(steps).toContain('torque');
	});
});
