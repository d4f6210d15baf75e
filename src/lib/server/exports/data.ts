/**
 * What the registration-agency exports hold, gathered once and shaped for both CSV and PDF.
 * Totals come from the progress engine; sign-offs for a whole cohort come from one query.
 */
import { QueryTypes } from 'sequelize';
import { Cohort, Programme, sequelize } from '../db';
import * as progress from '../progress';
import type { ApprenticeProgress } from '../progress';

/**
 * A sign-off or correction stands until a later record revokes or corrects it; a standing one is
 * superseded when the same task stands at a higher level from another record.
 */
export type SignOffStatus = 'standing' | 'superseded' | 'revoked' | 'corrected' | 'revocation';

export interface SignOffLine {
	id: number;
	apprenticeId: string;
	kind: 'sign-off' | 'correction' | 'revocation';
	taskCode: string;
	taskTitle: string;
	level: number | null;
	journeyworker: string;
	signedOn: string;
	frameworkVersion: number;
	refersToId: number | null;
	reason: string | null;
	/** What later happened to this record: revoked or corrected on a date, or still standing. */
	status: SignOffStatus;
	replacedOn: string | null;
}

export interface ProgrammeInfo {
	id: number;
	name: string;
	approach: string;
}

export interface ApprenticeRecord extends ApprenticeProgress {
	programme: ProgrammeInfo;
	generatedOn: string;
	signOffs: SignOffLine[];
}

export interface CohortRecord {
	cohort: { id: number; name: string; startDate: string; plannedEndDate: string };
	programme: ProgrammeInfo;
	generatedOn: string;
	apprentices: ApprenticeRecord[];
}

interface SignOffRow extends Omit<SignOffLine, 'status' | 'replacedOn' | 'signedOn'> {
	signedAt: string;
	replacedKind: string | null;
	replacedAt: string | null;
}

const day = (value: string | Date | null) =>
	value === null
		? null
		: (value instanceof Date ? value.toISOString() : String(value)).slice(0, 10);

/** Every sign-off, correction and revocation of one apprentice or of a cohort's active apprentices. */
async function signOffs(scope: { apprenticeId: string } | { cohortId: number }) {
	const where =
		'apprenticeId' in scope
			? 's.apprentice_id = :apprenticeId'
			: `s.apprentice_id IN (SELECT p.user_id FROM apprentice_profiles p JOIN users pu ON pu.id = p.user_id
			                        WHERE p.cohort_id = :cohortId AND pu.active)`;
	const rows = await sequelize.query<SignOffRow>(
		`SELECT s.id, s.apprentice_id AS "apprenticeId", s.kind, t.code AS "taskCode", t.title AS "taskTitle",
		        s.level, u.name AS journeyworker, s.signed_at AS "signedAt", f.version AS "frameworkVersion",
		        s.refers_to_id AS "refersToId", s.reason, r.kind AS "replacedKind", r.signed_at AS "replacedAt"
		   FROM sign_offs s
		   JOIN framework_tasks t ON t.id = s.task_id
		   JOIN frameworks f ON f.id = s.framework_id
		   JOIN users u ON u.id = s.supervisor_id
		   LEFT JOIN sign_offs r ON r.refers_to_id = s.id
		  WHERE ${where}
		  ORDER BY s.apprentice_id, s.signed_at, s.id`,
		{ type: QueryTypes.SELECT, replacements: scope }
	);
	const out = new Map<string, SignOffLine[]>();
	for (const { signedAt, replacedKind, replacedAt, ...row } of rows) {
		const status: SignOffStatus =
			row.kind === 'revocation'
				? 'revocation'
				: replacedKind === 'revocation'
					? 'revoked'
					: replacedKind === 'correction'
						? 'corrected'
						: 'standing';
		const line = { ...row, signedOn: day(signedAt)!, status, replacedOn: day(replacedAt) };
		const list = out.get(row.apprenticeId) ?? [];
		list.push(line);
		out.set(row.apprenticeId, list);
	}
	for (const lines of out.values()) {
		const top = new Map<string, number>();
		for (const l of lines) {
			if (l.status === 'standing')
				top.set(l.taskCode, Math.max(top.get(l.taskCode) ?? 0, l.level ?? 0));
		}
		for (const l of lines) {
			if (l.status === 'standing' && (l.level ?? 0) < top.get(l.taskCode)!) l.status = 'superseded';
		}
	}
	return out;
}

async function programmeInfo(ids: number[]): Promise<Map<number, ProgrammeInfo>> {
	const rows = await Programme.findAll({
		where: { id: [...new Set(ids)] },
		attributes: ['id', 'name', 'approach']
	});
	return new Map(rows.map((p) => [p.id, { id: p.id, name: p.name, approach: p.approach }]));
}

/** One apprentice's record, or null when the id is not an apprentice. */
export async function apprenticeRecord(
	apprenticeId: string,
	today?: string
): Promise<ApprenticeRecord | null> {
	const generatedOn = today ?? new Date().toISOString().slice(0, 10);
	const found = await progress.apprentice(apprenticeId, generatedOn);
	if (!found) return null;
	const [programmes, lines] = await Promise.all([
		programmeInfo([found.person.programmeId]),
		signOffs({ apprenticeId })
	]);
	return {
		person: found.person,
		rules: found.rules,
		progress: found.progress,
		areas: found.areas,
		programme: programmes.get(found.person.programmeId)!,
		generatedOn,
		signOffs: lines.get(apprenticeId) ?? []
	};
}

/** A cohort's record (active apprentices), or null when there is no such cohort. */
export async function cohortRecord(cohortId: number, today?: string): Promise<CohortRecord | null> {
	const cohort = await Cohort.findByPk(cohortId, {
		attributes: ['id', 'name', 'programmeId', 'startDate', 'plannedEndDate']
	});
	if (!cohort) return null;
	const generatedOn = today ?? new Date().toISOString().slice(0, 10);
	const [{ rows }, lines] = await Promise.all([
		progress.compute({ cohortId }, generatedOn),
		signOffs({ cohortId })
	]);
	const programmes = await programmeInfo([
		cohort.programmeId,
		...rows.map((r) => r.person.programmeId)
	]);
	return {
		cohort: {
			id: cohort.id,
			name: cohort.name,
			startDate: cohort.startDate,
			plannedEndDate: cohort.plannedEndDate
		},
		programme: programmes.get(cohort.programmeId)!,
		generatedOn,
		apprentices: rows.map((row) => ({
			...row,
			programme: programmes.get(row.person.programmeId)!,
			generatedOn,
			signOffs: lines.get(row.person.id) ?? []
		}))
	};
}

/** A name made safe for a file name: lower-case letters, digits and hyphens. */
export function fileSlug(text: string): string {
	return (
		text
			.normalize('NFKD')
			.replace(/[\u0300-\u036f]/g, '')
			.toLowerCase()
			.replace(/[^a-z0-9]+/g, '-')
			.replace(/^-+|-+$/g, '')
			.slice(0, 60) || 'record'
	);
}

/** `Content-Disposition: attachment` with a plain ASCII name and the UTF-8 form beside it. */
export function attachment(filename: string): string {
	return `attachment; filename="${filename.replace(/[^\x20-\x7e]|"/g, '_')}"; filename*=UTF-8''${encodeURIComponent(filename)}`;
}
