import {
	DEFAULT_DAILY_LIMIT_HOURS,
	durationTenths,
	hoursToTenths,
	validateEntryRules,
	type ExistingEntry
} from '$lib/hours';
import type { EntryInput } from '$lib/schemas/worklog';
import { validateVin } from '$lib/vin';

export interface RuleContext {
	today: string;
	/** The apprentice's start date; nothing is logged before it. */
	earliest: string;
	sameDay: Omit<ExistingEntry, 'date'>[];
	dailyLimitHours?: number;
}

/** The log rules and the VIN check for one entry: field errors, total tenths and the task split. */
export function ruleErrors(input: EntryInput, context: RuleContext) {
	const splits = input.tasks.map((t) => ({ taskId: t.taskId, tenths: hoursToTenths(t.hours) }));
	const timed = Boolean(input.startTime || input.endTime);
	const errors: Record<string, string> = {
		...validateEntryRules(
			{
				workDate: input.workDate,
				startTime: input.startTime ?? null,
				endTime: input.endTime ?? null,
				// With clock times the duration comes from them; a typed total is only checked against it.
				tenths: input.hours !== undefined ? hoursToTenths(input.hours) : null,
				tasks: splits
			},
			{
				today: context.today,
				earliest: { date: context.earliest, label: 'your apprenticeship start' },
				sameDay: context.sameDay.map((e) => ({ ...e, date: input.workDate })),
				dailyLimitHours: context.dailyLimitHours ?? DEFAULT_DAILY_LIMIT_HOURS
			}
		)
	};
	if (input.vin) {
		const vin = validateVin(input.vin);
		if (!vin.ok && (vin.problem !== 'check-digit' || !input.vinOverride)) errors.vin = vin.message;
	}
	const duration = timed ? durationTenths(input.startTime ?? '', input.endTime ?? '') : null;
	const tenths = duration ? (duration.ok ? duration.tenths : 0) : hoursToTenths(input.hours ?? 0);
	return { errors, tenths, splits };
}
