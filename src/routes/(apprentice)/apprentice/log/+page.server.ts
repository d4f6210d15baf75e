import { error } from '@sveltejs/kit';
import { z } from 'zod';
import type { PageServerLoad } from './$types';
import { requireRole } from '$lib/server/auth';
import * as worklog from '$lib/server/worklog';

const PAGE_SIZE = 20;
const STATUSES = ['draft', 'submitted', 'verified', 'returned'] as const;

const listQuery = z.object({
	status: z
		.enum(STATUSES)
		.optional()
		.or(z.literal('').transform(() => undefined)),
	page: z.coerce.number().int().min(1).max(10_000).default(1),
	sent: z.coerce.number().int().positive().max(2_147_483_647).optional(),
	deleted: z.string().optional()
});

export const load = (async (event) => {
	const user = requireRole(event, 'apprentice');
	const query = listQuery.safeParse(Object.fromEntries(event.url.searchParams));
	if (!query.success)
		error(400, 'That filter is not one of draft, submitted, verified or returned.');
	const { status, page, sent, deleted } = query.data;
	const { rows, total } = await worklog.queries.forApprentice(user.id, {
		status,
		limit: PAGE_SIZE,
		offset: (page - 1) * PAGE_SIZE
	});
	return {
		entries: rows.map((r) => ({
			id: r.id,
			workDate: r.workDate,
			startTime: r.startTime,
			endTime: r.endTime,
			tenths: r.tenths,
			repairOrder: r.repairOrder,
			vehicle: r.vehicle,
			status: r.status,
			returnComment: r.returnComment,
			taskCodes: r.taskCodes ? r.taskCodes.split(' ') : [],
			evidenceCount: r.evidenceCount,
			thumbnailId: r.thumbnailId,
			correctsId: r.correctsId
		})),
		total,
		page,
		pages: Math.max(1, Math.ceil(total / PAGE_SIZE)),
		status: status ?? null,
		sent: sent ?? null,
		deleted: deleted !== undefined
	};
}) satisfies PageServerLoad;
