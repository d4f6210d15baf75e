import { z } from 'zod';
import { entrySchema } from './worklog';

export const entryBodySchema = entrySchema.extend({
	intent: z.enum(['draft', 'submit']).default('draft'),
	correctsId: z.number().int().positive().optional()
});

export const entryListSchema = z.object({
	status: z.enum(['draft', 'submitted', 'verified', 'returned']).optional(),
	sort: z.enum(['oldest', 'newest', 'apprentice']).default('oldest'),
	apprenticeId: z.string().trim().min(1).max(40).optional(),
	page: z.coerce.number().int().min(1).max(10_000).default(1),
	size: z.coerce.number().int().min(1).max(200).default(50),
	/** `full` returns each entry with its task titles, notes and evidence, in one query. */
	view: z.enum(['summary', 'full']).default('summary')
});
