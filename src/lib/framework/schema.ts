import { z } from 'zod';
import { isUnit, plausible, toSI, UNIT_SYMBOLS } from '../units';
import type { AreaDef, ServiceInfoKind, TaskDef } from './types';

export type FrameworkDef = { name: string; areas: AreaDef[] };

export const SERVICE_INFO_KINDS = [
	'repair procedure',
	'specifications',
	'wiring diagram',
	'diagnostic procedure',
	'service bulletin',
	'maintenance schedule',
	'safety data sheet',
	'owner information'
] as const satisfies readonly ServiceInfoKind[];

export const SPEC_LIMITS = ['nominal', 'minimum', 'maximum'] as const;

export const AREA_CODE = /^[A-Z]{3}$/;
export const TASK_CODE = /^[A-Z]{3}-\d{2}$/;

function text(what: string, max: number) {
	return z
		.string({ error: `Enter the ${what}.` })
		.trim()
		.min(1, `Enter the ${what}.`)
		.max(max, `The ${what} is at most ${max} characters.`);
}

function list<T extends z.ZodType>(item: T, what: string, min: number, max: number) {
	const range = min === 0 ? `at most ${max}` : `${min} to ${max}`;
	return z
		.array(item, { error: `Give the ${what} as a list.` })
		.min(min, `A task needs ${range} ${what}.`)
		.max(max, `A task needs ${range} ${what}.`);
}

const checklistItemSchema = z.object({
	text: text('checklist step', 300),
	safety: z.boolean({ error: 'Mark the step as a safety step or not.' }).optional()
});

const specSchema = z
	.object({
		label: text('specification label', 200),
		value: z.number({ error: 'Enter the value as a number.' }).finite('Enter a finite number.'),
		unit: z.enum(UNIT_SYMBOLS, {
			error: `Use one of these units: ${UNIT_SYMBOLS.join(', ')}.`
		}),
		limit: z.enum(SPEC_LIMITS, { error: 'The limit is nominal, minimum or maximum.' })
	})
	.superRefine((spec, ctx) => {
		if (!isUnit(spec.unit) || !Number.isFinite(spec.value)) return;
		const problem = plausible(toSI(spec.value, spec.unit), spec.unit);
		if (problem) ctx.addIssue({ code: 'custom', path: ['value'], message: problem });
	});

const optionSchema = z.object({
	text: text('answer option', 300),
	correct: z.boolean({ error: 'Say whether the option is correct.' })
});

const questionSchema = z
	.object({
		prompt: text('question', 500),
		options: z
			.array(optionSchema, { error: 'Give the options as a list.' })
			.min(2, 'A question needs 2 to 6 options.')
			.max(6, 'A question needs 2 to 6 options.'),
		explanation: text('explanation', 1000)
	})
	.superRefine((question, ctx) => {
		if (!question.options.some((option) => option.correct)) {
			ctx.addIssue({
				code: 'custom',
				path: ['options'],
				message: 'Mark at least one option as correct.'
			});
		}
		const seen = new Set<string>();
		question.options.forEach((option, index) => {
			const key = option.text.toLowerCase();
			if (seen.has(key)) {
				ctx.addIssue({
					code: 'custom',
					path: ['options', index, 'text'],
					message: `The option “${option.text}” appears twice in this question.`
				});
			}
			seen.add(key);
		});
	});

/**
 * Code checks run even when other fields are wrong, so one pass reports every problem; the value
 * may then be partly invalid, hence the guards below.
 */
const everyTime = () => true;

function fieldOf(value: unknown, key: string): unknown {
	return typeof value === 'object' && value !== null
		? (value as Record<string, unknown>)[key]
		: null;
}

/** The `code` of each item of a list, or null where it is not a string. */
function codesOf(items: unknown): (string | null)[] {
	if (!Array.isArray(items)) return [];
	return items.map((item) => {
		const code = fieldOf(item, 'code');
		return typeof code === 'string' ? code : null;
	});
}

