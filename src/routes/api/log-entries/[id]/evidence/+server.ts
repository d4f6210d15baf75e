import { error } from '@sveltejs/kit';
import type { RequestHandler } from './$types';
import { answer, idParam } from '$lib/server/api';
import { requireRole } from '$lib/server/auth';
import * as worklog from '$lib/server/worklog';

/** Upload one photo or PDF (multipart field `file`) to the apprentice's own entry. */
export const POST = (async (event) => {
	const user = requireRole(event, 'apprentice');
	const id = idParam(event.params.id);
	return answer(async () => {
		const size = Number(event.request.headers.get('content-length') ?? 0);
		if (size > worklog.MAX_UPLOAD_BYTES + 64_000) {
			throw new worklog.EntryProblem(413, { file: 'That file is larger than 10 MB.' });
		}
		let form: FormData;
		try {
			form = await event.request.formData();
		} catch {
			error(400, 'Send the file as multipart/form-data in a field named "file".');
		}
		const file = form.get('file');
		if (!(file instanceof File))
			throw new worklog.EntryProblem(400, { file: 'Choose a photo or PDF.' });
		const bytes = new Uint8Array(await file.arrayBuffer());
		const stored = await worklog.attach(user, id, bytes, file.name);
		return new Response(JSON.stringify(stored), {
			status: 201,
			headers: { 'content-type': 'application/json' }
		});
	});
}) satisfies RequestHandler;
