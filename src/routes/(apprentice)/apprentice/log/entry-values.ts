/**
 * The log form as flat text values keyed by field name (`tasks.0.hours`), so the same
 * functions serve the server (form posts without JavaScript) and the browser (live feedback).
 */
import { durationTenths, hoursToTenths, validateEntryRules } from '$lib/hours';
import { validateVin } from '$lib/vin';

export type EntryValues = Record<string, string>;

export interface TaskRowValues {
	taskId: string;
	hours: string;
}

export interface RecentVehicle {
	vehicleYear: number | null;
	vehicleMake: string;
	vehicleModel: string;
	vin: string | null;
	odometer: number | null;
	odometerUnit: 'mi' | 'km';
}

export const MAX_TASKS = 10;
// Without JavaScript there is no "add a row" on the spot, so a few empty rows are ready.
export const NO_SCRIPT_ROWS = 3;
export const QUICK_HOURS = ['0.5', '1', '1.5', '2', '2.5', '3', '4'];

export const taskKey = (i: number, field: keyof TaskRowValues) => `tasks.${i}.${field}`;

/** A repair order as people say it: 'RO 4417', without doubling a number that starts with RO. */
export const roLabel = (repairOrder: string) =>
	/^RO\b/i.test(repairOrder) ? repairOrder : `RO ${repairOrder}`;

/** Tenths as the hours field shows them: 25 → '2.5'. */
export const tenthsText = (tenths: number) => (tenths / 10).toFixed(1);

/** How many task rows the values hold (the highest row index plus one). */
export function rowCount(values: EntryValues): number {
	let rows = 0;
	for (const key of Object.keys(values)) {
		const match = /^tasks\.(\d+)\./.exec(key);
		if (match) rows = Math.max(rows, Number(match[1]) + 1);
	}
	return Math.min(rows, MAX_TASKS);
}

export function taskRows(values: EntryValues, rows: number): TaskRowValues[] {
	return Array.from({ length: rows }, (_, i) => ({
		taskId: values[taskKey(i, 'taskId')] ?? '',
		hours: values[taskKey(i, 'hours')] ?? ''
	}));
}

/** The values with their task rows replaced by `list`. */
export function withTaskRows(values: EntryValues, list: TaskRowValues[]): EntryValues {
	const next = Object.fromEntries(Object.entries(values).filter(([k]) => !k.startsWith('tasks.')));
	list.slice(0, MAX_TASKS).forEach((row, i) => {
		next[taskKey(i, 'taskId')] = row.taskId;
		next[taskKey(i, 'hours')] = row.hours;
	});
	return next;
}

/** Drops rows with neither a task nor hours; at least one (empty) row remains. */
export function compactRows(values: EntryValues, rows: number) {
	const kept = taskRows(values, rows).filter((r) => r.taskId.trim() || r.hours.trim());
	const list = kept.length ? kept : [{ taskId: '', hours: '' }];
	return { values: withTaskRows(values, list), rows: list.length };
}

/** Hours as typed to tenths: null when blank, NaN when not a number. */
function typedTenths(text: string | undefined): number | null {
	if (!text?.trim()) return null;
	const hours = Number(text.trim());
	return Number.isFinite(hours) ? hoursToTenths(hours) : NaN;
}

/** The entry's time on the job in tenths: from the clock times when given, else the hours. */
export function totalTenths(values: EntryValues): number | null {
	if (values.startTime || values.endTime) {
		const duration = durationTenths(values.startTime ?? '', values.endTime ?? '');
		return duration.ok ? duration.tenths : null;
	}
	const tenths = typedTenths(values.hours);
	return tenths !== null && Number.isInteger(tenths) && tenths > 0 ? tenths : null;
}

/** With exactly one task chosen, its hours are the entry's hours: the field and value to set. */
export function singleTaskHours(values: EntryValues, rows: number) {
	const chosen = taskRows(values, rows)
		.map((r, i) => ({ ...r, i }))
		.filter((r) => r.taskId.trim());
	const total = totalTenths(values);
	if (chosen.length !== 1 || total === null) return null;
	return { key: taskKey(chosen[0].i, 'hours'), value: tenthsText(total) };
}

