/**
 * The progress engine: pure functions over plain numbers that the aggregate queries in
 * `data.ts` fetch. Nothing here touches the database, so every rule is unit-tested on its own.
 */
import type { Approach } from '../db/models/Programme';

export type Tier = 1 | 2 | 3;

export interface WageStepRule {
	/** Verified hours (with prior credit) from which the step applies. */
	fromHours: number;
	/** Percentage of the journeyworker rate. */
	percent: number;
	/** Tasks that must stand at their required level as well; 0 when the step is by hours only. */
	minTasks?: number;
}

export type RatioRule =
	| { kind: 'fixed'; apprentices: number; journeyworkers: number }
	| { kind: 'first-then-every'; every: number };

export interface ProgrammeRules {
	approach: Approach;
	termYears: number;
	ojlHours: number;
	rtiHoursPerYear: number;
	probationHours: number;
	journeyworkerRateCents: number;
	wageSchedule: WageStepRule[];
	ratio: RatioRule;
	tierThresholds: [number, number, number];
	stallWeeks: number;
	returnedLimit: number;
}

/** Counts one apprentice's standing per tier: tasks in the framework and tasks at the required level. */
export type TierCounts = Record<Tier, { total: number; met: number }>;

export interface ApprenticeFacts {
	startDate: string;
	plannedEndDate: string;
	priorCreditHours: number;
	verifiedTenths: number;
	pendingTenths: number;
	returnedOpen: number;
	lastVerifiedDate: string | null;
	/** Related instruction, confirmed, by programme year (index 0 = year 1). */
	rtiTenthsByYear: number[];
	tiers: TierCounts;
	/** Verified tenths in the forecast window, and the same weighted for the trend line. */
	window: WindowSums;
	/** Standard and actual tenths on jobs with a standard time: earlier and later half of the window. */
	standard: [number, number];
	actual: [number, number];
	siteBreachDays: number;
}

const DAY = 86_400_000;

export function isoDate(d: Date): string {
	return d.toISOString().slice(0, 10);
}

export function addDays(date: string, days: number): string {
	return isoDate(new Date(Date.parse(`${date}T00:00:00Z`) + Math.round(days) * DAY));
}

export function daysBetween(from: string, to: string): number {
	return Math.round((Date.parse(`${to}T00:00:00Z`) - Date.parse(`${from}T00:00:00Z`)) / DAY);
}

export const FORECAST_METHOD =
	'Ordinary least squares line through cumulative verified hours, week by week, over the last 26 weeks';

/** Weeks in the forecast window; week 0 is the oldest, week WINDOW − 1 holds today. */
export const WINDOW = 26;

/**
 * What the least-squares fit needs from a window of weekly hours h₀…hₙ₋₁, summed in SQL:
 * the hours, and the hours weighted by k(n − k) for week k.
 *
 * Fitting y = a + bx to cumulative hours yₓ = C + Σₖ≤ₓ hₖ, the numerator Σ(x − x̄)(yₓ − ȳ)
 * regroups as Σₖ hₖ · Σₓ≥ₖ(x − x̄) = Σₖ hₖ · k(n − k)/2, and Sxx = n(n² − 1)/12; C drops out.
 * So the slope comes from two sums instead of a series per apprentice.
 */
export interface WindowSums {
	tenths: number;
	weighted: number;
}

/** The weight of week k in `WindowSums.weighted`. */
export const weekWeight = (k: number, n = WINDOW) => k * (n - k);

/** Sums a weekly series the way the SQL does; for tests and single series. */
export function windowSums(weeklyTenths: number[]): WindowSums {
	const n = weeklyTenths.length;
	let tenths = 0;
	let weighted = 0;
	weeklyTenths.forEach((t, k) => {
		tenths += t;
		weighted += t * weekWeight(k, n);
	});
	return { tenths, weighted };
}

/** The least-squares slope, in hours per week, of cumulative hours over an n-week window. */
export function trendSlope(sums: WindowSums, n = WINDOW): number {
	const sxx = (n * (n * n - 1)) / 12;
	return sums.weighted / 10 / 2 / sxx;
}

export interface Forecast {
	method: string;
	/** Hours per week the trend line rises by. */
	hoursPerWeek: number;
	/** Date the required on-the-job hours are reached at that pace; null when the trend is flat. */
	completionDate: string | null;
}

/** Projects when `targetHours` is reached, walking the trend line on from `hoursNow`. */
export function forecast(
	sums: WindowSums,
	hoursNow: number,
	targetHours: number,
	today: string,
	n = WINDOW
): Forecast {
	const slope = trendSlope(sums, n);
	const remaining = targetHours - hoursNow;
	let completionDate: string | null = null;
	if (remaining <= 0) completionDate = today;
	else if (slope > 0.05) completionDate = addDays(today, (remaining / slope) * 7);
	return { method: FORECAST_METHOD, hoursPerWeek: round1(slope), completionDate };
}

const round1 = (n: number) => Math.round(n * 10) / 10;

