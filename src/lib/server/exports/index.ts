/**
 * Records for the registration agency: per apprentice and per cohort, as CSV and PDF.
 * Routes parse and authorise, then call `record` and `file` here.
 */
import { error } from '@sveltejs/kit';
import { z } from 'zod';
import { apprenticeCsv, cohortCsv } from './csv';
import { apprenticeRecord, attachment, cohortRecord, fileSlug } from './data';
import { apprenticePdf, cohortPdf } from './pdf';

export type { ApprenticeRecord, CohortRecord } from './data';

export type Format = 'csv' | 'pdf';

/** Apprentice numbers are account ids: letters, digits, `_` and `-`, at most 40. */
const apprenticeId = z.string().regex(/^[A-Za-z0-9_-]{1,40}$/);
/** Cohort numbers are positive integers written in plain digits. */
const cohortId = z
	.string()
	.regex(/^\d{1,10}$/)
	.transform(Number)
	.pipe(z.number().int().min(1).max(2_147_483_647));

const TYPES: Record<Format, string> = {
	csv: 'text/csv; charset=utf-8',
	pdf: 'application/pdf'
};

function download(format: Format, body: string | Uint8Array, filename: string): Response {
	return new Response(typeof body === 'string' ? body : new Uint8Array(body), {
		headers: {
			'content-type': TYPES[format],
			'content-disposition': attachment(filename),
			'cache-control': 'private, no-store'
		}
	});
}

/** One apprentice's record as a download; 404 for an id that is not an apprentice. */
export async function apprenticeFile(id: string | undefined, format: Format): Promise<Response> {
	const parsed = apprenticeId.safeParse(id);
	if (!parsed.success) error(404, 'There is no apprentice with that number.');
	const record = await apprenticeRecord(parsed.data);
	if (!record) error(404, 'There is no apprentice with that number.');
	const name = `journeymark-record-${fileSlug(record.person.name)}-${record.generatedOn}.${format}`;
	return download(
		format,
		format === 'csv' ? apprenticeCsv(record) : await apprenticePdf(record),
		name
	);
}

/** A cohort's record as a download; 404 for a cohort number that does not exist. */
export async function cohortFile(id: string | undefined, format: Format): Promise<Response> {
	const parsed = cohortId.safeParse(id);
	if (!parsed.success) error(404, 'There is no cohort with that number.');
	const record = await cohortRecord(parsed.data);
	if (!record) error(404, 'There is no cohort with that number.');
	const name = `journeymark-cohort-${record.cohort.id}-${fileSlug(record.cohort.name)}-${record.generatedOn}.${format}`;
	return download(format, format === 'csv' ? cohortCsv(record) : await cohortPdf(record), name);
}
