import { fail, redirect } from '@sveltejs/kit';
import { z } from 'zod';
import type { Actions, PageServerLoad } from './$types';
import { requireRole } from '$lib/server/auth';
import * as framework from '$lib/server/framework';
import { fromCsv, MAX_CSV_BYTES } from '$lib/server/framework/csv';
import { diffFrameworks } from '$lib/framework/diff';
import { parseForm } from '$lib/schemas/forms';
import { draftOnly, issueText, openDraft, saveDef, versionOf } from '../../versions.server';

const LIMIT_MB = MAX_CSV_BYTES / 1_000_000;

const uploadSchema = z.object({
	file: z
		.instanceof(File, { error: 'Choose a .csv file to check.' })
		.refine((file) => file.size > 0, 'The file is empty. Start from an exported framework file.')
		.refine(
			(file) => file.size <= MAX_CSV_BYTES,
			`The file is larger than ${LIMIT_MB} MB. Remove unused rows or split the framework.`
		)
		.refine(
			(file) => /\.csv$/i.test(file.name),
			'Choose a file ending in .csv; save the spreadsheet as “CSV UTF-8”.'
		)
});

const applySchema = z.object({
	csv: z
		.string({ error: 'Check a file first: the checked text was not sent.' })
		.min(1, 'Check a file first: the checked text was not sent.')
		.max(MAX_CSV_BYTES, `The file is larger than ${LIMIT_MB} MB.`),
	fileName: z.string().max(255).optional()
});

/** One line ending throughout, so the text checked and the text applied are the same. */
const normalise = (text: string) => text.replace(/\r\n?/g, '\n');

export const load = (async (event) => {
	requireRole(event, 'coordinator');
	const version = await versionOf(event.params.id);
	const draft = version.status === 'draft' ? null : await openDraft(version.name);
	return { version, draftId: draft?.id ?? null, limitMb: LIMIT_MB };
}) satisfies PageServerLoad;

export const actions = {
	check: async (event) => {
		requireRole(event, 'coordinator');
		const version = await versionOf(event.params.id);
		const refused = draftOnly(version);
		if (refused) return fail(409, { step: 'refused' as const, message: refused });
		const parsed = parseForm(uploadSchema, await event.request.formData());
		if (!parsed.ok) {
			return fail(400, { step: 'refused' as const, message: Object.values(parsed.errors)[0] });
		}
		const { file } = parsed.data;
		const text = normalise(await file.text());
		if (text.includes('\uFFFD')) {
			return fail(400, {
				step: 'refused' as const,
				message:
					'The file is not UTF-8 text. In your spreadsheet, save it as “CSV UTF-8” and check it again.'
			});
		}
		const result = fromCsv(text);
		if (!result.ok) {
			return fail(400, { step: 'problems' as const, fileName: file.name, errors: result.errors });
		}
		const current = await framework.definition(version.id);
		const changes = diffFrameworks(current, { ...result.def, name: version.name });
		return {
			step: 'ready' as const,
			fileName: file.name,
			counts: result.counts,
			changes,
			// The draft keeps its name: publishing retires the version with the same name.
			renamedFrom: result.def.name === version.name ? null : result.def.name,
			csv: text
		};
	},
	apply: async (event) => {
		requireRole(event, 'coordinator');
		const version = await versionOf(event.params.id);
		const refused = draftOnly(version);
		if (refused) return fail(409, { step: 'refused' as const, message: refused });
		const parsed = parseForm(applySchema, await event.request.formData());
		if (!parsed.ok) {
			return fail(400, { step: 'refused' as const, message: Object.values(parsed.errors)[0] });
		}
		const result = fromCsv(normalise(parsed.data.csv));
		if (!result.ok) {
			return fail(400, {
				step: 'problems' as const,
				fileName: parsed.data.fileName ?? 'the file',
				errors: result.errors
			});
		}
		const def = { ...result.def, name: version.name };
		const saved = await saveDef(version.id, def);
		if (!saved.ok) {
			const message = saved.issues.map((issue) => issueText(def, issue)).join(' ');
			return fail(saved.status, { step: 'refused' as const, message });
		}
		redirect(303, `/coordinator/frameworks/${version.id}?imported=1`);
	}
} satisfies Actions;