/** Apprentices a site may have on the floor with `journeyworkers` qualified people present. */
export function allowedApprentices(rule: RatioRule, journeyworkers: number): number {
	if (journeyworkers <= 0) return 0;
	if (rule.kind === 'fixed') {
		return Math.floor((journeyworkers * rule.apprentices) / rule.journeyworkers);
	}
	return 1 + Math.floor((journeyworkers - 1) / rule.every);
}

export interface WageStanding {
	/** Index into the schedule; -1 before the first step applies. */
	index: number;
	percent: number;
	hourlyCents: number;
	next: null | {
		percent: number;
		hourlyCents: number;
		atHours: number;
		hoursToGo: number;
		minTasks: number;
		tasksToGo: number;
		/** Forecast date the hours fall due at the current pace; null when stalled. */
		dueDate: string | null;
	};
}

/**
 * The current step is the last one whose hours and task count are both reached, taken in
 * schedule order: a later step cannot apply while an earlier one is still out of reach.
 */
export function wageStep(
	schedule: WageStepRule[],
	rateCents: number,
	hours: number,
	tasksMet: number,
	hoursPerWeek: number,
	today: string
): WageStanding {
	const steps = [...schedule].sort((a, b) => a.fromHours - b.fromHours);
	let index = -1;
	for (let i = 0; i < steps.length; i++) {
		if (hours >= steps[i].fromHours && tasksMet >= (steps[i].minTasks ?? 0)) index = i;
		else break;
	}
	const percent = index >= 0 ? steps[index].percent : 0;
	const upcoming = steps[index + 1];
	const cents = (p: number) => Math.round((rateCents * p) / 100);
	let next: WageStanding['next'] = null;
	if (upcoming) {
		const hoursToGo = Math.max(0, round1(upcoming.fromHours - hours));
		const minTasks = upcoming.minTasks ?? 0;
		next = {
			percent: upcoming.percent,
			hourlyCents: cents(upcoming.percent),
			atHours: upcoming.fromHours,
			hoursToGo,
			minTasks,
			tasksToGo: Math.max(0, minTasks - tasksMet),
			dueDate:
				hoursToGo === 0
					? today
					: hoursPerWeek > 0.05
						? addDays(today, (hoursToGo / hoursPerWeek) * 7)
						: null
		};
	}
	return { index, percent, hourlyCents: cents(percent), next };
}

export interface TierCoverage {
	tier: Tier;
	total: number;
	met: number;
	percent: number;
	threshold: number;
	/** Tasks needed to reach the threshold, rounding the required count up. */
	needed: number;
	ok: boolean;
}

export function coverage(tiers: TierCounts, thresholds: [number, number, number]): TierCoverage[] {
	return ([1, 2, 3] as Tier[]).map((tier) => {
		const { total, met } = tiers[tier];
		const threshold = thresholds[tier - 1];
		const required = Math.ceil((total * threshold) / 100 - 1e-9);
		return {
			tier,
			total,
			met,
			percent: total === 0 ? 100 : Math.round((met / total) * 1000) / 10,
			threshold,
			needed: Math.max(0, required - met),
			ok: met >= required
		};
	});
}

export interface Completion {
	qualifies: boolean;
	missing: string[];
	/** Share of the way to completion, 0–100, for charts: the lesser of hours and coverage where both count. */
	percent: number;
}

export function completion(
	rules: ProgrammeRules,
	hours: number,
	rtiHours: number,
	tiers: TierCoverage[]
): Completion {
	const missing: string[] = [];
	const needsHours = rules.approach !== 'competency';
	const needsCoverage = rules.approach !== 'time';
	const hoursShare = Math.min(1, hours / Math.max(1, rules.ojlHours));
	if (needsHours && hours < rules.ojlHours) {
		missing.push(
			`${fmt(rules.ojlHours - hours)} more verified on-the-job hours (${fmt(hours)} of ${fmt(rules.ojlHours)} h).`
		);
	}
	const rtiRequired = rules.rtiHoursPerYear * rules.termYears;
	if (rtiHours < rtiRequired) {
		missing.push(
			`${fmt(rtiRequired - rtiHours)} more confirmed related instruction hours (${fmt(rtiHours)} of ${fmt(rtiRequired)} h).`
		);
	}
	let coverageShare = 1;
	if (needsCoverage) {
		for (const t of tiers) {
			if (!t.ok) {
				missing.push(
					`${t.needed} more priority ${t.tier} task${t.needed === 1 ? '' : 's'} signed off at the required level (${t.met} of ${t.total}; ${t.threshold} % needed).`
				);
			}
			const required = Math.max(1, Math.ceil((t.total * t.threshold) / 100 - 1e-9));
			coverageShare = Math.min(coverageShare, Math.min(1, t.met / required));
		}
	}
	const rtiShare = Math.min(1, rtiHours / Math.max(1, rtiRequired));
	const shares = [rtiShare];
	if (needsHours) shares.push(hoursShare);
	if (needsCoverage) shares.push(coverageShare);
	return {
		qualifies: missing.length === 0,
		missing,
		percent: Math.floor(Math.min(...shares) * 1000) / 10
	};
}

