import type { Actions, PageServerLoad } from './$types';
import * as audit from '$lib/server/audit';
import { requireRole } from '$lib/server/auth';
import { AuditEvent, User } from '$lib/server/db';

export const load = (async (event) => {
	requireRole(event, 'admin');
	const events = await AuditEvent.findAll({
		order: [['id', 'DESC']],
		limit: 100,
		attributes: ['id', 'at', 'actorId', 'kind', 'subject', 'hash'],
		raw: true
	});
	const actorIds = [...new Set(events.map((e) => e.actorId).filter((id) => id !== null))];
	const actors = await User.findAll({ where: { id: actorIds }, attributes: ['id', 'name'] });
	const names = new Map(actors.map((a) => [a.id, a.name]));
	return {
		events: events.map((e) => ({
			id: e.id,
			at: new Date(e.at).toISOString(),
			kind: e.kind,
			subject: e.subject,
			actor: e.actorId ? (names.get(e.actorId) ?? 'Unknown account') : 'System',
			hash: e.hash.slice(0, 12)
		}))
	};
}) satisfies PageServerLoad;

export const actions = {
	verify: async (event) => {
		requireRole(event, 'admin');
		return { chain: await audit.verify(), checkedAt: new Date().toISOString() };
	}
} satisfies Actions;