export const taskSchema = z
	.object({
		code: z
			.string({ error: 'Enter the task code.' })
			.regex(TASK_CODE, 'A task code is the area code, a hyphen and two digits, like BRK-03.'),
		title: text('task title', 200),
		description: text('task description', 2000),
		tier: z.literal([1, 2, 3], { error: 'The priority tier is 1, 2 or 3.' }),
		requiredLevel: z.literal([1, 2, 3, 4], { error: 'The required level is 1, 2, 3 or 4.' }),
		minHours: z
			.number({ error: 'Enter the minimum hours as a number.' })
			.min(0, 'Minimum hours cannot be negative.')
			.max(200, 'Minimum hours are at most 200.')
			// Tenths of an hour are the finest step a work log records.
			.refine((hours) => Math.abs(hours * 10 - Math.round(hours * 10)) < 1e-9, {
				message: 'Minimum hours have at most one decimal, like 2.5.'
			}),
		checklist: list(checklistItemSchema, 'checklist steps', 1, 20),
		specs: list(specSchema, 'specifications', 0, 30),
		tools: list(text('tool', 200), 'tools', 0, 30),
		cautions: list(text('caution', 500), 'cautions', 0, 20),
		serviceInfo: list(
			z.enum(SERVICE_INFO_KINDS, {
				error: `Service information is one of: ${SERVICE_INFO_KINDS.join(', ')}.`
			}),
			'kinds of service information',
			0,
			SERVICE_INFO_KINDS.length
		).refine((kinds) => new Set(kinds).size === kinds.length, {
			message: 'Each kind of service information is listed once.'
		}),
		questions: list(questionSchema, 'questions', 0, 50)
	})
	.strict() satisfies z.ZodType<TaskDef>;

export const areaSchema = z
	.object({
		code: z
			.string({ error: 'Enter the area code.' })
			.regex(AREA_CODE, 'An area code is three capital letters, like BRK.'),
		name: text('area name', 100),
		tasks: z
			.array(taskSchema, { error: 'Give the tasks as a list.' })
			.min(1, 'An area needs at least one task.')
			.max(99, 'An area holds at most 99 tasks.')
	})
	.strict()
	.superRefine(
		(area, ctx) => {
			codesOf(area.tasks).forEach((code, index) => {
				if (code !== null && !code.startsWith(`${area.code}-`)) {
					ctx.addIssue({
						code: 'custom',
						path: ['tasks', index, 'code'],
						message: `Task ${code} is in area ${area.code}, so its code must start with ${area.code}-.`
					});
				}
			});
		},
		{ when: everyTime }
	) satisfies z.ZodType<AreaDef>;

export const frameworkDefSchema = z
	.object({
		name: text('framework name', 200),
		areas: z
			.array(areaSchema, { error: 'Give the areas as a list.' })
			.min(1, 'A framework needs at least one area.')
			.max(40, 'A framework holds at most 40 areas.')
	})
	.strict()
	.superRefine(
		(def, ctx) => {
			const areaCodes = new Set<string>();
			const taskCodes = new Set<string>();
			const areas: unknown[] = Array.isArray(def.areas) ? def.areas : [];
			codesOf(areas).forEach((code, a) => {
				if (code !== null && areaCodes.has(code)) {
					ctx.addIssue({
						code: 'custom',
						path: ['areas', a, 'code'],
						message: `Area code ${code} is used twice.`
					});
				}
				if (code !== null) areaCodes.add(code);
				codesOf(fieldOf(areas[a], 'tasks')).forEach((taskCode, t) => {
					if (taskCode !== null && taskCodes.has(taskCode)) {
						ctx.addIssue({
							code: 'custom',
							path: ['areas', a, 'tasks', t, 'code'],
							message: `Task code ${taskCode} is used twice.`
						});
					}
					if (taskCode !== null) taskCodes.add(taskCode);
				});
			});
		},
		{ when: everyTime }
	) satisfies z.ZodType<FrameworkDef>;
