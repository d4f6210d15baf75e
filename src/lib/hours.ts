/**
 * Work-log rules as pure functions, shared by the entry form and the server.
 * Hours are integer tenths of an hour so sums are exact.
 */

// common practice, no published source
export const DEFAULT_DAILY_LIMIT_HOURS = 16;

const MONTHS = [
	'January',
	'February',
	'March',
	'April',
	'May',
	'June',
	'July',
	'August',
	'September',
	'October',
	'November',
	'December'
];

/** Hours to integer tenths, rounding half up (2.25 → 23). */
export function hoursToTenths(hours: number): number {
	if (!Number.isFinite(hours)) throw new RangeError(`Not a number of hours: ${hours}`);
	// toPrecision drops binary noise (0.01 + 2.34 is 2.3499999999999996) so halves round up.
	return Math.round(Number((hours * 10).toPrecision(12)));
}

/**
 * Hours to the nearest 0.1 h, half up: 2.25 → 2.3.
 * Rounding to 0.1 h (six minutes), half up, is common practice, no published source.
 */
export function roundToTenths(hours: number): number {
	return hoursToTenths(hours) / 10;
}

/** Tenths as people read them: 25 → '2.5 h', 160 → '16.0 h'. */
export function formatTenths(tenths: number): string {
	return `${(tenths / 10).toFixed(1)} h`;
}

/** Minutes since midnight for a 24-hour 'HH:MM', or null when it is not one. */
export function parseClock(hhmm: string): number | null {
	const match = /^([01]\d|2[0-3]):([0-5]\d)$/.exec(hhmm);
	return match ? Number(match[1]) * 60 + Number(match[2]) : null;
}

export type DurationResult = { ok: true; tenths: number } | { ok: false; message: string };

/** Time between two clock times on the same day, in tenths (minutes rounded half up). */
export function durationTenths(start: string, end: string): DurationResult {
	const from = parseClock(start);
	const to = parseClock(end);
	if (from === null || to === null) {
		return { ok: false, message: 'Use a 24-hour time like 07:30.' };
	}
	if (to === from) {
		return { ok: false, message: 'The end time is the same as the start time.' };
	}
	if (to < from) {
		return {
			ok: false,
			message:
				'The end time is before the start time. For work past midnight, log one entry for each day.'
		};
	}
	// Whole minutes, so (minutes + 3) / 6 floored is exact half-up rounding to 6-minute steps.
	const tenths = Math.floor((to - from + 3) / 6);
	if (tenths === 0) {
		return { ok: false, message: 'That is under 3 minutes, which rounds to 0.0 h.' };
	}
	return { ok: true, tenths };
}

export interface TaskSplit {
	taskId: number;
	tenths: number;
	/** Task code or title, for messages. */
	label?: string;
}

function splitShapeProblem(splits: readonly TaskSplit[]): string | null {
	if (splits.length === 0) return 'Add at least one task you practised.';
	for (const split of splits) {
		if (!Number.isInteger(split.tenths)) {
			return 'Give task time in tenths of an hour, like 1.5 h.';
		}
		if (split.tenths <= 0) {
			return split.label
				? `Give ${split.label} at least 0.1 h, or remove it.`
				: 'Give each task at least 0.1 h, or remove it.';
		}
	}
	const seen = new Set<number>();
	for (const split of splits) {
		if (seen.has(split.taskId)) {
			return `${split.label ?? 'A task'} is listed twice; put all its time on one line.`;
		}
		seen.add(split.taskId);
	}
	return null;
}

/** Why the task hours cannot be split this way, or null when they add up exactly. */
export function splitProblems(totalTenths: number, splits: readonly TaskSplit[]): string | null {
	const shape = splitShapeProblem(splits);
	if (shape) return shape;
	const sum = splits.reduce((total, split) => total + split.tenths, 0);
	if (sum !== totalTenths) {
		return `The task hours add up to ${formatTenths(sum)} but the entry is ${formatTenths(totalTenths)}.`;
	}
	return null;
}

export interface TimedEntry {
	/** ISO date, YYYY-MM-DD. */
	date: string;
	startTime?: string | null;
	endTime?: string | null;
}

export interface ExistingEntry extends TimedEntry {
	id: number;
	repairOrder: string;
	tenths: number;
}

function interval(entry: TimedEntry): [number, number] | null {
	if (!entry.startTime || !entry.endTime) return null;
	const from = parseClock(entry.startTime);
	const to = parseClock(entry.endTime);
	return from === null || to === null || to <= from ? null : [from, to];
}

/** Whether two entries on the same date share any minute; entries without times never overlap. */
export function overlaps(a: TimedEntry, b: TimedEntry): boolean {
	if (a.date !== b.date) return false;
	const first = interval(a);
	const second = interval(b);
	// Half-open intervals: a job ending at 10:00 and the next starting at 10:00 do not overlap.
	return first !== null && second !== null && first[0] < second[1] && second[0] < first[1];
}

/** The first existing entry the new one overlaps, skipping the entry being edited. */
export function findOverlap(
	entry: TimedEntry & { id?: number },
	existing: readonly ExistingEntry[]
): ExistingEntry | null {
	return existing.find((other) => other.id !== entry.id && overlaps(entry, other)) ?? null;
}

/** A date as people say it: '3 March', or '3 March 2025' with the year. */
export function formatDay(isoDate: string, withYear = false): string {
	const [year, month, day] = isoDate.split('-').map(Number);
	const text = `${day} ${MONTHS[month - 1]}`;
	return withYear ? `${text} ${year}` : text;
}

