import { describe, expect, it } from 'vitest';
import {
	dailyTotalProblem,
	dateProblem,
	DEFAULT_DAILY_LIMIT_HOURS,
	durationTenths,
	findOverlap,
	formatDay,
	formatTenths,
	hoursToTenths,
	overlaps,
	parseClock,
	roundToTenths,
	splitProblems,
	validateEntryRules,
	type EntryRulesContext,
	type EntryRulesInput,
	type ExistingEntry
} from '../../src/lib/hours';

const existing = (overrides: Partial<ExistingEntry> = {}): ExistingEntry => ({
	id: 1,
	repairOrder: '48213',
	date: '2025-03-03',
	startTime: '07:30',
	endTime: '10:00',
	tenths: 25,
	...overrides
});

const entry = (overrides: Partial<EntryRulesInput> = {}): EntryRulesInput => ({
	workDate: '2025-03-03',
	startTime: '10:00',
	endTime: '12:30',
	tasks: [{ taskId: 7, tenths: 25 }],
	...overrides
});

const context = (overrides: Partial<EntryRulesContext> = {}): EntryRulesContext => ({
	today: '2025-03-04',
	sameDay: [existing()],
	...overrides
});

describe('rounding to tenths', () => {
	it('rounds half up to 0.1 h', () => {
		// common practice, no published source: 0.1 h steps, halves round up
		expect(roundToTenths(2.25)).toBe(2.3);
		expect(roundToTenths(2.24)).toBe(2.2);
		expect(roundToTenths(2.35)).toBe(2.4);
		expect(roundToTenths(0.05)).toBe(0.1);
		expect(roundToTenths(0.04)).toBe(0);
		expect(roundToTenths(7)).toBe(7);
	});

	it('is not fooled by binary floating point', () => {
		// IEEE 754 doubles: 0.01 + 2.34 is 2.3499999999999996; the half must still round up
		expect((0.01 + 2.34) * 10).toBeLessThan(23.5);
		expect(roundToTenths(0.01 + 2.34)).toBe(2.4);
		expect(roundToTenths(0.01 + 4.14)).toBe(4.2);
		expect(hoursToTenths(0.1 + 0.2)).toBe(3);
	});

	it('stores integer tenths and prints them with one decimal', () => {
		expect(hoursToTenths(2.5)).toBe(25);
		expect(hoursToTenths(16)).toBe(160);
		expect(formatTenths(25)).toBe('2.5 h');
		expect(formatTenths(160)).toBe('16.0 h');
		expect(() => hoursToTenths(Number.NaN)).toThrow(RangeError);
	});
});

describe('durationTenths', () => {
	it('measures clock time on one day', () => {
		expect(durationTenths('07:30', '10:00')).toEqual({ ok: true, tenths: 25 });
		expect(durationTenths('00:00', '23:59')).toEqual({ ok: true, tenths: 240 });
	});

	it('rounds minutes to six-minute tenths, half up', () => {
		// common practice, no published source: 9 min = 0.15 h → 0.2 h, 8 min = 0.13 h → 0.1 h
		expect(durationTenths('08:00', '08:09')).toEqual({ ok: true, tenths: 2 });
		expect(durationTenths('08:00', '08:08')).toEqual({ ok: true, tenths: 1 });
		expect(durationTenths('08:00', '08:03')).toEqual({ ok: true, tenths: 1 });
		expect(durationTenths('08:00', '08:02')).toEqual({
			ok: false,
			message: 'That is under 3 minutes, which rounds to 0.0 h.'
		});
	});

	it('refuses overnight and empty spans', () => {
		expect(durationTenths('22:00', '01:00')).toEqual({
			ok: false,
			message:
				'The end time is before the start time. For work past midnight, log one entry for each day.'
		});
		expect(durationTenths('09:00', '09:00')).toEqual({
			ok: false,
			message: 'The end time is the same as the start time.'
		});
	});

	it('accepts only 24-hour HH:MM', () => {
		expect(parseClock('07:30')).toBe(450);
		expect(parseClock('23:59')).toBe(1439);
		for (const bad of ['7:30', '24:00', '12:60', '0730', '']) expect(parseClock(bad)).toBeNull();
		expect(durationTenths('7:30', '10:00')).toEqual({
			ok: false,
			message: 'Use a 24-hour time like 07:30.'
		});
	});
});

