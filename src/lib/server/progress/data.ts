/**
 * The facts the progress engine needs, fetched with a handful of aggregate queries that serve one
 * apprentice or a whole cohort alike: the cost grows with the rows scanned, never with one query
 * per apprentice.
 */
import { reader } from '../db';
import { dialectSql } from '../db/dialect';
import { select, STANDING } from '../db/sql';
import type { Programme } from '../db/models/Programme';
import type { ApprenticeFacts, ProgrammeRules, RatioRule, Tier, TierCounts } from './engine';
import { addDays, allowedApprentices, WINDOW } from './engine';

/** Days of shop-floor records the ratio check looks back over. */
export const RATIO_DAYS = 28;

/** Who the queries cover: one cohort, every cohort (null), or one apprentice. */
export interface Scope {
	cohortId?: number | null;
	apprenticeId?: string;
}

function scopeSql(scope: Scope, column: string) {
	if (scope.apprenticeId) return { sql: `${column} = :apprenticeId`, join: '' };
	if (scope.cohortId != null) {
		return {
			sql: `sp.cohort_id = :cohortId`,
			join: `JOIN apprentice_profiles sp ON sp.user_id = ${column}`
		};
	}
	return { sql: '1 = 1', join: '' };
}

export interface Person {
	id: string;
	name: string;
	email: string;
	siteId: number | null;
	siteName: string | null;
	cohortId: number;
	cohortName: string;
	programmeId: number;
	startDate: string;
	plannedEndDate: string;
	priorCreditHours: number;
}

export function rulesOf(p: Programme): ProgrammeRules {
	const ratio: RatioRule =
		p.ratioRule === 'first-then-every'
			? { kind: 'first-then-every', every: p.ratioEvery }
			: {
					kind: 'fixed',
					apprentices: p.ratioApprentices,
					journeyworkers: p.ratioJourneyworkers
				};
	return {
		approach: p.approach,
		termYears: p.termYears,
		ojlHours: p.ojlHours,
		rtiHoursPerYear: p.rtiHoursPerYear,
		probationHours: p.probationHours,
		journeyworkerRateCents: p.journeyworkerRateCents,
		wageSchedule: p.wageSchedule,
		ratio,
		tierThresholds: p.tierThresholds,
		stallWeeks: p.stallWeeks,
		returnedLimit: p.returnedLimit
	};
}

export async function people(scope: Scope): Promise<Person[]> {
	const where = scope.apprenticeId
		? 'a.user_id = :apprenticeId'
		: scope.cohortId != null
			? 'a.cohort_id = :cohortId AND u.active'
			: 'u.active';
	return select<Person>(
		`SELECT u.id, u.name, u.email, u.site_id AS "siteId", s.name AS "siteName", c.id AS "cohortId",
		        c.name AS "cohortName", c.programme_id AS "programmeId", a.start_date AS "startDate",
		        a.planned_end_date AS "plannedEndDate", a.prior_credit_hours AS "priorCreditHours"
		   FROM apprentice_profiles a
		   JOIN users u ON u.id = a.user_id
		   JOIN cohorts c ON c.id = a.cohort_id
		   LEFT JOIN sites s ON s.id = u.site_id
		  WHERE ${where}
		  ORDER BY u.name`,
		{ ...scope }
	);
}

/** Per-tier task totals of a framework. */
export async function tierTotals(frameworkId: number): Promise<Record<Tier, number>> {
	const rows = await select<{ tier: Tier; n: number }>(
		`SELECT tier, COUNT(*) AS n FROM framework_tasks WHERE framework_id = :frameworkId GROUP BY tier`,
		{ frameworkId }
	);
	const totals: Record<Tier, number> = { 1: 0, 2: 0, 3: 0 };
	for (const r of rows) totals[r.tier] = r.n;
	return totals;
}