/** Why adding this entry would break the daily limit, or null when it fits. */
export function dailyTotalProblem(
	existingTenthsOnDay: number,
	newTenths: number,
	limitHours = DEFAULT_DAILY_LIMIT_HOURS,
	isoDate?: string
): string | null {
	const total = existingTenthsOnDay + newTenths;
	if (total <= hoursToTenths(limitHours)) return null;
	const day = isoDate && isRealDate(isoDate) ? formatDay(isoDate) : 'that day';
	return `That would make ${formatTenths(total)} on ${day}; the limit is ${limitHours} h a day.`;
}

function isRealDate(isoDate: string): boolean {
	if (!/^\d{4}-\d{2}-\d{2}$/.test(isoDate)) return false;
	const [year, month, day] = isoDate.split('-').map(Number);
	const date = new Date(Date.UTC(year, month - 1, day));
	// Date.UTC rolls 30 February over into March, so a real date survives the round trip.
	return (
		date.getUTCFullYear() === year && date.getUTCMonth() === month - 1 && date.getUTCDate() === day
	);
}

export interface EarliestDate {
	/** ISO date, YYYY-MM-DD. */
	date: string;
	/** What the date is, for the message: 'your programme start'. */
	label: string;
}

/** Why an entry cannot carry this date, or null. `today` is the site's local date, YYYY-MM-DD. */
export function dateProblem(
	isoDate: string,
	today: string,
	earliest?: EarliestDate
): string | null {
	if (!/^\d{4}-\d{2}-\d{2}$/.test(isoDate)) return 'Enter the date as YYYY-MM-DD.';
	if (!isRealDate(isoDate)) return `${isoDate} is not a real date.`;
	// ISO dates compare correctly as strings.
	if (isoDate > today) return 'Entries cannot be dated in the future.';
	if (earliest && isoDate < earliest.date) {
		return `Entries cannot be dated before ${earliest.label} (${formatDay(earliest.date, true)}).`;
	}
	return null;
}

export interface EntryRulesInput {
	/** Set when editing, so the entry is not compared with itself. */
	id?: number;
	workDate: string;
	startTime?: string | null;
	endTime?: string | null;
	/** Hours entered directly, in tenths; used when there are no clock times. */
	tenths?: number | null;
	tasks: readonly TaskSplit[];
}

export interface EntryRulesContext {
	/** The site's local date, YYYY-MM-DD. */
	today: string;
	earliest?: EarliestDate;
	/** The apprentice's other entries that count on this date (returned ones left out). */
	sameDay: readonly ExistingEntry[];
	dailyLimitHours?: number;
}

export type EntryField = 'workDate' | 'startTime' | 'endTime' | 'hours' | 'tasks';
export type EntryErrors = Partial<Record<EntryField, string>>;

// 24 h is the most one calendar day can hold.
const MAX_ENTRY_TENTHS = 240;

function clockRange(entry: TimedEntry): string {
	return `${entry.startTime}–${entry.endTime}`;
}

/** Every work-log rule for one entry; an empty object means the entry may be saved. */
export function validateEntryRules(
	input: EntryRulesInput,
	context: EntryRulesContext
): EntryErrors {
	const errors: EntryErrors = {};
	const dateError = dateProblem(input.workDate, context.today, context.earliest);
	if (dateError) errors.workDate = dateError;

	const start = input.startTime ?? '';
	const end = input.endTime ?? '';
	const timed = start !== '' || end !== '';
	let total: number | null = null;

	if (timed && end === '') {
		errors.endTime = 'Enter the end time too, or clear the start time and enter the hours.';
	} else if (timed && start === '') {
		errors.startTime = 'Enter the start time too, or clear the end time and enter the hours.';
	} else if (timed) {
		const duration = durationTenths(start, end);
		if (!duration.ok) {
			errors[parseClock(start) === null ? 'startTime' : 'endTime'] = duration.message;
		} else {
			total = duration.tenths;
			if (input.tenths != null && input.tenths !== total) {
				errors.hours = `${start}–${end} is ${formatTenths(total)} but the hours say ${formatTenths(input.tenths)}; clear one of them.`;
			}
		}
	} else if (input.tenths == null) {
		errors.hours = 'Enter the start and end times, or the hours.';
	} else if (!Number.isInteger(input.tenths) || input.tenths <= 0) {
		errors.hours = 'Time on the job must be at least 0.1 h.';
	} else if (input.tenths > MAX_ENTRY_TENTHS) {
		errors.hours = 'One entry cannot be more than 24 h.';
	} else {
		total = input.tenths;
	}

	const taskError =
		total === null ? splitShapeProblem(input.tasks) : splitProblems(total, input.tasks);
	if (taskError) errors.tasks = taskError;

	if (total === null || errors.workDate) return errors;

	const others = context.sameDay.filter(
		(other) => other.id !== input.id && other.date === input.workDate
	);
	const self = { id: input.id, date: input.workDate, startTime: start, endTime: end };
	const clash = timed ? findOverlap(self, others) : null;
	if (clash) {
		errors.startTime = `These times overlap your entry for RO ${clash.repairOrder} (${clockRange(clash)}).`;
	}
	const dayTotal = dailyTotalProblem(
		others.reduce((sum, other) => sum + other.tenths, 0),
		total,
		context.dailyLimitHours,
		input.workDate
	);
	if (dayTotal) errors[timed ? 'endTime' : 'hours'] ??= dayTotal;
	return errors;
}
