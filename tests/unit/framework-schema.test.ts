import { describe, expect, it } from 'vitest';
import {
	areaSchema,
	frameworkDefSchema,
	taskSchema,
	type FrameworkDef
} from '../../src/lib/framework/schema';
import type { AreaDef, TaskDef } from '../../src/lib/framework/types';

function makeTask(code: string, overrides: Partial<TaskDef> = {}): TaskDef {
	return {
		code,
		title: 'Replace a wheel bearing hub unit',
		description: 'Remove the hub unit, fit the new one and torque the axle nut.',
		tier: 2,
		requiredLevel: 3,
		minHours: 2.5,
		checklist: [
			{ text: 'Support the vehicle on stands', safety: true },
			{ text: 'Torque the axle nut' }
		],
		specs: [{ label: 'Axle nut torque', value: 177, unit: 'lbf·ft', limit: 'nominal' }],
		tools: ['Torque wrench'],
		cautions: ['Never reuse a staked axle nut.'],
		serviceInfo: ['repair procedure'],
		questions: [
			{
				prompt: 'When is the axle nut torqued?',
				options: [
					{ text: 'With the wheel on the ground', correct: true },
					{ text: 'With the wheel spinning', correct: false }
				],
				explanation: 'The hub must not turn while the nut is torqued.'
			}
		],
		...overrides
	};
}

function makeFramework(...areas: AreaDef[]): FrameworkDef {
	return { name: 'Test framework', areas };
}

/** The path and message of each issue, for readable assertions. */
function issuesOf(result: { error?: { issues: { path: PropertyKey[]; message: string }[] } }) {
	return (result.error?.issues ?? []).map((issue) => ({
		path: issue.path.join('.'),
		message: issue.message
	}));
}

describe('taskSchema', () => {
	it('accepts a well-formed task', () => {
		expect(issuesOf(taskSchema.safeParse(makeTask('SUS-04')))).toEqual([]);
	});

	it('refuses malformed codes and out-of-range numbers with plain messages', () => {
		const issues = issuesOf(
			taskSchema.safeParse(
				makeTask('sus-4', { tier: 4 as 1, requiredLevel: 0 as 1, minHours: 2.25 })
			)
		);
		expect(issues.map((issue) => issue.path)).toEqual([
			'code',
			'tier',
			'requiredLevel',
			'minHours'
		]);
		expect(issues[0].message).toMatch(/like BRK-03/);
		expect(issues[3].message).toMatch(/one decimal/);
		expect(issuesOf(taskSchema.safeParse(makeTask('SUS-04', { minHours: 201 })))[0].path).toBe(
			'minHours'
		);
	});

	it('needs 1 to 20 checklist steps', () => {
		const step = { text: 'Check the work' };
		expect(issuesOf(taskSchema.safeParse(makeTask('SUS-04', { checklist: [] })))[0].path).toBe(
			'checklist'
		);
		const many = Array.from({ length: 21 }, () => step);
		expect(issuesOf(taskSchema.safeParse(makeTask('SUS-04', { checklist: many })))[0].path).toBe(
			'checklist'
		);
		const twenty = Array.from({ length: 20 }, () => step);
		expect(taskSchema.safeParse(makeTask('SUS-04', { checklist: twenty })).success).toBe(true);
	});

	it('refuses unknown units and implausible values', () => {
		const task = makeTask('SUS-04', {
			specs: [
				{ label: 'Wheel nut torque', value: 10_000, unit: 'N·m', limit: 'nominal' },
				{ label: 'Axle nut torque', value: 100, unit: 'Nmm' as 'N·m', limit: 'nominal' }
			]
		});
		const issues = issuesOf(taskSchema.safeParse(task));
		expect(issues.map((issue) => issue.path)).toEqual(['specs.0.value', 'specs.1.unit']);
		expect(issues[0].message).toMatch(/3000 N·m/);
	});

	it('needs 2 to 6 options and at least one correct option per question', () => {
		const question = makeTask('SUS-04').questions[0];
		const wrongOnly = {
			...question,
			options: question.options.map((o) => ({ ...o, correct: false }))
		};
		expect(issuesOf(taskSchema.safeParse(makeTask('SUS-04', { questions: [wrongOnly] })))).toEqual([
			{ path: 'questions.0.options', message: 'Mark at least one option as correct.' }
		]);
		const one = { ...question, options: question.options.slice(0, 1) };
		expect(issuesOf(taskSchema.safeParse(makeTask('SUS-04', { questions: [one] })))[0].path).toBe(
			'questions.0.options'
		);
		const seven = {
			...question,
			options: Array.from({ length: 7 }, (_, i) => ({ text: `Option ${i}`, correct: i === 0 }))
		};
		expect(issuesOf(taskSchema.safeParse(makeTask('SUS-04', { questions: [seven] })))[0].path).toBe(
			'questions.0.options'
		);
	});
});

describe('areaSchema and frameworkDefSchema', () => {
	it('needs every task code to start with its area code', () => {
		const area = { code: 'SUS', name: 'Suspension and steering', tasks: [makeTask('BRK-01')] };
		expect(issuesOf(areaSchema.safeParse(area))).toEqual([
			{
				path: 'tasks.0.code',
				message: 'Task BRK-01 is in area SUS, so its code must start with SUS-.'
			}
		]);
	});

	it('refuses duplicate task and area codes at the duplicate', () => {
		const suspension = {
			code: 'SUS',
			name: 'Suspension',
			tasks: [makeTask('SUS-01'), makeTask('SUS-01')]
		};
		const again = { code: 'SUS', name: 'Steering', tasks: [makeTask('SUS-02')] };
		expect(issuesOf(frameworkDefSchema.safeParse(makeFramework(suspension, again)))).toEqual([
			{ path: 'areas.0.tasks.1.code', message: 'Task code SUS-01 is used twice.' },
			{ path: 'areas.1.code', message: 'Area code SUS is used twice.' }
		]);
	});

	it('still reports duplicates when another field has the wrong type', () => {
		const broken = makeTask('SUS-01', { tier: 'high' as unknown as 1 });
		const area = { code: 'SUS', name: 'Suspension', tasks: [broken, makeTask('SUS-01')] };
		const paths = issuesOf(frameworkDefSchema.safeParse(makeFramework(area))).map((i) => i.path);
		expect(paths).toEqual(['areas.0.tasks.0.tier', 'areas.0.tasks.1.code']);
	});

	it('needs at least one area', () => {
		expect(issuesOf(frameworkDefSchema.safeParse(makeFramework()))[0].path).toBe('areas');
	});
});
