import { describe, expect, it } from 'vitest';
import { linearRegression } from 'simple-statistics';
import {
	addDays,
	allowedApprentices,
	completion,
	coverage,
	efficiency,
	forecast,
	progress,
	risk,
	trendSlope,
	wageStep,
	windowSums,
	type ApprenticeFacts,
	type ProgrammeRules
} from '../../src/lib/server/progress/engine';
import { PROGRAMME_DEFAULTS, probationCap } from '../../src/lib/schemas/programme';

const rules: ProgrammeRules = {
	approach: 'hybrid',
	termYears: 4,
	ojlHours: 8000,
	rtiHoursPerYear: 144,
	probationHours: 2000,
	journeyworkerRateCents: 3400,
	wageSchedule: [
		{ fromHours: 0, percent: 55 },
		{ fromHours: 2000, percent: 65 },
		{ fromHours: 4000, percent: 75 },
		{ fromHours: 6000, percent: 85 }
	],
	ratio: { kind: 'fixed', apprentices: 2, journeyworkers: 1 },
	tierThresholds: [95, 80, 50],
	stallWeeks: 4,
	returnedLimit: 5
};

describe('programme defaults', () => {
	it('follow 29 CFR 29.5(b)(2)(i): 2,000 on-the-job hours per year of a time-based term', () => {
		// 29 CFR 29.5(b)(2)(i) and 29.4(c): at least 2,000 hours
		expect(PROGRAMME_DEFAULTS.ojlHoursPerYear).toBe(2000);
		expect(PROGRAMME_DEFAULTS.ojlHours).toBe(2000 * PROGRAMME_DEFAULTS.termYears);
	});
	it('follow 29 CFR 29.5(b)(4): 144 hours of related instruction per year', () => {
		// 29 CFR 29.5(b)(4), 29.7(e)(2)
		expect(PROGRAMME_DEFAULTS.rtiHoursPerYear).toBe(144);
	});
	it('cap probation at 25 % of the term or one year, whichever is shorter — 29 CFR 29.5(b)(8)', () => {
		// REFERENCES.md check values: 8,000 h (4 years) → 2,000 h; 2,000 h (1 year) → 500 h
		expect(probationCap(8000, 4)).toBe(2000);
		expect(probationCap(2000, 1)).toBe(500);
	});
	it('use the trade accreditation coverage 95/80/50 % (Standard 7.5A, REFERENCES.md)', () => {
		expect(PROGRAMME_DEFAULTS.tierThresholds).toEqual([95, 80, 50]);
	});
});

describe('forecast', () => {
	it('gets the least-squares slope of cumulative hours from two window sums, as simple-statistics does from the series', () => {
		const weekly = [
			300, 285, 305, 90, 425, 275, 10, 390, 380, 0, 400, 415, 377, 362, 301, 288, 350, 360, 330, 0,
			0, 410, 420, 330, 340, 385
		];
		let cumulative = 1234.5;
		const series = weekly.map((t, week) => [week, (cumulative += t / 10)] as [number, number]);
		const reference = linearRegression(series); // simple-statistics, general-purpose package
		expect(trendSlope(windowSums(weekly))).toBeCloseTo(reference.m, 10);
	});

	it('walks the trend forward from the hours counted now', () => {
		// 40 h every week: 4,000 h to go at 40 h/week = 100 weeks
		const f = forecast(windowSums(new Array(26).fill(400)), 4000, 8000, '2026-12-02');
		expect(f.hoursPerWeek).toBe(40);
		expect(f.completionDate).toBe(addDays('2026-12-02', 700));
		expect(f.method).toMatch(/least squares/i);
	});

	it('gives no date when the trend is flat', () => {
		expect(
			forecast(windowSums(new Array(26).fill(0)), 1200, 8000, '2026-12-02').completionDate
		).toBeNull();
	});
});

