import { z } from 'zod';

/** Query of the task list, shared by the page and `GET /api/frameworks/:id/tasks`. */
export const taskFilterSchema = z.object({
	area: z
		.string()
		.trim()
		.toUpperCase()
		.regex(/^[A-Z]{3}$/, 'An area code is three letters, like BRK.')
		.optional()
		.or(z.literal('').transform(() => undefined)),
	tier: z
		.enum(['1', '2', '3'], { error: 'Tier is 1, 2 or 3.' })
		.transform((v) => Number(v) as 1 | 2 | 3)
		.optional()
		.or(z.literal('').transform(() => undefined)),
	q: z.string().trim().max(100, 'Search for at most 100 characters.').optional(),
	page: z.coerce
		.number({ error: 'Page is a number.' })
		.int('Page is a whole number.')
		.min(1, 'Pages start at 1.')
		.max(10_000, 'That page is out of range.')
		.default(1),
	size: z.coerce
		.number({ error: 'Size is a number.' })
		.int()
		.min(1)
		.max(200, 'At most 200 tasks per page.')
		.default(50)
});

export type TaskFilterInput = z.infer<typeof taskFilterSchema>;

export const frameworkIdSchema = z.coerce
	.number({ error: 'A framework id is a number.' })
	.int()
	.positive('A framework id is a positive number.')
	.max(2_147_483_647);