describe('splitProblems', () => {
	it('accepts task hours that add up exactly', () => {
		expect(
			splitProblems(25, [
				{ taskId: 1, tenths: 15 },
				{ taskId: 2, tenths: 10 }
			])
		).toBeNull();
	});

	it('says both totals when they differ', () => {
		expect(
			splitProblems(25, [
				{ taskId: 1, tenths: 10 },
				{ taskId: 2, tenths: 10 }
			])
		).toBe('The task hours add up to 2.0 h but the entry is 2.5 h.');
	});

	it('refuses zero, negative and fractional tenths', () => {
		expect(splitProblems(10, [{ taskId: 1, tenths: 0 }])).toBe(
			'Give each task at least 0.1 h, or remove it.'
		);
		expect(
			splitProblems(10, [
				{ taskId: 1, tenths: 15, label: 'BR-04' },
				{ taskId: 2, tenths: -5, label: 'BR-05' }
			])
		).toBe('Give BR-05 at least 0.1 h, or remove it.');
		expect(splitProblems(10, [{ taskId: 1, tenths: 9.5 }])).toBe(
			'Give task time in tenths of an hour, like 1.5 h.'
		);
	});

	it('refuses the same task twice and an empty list', () => {
		expect(
			splitProblems(20, [
				{ taskId: 3, tenths: 10, label: 'SS-02' },
				{ taskId: 3, tenths: 10, label: 'SS-02' }
			])
		).toBe('SS-02 is listed twice; put all its time on one line.');
		expect(splitProblems(20, [])).toBe('Add at least one task you practised.');
	});
});

describe('overlaps and findOverlap', () => {
	const a = { date: '2025-03-03', startTime: '07:30', endTime: '10:00' };

	it('finds shared minutes on the same date', () => {
		expect(overlaps(a, { date: '2025-03-03', startTime: '09:45', endTime: '11:00' })).toBe(true);
		expect(overlaps(a, { date: '2025-03-03', startTime: '08:00', endTime: '09:00' })).toBe(true);
		expect(overlaps({ date: '2025-03-03', startTime: '06:00', endTime: '12:00' }, a)).toBe(true);
	});

	it('lets one job end when the next starts', () => {
		expect(overlaps(a, { date: '2025-03-03', startTime: '10:00', endTime: '11:00' })).toBe(false);
		expect(overlaps(a, { date: '2025-03-03', startTime: '06:00', endTime: '07:30' })).toBe(false);
	});

	it('ignores other dates and entries without times', () => {
		expect(overlaps(a, { ...a, date: '2025-03-04' })).toBe(false);
		expect(overlaps(a, { date: '2025-03-03', startTime: null, endTime: null })).toBe(false);
	});

	it('skips the entry being edited and returns the clash', () => {
		const list = [existing(), existing({ id: 2, repairOrder: '48250', startTime: '13:00' })];
		expect(findOverlap({ id: 1, ...a }, list)).toBeNull();
		expect(findOverlap({ ...a, startTime: '09:00' }, list)?.repairOrder).toBe('48213');
		expect(findOverlap({ ...a, startTime: '10:00', endTime: '12:00' }, list)).toBeNull();
	});
});

describe('dailyTotalProblem', () => {
	it('allows up to the limit and refuses beyond it', () => {
		// common practice, no published source: 16 h a day default limit
		expect(DEFAULT_DAILY_LIMIT_HOURS).toBe(16);
		expect(dailyTotalProblem(150, 10)).toBeNull();
		expect(dailyTotalProblem(160, 15, 16, '2025-03-03')).toBe(
			'That would make 17.5 h on 3 March; the limit is 16 h a day.'
		);
		expect(dailyTotalProblem(160, 1)).toBe(
			'That would make 16.1 h on that day; the limit is 16 h a day.'
		);
	});

	it('uses the programme limit when given', () => {
		expect(dailyTotalProblem(100, 20, 12)).toBeNull();
		expect(dailyTotalProblem(100, 21, 12, '2025-11-30')).toBe(
			'That would make 12.1 h on 30 November; the limit is 12 h a day.'
		);
	});
});

describe('dateProblem', () => {
	it('accepts today and earlier', () => {
		expect(dateProblem('2025-03-04', '2025-03-04')).toBeNull();
		expect(dateProblem('2025-03-03', '2025-03-04')).toBeNull();
	});

	it('refuses the future', () => {
		expect(dateProblem('2025-03-05', '2025-03-04')).toBe('Entries cannot be dated in the future.');
		expect(dateProblem('2026-01-01', '2025-12-31')).toBe('Entries cannot be dated in the future.');
	});

	it('refuses dates before the earliest allowed', () => {
		const earliest = { date: '2024-09-02', label: 'your programme start' };
		expect(dateProblem('2024-09-01', '2025-03-04', earliest)).toBe(
			'Entries cannot be dated before your programme start (2 September 2024).'
		);
		expect(dateProblem('2024-09-02', '2025-03-04', earliest)).toBeNull();
	});

	it('refuses dates that are not real', () => {
		// Gregorian calendar: 2024 is a leap year, 2025 is not
		expect(dateProblem('2024-02-29', '2025-03-04')).toBeNull();
		expect(dateProblem('2025-02-29', '2025-03-04')).toBe('2025-02-29 is not a real date.');
		expect(dateProblem('2025-04-31', '2025-05-04')).toBe('2025-04-31 is not a real date.');
		expect(dateProblem('2025-3-3', '2025-03-04')).toBe('Enter the date as YYYY-MM-DD.');
		expect(dateProblem('', '2025-03-04')).toBe('Enter the date as YYYY-MM-DD.');
	});

	it('formats days for messages', () => {
		expect(formatDay('2025-03-03')).toBe('3 March');
		expect(formatDay('2024-12-25', true)).toBe('25 December 2024');
	});
});