/**
 * Two passes over the work log, each in index order: totals per apprentice and status over all
 * time, and, over the verified entries of the forecast window only, the window's sums (see
 * `WindowSums` in the engine) with efficiency's standard and actual time for each half.
 */
const WEEK = dialectSql.wholeWeeks('e.work_date', ':windowStart');
const IN_WINDOW = `e.work_date BETWEEN :windowStart AND :today`;
const EARLY = `e.work_date <= :halfway`;
const TOTALS = `SUM(e.tenths) AS tenths, COUNT(*) AS entries, MAX(e.work_date) AS "lastDate"`;
const WINDOW_SUMS = `SUM(e.tenths) AS "windowTenths",
	SUM(e.tenths * ${WEEK} * (${WINDOW} - ${WEEK})) AS "windowWeighted",
	COALESCE(SUM(CASE WHEN ${EARLY} THEN e.standard_tenths END), 0) AS "standardEarly",
	COALESCE(SUM(CASE WHEN ${EARLY} AND e.standard_tenths IS NOT NULL THEN e.tenths END), 0) AS "actualEarly",
	COALESCE(SUM(CASE WHEN NOT ${EARLY} THEN e.standard_tenths END), 0) AS "standardLate",
	COALESCE(SUM(CASE WHEN NOT ${EARLY} AND e.standard_tenths IS NOT NULL THEN e.tenths END), 0) AS "actualLate"`;

interface TotalRow {
	id: string;
	status: string;
	tenths: number;
	entries: number;
	lastDate: string;
}

interface WindowRow {
	id: string;
	windowTenths: number;
	windowWeighted: number;
	standardEarly: number;
	actualEarly: number;
	standardLate: number;
	actualLate: number;
}

type ReplacedRow = TotalRow & WindowRow;

interface MetRow {
	id: string;
	areaCode: string;
	tier: Tier;
	met: number;
	signed: number;
	levels: number;
}

interface RtiRow {
	id: string;
	year: number;
	tenths: number;
}

export interface SiteDayRow {
	siteId: number;
	day: string;
	apprentices: number;
	journeyworkers: number;
}

export interface Raw {
	totals: TotalRow[];
	window: WindowRow[];
	/** Verified entries a verified correction replaced: taken off again. */
	replaced: ReplacedRow[];
	met: MetRow[];
	rti: RtiRow[];
	siteDays: SiteDayRow[];
}

