import { error } from '@sveltejs/kit';
import { Framework } from '$lib/server/db';
import * as framework from '$lib/server/framework';
import { frameworkDefSchema, type FrameworkDef } from '$lib/framework/schema';
import { frameworkIdSchema } from '$lib/schemas/framework';

export type Version = {
	id: number;
	name: string;
	version: number;
	status: 'draft' | 'published' | 'retired';
	basedOnId: number | null;
	publishedAt: string | null;
};

function shape(row: Framework): Version {
	return {
		id: row.id,
		name: row.name,
		version: row.version,
		status: row.status,
		basedOnId: row.basedOnId ?? null,
		publishedAt: row.publishedAt ? row.publishedAt.toISOString().slice(0, 10) : null
	};
}

/** The version with this id, or null when the id is not a number or not stored. */
export async function findVersion(param: unknown): Promise<Version | null> {
	const id = frameworkIdSchema.safeParse(param);
	const row = id.success ? await Framework.findByPk(id.data) : null;
	return row ? shape(row) : null;
}

/** The version named by a URL or form id, or 404. */
export async function versionOf(param: unknown): Promise<Version> {
	const version = await findVersion(param);
	if (!version)
		error(404, 'There is no such framework version. Pick one from the list of versions.');
	return version;
}

/** The open draft of a framework family, if someone has started one. */
export async function openDraft(name: string): Promise<Version | null> {
	const row = await Framework.findOne({ where: { name, status: 'draft' } });
	return row ? shape(row) : null;
}

/** Every version of a family, newest first, for "compare with" choices. */
export async function family(name: string): Promise<Version[]> {
	const rows = await Framework.findAll({ where: { name }, order: [['version', 'DESC']] });
	return rows.map(shape);
}

export type Issue = { path: PropertyKey[]; message: string };
export type SaveOutcome = { ok: true } | { ok: false; status: 400 | 409; issues: Issue[] };

/** Validates the whole definition, then replaces the draft with it: all of it or nothing. */
export async function saveDef(id: number, def: FrameworkDef): Promise<SaveOutcome> {
	const parsed = frameworkDefSchema.safeParse(def);
	if (!parsed.success) {
		const issues = parsed.error.issues.map((i) => ({ path: i.path, message: i.message }));
		return { ok: false, status: 400, issues };
	}
	try {
		await framework.replaceDraft(id, parsed.data);
	} catch (err) {
		if (err instanceof framework.FrameworkError) {
			return { ok: false, status: 409, issues: [{ path: [], message: err.message }] };
		}
		throw err;
	}
	return { ok: true };
}

/** A schema message prefixed with the area or task it is about, for a page-level list. */
export function issueText(def: FrameworkDef, { path, message }: Issue): string {
	const [, a, , t] = path;
	const area = typeof a === 'number' ? def.areas[a] : undefined;
	const task = area && typeof t === 'number' ? area.tasks[t] : undefined;
	if (task) return `${task.code} ${task.title}: ${message}`;
	if (area) return `Area ${area.code} ${area.name}: ${message}`;
	return message;
}

/** Refuses changes to published and retired versions before any work is done. */
export function draftOnly(version: Version): string | null {
	if (version.status === 'draft') return null;
	return `Version ${version.version} is ${version.status} and cannot change. Start editing to make a draft.`;
}
