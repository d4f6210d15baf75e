/**
 * Progress of apprentices: the service the dashboards, APIs, exports and certificates share.
 * It fetches facts with `data.ts` and leaves every rule to the pure `engine.ts`.
 */
import { Cohort, Programme } from '../db';
import { dialectSql } from '../db/dialect';
import { COUNTED, select } from '../db/sql';
import * as framework from '../framework';
import * as assessment from '../assessment';
import * as data from './data';
import type { Person } from './data';
import {
	addDays,
	allowedApprentices,
	isoDate,
	progress,
	type Progress,
	type ProgrammeRules,
	type Tier
} from './engine';
import type { AreaStanding, CoveredTask, Qualification } from './qualification-types';

export type { Progress, ProgrammeRules } from './engine';
export type { Qualification } from './qualification-types';

export interface AreaTotal {
	code: string;
	name: string;
	total: number;
}

export async function areaTotals(frameworkId: number): Promise<AreaTotal[]> {
	return select<AreaTotal>(
		`SELECT a.code, a.name, COUNT(t.id) AS total
		   FROM framework_areas a LEFT JOIN framework_tasks t ON t.area_id = a.id
		  WHERE a.framework_id = :frameworkId
		  GROUP BY a.id ORDER BY a.position`,
		{ frameworkId }
	);
}

async function programmes(ids: number[]): Promise<Map<number, ProgrammeRules>> {
	const rows = await Programme.findAll({ where: { id: [...new Set(ids)] } });
	return new Map(rows.map((p) => [p.id, data.rulesOf(p)]));
}

export interface ApprenticeProgress {
	person: Person;
	rules: ProgrammeRules;
	progress: Progress;
	/** Per area: tasks at the required level, tasks with any standing sign-off, sum of levels. */
	areas: Record<string, data.AreaCell>;
}

/** Progress of everyone in scope, with a fixed number of queries whatever the head count. */
export async function compute(
	scope: data.Scope,
	today = isoDate(new Date())
): Promise<{ rows: ApprenticeProgress[]; areas: AreaTotal[] }> {
	const current = await framework.current();
	const frameworkId = current?.id ?? -1;
	const [persons, totals, areas, raw] = await Promise.all([
		data.people(scope),
		data.tierTotals(frameworkId),
		areaTotals(frameworkId),
		data.fetchRaw(scope, frameworkId, today)
	]);
	const rules = await programmes(persons.map((p) => p.programmeId));
	const facts = data.assemble(persons, raw, totals, (p) => rules.get(p.programmeId)!.ratio);
	const rows = persons.map((person) => {
		const r = rules.get(person.programmeId)!;
		const f = facts.get(person.id)!;
		return {
			person,
			rules: r,
			progress: progress(r, f.facts, today),
			areas: Object.fromEntries(f.areas)
		};
	});
	return { rows, areas };
}

/** One line of the cohort table and the data behind every cohort chart. */
export function summary(row: ApprenticeProgress) {
	const { person: p, progress: g } = row;
	return {
		id: p.id,
		name: p.name,
		siteName: p.siteName,
		cohortName: p.cohortName,
		startDate: p.startDate,
		plannedEndDate: p.plannedEndDate,
		verifiedHours: g.hours.verified,
		pendingHours: g.hours.pending,
		countedHours: g.hours.counted,
		requiredHours: g.hours.required,
		rtiHours: g.rti.total,
		tiers: g.tiers.map((t) => ({ tier: t.tier, met: t.met, total: t.total, ok: t.ok })),
		tasksMet: g.tasksMet,
		completionPercent: g.completion.percent,
		qualifies: g.completion.qualifies,
		wagePercent: g.wage.percent,
		nextWage: g.wage.next
			? {
					percent: g.wage.next.percent,
					atHours: g.wage.next.atHours,
					dueDate: g.wage.next.dueDate
				}
			: null,
		hoursPerWeek: g.forecast.hoursPerWeek,
		forecastDate: g.forecast.completionDate,
		efficiencyPercent: g.efficiency.percent,
		atRisk: g.risk.atRisk,
		reasons: g.risk.reasons,
		areas: row.areas
	};
}

export type ProgressSummary = ReturnType<typeof summary>;

export class ProgressProblem extends Error {
	constructor(
		readonly status: 404,
		message: string
	) {
		super(message);
	}
}