/** The six aggregate queries, run together on two connections. */
export async function fetchRaw(scope: Scope, frameworkId: number, today: string): Promise<Raw> {
	const e = scopeSql(scope, 'e.apprentice_id');
	const s = scopeSql(scope, 's.apprentice_id');
	const r = scopeSql(scope, 'r.apprentice_id');
	const windowStart = addDays(today, -(WINDOW * 7 - 1));
	const replacements = {
		...scope,
		frameworkId,
		windowStart,
		halfway: addDays(windowStart, (WINDOW / 2) * 7 - 1),
		ratioSince: addDays(today, -(RATIO_DAYS - 1)),
		today
	};
	const [totals, window, replaced, met, rti, days] = await Promise.all([
		// The two heaviest queries run on the second connection while the others run here.
		select<TotalRow>(
			`SELECT e.apprentice_id AS id, e.status, ${TOTALS}
			   FROM log_entries e ${e.join}
			  WHERE ${e.sql}
			  GROUP BY e.apprentice_id, e.status`,
			replacements,
			reader
		),
		select<WindowRow>(
			`SELECT e.apprentice_id AS id, ${WINDOW_SUMS}
			   FROM log_entries e ${e.join}
			  WHERE ${e.sql} AND e.status = 'verified' AND ${IN_WINDOW}
			  GROUP BY e.apprentice_id`,
			replacements
		),
		select<ReplacedRow>(
			`SELECT e.apprentice_id AS id, e.status, ${TOTALS},
			        COALESCE(SUM(CASE WHEN ${IN_WINDOW} THEN e.tenths END), 0) AS "windowTenths",
			        COALESCE(SUM(CASE WHEN ${IN_WINDOW} THEN e.tenths * ${WEEK} * (${WINDOW} - ${WEEK}) END), 0) AS "windowWeighted",
			        COALESCE(SUM(CASE WHEN ${IN_WINDOW} AND ${EARLY} THEN e.standard_tenths END), 0) AS "standardEarly",
			        COALESCE(SUM(CASE WHEN ${IN_WINDOW} AND ${EARLY} AND e.standard_tenths IS NOT NULL THEN e.tenths END), 0) AS "actualEarly",
			        COALESCE(SUM(CASE WHEN ${IN_WINDOW} AND NOT ${EARLY} THEN e.standard_tenths END), 0) AS "standardLate",
			        COALESCE(SUM(CASE WHEN ${IN_WINDOW} AND NOT ${EARLY} AND e.standard_tenths IS NOT NULL THEN e.tenths END), 0) AS "actualLate"
			   FROM log_entries c JOIN log_entries e ON e.id = c.corrects_id ${e.join}
			  WHERE c.corrects_id IS NOT NULL AND c.status = 'verified' AND e.status = 'verified'
			    AND ${e.sql}
			  GROUP BY e.apprentice_id, e.status`,
			replacements
		),
		select<MetRow>(
			`WITH per_task AS (
			   SELECT s.apprentice_id, s.task_id, MAX(s.level) AS level
			     FROM sign_offs s ${s.join}
			    WHERE ${s.sql} AND ${STANDING}
			    GROUP BY s.apprentice_id, s.task_id),
			 standing AS (
			   SELECT p.apprentice_id, t0.code, MAX(p.level) AS level
			     FROM per_task p JOIN framework_tasks t0 ON t0.id = p.task_id
			    GROUP BY p.apprentice_id, t0.code)
			 SELECT st.apprentice_id AS id, a.code AS "areaCode", t.tier,
			        COUNT(CASE WHEN st.level >= t.required_level THEN 1 END) AS met, COUNT(*) AS signed, SUM(st.level) AS levels
			   FROM standing st
			   JOIN framework_tasks t ON t.framework_id = :frameworkId AND t.code = st.code
			   JOIN framework_areas a ON a.id = t.area_id
			  GROUP BY st.apprentice_id, a.code, t.tier`,
			replacements,
			reader
		),
		select<RtiRow>(
			`SELECT r.apprentice_id AS id,
			        ${dialectSql.wholeYears('r.completed_on', 'p.start_date')} AS year,
			        SUM(r.tenths) AS tenths
			   FROM rti_records r ${r.join}
			   JOIN apprentice_profiles p ON p.user_id = r.apprentice_id
			  WHERE ${r.sql} AND r.confirmed_at IS NOT NULL AND r.result IN ('attended', 'passed')
			  GROUP BY r.apprentice_id, year`,
			replacements
		),
		siteDays(replacements.ratioSince, today)
	]);
	return { totals, window, replaced, met, rti, siteDays: days };
}

/**
 * Per shop and day: apprentices who logged work, and the journeyworkers who supervised it —
 * the two sides of the ratio.
 */
export function siteDays(since: string, today: string): Promise<SiteDayRow[]> {
	return select<SiteDayRow>(
		`SELECT u.site_id AS "siteId", e.work_date AS day,
		        COUNT(DISTINCT e.apprentice_id) AS apprentices,
		        COUNT(DISTINCT e.supervisor_id) AS journeyworkers
		   FROM log_entries e JOIN users u ON u.id = e.apprentice_id
		  WHERE e.work_date BETWEEN :since AND :today
		    AND e.status IN ('submitted', 'verified') AND u.site_id IS NOT NULL
		  GROUP BY u.site_id, e.work_date`,
		{ since, today }
	);
}

