import { z } from 'zod';

/**
 * Defaults from the US registered apprenticeship rules (29 CFR Part 29, REFERENCES.md) and the
 * trade's programme accreditation coverage rule. The local registration agency's rules govern;
 * every value stays editable.
 */
export const PROGRAMME_DEFAULTS = {
	approach: 'hybrid' as const,
	termYears: 4,
	/** 29 CFR 29.5(b)(2)(i): at least 2,000 hours of on-the-job learning per year of term. */
	ojlHoursPerYear: 2000,
	ojlHours: 8000,
	/** 29 CFR 29.5(b)(4): 144 hours of related instruction per year. */
	rtiHoursPerYear: 144,
	probationHours: 2000,
	tierThresholds: [95, 80, 50] as [number, number, number],
	stallWeeks: 4,
	returnedLimit: 5
};

/** 29 CFR 29.5(b)(8): probation of at most 25 % of the term or one year, whichever is shorter. */
export function probationCap(ojlHours: number, termYears: number): number {
	return Math.floor(Math.min(ojlHours * 0.25, ojlHours / termYears));
}

const int = (label: string, min: number, max: number) =>
	z.coerce
		.number({ error: `${label}: enter a number.` })
		.int(`${label}: use a whole number.`)
		.min(min, `${label}: at least ${min.toLocaleString('en-US')}.`)
		.max(max, `${label}: at most ${max.toLocaleString('en-US')}.`);

const optionalInt = (label: string, min: number, max: number) =>
	z.preprocess((v) => (v === '' || v === undefined || v === null ? 0 : v), int(label, min, max));

/** A form row left empty is not a step. */
const blankStep = (s: unknown) =>
	s !== null &&
	typeof s === 'object' &&
	['fromHours', 'percent', 'minTasks'].every((k) => {
		const v = (s as Record<string, unknown>)[k];
		return v === undefined || v === '';
	});

export const wageStepSchema = z.object({
	fromHours: int('Hours', 0, 20000),
	percent: int('Percentage', 1, 100),
	minTasks: optionalInt('Tasks', 0, 1000)
});

export const programmeRulesSchema = z
	.object({
		name: z
			.string()
			.trim()
			.min(3, 'Give the programme a name.')
			.max(160, 'Keep the name under 160 characters.'),
		approach: z.enum(['time', 'competency', 'hybrid'], 'Choose how the programme is completed.'),
		termYears: int('Term', 1, 6),
		ojlHours: int('On-the-job hours', 1, 20000),
		rtiHoursPerYear: int('Related instruction', 0, 2000),
		probationHours: int('Probation', 0, 20000),
		journeyworkerRate: z.coerce
			.number({ error: 'Journeyworker rate: enter an amount.' })
			.positive('Journeyworker rate: enter an amount above zero.')
			.max(1000, 'Journeyworker rate: at most 1,000 per hour.'),
		wageSchedule: z.preprocess(
			(v) => (Array.isArray(v) ? v.filter((s) => !blankStep(s)) : v),
			z
				.array(wageStepSchema, 'Add at least one wage step.')
				.min(1, 'Add at least one wage step.')
				.max(12, 'At most 12 wage steps.')
		),
		ratioRule: z.enum(['fixed', 'first-then-every'], 'Choose how the ratio is counted.'),
		ratioApprentices: int('Apprentices in the ratio', 1, 10),
		ratioJourneyworkers: int('Journeyworkers in the ratio', 1, 10),
		ratioEvery: int('Journeyworkers per extra apprentice', 1, 10),
		tier1: int('Priority 1 coverage', 0, 100),
		tier2: int('Priority 2 coverage', 0, 100),
		tier3: int('Priority 3 coverage', 0, 100),
		stallWeeks: int('Weeks without verified hours', 1, 52),
		returnedLimit: int('Returned entries', 1, 100),
		certificateValidityMonths: z.preprocess(
			(v) => (v === '' || v === undefined ? null : v),
			int('Certificate validity', 1, 240).nullable()
		)
	})
	.superRefine((r, ctx) => {
		if (r.approach === 'time' && r.ojlHours < 2000) {
			ctx.addIssue({
				code: 'custom',
				path: ['ojlHours'],
				message:
					'A time-based programme needs at least 2,000 on-the-job hours (29 CFR 29.5(b)(2)(i)).'
			});
		}
		const cap = probationCap(r.ojlHours, r.termYears);
		if (r.probationHours > cap) {
			ctx.addIssue({
				code: 'custom',
				path: ['probationHours'],
				message: `Probation may be at most ${cap.toLocaleString('en-US')} hours: 25 % of the term or one year, whichever is shorter (29 CFR 29.5(b)(8)).`
			});
		}
		const steps = r.wageSchedule;
		if (steps[0] && steps[0].fromHours !== 0) {
			ctx.addIssue({
				code: 'custom',
				path: ['wageSchedule', 0, 'fromHours'],
				message: 'The first wage step starts at 0 hours.'
			});
		}
		for (let i = 1; i < steps.length; i++) {
			if (steps[i].fromHours <= steps[i - 1].fromHours) {
				ctx.addIssue({
					code: 'custom',
					path: ['wageSchedule', i, 'fromHours'],
					message: `Step ${i + 1} must start at more hours than step ${i}.`
				});
			}
			if (steps[i].percent <= steps[i - 1].percent) {
				ctx.addIssue({
					code: 'custom',
					path: ['wageSchedule', i, 'percent'],
					message: `Wages must rise: step ${i + 1} must pay more than step ${i} (29 CFR 29.5(b)(5)).`
				});
			}
			if (steps[i].minTasks < steps[i - 1].minTasks) {
				ctx.addIssue({
					code: 'custom',
					path: ['wageSchedule', i, 'minTasks'],
					message: `Step ${i + 1} cannot ask for fewer tasks than step ${i}.`
				});
			}
		}
		const last = steps.at(-1);
		if (last && last.fromHours >= r.ojlHours && r.approach !== 'competency') {
			ctx.addIssue({
				code: 'custom',
				path: ['wageSchedule', steps.length - 1, 'fromHours'],
				message: 'Every wage step must start before the programme’s on-the-job hours are complete.'
			});
		}
	});

export type ProgrammeRulesInput = z.infer<typeof programmeRulesSchema>;

/** Advanced standing for prior experience or training, 29 CFR 29.5(b)(12). */
export const priorCreditSchema = z.object({
	priorCreditHours: z.coerce
		.number({ error: 'Prior credit: enter a number of hours.' })
		.min(0, 'Prior credit: 0 hours or more.')
		.max(20000, 'Prior credit: at most 20,000 hours.')
		.refine((n) => Number.isInteger(n * 10), 'Prior credit: use tenths of an hour at most.'),
	reason: z
		.string()
		.trim()
		.min(3, 'Say what the credit is for (for example, the course or previous employer).')
		.max(300, 'Keep the reason under 300 characters.')
});
