import { error, redirect } from '@sveltejs/kit';
import { z } from 'zod';
import type { Actions, PageServerLoad } from './$types';
import { requireRole } from '$lib/server/auth';
import * as worklog from '$lib/server/worklog';
import { fillEntry, formContext, saveEntry } from '../entry-form.server';
import { NO_SCRIPT_ROWS, entryToValues, rowCount, withTaskRows } from '../entry-values';

const query = z.object({
	corrects: z.coerce.number().int().positive().max(2_147_483_647).optional()
});

export const load = (async (event) => {
	const user = requireRole(event, 'apprentice');
	const parsed = query.safeParse(Object.fromEntries(event.url.searchParams));
	if (!parsed.success) error(400, 'The entry to correct is not a valid entry number.');
	const correctsId = parsed.data.corrects;
	const [context, original] = await Promise.all([
		formContext(user.id),
		correctsId ? worklog.detail(correctsId) : null
	]);
	if (correctsId && (!original || original.apprenticeId !== user.id)) {
		error(404, 'No such entry, or it is not yours to see.');
	}
	if (original && original.status !== 'verified') redirect(303, `/apprentice/log/${original.id}`);

	const values = original
		? {
				...entryToValues(original),
				// The verified original still counts on its day, so its clock times would overlap it.
				startTime: '',
				endTime: '',
				correctsId: String(original.id)
			}
		: withTaskRows(
				{
					workDate: context.today,
					odometerUnit: 'mi',
					supervisorId: context.supervisors[0]?.id ?? ''
				},
				[]
			);
	return {
		context,
		start: {
			values,
			rows: Math.max(NO_SCRIPT_ROWS, rowCount(values)),
			errors: {} as Record<string, string>
		},
		draftKey: `${user.id}:new${correctsId ? `:corrects-${correctsId}` : ''}`,
		corrects: original
			? { id: original.id, repairOrder: original.repairOrder, workDate: original.workDate }
			: null
	};
}) satisfies PageServerLoad;

export const actions = {
	save: (event) => saveEntry(event, 'draft'),
	submit: (event) => saveEntry(event, 'submit'),
	fill: fillEntry
} satisfies Actions;