describe('wage steps', () => {
	it('matches a hand-computed example', () => {
		// Worked by hand: rate $34.00/h; 2,150 h counted → step 2 (65 %) = $22.10/h;
		// next step 75 % = $25.50/h at 4,000 h, 1,850 h to go; at 37 h/week that is 50 weeks = 350 days.
		const w = wageStep(rules.wageSchedule, 3400, 2150, 0, 37, '2026-12-02');
		expect(w.index).toBe(1);
		expect(w.percent).toBe(65);
		expect(w.hourlyCents).toBe(2210);
		expect(w.next).toEqual({
			percent: 75,
			hourlyCents: 2550,
			atHours: 4000,
			hoursToGo: 1850,
			minTasks: 0,
			tasksToGo: 0,
			dueDate: '2027-11-17'
		});
	});

	it('reproduces the Missouri FAQ: 50 % of ($30 + $10) is $20', () => {
		// Missouri Department of Labor FAQ (REFERENCES.md): journeyworker base + fringe, times 50 %
		const w = wageStep([{ fromHours: 0, percent: 50 }], 4000, 10, 0, 0, '2026-12-02');
		expect(w.hourlyCents).toBe(2000);
	});

	it('places hours on the published laborers’ schedule 75/85/90/95 %', () => {
		// REFERENCES.md: 0–1,000 h 75 %, 1,001–2,000 h 85 %, 2,001–3,000 h 90 %, 3,001–4,000 h 95 %
		const schedule = [
			{ fromHours: 0, percent: 75 },
			{ fromHours: 1000, percent: 85 },
			{ fromHours: 2000, percent: 90 },
			{ fromHours: 3000, percent: 95 }
		];
		expect(wageStep(schedule, 1000, 999, 0, 0, 'x').percent).toBe(75);
		expect(wageStep(schedule, 1000, 1500, 0, 0, 'x').percent).toBe(85);
		expect(wageStep(schedule, 1000, 2500, 0, 0, 'x').percent).toBe(90);
		expect(wageStep(schedule, 1000, 3999, 0, 0, 'x').percent).toBe(95);
	});

	it('holds a step until its task count is reached too, and never skips one', () => {
		const schedule = [
			{ fromHours: 0, percent: 55 },
			{ fromHours: 2000, percent: 65, minTasks: 20 },
			{ fromHours: 4000, percent: 75 }
		];
		const w = wageStep(schedule, 3400, 4500, 12, 0, '2026-12-02');
		expect(w.percent).toBe(55);
		expect(w.next).toMatchObject({
			percent: 65,
			hoursToGo: 0,
			tasksToGo: 8,
			dueDate: '2026-12-02'
		});
	});
});

describe('ratio', () => {
	it('counts a fixed 2:1 ratio', () => {
		const fixed = { kind: 'fixed', apprentices: 2, journeyworkers: 1 } as const;
		expect(allowedApprentices(fixed, 3)).toBe(6);
		expect(allowedApprentices(fixed, 0)).toBe(0);
	});
	it('reproduces the Kentucky rule: 1 + ⌊(J − 1) / 3⌋, with J = 7 → 3', () => {
		// Kentucky prevailing-wage rule (REFERENCES.md)
		const rule = { kind: 'first-then-every', every: 3 } as const;
		expect(allowedApprentices(rule, 7)).toBe(3);
		expect(allowedApprentices(rule, 1)).toBe(1);
		expect(allowedApprentices(rule, 4)).toBe(2);
	});
});

