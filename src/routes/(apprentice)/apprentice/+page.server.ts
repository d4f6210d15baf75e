import { error } from '@sveltejs/kit';
import type { PageServerLoad } from './$types';
import * as assessment from '$lib/server/assessment';
import { requireRole } from '$lib/server/auth';
import * as certificates from '$lib/server/certificates';
import * as people from '$lib/server/people';
import * as progress from '$lib/server/progress';

export const load = (async (event) => {
	const user = requireRole(event, 'apprentice');
	const [record, found, cells, held] = await Promise.all([
		people.apprenticeRecord(user.id),
		progress.apprentice(user.id),
		assessment.matrix(user.id),
		certificates.listForHolder(user.id)
	]);
	if (!record || !found)
		error(404, 'Your apprentice record is not set up yet. Ask your coordinator.');
	const g = found.progress;
	return {
		record,
		hours: g.hours,
		probation: g.probation,
		rti: g.rti,
		tiers: g.tiers,
		completion: g.completion,
		wage: g.wage,
		forecast: g.forecast,
		risk: g.risk,
		efficiency: g.efficiency,
		approach: found.rules.approach,
		next: progress.nextTasks(cells),
		certificates: held.map((c) => ({
			serial: c.serial,
			title: c.title,
			issuedAt: c.issuedAt,
			statusWord: c.statusWord,
			status: c.status
		}))
	};
}) satisfies PageServerLoad;
