/** The rules form's choices and number fields, grouped as the screen shows them. */
export const APPROACHES = [
	{ value: 'time', label: 'Time-based', hint: 'Completes on verified on-the-job hours.' },
	{
		value: 'competency',
		label: 'Competency-based',
		hint: 'Completes on task coverage; hours still recorded.'
	},
	{ value: 'hybrid', label: 'Hybrid', hint: 'Needs both the hours and the coverage.' }
];

export const RATIO_RULES = [
	{ value: 'fixed', label: 'Fixed ratio', hint: 'So many apprentices for so many journeyworkers.' },
	{
		value: 'first-then-every',
		label: 'One, then one more per group',
		hint: 'One apprentice for the first journeyworker, one more for each further group.'
	}
];

export const COMPLETION = [
	{ name: 'termYears', label: 'Term (years)' },
	{ name: 'ojlHours', label: 'On-the-job hours' },
	{ name: 'rtiHoursPerYear', label: 'Related instruction (hours per year)' },
	{
		name: 'probationHours',
		label: 'Probation (hours)',
		hint: 'At most 25 % of the term or one year, whichever is shorter.'
	}
];

export const RATIO = [
	{ name: 'ratioApprentices', label: 'Apprentices', hint: 'Fixed ratio' },
	{ name: 'ratioJourneyworkers', label: 'per journeyworkers', hint: 'Fixed ratio' },
	{ name: 'ratioEvery', label: 'Group size', hint: 'One, then one more per group' }
];

export const COVERAGE = [
	{ name: 'tier1', label: 'Priority 1' },
	{ name: 'tier2', label: 'Priority 2' },
	{ name: 'tier3', label: 'Priority 3' }
];

export const FLAGS = [
	{ name: 'stallWeeks', label: 'Weeks without verified hours' },
	{ name: 'returnedLimit', label: 'Returned entries waiting' },
	{
		name: 'certificateValidityMonths',
		label: 'Certificate valid for (months)',
		hint: 'Leave empty for no expiry.'
	}
];