/** Applies one tap on a shortcut (quick hours, recent vehicle, task chip, add or remove a row). */
export function applyFill(
	values: EntryValues,
	rows: number,
	fill: string,
	vehicles: RecentVehicle[]
): { values: EntryValues; rows: number } {
	const [kind, arg = ''] = fill.split(':');
	let next = { ...values };
	let list = taskRows(values, rows);
	if (kind === 'hours' && QUICK_HOURS.includes(arg)) {
		// A quick duration replaces clock times, which would otherwise disagree with it.
		next = { ...next, hours: arg, startTime: '', endTime: '' };
	} else if (kind === 'vehicle' && vehicles[Number(arg)]) {
		const v = vehicles[Number(arg)];
		next = {
			...next,
			vehicleYear: v.vehicleYear ? String(v.vehicleYear) : '',
			vehicleMake: v.vehicleMake,
			vehicleModel: v.vehicleModel,
			vin: v.vin ?? '',
			vinOverride: '',
			odometer: v.odometer !== null ? String(v.odometer) : '',
			odometerUnit: v.odometerUnit
		};
	} else if (kind === 'task' && /^\d+$/.test(arg) && !list.some((r) => r.taskId === arg)) {
		const free = list.findIndex((r) => !r.taskId.trim());
		if (free >= 0) list[free] = { ...list[free], taskId: arg };
		else list.push({ taskId: arg, hours: '' });
	} else if (kind === 'row') {
		list.push({ taskId: '', hours: '' });
	} else if (kind === 'remove' && list[Number(arg)]) {
		list = list.filter((_, i) => i !== Number(arg));
		if (list.length === 0) list.push({ taskId: '', hours: '' });
	}
	list = list.slice(0, MAX_TASKS);
	next = withTaskRows(next, list);
	const single = singleTaskHours(next, list.length);
	if (single) next[single.key] = single.value;
	return { values: next, rows: list.length };
}

/** The problems the browser can see without the server; same rules, same words. */
export function liveProblems(values: EntryValues, rows: number, today: string) {
	const chosen = taskRows(values, rows).filter((r) => r.taskId.trim());
	const problems: Record<string, string> = {
		...validateEntryRules(
			{
				workDate: values.workDate ?? '',
				startTime: values.startTime || null,
				endTime: values.endTime || null,
				tenths: typedTenths(values.hours),
				tasks: chosen.map((r) => ({ taskId: Number(r.taskId), tenths: typedTenths(r.hours) ?? 0 }))
			},
			{ today, sameDay: [] }
		)
	};
	const vin = values.vin?.trim() ? validateVin(values.vin) : null;
	if (vin && !vin.ok && !(vin.problem === 'check-digit' && values.vinOverride === 'on')) {
		problems.vin = vin.message;
	}
	return problems;
}

/** What the task split adds up to against the entry's hours, for the live line under the tasks. */
export function splitSummary(values: EntryValues, rows: number) {
	const chosen = taskRows(values, rows).filter((r) => r.taskId.trim());
	const total = totalTenths(values);
	if (chosen.length === 0 || total === null) return null;
	const parts = chosen.map((r) => typedTenths(r.hours) ?? 0);
	const sum = parts.reduce((a, b) => a + (Number.isInteger(b) ? b : 0), 0);
	return { sum, total, ok: sum === total && parts.every((p) => Number.isInteger(p) && p > 0) };
}

/** A stored entry as form values, for editing it or logging a correction of it. */
export function entryToValues(entry: {
	workDate: string;
	startTime: string | null;
	endTime: string | null;
	tenths: number;
	repairOrder: string;
	vehicleYear: number | null;
	vehicleMake: string;
	vehicleModel: string;
	vin: string | null;
	vinCheckOverridden: boolean;
	odometer: number | null;
	odometerUnit: 'mi' | 'km';
	standardTenths: number | null;
	supervisorId: string;
	notes: string;
	tasks: { taskId: number; tenths: number }[];
}): EntryValues {
	const values: EntryValues = {
		workDate: entry.workDate,
		startTime: entry.startTime ?? '',
		endTime: entry.endTime ?? '',
		hours: tenthsText(entry.tenths),
		repairOrder: entry.repairOrder,
		vehicleYear: entry.vehicleYear ? String(entry.vehicleYear) : '',
		vehicleMake: entry.vehicleMake,
		vehicleModel: entry.vehicleModel,
		vin: entry.vin ?? '',
		vinOverride: entry.vinCheckOverridden ? 'on' : '',
		odometer: entry.odometer !== null ? String(entry.odometer) : '',
		odometerUnit: entry.odometerUnit,
		standardHours: entry.standardTenths ? tenthsText(entry.standardTenths) : '',
		supervisorId: entry.supervisorId,
		notes: entry.notes
	};
	return withTaskRows(
		values,
		entry.tasks.map((t) => ({ taskId: String(t.taskId), hours: tenthsText(t.tenths) }))
	);
}
