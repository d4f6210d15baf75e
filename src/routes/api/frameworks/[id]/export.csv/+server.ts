import { error } from '@sveltejs/kit';
import type { RequestHandler } from './$types';
import { requireRole } from '$lib/server/auth';
import { Framework } from '$lib/server/db';
import * as framework from '$lib/server/framework';
import { toCsv } from '$lib/server/framework/csv';
import { frameworkIdSchema } from '$lib/schemas/framework';

export const GET = (async (event) => {
	requireRole(event, 'coordinator');
	const id = frameworkIdSchema.safeParse(event.params.id);
	const version = id.success
		? await Framework.findByPk(id.data, { attributes: ['id', 'version'] })
		: null;
	if (!version) error(404, 'There is no such framework version.');
	const csv = toCsv(await framework.definition(version.id));
	return new Response(csv, {
		headers: {
			'content-type': 'text/csv; charset=utf-8',
			'content-disposition': `attachment; filename="journeymark-framework-v${version.version}.csv"`,
			// A draft changes under the coordinator's hands; never serve a stale copy.
			'cache-control': 'no-store'
		}
	});
}) satisfies RequestHandler;
