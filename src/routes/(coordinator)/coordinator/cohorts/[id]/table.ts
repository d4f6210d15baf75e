import type { ProgressSummary } from '$lib/server/progress';

export type SortKey =
	'name' | 'site' | 'hours' | 'tasks' | 'completion' | 'wage' | 'forecast' | 'status';

export const columns: { key: SortKey; label: string; numeric?: boolean }[] = [
	{ key: 'name', label: 'Apprentice' },
	{ key: 'site', label: 'Shop' },
	{ key: 'hours', label: 'Hours', numeric: true },
	{ key: 'tasks', label: 'Tasks met', numeric: true },
	{ key: 'completion', label: 'Completion', numeric: true },
	{ key: 'wage', label: 'Wage step', numeric: true },
	{ key: 'forecast', label: 'Forecast finish' },
	{ key: 'status', label: 'Status' }
];

const value: Record<SortKey, (a: ProgressSummary) => string | number> = {
	name: (a) => a.name,
	site: (a) => a.siteName ?? '',
	hours: (a) => a.countedHours,
	tasks: (a) => a.tasksMet,
	completion: (a) => a.completionPercent,
	wage: (a) => a.wagePercent,
	// No trend sorts last: it is the furthest-off finish.
	forecast: (a) => a.forecastDate ?? '9999',
	status: (a) => (a.atRisk ? 0 : a.qualifies ? 2 : 1)
};

export function sortRows(rows: ProgressSummary[], key: SortKey, ascending: boolean) {
	const get = value[key];
	const sign = ascending ? 1 : -1;
	return [...rows].sort((x, y) => {
		const a = get(x);
		const b = get(y);
		const c =
			typeof a === 'number' && typeof b === 'number' ? a - b : String(a).localeCompare(String(b));
		return sign * c || x.name.localeCompare(y.name);
	});
}
