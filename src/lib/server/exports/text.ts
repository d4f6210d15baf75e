/** Words shared by the CSV and PDF records, so both say the same thing. */
import { hours } from '$lib/framework/labels';
import type { Progress } from '../progress';

export { hours, LEVELS } from '$lib/framework/labels';

type NextStep = NonNullable<Progress['wage']['next']>;

const APPROACH: Record<string, string> = {
	time: 'Time-based',
	competency: 'Competency-based',
	hybrid: 'Hybrid (hours and competencies)'
};

export const approachLabel = (approach: string) => APPROACH[approach] ?? approach;

export const completionWord = (qualifies: boolean) => (qualifies ? 'complete' : 'in progress');

export const money = (cents: number) =>
	`$${(cents / 100).toLocaleString('en-US', { minimumFractionDigits: 2, maximumFractionDigits: 2 })}`;

/** "from 2,000 h: 150.5 h to go; 3 more tasks at the required level" */
export function wageNote(next: NextStep): string {
	const parts = [`from ${hours(next.atHours)}: ${hours(next.hoursToGo)} to go`];
	if (next.tasksToGo > 0) {
		parts.push(
			`${next.tasksToGo} more task${next.tasksToGo === 1 ? '' : 's'} at the required level`
		);
	}
	if (!next.dueDate) parts.push('no due date while verified hours are not rising');
	return parts.join('; ');
}

export const STATUS_WORDS: Record<string, string> = {
	standing: 'Stands',
	superseded: 'Superseded',
	revoked: 'Revoked',
	corrected: 'Corrected',
	revocation: 'Revocation'
};

export const AGENCY_NOTE =
	"The local registration agency's rules govern this apprenticeship; this record reports what Journeymark holds on the date shown.";