/** Cohort (or, with `all`, every active apprentice) progress for the coordinator's dashboard. */
export async function cohort(cohortId: number | 'all', today = isoDate(new Date())) {
	let cohortInfo: { id: number | 'all'; name: string; startDate: string | null } = {
		id: 'all',
		name: 'All cohorts',
		startDate: null
	};
	if (cohortId !== 'all') {
		const c = await Cohort.findByPk(cohortId, { attributes: ['id', 'name', 'startDate'] });
		if (!c) throw new ProgressProblem(404, 'There is no cohort with that number.');
		cohortInfo = { id: c.id, name: c.name, startDate: c.startDate };
	}
	const { rows, areas } = await compute({ cohortId: cohortId === 'all' ? null : cohortId }, today);
	const apprentices = rows.map(summary);
	return {
		cohort: cohortInfo,
		generatedOn: today,
		forecastMethod: rows[0]?.progress.forecast.method ?? null,
		areas,
		apprentices,
		totals: {
			apprentices: apprentices.length,
			atRisk: apprentices.filter((a) => a.atRisk).length,
			qualified: apprentices.filter((a) => a.qualifies).length,
			verifiedHours: Math.round(apprentices.reduce((s, a) => s + a.verifiedHours, 0) * 10) / 10,
			pendingHours: Math.round(apprentices.reduce((s, a) => s + a.pendingHours, 0) * 10) / 10
		}
	};
}

export type CohortProgress = Awaited<ReturnType<typeof cohort>>;

/** One apprentice's full progress, or null when they have no apprentice record. */
export async function apprentice(apprenticeId: string, today = isoDate(new Date())) {
	const { rows, areas } = await compute({ apprenticeId }, today);
	const row = rows[0];
	if (!row) return null;
	return { ...row, areaTotals: areas };
}

/** The next tasks worth asking a journeyworker about, from the apprentice's matrix. */
export function nextTasks(cells: assessment.MatrixCell[], limit = 5) {
	const open = cells.filter((c) => (c.level ?? 0) < c.requiredLevel);
	const ready = open
		.filter((c) => c.verifiedTenths >= c.minHours * 10)
		.sort((a, b) => a.tier - b.tier || Number(b.quizPassed) - Number(a.quizPassed));
	const close = open
		.filter((c) => c.verifiedTenths < c.minHours * 10)
		.sort(
			(a, b) =>
				a.tier - b.tier || a.minHours * 10 - a.verifiedTenths - (b.minHours * 10 - b.verifiedTenths)
		);
	return [...ready, ...close].slice(0, limit).map((c) => ({
		code: c.code,
		title: c.title,
		tier: c.tier,
		level: c.level,
		requiredLevel: c.requiredLevel,
		verifiedHours: c.verifiedTenths / 10,
		minHours: c.minHours,
		quizPassed: Boolean(c.quizPassed),
		step:
			c.verifiedTenths < c.minHours * 10
				? ('hours' as const)
				: c.quizPassed
					? ('request' as const)
					: ('check' as const)
	}));
}

/** What a certificate could cover now: whole programme and each area. */
export async function qualification(apprenticeId: string): Promise<Qualification | null> {
	const [found, cells] = await Promise.all([
		apprentice(apprenticeId),
		assessment.matrix(apprenticeId)
	]);
	if (!found) return null;
	const programme = await Programme.findByPk(found.person.programmeId, {
		attributes: ['id', 'name', 'approach', 'certificateValidityMonths'],
		rejectOnEmpty: true
	});
	const covered: CoveredTask[] = cells
		.filter((c) => c.level !== null && c.level >= c.requiredLevel)
		.map((c) => ({
			code: c.code,
			title: c.title,
			areaCode: c.areaCode,
			tier: c.tier,
			level: c.level!,
			requiredLevel: c.requiredLevel,
			signedAt: String(c.lastAssessed)
		}));
	const areas: AreaStanding[] = found.areaTotals.map((a) => {
		const inArea = cells.filter((c) => c.areaCode === a.code);
		const open = inArea.filter((c) => c.level === null || c.level < c.requiredLevel);
		return {
			code: a.code,
			name: a.name,
			complete: inArea.length > 0 && open.length === 0,
			missing:
				inArea.length === 0
					? ['This area has no tasks.']
					: open.map(
							(c) =>
								`${c.code} ${c.title}: ${c.level ? `level ${c.level}` : 'not signed off'}, level ${c.requiredLevel} required.`
						),
			tasks: covered.filter((c) => c.areaCode === a.code),
			verifiedTenths: inArea.reduce((s, c) => s + c.verifiedTenths, 0)
		};
	});
	const g = found.progress;
	return {
		apprenticeId,
		holder: found.person.name,
		programme: {
			id: programme.id,
			name: programme.name,
			approach: programme.approach,
			certificateValidityMonths: programme.certificateValidityMonths
		},
		completion: { qualifies: g.completion.qualifies, missing: g.completion.missing },
		interimAllowed: programme.approach !== 'time',
		areas,
		tasks: covered,
		totals: {
			verifiedTenths: Math.round(g.hours.verified * 10),
			creditHours: g.hours.credit,
			rtiTenths: Math.round(g.rti.total * 10)
		}
	};
}

