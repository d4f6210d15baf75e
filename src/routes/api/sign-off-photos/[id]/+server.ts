import { error } from '@sveltejs/kit';
import type { RequestHandler } from './$types';
import { idParam } from '$lib/server/api';
import { requireUser } from '$lib/server/auth';
import { SignOff, SignOffPhoto } from '$lib/server/db';
import * as worklog from '$lib/server/worklog';

/** A sign-off photo for the apprentice, their journeyworkers and coordinators; never a page. */
export const GET = (async (event) => {
	const user = requireUser(event);
	const photo = await SignOffPhoto.findByPk(idParam(event.params.id), {
		include: [{ model: SignOff, as: 'signOff', attributes: ['apprenticeId'] }]
	});
	const signOff = (photo as (SignOffPhoto & { signOff: SignOff }) | null)?.signOff;
	if (!photo || !signOff || !(await worklog.canView(user, signOff))) error(404, 'No such photo.');
	const thumb = event.url.searchParams.get('size') === 'thumb' && photo.thumbnailKey;
	const bytes = await worklog.evidenceStorage().get(thumb ? photo.thumbnailKey! : photo.storageKey);
	if (!bytes) error(404, 'No such photo.');
	return new Response(new Uint8Array(bytes), {
		headers: {
			'content-type': thumb ? 'image/webp' : photo.mime,
			'x-content-type-options': 'nosniff',
			'content-security-policy': "default-src 'none'; sandbox",
			'cache-control': 'private, max-age=3600'
		}
	});
}) satisfies RequestHandler;
