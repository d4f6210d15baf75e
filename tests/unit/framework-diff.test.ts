import { describe, expect, it } from 'vitest';
import { diffFrameworks, TASK_FIELDS } from '../../src/lib/framework/diff';
import type { FrameworkDef } from '../../src/lib/framework/schema';
import type { TaskDef } from '../../src/lib/framework/types';
import { DEFAULT_FRAMEWORK } from '../../src/lib/server/framework/default';

function makeTask(code: string, title = `Task ${code}`): TaskDef {
	return {
		code,
		title,
		description: 'Do the job to the standard.',
		tier: 2,
		requiredLevel: 3,
		minHours: 1,
		checklist: [{ text: 'Support the vehicle', safety: true }, { text: 'Road test' }],
		specs: [{ label: 'Wheel nut torque', value: 140, unit: 'N·m', limit: 'nominal' }],
		tools: ['Torque wrench'],
		cautions: ['Wear eye protection.'],
		serviceInfo: ['repair procedure'],
		questions: []
	};
}

function makeFramework(): FrameworkDef {
	return {
		name: 'Test framework',
		areas: [
			{ code: 'BRK', name: 'Brakes', tasks: [makeTask('BRK-01'), makeTask('BRK-02')] },
			{ code: 'SUS', name: 'Suspension', tasks: [makeTask('SUS-01')] }
		]
	};
}

describe('diffFrameworks', () => {
	it('finds no change between equal frameworks, even with keys in another order', () => {
		const b = makeFramework();
		b.areas[0].tasks[0].checklist[0] = { safety: true, text: 'Support the vehicle' };
		b.areas[0].tasks[0].checklist[1] = { text: 'Road test', safety: undefined };
		expect(diffFrameworks(makeFramework(), b)).toEqual([]);
		expect(diffFrameworks(DEFAULT_FRAMEWORK, structuredClone(DEFAULT_FRAMEWORK))).toEqual([]);
	});

	it('lists the fields that changed on a task', () => {
		const b = makeFramework();
		const task = b.areas[0].tasks[1];
		task.title = 'Service drum brakes';
		task.minHours = 1.5;
		task.specs[0].value = 190;
		task.checklist.reverse();
		expect(diffFrameworks(makeFramework(), b)).toEqual([
			{
				kind: 'changed',
				level: 'task',
				code: 'BRK-02',
				title: 'Service drum brakes',
				fields: ['title', 'minHours', 'checklist', 'specs']
			}
		]);
	});

	it('notices a change in every compared field', () => {
		const changed: Partial<TaskDef> = {
			title: 'New title',
			description: 'New description.',
			tier: 1,
			requiredLevel: 4,
			minHours: 3,
			checklist: [{ text: 'Only step' }],
			specs: [],
			tools: ['Dial indicator'],
			cautions: [],
			serviceInfo: ['specifications'],
			questions: [
				{
					prompt: 'Why?',
					options: [
						{ text: 'Because', correct: true },
						{ text: 'No reason', correct: false }
					],
					explanation: 'It matters.'
				}
			]
		};
		for (const field of TASK_FIELDS) {
			const b = makeFramework();
			Object.assign(b.areas[1].tasks[0], { [field]: changed[field] });
			expect(diffFrameworks(makeFramework(), b)).toEqual([
				expect.objectContaining({ kind: 'changed', code: 'SUS-01', fields: [field] })
			]);
		}
	});

	it('reports added and removed tasks and areas, and renamed areas', () => {
		const b = makeFramework();
		b.areas[0].name = 'Brake systems';
		b.areas[0].tasks.splice(0, 1);
		b.areas[0].tasks.push(makeTask('BRK-03', 'Bleed the brakes'));
		b.areas.splice(1, 1, { code: 'ELE', name: 'Electrical', tasks: [makeTask('ELE-01')] });
		expect(diffFrameworks(makeFramework(), b)).toEqual([
			{ kind: 'changed', level: 'area', code: 'BRK', title: 'Brake systems', fields: ['name'] },
			{ kind: 'added', level: 'task', code: 'BRK-03', title: 'Bleed the brakes' },
			{ kind: 'removed', level: 'task', code: 'BRK-01', title: 'Task BRK-01' },
			{ kind: 'added', level: 'area', code: 'ELE', title: 'Electrical' },
			{ kind: 'added', level: 'task', code: 'ELE-01', title: 'Task ELE-01' },
			{ kind: 'removed', level: 'area', code: 'SUS', title: 'Suspension' },
			{ kind: 'removed', level: 'task', code: 'SUS-01', title: 'Task SUS-01' }
		]);
	});

	it('is symmetric in what it finds', () => {
		const b = makeFramework();
		b.areas[0].tasks.pop();
		expect(diffFrameworks(makeFramework(), b)).toEqual([
			{ kind: 'removed', level: 'task', code: 'BRK-02', title: 'Task BRK-02' }
		]);
		expect(diffFrameworks(b, makeFramework())).toEqual([
			{ kind: 'added', level: 'task', code: 'BRK-02', title: 'Task BRK-02' }
		]);
	});
});
