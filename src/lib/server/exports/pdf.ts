/**
 * PDF records for the registration agency, in Journeymark's own layout: a masthead, figure boxes
 * for hours, tables for instruction, wage steps and sign-offs, and the agency footer on each page.
 */
import type { ApprenticeRecord, CohortRecord } from './data';
import { Sheet } from './sheet';
import {
	AGENCY_NOTE,
	approachLabel,
	completionWord,
	hours,
	LEVELS,
	money,
	STATUS_WORDS,
	wageNote
} from './text';

const num = (n: number) => n.toLocaleString('en-US', { maximumFractionDigits: 1 });

/** The sections every apprentice's record has, in the per-apprentice and the cohort file. */
function apprenticeSections(sheet: Sheet, record: ApprenticeRecord) {
	const { progress: g, rules } = record;

	sheet.section('On-the-job hours');
	sheet.figures([
		{ label: 'Verified', value: hours(g.hours.verified) },
		{ label: 'Waiting for verification', value: hours(g.hours.pending) },
		{ label: 'Prior experience credit', value: hours(g.hours.credit) },
		{ label: 'Counted', value: hours(g.hours.counted) },
		{ label: 'Required', value: hours(g.hours.required) }
	]);

	sheet.section('Related instruction by programme year');
	const rtiRequired = rules.rtiHoursPerYear * rules.termYears;
	sheet.table(
		[
			{ label: 'Programme year', width: 0.34 },
			{ label: 'Confirmed hours', width: 0.22, align: 'right' },
			{ label: 'Required', width: 0.22, align: 'right' },
			{ label: 'Still to attend', width: 0.22, align: 'right' }
		],
		[
			...g.rti.byYear.map((y) => [
				`Year ${y.year}`,
				hours(y.hours),
				hours(y.required),
				hours(Math.max(0, y.required - y.hours))
			]),
			[
				'All years',
				hours(g.rti.total),
				hours(rtiRequired),
				hours(Math.max(0, rtiRequired - g.rti.total))
			]
		]
	);

	sheet.section('Progressive wage');
	const next = g.wage.next;
	sheet.table(
		[
			{ label: 'Step', width: 0.16 },
			{ label: '% of journeyworker rate', width: 0.2, align: 'right' },
			{ label: 'Hourly', width: 0.14, align: 'right' },
			{ label: 'Due', width: 0.16 },
			{ label: 'What it takes', width: 0.34 }
		],
		[
			[
				'Current',
				`${g.wage.percent} %`,
				money(g.wage.hourlyCents),
				'reached',
				g.wage.index < 0 ? 'No step reached yet.' : 'Reached.'
			],
			...(next
				? [
						[
							'Next',
							`${next.percent} %`,
							money(next.hourlyCents),
							next.dueDate ? `${next.dueDate} (forecast)` : 'no forecast',
							wageNote(next)
						]
					]
				: [['Next', '—', '—', '—', 'The top step of the schedule is reached.']])
		]
	);

	sheet.section('Completion');
	sheet.paragraph(
		`Status: ${completionWord(g.completion.qualifies).toUpperCase()} under the ${approachLabel(rules.approach).toLowerCase()} approach, ${num(g.completion.percent)} % of the way; ${g.tasksMet} task${g.tasksMet === 1 ? '' : 's'} at the required level.`,
		{ bold: true }
	);
	if (g.completion.missing.length === 0) sheet.paragraph('Nothing is missing.');
	for (const m of g.completion.missing) sheet.paragraph(`–  Still needed: ${m}`, { indent: 8 });

	sheet.section('Sign-offs');
	sheet.table(
		[
			{ label: 'Record', width: 0.08 },
			{ label: 'Date', width: 0.13 },
			{ label: 'Task', width: 0.1 },
			{ label: 'Title', width: 0.23 },
			{ label: 'Level', width: 0.14 },
			{ label: 'Journeyworker', width: 0.16 },
			{ label: 'Standing', width: 0.16 }
		],
		record.signOffs.map((s) => [
			`#${s.id}`,
			s.signedOn,
			s.taskCode,
			s.taskTitle,
			s.level ? `${s.level} ${LEVELS[s.level as 1 | 2 | 3 | 4]}` : '—',
			s.journeyworker,
			[
				STATUS_WORDS[s.status] ?? s.status,
				s.replacedOn ? s.replacedOn : '',
				s.refersToId ? `of #${s.refersToId}` : '',
				s.reason ? `“${s.reason}”` : ''
			]
				.filter(Boolean)
				.join(' ')
		]),
		'No sign-offs recorded yet.'
	);
}