const fmt = (n: number) => round1(n).toLocaleString('en-US');

export interface Efficiency {
	/** Standard ÷ actual time over the window, as a percentage; null without standard times. */
	percent: number | null;
	/** Later half of the window less the earlier half, in percentage points; null without both. */
	change: number | null;
}

/** Efficiency = standard (flat-rate) hours produced ÷ hours worked, per the dealer formula. */
export function efficiency(standard: [number, number], actual: [number, number]): Efficiency {
	const pct = (s: number, a: number) => (a > 0 ? Math.round((s / a) * 1000) / 10 : null);
	const early = pct(standard[0], actual[0]);
	const late = pct(standard[1], actual[1]);
	return {
		percent: pct(standard[0] + standard[1], actual[0] + actual[1]),
		change: early !== null && late !== null ? round1(late - early) : null
	};
}

export interface Risk {
	atRisk: boolean;
	reasons: string[];
}

export function risk(
	rules: ProgrammeRules,
	facts: Pick<
		ApprenticeFacts,
		'plannedEndDate' | 'lastVerifiedDate' | 'returnedOpen' | 'siteBreachDays' | 'startDate'
	>,
	fc: Forecast,
	done: boolean,
	today: string
): Risk {
	const reasons: string[] = [];
	if (done) return { atRisk: false, reasons };
	if (rules.approach !== 'competency') {
		if (fc.completionDate === null) reasons.push('Verified hours are not rising.');
		else if (fc.completionDate > facts.plannedEndDate) {
			reasons.push(
				`Forecast to finish ${fc.completionDate}, after the planned end ${facts.plannedEndDate}.`
			);
		}
	}
	const since = facts.lastVerifiedDate ?? facts.startDate;
	const idleDays = daysBetween(since, today);
	if (idleDays >= rules.stallWeeks * 7) {
		reasons.push(
			facts.lastVerifiedDate
				? `No verified hours for ${Math.floor(idleDays / 7)} weeks.`
				: 'No verified hours yet.'
		);
	}
	if (facts.returnedOpen >= rules.returnedLimit) {
		reasons.push(`${facts.returnedOpen} returned entries not yet corrected.`);
	}
	if (facts.siteBreachDays > 0) {
		reasons.push(
			`Their shop was over the apprentice ratio on ${facts.siteBreachDays} day${facts.siteBreachDays === 1 ? '' : 's'} in the last 4 weeks.`
		);
	}
	return { atRisk: reasons.length > 0, reasons };
}

export interface Progress {
	hours: {
		verified: number;
		pending: number;
		credit: number;
		counted: number;
		required: number;
		percent: number;
	};
	probation: { inProbation: boolean; hours: number };
	rti: { byYear: { year: number; hours: number; required: number }[]; total: number };
	tiers: TierCoverage[];
	tasksMet: number;
	completion: Completion;
	wage: WageStanding;
	forecast: Forecast;
	efficiency: Efficiency;
	risk: Risk;
}

/** Everything the dashboards show about one apprentice, from their aggregated facts. */
export function progress(rules: ProgrammeRules, facts: ApprenticeFacts, today: string): Progress {
	const verified = facts.verifiedTenths / 10;
	const counted = verified + facts.priorCreditHours;
	const fc = forecast(facts.window, counted, rules.ojlHours, today);
	const tiers = coverage(facts.tiers, rules.tierThresholds);
	const tasksMet = facts.tiers[1].met + facts.tiers[2].met + facts.tiers[3].met;
	const rtiByYear = Array.from({ length: rules.termYears }, (_, i) => ({
		year: i + 1,
		hours: (facts.rtiTenthsByYear[i] ?? 0) / 10,
		required: rules.rtiHoursPerYear
	}));
	// Instruction taken after the planned term still counts towards the total.
	const rtiTotal = facts.rtiTenthsByYear.reduce((a, b) => a + b, 0) / 10;
	const done = completion(rules, counted, rtiTotal, tiers);
	return {
		hours: {
			verified,
			pending: facts.pendingTenths / 10,
			credit: facts.priorCreditHours,
			counted,
			required: rules.ojlHours,
			percent: Math.floor(Math.min(1, counted / Math.max(1, rules.ojlHours)) * 1000) / 10
		},
		probation: { inProbation: counted < rules.probationHours, hours: rules.probationHours },
		rti: { byYear: rtiByYear, total: rtiTotal },
		tiers,
		tasksMet,
		completion: done,
		wage: wageStep(
			rules.wageSchedule,
			rules.journeyworkerRateCents,
			counted,
			tasksMet,
			fc.hoursPerWeek,
			today
		),
		forecast: fc,
		efficiency: efficiency(facts.standard, facts.actual),
		risk: risk(rules, facts, fc, done.qualifies, today)
	};
}