/**
 * Cumulative verified hours of a cohort week by week, beside the plan: each apprentice's
 * required hours spread evenly from their start to their planned end.
 */
export async function burnUp(cohortId: number | 'all', today = isoDate(new Date())) {
	const scope = cohortId === 'all' ? '1 = 1' : 'a.cohort_id = :cohortId';
	const [weeks, persons] = await Promise.all([
		select<{ week: string; tenths: number }>(
			`SELECT ${dialectSql.weekStart('e.work_date')} AS week, SUM(e.tenths) AS tenths
			   FROM log_entries e JOIN apprentice_profiles a ON a.user_id = e.apprentice_id
			  WHERE ${scope} AND ${COUNTED}
			  GROUP BY week ORDER BY week`,
			{ cohortId }
		),
		select<{ startDate: string; plannedEndDate: string; credit: number; ojlHours: number }>(
			`SELECT a.start_date AS "startDate", a.planned_end_date AS "plannedEndDate",
			        a.prior_credit_hours AS credit, p.ojl_hours AS "ojlHours"
			   FROM apprentice_profiles a JOIN cohorts c ON c.id = a.cohort_id
			   JOIN programmes p ON p.id = c.programme_id JOIN users u ON u.id = a.user_id
			  WHERE ${scope} AND u.active`,
			{ cohortId }
		)
	]);
	if (persons.length === 0) return { weeks: [] as string[], actual: [], plan: [] };
	const first = persons.reduce((m, p) => (p.startDate < m ? p.startDate : m), today);
	const monday = (d: string) => addDays(d, -((new Date(`${d}T00:00:00Z`).getUTCDay() + 6) % 7));
	const labels: string[] = [];
	for (let w = monday(first); w <= today; w = addDays(w, 7)) labels.push(w);
	const byWeek = new Map(weeks.map((w) => [w.week, w.tenths]));
	const credit = persons.reduce((s, p) => s + p.credit, 0);
	let sum = credit * 10;
	const actual = labels.map((w) => {
		sum += byWeek.get(w) ?? 0;
		return Math.round(sum) / 10;
	});
	const plan = labels.map((w) => {
		const end = addDays(w, 6);
		let total = 0;
		for (const p of persons) {
			const span = Date.parse(p.plannedEndDate) - Date.parse(p.startDate);
			const share = Math.min(1, Math.max(0, (Date.parse(end) - Date.parse(p.startDate)) / span));
			total += p.credit + share * (p.ojlHours - p.credit);
		}
		return Math.round(total);
	});
	return { weeks: labels, actual, plan };
}

/**
 * Apprentices per journeyworker at each site, week by week: the busiest day's ratio and the
 * days over the limit the programme allows.
 */
export async function ratioBySite(weeks = 26, today = isoDate(new Date())) {
	const since = addDays(today, -(weeks * 7 - 1));
	const [rows, sites, rules] = await Promise.all([
		data.siteDays(since, today),
		select<{ id: number; code: string; name: string }>(
			`SELECT id, code, name FROM sites ORDER BY code`,
			{}
		),
		Programme.findOne({ order: [['id', 'ASC']] })
	]);
	const ratio = rules
		? data.rulesOf(rules).ratio
		: ({ kind: 'fixed', apprentices: 1, journeyworkers: 1 } as const);
	const labels = Array.from({ length: weeks }, (_, i) => addDays(since, i * 7));
	const series = new Map(
		sites.map((s) => [
			s.id,
			{
				peak: new Array<number | null>(weeks).fill(null),
				breaches: new Array<number>(weeks).fill(0)
			}
		])
	);
	for (const r of rows) {
		const s = series.get(r.siteId);
		if (!s) continue;
		const w = Math.floor((Date.parse(r.day) - Date.parse(since)) / (7 * 86_400_000));
		const value = r.journeyworkers > 0 ? r.apprentices / r.journeyworkers : r.apprentices;
		s.peak[w] = Math.max(s.peak[w] ?? 0, Math.round(value * 100) / 100);
		if (r.apprentices > allowedApprentices(ratio, r.journeyworkers)) s.breaches[w] += 1;
	}
	return {
		weeks: labels,
		sites: sites.map((s) => ({ ...s, ...series.get(s.id)! })),
		ratio
	};
}

export type { Tier };
