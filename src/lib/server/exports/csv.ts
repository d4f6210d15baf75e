/**
 * CSV records for the registration agency, in Journeymark's own layouts (DEVELOPERS.md,
 * "Exports"). UTF-8 with a byte-order mark so spreadsheets read accents right; text cells that a
 * spreadsheet would run as a formula are prefixed with a quote.
 */
import { stringify } from 'csv-stringify/sync';
import type { ApprenticeRecord, CohortRecord } from './data';
import { approachLabel, completionWord, money, wageNote } from './text';

type Cell = string | number | null | undefined;

/** Neutralises cells a spreadsheet would treat as a formula (OWASP "CSV injection"). */
export function safeCell(value: Cell): string {
	if (value === null || value === undefined) return '';
	if (typeof value === 'number') return Number.isFinite(value) ? String(value) : '';
	return /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
}

function toCsv(header: string[], rows: Cell[][]): string {
	const full = rows.map((r) => header.map((_, i) => safeCell(r[i])));
	return stringify([header, ...full], {
		bom: true,
		record_delimiter: 'windows'
	});
}

/** Columns of the per-apprentice record: one line per fact, each tagged with its part. */
export const APPRENTICE_COLUMNS = [
	'part',
	'item',
	'label',
	'value',
	'unit',
	'date',
	'journeyworker',
	'status',
	'note'
] as const;

export function apprenticeCsv(record: ApprenticeRecord): string {
	const { person: p, progress: g, rules } = record;
	const rows: Cell[][] = [];
	const add = (part: string, item: string, label: string, value: Cell, extra: Cell[] = []) =>
		rows.push([part, item, label, value, ...extra]);

	add('record', 'apprentice_id', 'Apprentice number', p.id);
	add('record', 'apprentice_name', 'Apprentice', p.name);
	add('record', 'email', 'E-mail', p.email);
	add('record', 'programme', 'Programme', record.programme.name);
	add('record', 'approach', 'Completion approach', approachLabel(rules.approach));
	add('record', 'cohort', 'Cohort', p.cohortName);
	add('record', 'site', 'Shop', p.siteName ?? '');
	add('record', 'start_date', 'Started', p.startDate);
	add('record', 'planned_end_date', 'Planned end', p.plannedEndDate);
	add('record', 'generated_on', 'Record generated', record.generatedOn);

	add('hours', 'verified', 'Verified on-the-job hours', g.hours.verified, ['h']);
	add('hours', 'pending', 'Submitted, waiting for verification', g.hours.pending, ['h']);
	add('hours', 'prior_credit', 'Credit for prior experience', g.hours.credit, ['h']);
	add('hours', 'counted', 'Counted towards completion', g.hours.counted, ['h']);
	add('hours', 'required', 'Required by the programme', g.hours.required, ['h']);

	for (const y of g.rti.byYear) {
		add('instruction', `year_${y.year}`, `Related instruction, programme year ${y.year}`, y.hours, [
			'h',
			'',
			'',
			'',
			`${y.required} h required`
		]);
	}
	add('instruction', 'total', 'Related instruction, all years', g.rti.total, [
		'h',
		'',
		'',
		'',
		`${rules.rtiHoursPerYear * rules.termYears} h required`
	]);

	add('wage', 'current', 'Current wage step', g.wage.percent, [
		'% of journeyworker rate',
		'',
		'',
		'',
		`${money(g.wage.hourlyCents)} an hour`
	]);
	if (g.wage.next) {
		add('wage', 'next', 'Next wage step', g.wage.next.percent, [
			'% of journeyworker rate',
			g.wage.next.dueDate,
			'',
			g.wage.next.dueDate ? 'forecast' : 'no forecast',
			wageNote(g.wage.next)
		]);
	}

	add('completion', 'status', 'Completion', completionWord(g.completion.qualifies), [
		'',
		'',
		'',
		'',
		`${g.completion.percent} % of the way`
	]);
	g.completion.missing.forEach((m, i) => add('completion', `missing_${i + 1}`, 'Still needed', m));

	for (const s of record.signOffs) {
		const note = [
			`record ${s.id}`,
			s.refersToId ? `${s.kind} of sign-off ${s.refersToId}` : '',
			s.replacedOn ? `${s.status} on ${s.replacedOn}` : '',
			s.reason ? `reason: ${s.reason}` : '',
			`framework v${s.frameworkVersion}`
		]
			.filter(Boolean)
			.join('; ');
		add('signoff', s.taskCode, s.taskTitle, s.level, [
			s.level ? 'level' : '',
			s.signedOn,
			s.journeyworker,
			s.status,
			note
		]);
	}
	return toCsv([...APPRENTICE_COLUMNS], rows);
}

/** Header of the cohort record: one row per apprentice; instruction columns per programme year. */
export function cohortColumns(years: number): string[] {
	return [
		'apprentice_id',
		'apprentice_name',
		'email',
		'site',
		'cohort',
		'programme',
		'start_date',
		'planned_end_date',
		'ojl_verified_h',
		'ojl_pending_h',
		'prior_credit_h',
		'ojl_counted_h',
		'ojl_required_h',
		...Array.from({ length: years }, (_, i) => `rti_year_${i + 1}_h`),
		'rti_total_h',
		'rti_required_h',
		'tasks_at_required_level',
		'signoffs_standing',
		'signoffs_revoked',
		'last_signoff_date',
		'wage_current_percent',
		'wage_next_percent',
		'wage_next_at_h',
		'wage_next_due_date',
		'completion',
		'completion_percent',
		'at_risk',
		'still_needed'
	];
}

export function cohortCsv(record: CohortRecord): string {
	const years = Math.max(1, ...record.apprentices.map((a) => a.progress.rti.byYear.length));
	const rows = record.apprentices.map((a): Cell[] => {
		const { person: p, progress: g, rules } = a;
		const last = a.signOffs.filter((s) => s.kind === 'sign-off').at(-1);
		return [
			p.id,
			p.name,
			p.email,
			p.siteName ?? '',
			p.cohortName,
			a.programme.name,
			p.startDate,
			p.plannedEndDate,
			g.hours.verified,
			g.hours.pending,
			g.hours.credit,
			g.hours.counted,
			g.hours.required,
			...Array.from({ length: years }, (_, i) => g.rti.byYear[i]?.hours ?? 0),
			g.rti.total,
			rules.rtiHoursPerYear * rules.termYears,
			g.tasksMet,
			a.signOffs.filter((s) => s.status === 'standing').length,
			a.signOffs.filter((s) => s.status === 'revoked').length,
			last?.signedOn ?? '',
			g.wage.percent,
			g.wage.next?.percent ?? '',
			g.wage.next?.atHours ?? '',
			g.wage.next?.dueDate ?? '',
			completionWord(g.completion.qualifies),
			g.completion.percent,
			g.risk.atRisk ? 'yes' : 'no',
			g.completion.missing.join(' | ')
		];
	});
	return toCsv(cohortColumns(years), rows);
}
