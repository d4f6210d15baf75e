import { error } from '@sveltejs/kit';
import type { PageServerLoad } from './$types';
import { requireRole } from '$lib/server/auth';
import * as framework from '$lib/server/framework';
import { diffFrameworks } from '$lib/framework/diff';
import { family, findVersion, versionOf } from '../../versions.server';
import { detailsOf, findTask } from './details';

export const load = (async (event) => {
	requireRole(event, 'coordinator');
	const version = await versionOf(event.params.id);
	const asked = event.url.searchParams.get('against');
	const against = asked !== null ? await findVersion(asked) : await findVersion(version.basedOnId);
	if (asked !== null && !against) error(404, 'There is no version with that id to compare with.');
	const others = (await family(version.name)).filter((v) => v.id !== version.id);
	const choices = others.map((v) => ({ id: v.id, version: v.version, status: v.status }));
	if (!against) return { version, against: null, choices, changes: [] };

	const [before, after] = await Promise.all([
		framework.definition(against.id),
		framework.definition(version.id)
	]);
	const changes = diffFrameworks(before, after).map((change) => {
		const fields = change.fields ?? [];
		if (change.level === 'area') {
			const old = before.areas.find((a) => a.code === change.code);
			const now = after.areas.find((a) => a.code === change.code);
			return { ...change, details: fields.map((f) => detailsOf(f, old?.name, now?.name)) };
		}
		const [old, now] = [findTask(before, change.code), findTask(after, change.code)];
		return {
			...change,
			details: fields.map((f) =>
				detailsOf(f, old?.[f as keyof typeof old], now?.[f as keyof typeof now])
			)
		};
	});
	return {
		version,
		against: { id: against.id, version: against.version, status: against.status },
		choices,
		changes
	};
}) satisfies PageServerLoad;
