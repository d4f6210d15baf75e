import { error, json } from '@sveltejs/kit';
import type { RequestHandler } from './$types';
import { answer, idParam, readJson } from '$lib/server/api';
import { requireRole } from '$lib/server/auth';
import * as programmes from '$lib/server/programmes';
import { programmeRulesSchema } from '$lib/schemas/programme';

/** A programme's rules in the editor's shape. */
export const GET = (async (event) => {
	requireRole(event, 'coordinator');
	const p = await programmes.get(idParam(event.params.id));
	if (!p) error(404, 'There is no programme with that number.');
	return json({ id: p.id, ...programmes.toInput(p) });
}) satisfies RequestHandler;

/** Replaces a programme's rules; rules that contradict each other are refused whole. */
export const PUT = (async (event) => {
	requireRole(event, 'coordinator');
	const id = idParam(event.params.id);
	return answer(async () => {
		const input = await readJson(event.request, programmeRulesSchema);
		const p = await programmes.update(id, input);
		if (!p) error(404, 'There is no programme with that number.');
		return { id: p.id, ...programmes.toInput(p) };
	});
}) satisfies RequestHandler;
