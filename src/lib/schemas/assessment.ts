import { z } from 'zod';

export const taskCodeSchema = z
	.string()
	.trim()
	.toUpperCase()
	.regex(/^[A-Z]{3}-\d{2}$/, 'Task codes look like BRK-01.');

export const answersSchema = z.object({
	attemptId: z.coerce.number().int().positive().max(2_147_483_647),
	answers: z
		.record(
			z.string().regex(/^\d{1,10}$/, 'Question ids are numbers.'),
			z.array(z.number().int().min(0).max(10)).max(10)
		)
		.refine((r) => Object.keys(r).length <= 50, 'Too many answers.')
});

const stepResult = z.enum(['met', 'not met', 'n/a'], {
	error: 'Mark each step met, not met or n/a.'
});

export const signOffSchema = z.object({
	apprenticeId: z.string().trim().min(1, 'Choose the apprentice.').max(40),
	code: taskCodeSchema,
	level: z.coerce
		.number({ error: 'Choose a level.' })
		.int()
		.min(1, 'Choose a level from 1 to 4.')
		.max(4, 'Choose a level from 1 to 4.')
		.transform((v) => v as 1 | 2 | 3 | 4),
	results: z
		.record(z.string().regex(/^\d{1,10}$/), stepResult)
		.refine((r) => Object.keys(r).length <= 30, 'Too many checklist results.'),
	notes: z.string().trim().max(2000, 'Notes are at most 2000 characters.').default(''),
	password: z
		.string({ error: 'Enter your password to sign.' })
		.min(1, 'Enter your password to sign.')
		.max(128)
});

export const revokeSchema = z.object({
	reason: z.string().trim().min(5, 'Give the reason (at least a few words).').max(1000),
	correctedLevel: z.coerce
		.number()
		.int()
		.min(1)
		.max(4)
		.optional()
		.transform((v) => v as 1 | 2 | 3 | 4 | undefined)
});

export const signOffRequestSchema = z.object({
	supervisorId: z.string().trim().min(1, 'Choose one of your journeyworkers.').max(40)
});