/** Days each site had more apprentices on the floor than its journeyworkers allow. */
export function breachDays(rows: SiteDayRow[], ratio: RatioRule): Map<number, number> {
	const out = new Map<number, number>();
	for (const row of rows) {
		if (row.apprentices > allowedApprentices(ratio, row.journeyworkers)) {
			out.set(row.siteId, (out.get(row.siteId) ?? 0) + 1);
		}
	}
	return out;
}

export interface AreaCell {
	met: number;
	signed: number;
	levels: number;
}

/** Turns the query rows into the engine's plain facts, keyed by apprentice. */
export function assemble(
	persons: Person[],
	raw: Raw,
	totals: Record<Tier, number>,
	ratioFor: (p: Person) => RatioRule
): Map<string, { facts: ApprenticeFacts; areas: Map<string, AreaCell> }> {
	const out = new Map<string, { facts: ApprenticeFacts; areas: Map<string, AreaCell> }>();
	const breaches = new Map<string, Map<number, number>>();
	for (const p of persons) {
		const tiers: TierCounts = {
			1: { total: totals[1], met: 0 },
			2: { total: totals[2], met: 0 },
			3: { total: totals[3], met: 0 }
		};
		const ratio = ratioFor(p);
		const key = JSON.stringify(ratio);
		if (!breaches.has(key)) breaches.set(key, breachDays(raw.siteDays, ratio));
		out.set(p.id, {
			facts: {
				startDate: p.startDate,
				plannedEndDate: p.plannedEndDate,
				priorCreditHours: p.priorCreditHours,
				verifiedTenths: 0,
				pendingTenths: 0,
				returnedOpen: 0,
				lastVerifiedDate: null,
				rtiTenthsByYear: [],
				tiers,
				window: { tenths: 0, weighted: 0 },
				standard: [0, 0],
				actual: [0, 0],
				siteBreachDays: p.siteId == null ? 0 : (breaches.get(key)!.get(p.siteId) ?? 0)
			},
			areas: new Map()
		});
	}
	for (const r of raw.totals) {
		const f = out.get(r.id)?.facts;
		if (!f) continue;
		if (r.status === 'submitted') f.pendingTenths += r.tenths;
		else if (r.status === 'returned') f.returnedOpen += r.entries;
		else if (r.status === 'verified') {
			f.verifiedTenths += r.tenths;
			f.lastVerifiedDate = r.lastDate;
		}
	}
	const addWindow = (f: ApprenticeFacts, w: WindowRow, sign: 1 | -1) => {
		f.window.tenths += sign * w.windowTenths;
		f.window.weighted += sign * w.windowWeighted;
		f.standard[0] += sign * w.standardEarly;
		f.standard[1] += sign * w.standardLate;
		f.actual[0] += sign * w.actualEarly;
		f.actual[1] += sign * w.actualLate;
	};
	for (const w of raw.window) {
		const f = out.get(w.id)?.facts;
		if (f) addWindow(f, w, 1);
	}
	for (const r of raw.replaced) {
		const f = out.get(r.id)?.facts;
		if (!f) continue;
		f.verifiedTenths -= r.tenths;
		addWindow(f, r, -1);
	}
	for (const m of raw.met) {
		const entry = out.get(m.id);
		if (!entry) continue;
		entry.facts.tiers[m.tier].met += m.met;
		const cell = entry.areas.get(m.areaCode) ?? { met: 0, signed: 0, levels: 0 };
		cell.met += m.met;
		cell.signed += m.signed;
		cell.levels += m.levels;
		entry.areas.set(m.areaCode, cell);
	}
	for (const r of raw.rti) {
		const f = out.get(r.id)?.facts;
		if (!f) continue;
		const year = Math.max(0, r.year);
		while (f.rtiTenthsByYear.length <= year) f.rtiTenthsByYear.push(0);
		f.rtiTenthsByYear[year] += r.tenths;
	}
	return out;
}