export async function apprenticePdf(record: ApprenticeRecord): Promise<Uint8Array> {
	const p = record.person;
	const sheet = await Sheet.create(
		`Apprenticeship record: ${p.name}`,
		`Apprenticeship record · ${p.name} · ${record.programme.name}`
	);
	sheet.masthead('Apprenticeship record', p.name, record.programme.name, [
		`Cohort: ${p.cohortName}`,
		`Shop: ${p.siteName ?? 'none'}`,
		`Started ${p.startDate}`,
		`Planned end ${p.plannedEndDate}`,
		`Generated ${record.generatedOn}`
	]);
	apprenticeSections(sheet, record);
	return sheet.finish(record.generatedOn, AGENCY_NOTE);
}

export async function cohortPdf(record: CohortRecord): Promise<Uint8Array> {
	const { cohort, apprentices } = record;
	const sheet = await Sheet.create(
		`Cohort record: ${cohort.name}`,
		`Cohort record · ${cohort.name} · ${record.programme.name}`
	);
	sheet.masthead('Cohort record', cohort.name, record.programme.name, [
		`Intake ${cohort.startDate} to ${cohort.plannedEndDate}`,
		`${apprentices.length} active apprentice${apprentices.length === 1 ? '' : 's'}`,
		`Generated ${record.generatedOn}`
	]);
	const sum = (f: (a: (typeof apprentices)[number]) => number) =>
		Math.round(apprentices.reduce((s, a) => s + f(a), 0) * 10) / 10;
	sheet.section('Cohort totals');
	sheet.figures([
		{ label: 'Apprentices', value: String(apprentices.length) },
		{ label: 'Verified hours', value: hours(sum((a) => a.progress.hours.verified)) },
		{ label: 'Waiting for verification', value: hours(sum((a) => a.progress.hours.pending)) },
		{
			label: 'Complete',
			value: String(apprentices.filter((a) => a.progress.completion.qualifies).length)
		},
		{ label: 'At risk', value: String(apprentices.filter((a) => a.progress.risk.atRisk).length) }
	]);
	sheet.section('Apprentices');
	sheet.table(
		[
			{ label: 'Apprentice', width: 0.19 },
			{ label: 'Shop', width: 0.16 },
			{ label: 'Verified', width: 0.1, align: 'right' },
			{ label: 'Waiting', width: 0.09, align: 'right' },
			{ label: 'Credit', width: 0.08, align: 'right' },
			{ label: 'Instruction', width: 0.12, align: 'right' },
			{ label: 'Tasks met', width: 0.08, align: 'right' },
			{ label: 'Wage', width: 0.07, align: 'right' },
			{ label: 'Status', width: 0.11 }
		],
		apprentices.map((a) => [
			a.person.name,
			a.person.siteName ?? '—',
			hours(a.progress.hours.verified),
			hours(a.progress.hours.pending),
			hours(a.progress.hours.credit),
			hours(a.progress.rti.total),
			String(a.progress.tasksMet),
			`${a.progress.wage.percent} %`,
			completionWord(a.progress.completion.qualifies) + (a.progress.risk.atRisk ? ', at risk' : '')
		]),
		'No active apprentices in this cohort.'
	);
	// Each apprentice's full record starts on its own page so pages can be filed separately.
	for (const a of apprentices) {
		sheet.newPage();
		sheet.titleBlock(a.person.name, a.programme.name, [
			`Shop: ${a.person.siteName ?? 'none'}`,
			`Started ${a.person.startDate}`,
			`Planned end ${a.person.plannedEndDate}`
		]);
		apprenticeSections(sheet, a);
	}
	return sheet.finish(record.generatedOn, AGENCY_NOTE);
}
