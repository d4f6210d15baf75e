/**
 * The signed content of a certificate, built from what the progress engine says the apprentice
 * stands at. Pure: the same qualification, scope and dates always give the same content.
 */
import type { Approach } from '../db/models/Programme';
import type { Qualification } from '../progress/qualification-types';

export const CONTENT_FORMAT = 'journeymark-certificate/1';

export type Scope = { kind: 'programme' } | { kind: 'area'; code: string };

export interface CoveredArea {
	code: string;
	name: string;
	tasks: number;
	verifiedHours: number;
}

export interface CoveredTaskLine {
	code: string;
	title: string;
	area: string;
	level: 1 | 2 | 3 | 4;
	signedAt: string;
}

export interface CertificateContent {
	format: typeof CONTENT_FORMAT;
	serial: string;
	holder: string;
	programme: { id: number; name: string; approach: Approach };
	scope: {
		kind: 'programme' | 'area';
		code: string | null;
		title: string;
		areas: CoveredArea[];
		tasks: CoveredTaskLine[];
		hours: { verified: number; priorCredit: number; relatedInstruction: number };
	};
	issuedAt: string;
	expiresAt: string | null;
	issuer: { name: string; url: string; signedBy: string };
	keyId: string;
}

/** What stands in the way of a certificate of this scope; empty when it may be issued. */
export function missingFor(q: Qualification, scope: Scope): string[] {
	if (scope.kind === 'programme') {
		return q.completion.qualifies
			? []
			: q.completion.missing.length
				? q.completion.missing
				: ['The progress engine does not report programme completion yet.'];
	}
	if (!q.interimAllowed) {
		return [
			'Interim credentials are issued only in competency-based and hybrid programmes (29 CFR 29.5(b)(16)).'
		];
	}
	const area = q.areas.find((a) => a.code === scope.code);
	if (!area) return [`There is no area ${scope.code} in the current framework.`];
	if (area.complete) return [];
	return area.missing.length ? area.missing : [`${area.name} is not complete yet.`];
}

export const scopeTitle = (q: Qualification, scope: Scope) =>
	scope.kind === 'programme'
		? `Programme completion: ${q.programme.name}`
		: `Interim credential: ${q.areas.find((a) => a.code === scope.code)?.name ?? scope.code}`;

/** Adds whole months in UTC, clamping to the month's last day (31 Jan + 1 month = 28/29 Feb). */
export function addMonths(date: Date, months: number): Date {
	const d = new Date(date.getTime());
	const day = d.getUTCDate();
	d.setUTCDate(1);
	d.setUTCMonth(d.getUTCMonth() + months);
	const last = new Date(Date.UTC(d.getUTCFullYear(), d.getUTCMonth() + 1, 0)).getUTCDate();
	d.setUTCDate(Math.min(day, last));
	return d;
}

/** SQLite hands dates back as text in its own layout; the signed content always holds ISO 8601. */
const isoTime = (value: string) => {
	const date = new Date(value);
	return Number.isNaN(date.getTime()) ? value : date.toISOString();
};

const hours = (tenths: number) => Math.round(tenths) / 10;

export function buildContent(
	q: Qualification,
	scope: Scope,
	facts: {
		serial: string;
		issuedAt: Date;
		issuer: { name: string; url: string; signedBy: string };
		keyId: string;
	}
): CertificateContent {
	const areas = scope.kind === 'programme' ? q.areas : q.areas.filter((a) => a.code === scope.code);
	const codes = new Set(areas.map((a) => a.code));
	const tasks = (scope.kind === 'programme' ? q.tasks : areas.flatMap((a) => a.tasks))
		.filter((t) => codes.has(t.areaCode))
		.map((t) => ({
			code: t.code,
			title: t.title,
			area: t.areaCode,
			level: t.level,
			signedAt: isoTime(t.signedAt)
		}));
	const validity = q.programme.certificateValidityMonths;
	return {
		format: CONTENT_FORMAT,
		serial: facts.serial,
		holder: q.holder,
		programme: { id: q.programme.id, name: q.programme.name, approach: q.programme.approach },
		scope: {
			kind: scope.kind,
			code: scope.kind === 'area' ? scope.code : null,
			title: scopeTitle(q, scope),
			areas: areas.map((a) => ({
				code: a.code,
				name: a.name,
				tasks: tasks.filter((t) => t.area === a.code).length,
				verifiedHours: hours(a.verifiedTenths)
			})),
			tasks,
			hours:
				scope.kind === 'programme'
					? {
							verified: hours(q.totals.verifiedTenths),
							priorCredit: q.totals.creditHours,
							relatedInstruction: hours(q.totals.rtiTenths)
						}
					: {
							verified: hours(areas.reduce((n, a) => n + a.verifiedTenths, 0)),
							priorCredit: 0,
							relatedInstruction: 0
						}
		},
		issuedAt: facts.issuedAt.toISOString(),
		expiresAt: validity ? addMonths(facts.issuedAt, validity).toISOString() : null,
		issuer: facts.issuer,
		keyId: facts.keyId
	};
}