describe('tier coverage and completion', () => {
	it('rounds the required task count up, so 95 % of 104 tasks needs 99', () => {
		const tiers = coverage(
			{ 1: { total: 104, met: 98 }, 2: { total: 55, met: 44 }, 3: { total: 31, met: 16 } },
			[95, 80, 50]
		);
		expect(tiers[0]).toMatchObject({ ok: false, needed: 1 });
		expect(tiers[1]).toMatchObject({ ok: true, needed: 0 }); // 80 % of 55 = 44
		expect(tiers[2]).toMatchObject({ ok: true, needed: 0 }); // 50 % of 31 = 15.5 → 16
	});

	it('needs hours and coverage in a hybrid programme, hours only in a time-based one', () => {
		const tiers = coverage(
			{ 1: { total: 10, met: 5 }, 2: { total: 10, met: 10 }, 3: { total: 10, met: 10 } },
			[95, 80, 50]
		);
		const hybrid = completion(rules, 8000, 576, tiers);
		expect(hybrid.qualifies).toBe(false);
		expect(hybrid.missing).toEqual([expect.stringContaining('5 more priority 1 tasks')]);
		const time = completion({ ...rules, approach: 'time' }, 8000, 576, tiers);
		expect(time).toMatchObject({ qualifies: true, missing: [], percent: 100 });
		const short = completion({ ...rules, approach: 'time' }, 7999.5, 500, tiers);
		expect(short.missing).toHaveLength(2);
	});
});

describe('efficiency', () => {
	it('is standard time over actual time, per the dealer formula (REFERENCES.md)', () => {
		const e = efficiency([22, 15], [20, 10]);
		expect(e.percent).toBe(123.3); // 37 / 30
		expect(e.change).toBe(40); // 150 % − 110 %
		expect(efficiency([0, 5], [0, 5])).toEqual({ percent: 100, change: null });
	});
});

describe('at-risk flags', () => {
	const base = {
		startDate: '2025-01-06',
		plannedEndDate: '2029-01-05',
		lastVerifiedDate: '2026-11-30',
		returnedOpen: 0,
		siteBreachDays: 0
	};
	const onTrack = { method: 'x', hoursPerWeek: 40, completionDate: '2028-12-01' };
	it('flags a forecast past the planned end, a stall, returned entries and ratio breaches', () => {
		expect(risk(rules, base, onTrack, false, '2026-12-02').atRisk).toBe(false);
		const late = risk(
			rules,
			base,
			{ ...onTrack, completionDate: '2029-06-01' },
			false,
			'2026-12-02'
		);
		expect(late.reasons[0]).toMatch(/after the planned end/);
		const stalled = risk(
			rules,
			{ ...base, lastVerifiedDate: '2026-10-01' },
			onTrack,
			false,
			'2026-12-02'
		);
		expect(stalled.reasons).toEqual(['No verified hours for 8 weeks.']);
		const piling = risk(
			rules,
			{ ...base, returnedOpen: 5, siteBreachDays: 2 },
			onTrack,
			false,
			'2026-12-02'
		);
		expect(piling.reasons).toHaveLength(2);
	});
});

describe('progress', () => {
	it('puts the pieces together for one apprentice', () => {
		const facts: ApprenticeFacts = {
			startDate: '2025-06-02',
			plannedEndDate: '2029-06-01',
			priorCreditHours: 150,
			verifiedTenths: 20000,
			pendingTenths: 75,
			returnedOpen: 1,
			lastVerifiedDate: '2026-11-27',
			rtiTenthsByYear: [1440, 600],
			tiers: { 1: { total: 10, met: 4 }, 2: { total: 10, met: 2 }, 3: { total: 5, met: 0 } },
			window: windowSums(new Array(26).fill(380)),
			standard: [0, 0],
			actual: [0, 0],
			siteBreachDays: 0
		};
		const p = progress(rules, facts, '2026-12-02');
		expect(p.hours).toMatchObject({ verified: 2000, pending: 7.5, credit: 150, counted: 2150 });
		expect(p.probation.inProbation).toBe(false);
		expect(p.rti.byYear.map((y) => y.hours)).toEqual([144, 60, 0, 0]);
		expect(p.tasksMet).toBe(6);
		expect(p.wage.percent).toBe(65);
		expect(p.forecast.hoursPerWeek).toBe(38);
		expect(p.efficiency.percent).toBeNull();
		expect(p.completion.qualifies).toBe(false);
	});
});
