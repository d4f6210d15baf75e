import { fail, redirect, type RequestEvent } from '@sveltejs/kit';
import { z } from 'zod';
import type { Actions, PageServerLoad } from './$types';
import { requireRole } from '$lib/server/auth';
import * as framework from '$lib/server/framework';
import { frameworkIdSchema } from '$lib/schemas/framework';
import { parseForm } from '$lib/schemas/forms';
import { versionOf } from './versions.server';

const idForm = z.object({ id: frameworkIdSchema });
const confirmQuery = z.object({
	publish: frameworkIdSchema.optional(),
	discard: frameworkIdSchema.optional(),
	published: z.coerce.number().int().positive().optional(),
	discarded: z.coerce.number().int().positive().optional()
});

export const load = (async (event) => {
	requireRole(event, 'coordinator');
	const versions = await framework.list();
	const query = confirmQuery.safeParse(Object.fromEntries(event.url.searchParams));
	const ask = query.success ? query.data : {};
	const publishedOf = (name: string) =>
		versions.find((v) => v.name === name && v.status === 'published') ?? null;
	const pick = (id: number | undefined) =>
		versions.find((v) => v.id === id && v.status === 'draft') ?? null;
	const confirmFor = (kind: 'publish' | 'discard', draft: ReturnType<typeof pick>) => {
		if (!draft) return null;
		const current = publishedOf(draft.name);
		return {
			kind,
			id: draft.id,
			version: draft.version,
			tasks: draft.tasks,
			current: current?.version ?? null
		};
	};
	return {
		versions: versions.map((v) => ({
			...v,
			publishedAt: v.publishedAt ? String(v.publishedAt).slice(0, 10) : null,
			basedOnVersion: versions.find((b) => b.id === v.basedOnId)?.version ?? null,
			openDraft:
				versions.find((d) => d.name === v.name && d.status === 'draft' && d.id !== v.id)?.id ?? null
		})),
		confirm: confirmFor('publish', pick(ask.publish)) ?? confirmFor('discard', pick(ask.discard)),
		published: ask.published ?? null,
		discarded: ask.discarded ?? null
	};
}) satisfies PageServerLoad;

async function idFrom(event: RequestEvent) {
	const parsed = parseForm(idForm, await event.request.formData());
	return parsed.ok ? versionOf(parsed.data.id) : null;
}

const missing = () =>
	fail(400, { errors: { form: 'Say which version: the form had no valid id.' } });

export const actions = {
	start: async (event) => {
		const user = requireRole(event, 'coordinator');
		const version = await idFrom(event);
		if (!version) return missing();
		const draft = await framework.draftFrom(version.id, user.id);
		redirect(303, `/coordinator/frameworks/${draft.id}`);
	},
	publish: async (event) => {
		requireRole(event, 'coordinator');
		const version = await idFrom(event);
		if (!version) return missing();
		try {
			await framework.publish(version.id);
		} catch (err) {
			if (!(err instanceof framework.FrameworkError)) throw err;
			return fail(409, { errors: { form: err.message } });
		}
		redirect(303, `/coordinator/frameworks?published=${version.version}`);
	},
	discard: async (event) => {
		requireRole(event, 'coordinator');
		const version = await idFrom(event);
		if (!version) return missing();
		try {
			await framework.discardDraft(version.id);
		} catch (err) {
			if (!(err instanceof framework.FrameworkError)) throw err;
			return fail(409, { errors: { form: err.message } });
		}
		redirect(303, `/coordinator/frameworks?discarded=${version.version}`);
	}
} satisfies Actions;
