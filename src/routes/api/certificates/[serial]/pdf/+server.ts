import { error } from '@sveltejs/kit';
import type { RequestHandler } from './$types';
import { normaliseSerial } from '$lib/certificates';
import { requireUser } from '$lib/server/auth';
import * as certificates from '$lib/server/certificates';

/** The certificate PDF in A4 or US Letter, for its holder, coordinators and administrators. */
export const GET = (async (event) => {
	const user = requireUser(event);
	const serial = normaliseSerial(event.params.serial);
	if (!serial) error(400, 'That is not a Journeymark serial.');
	const paper = event.url.searchParams.get('paper') ?? 'a4';
	if (paper !== 'a4' && paper !== 'letter') error(400, 'Paper is a4 or letter.');
	const certificate = await certificates.bySerial(serial);
	if (!certificate || !certificates.mayDownload(user, certificate)) {
		error(404, 'No such certificate, or it is not yours to download.');
	}
	if (certificate.revokedAt && user.role === 'apprentice') {
		error(410, 'This certificate was withdrawn; its PDF is no longer available to download.');
	}
	const bytes = await certificates.pdfFor(certificate, paper);
	return new Response(new Uint8Array(bytes), {
		headers: {
			'content-type': 'application/pdf',
			'content-disposition': `attachment; filename="${serial}-${paper}.pdf"`,
			'cache-control': 'private, max-age=300'
		}
	});
}) satisfies RequestHandler;