describe('validateEntryRules', () => {
	it('accepts an entry that follows every rule', () => {
		expect(validateEntryRules(entry(), context())).toEqual({});
		expect(
			validateEntryRules(
				entry({ startTime: null, endTime: null, tenths: 15, tasks: [{ taskId: 1, tenths: 15 }] }),
				context()
			)
		).toEqual({});
	});

	it('names the entry it overlaps', () => {
		expect(validateEntryRules(entry({ startTime: '09:30' }), context())).toEqual({
			startTime: 'These times overlap your entry for RO 48213 (07:30–10:00).',
			tasks: 'The task hours add up to 2.5 h but the entry is 3.0 h.'
		});
	});

	it('does not compare an edited entry with its own saved copy', () => {
		const edited = entry({ id: 1, startTime: '07:30', endTime: '10:00' });
		expect(validateEntryRules(edited, context())).toEqual({});
	});

	it('checks the task split against the clock time', () => {
		const errors = validateEntryRules(
			entry({
				tasks: [
					{ taskId: 1, tenths: 10 },
					{ taskId: 2, tenths: 10 }
				]
			}),
			context()
		);
		expect(errors).toEqual({ tasks: 'The task hours add up to 2.0 h but the entry is 2.5 h.' });
	});

	it('refuses a day over the limit, on the field the apprentice filled', () => {
		const busyDay = context({
			sameDay: [existing({ startTime: null, endTime: null, tenths: 150 })]
		});
		expect(validateEntryRules(entry(), busyDay)).toEqual({
			endTime: 'That would make 17.5 h on 3 March; the limit is 16 h a day.'
		});
		expect(
			validateEntryRules(
				entry({ startTime: null, endTime: null, tenths: 25 }),
				context({ ...busyDay, dailyLimitHours: 12 })
			)
		).toEqual({ hours: 'That would make 17.5 h on 3 March; the limit is 12 h a day.' });
	});

	it('counts only entries on the same date', () => {
		const otherDay = existing({ date: '2025-03-02', startTime: null, endTime: null, tenths: 150 });
		expect(validateEntryRules(entry(), context({ sameDay: [otherDay] }))).toEqual({});
	});

	it('refuses future dates and skips the day checks for them', () => {
		expect(validateEntryRules(entry({ workDate: '2025-03-05' }), context())).toEqual({
			workDate: 'Entries cannot be dated in the future.'
		});
	});

	it('needs both times or the hours', () => {
		expect(validateEntryRules(entry({ endTime: null }), context())).toEqual({
			endTime: 'Enter the end time too, or clear the start time and enter the hours.'
		});
		expect(validateEntryRules(entry({ startTime: '' }), context())).toEqual({
			startTime: 'Enter the start time too, or clear the end time and enter the hours.'
		});
		expect(validateEntryRules(entry({ startTime: null, endTime: null }), context())).toEqual({
			hours: 'Enter the start and end times, or the hours.'
		});
	});

	it('refuses hours that disagree with the clock', () => {
		expect(validateEntryRules(entry({ tenths: 30 }), context())).toEqual({
			hours: '10:00–12:30 is 2.5 h but the hours say 3.0 h; clear one of them.'
		});
	});

	it('refuses overnight times and impossible durations', () => {
		expect(validateEntryRules(entry({ startTime: '23:00', endTime: '02:00' }), context())).toEqual({
			endTime:
				'The end time is before the start time. For work past midnight, log one entry for each day.'
		});
		expect(
			validateEntryRules(entry({ startTime: '7:00' }), context({ sameDay: [] })).startTime
		).toBe('Use a 24-hour time like 07:30.');
		expect(
			validateEntryRules(entry({ startTime: null, endTime: null, tenths: 0 }), context()).hours
		).toBe('Time on the job must be at least 0.1 h.');
		expect(
			validateEntryRules(entry({ startTime: null, endTime: null, tenths: 241 }), context()).hours
		).toBe('One entry cannot be more than 24 h.');
	});

	it('still checks the task list when the total is unknown', () => {
		expect(validateEntryRules(entry({ endTime: null, tasks: [] }), context()).tasks).toBe(
			'Add at least one task you practised.'
		);
	});
});
