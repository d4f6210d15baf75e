import { error } from '@sveltejs/kit';
import type { RequestHandler } from './$types';
import { idParam } from '$lib/server/api';
import { requireUser } from '$lib/server/auth';
import * as worklog from '$lib/server/worklog';

/** A stored photo or PDF, only for people who may see its entry; never rendered as a page. */
export const GET = (async (event) => {
	const user = requireUser(event);
	const file = await worklog.readEvidence(
		user,
		idParam(event.params.id),
		event.url.searchParams.get('size') === 'thumb'
	);
	if (!file) error(404, 'No such file, or it is not yours to see.');
	const disposition = file.mime === 'application/pdf' ? 'attachment' : 'inline';
	return new Response(new Uint8Array(file.bytes), {
		headers: {
			'content-type': file.mime,
			'content-disposition': `${disposition}; filename="${file.name.replace(/"/g, '')}"`,
			'x-content-type-options': 'nosniff',
			'content-security-policy': "default-src 'none'; sandbox",
			'cache-control': 'private, max-age=3600'
		}
	});
}) satisfies RequestHandler;
