import { z } from 'zod';

const optionalText = (max: number, label: string) =>
	z
		.string()
		.trim()
		.max(max, `${label} is at most ${max} characters.`)
		.optional()
		.transform((v) => v ?? '');

const blankToUndefined = (v: unknown) => (v === '' || v === null ? undefined : v);

const hoursNumber = (label: string) =>
	z.coerce
		.number({ error: `${label} is a number of hours, like 2.5.` })
		.positive(`${label} must be more than 0.`)
		.max(24, `${label} cannot be more than 24 h.`);
const hours = (label: string) => z.preprocess(blankToUndefined, hoursNumber(label));
const optionalHours = (label: string) =>
	z.preprocess(blankToUndefined, hoursNumber(label).optional());

const time = z
	.string()
	.regex(/^([01]\d|2[0-3]):[0-5]\d$/, 'Use a 24-hour time like 07:30.')
	.optional()
	.or(z.literal('').transform(() => undefined));

/** One work-log entry as the apprentice enters it (form or JSON). */
export const entrySchema = z.object({
	workDate: z.iso.date({ error: 'Choose the date of the work.' }),
	startTime: time,
	endTime: time,
	hours: optionalHours('Time on the job'),
	repairOrder: z
		.string({ error: 'Enter the repair order number.' })
		.trim()
		.min(1, 'Enter the repair order number.')
		.max(30, 'A repair order number is at most 30 characters.')
		.regex(/^[A-Za-z0-9][A-Za-z0-9 /-]*$/, 'Use letters, digits, spaces, - or / only.'),
	vehicleYear: z.preprocess(
		blankToUndefined,
		z.coerce
			.number({ error: 'The model year is a number, like 2019.' })
			.int('The model year is a whole number.')
			.min(1950, 'Model years before 1950 are not accepted.')
			.max(new Date().getFullYear() + 2, 'That model year is in the future.')
			.optional()
	),
	vehicleMake: optionalText(40, 'The make'),
	vehicleModel: optionalText(60, 'The model'),
	vin: z.preprocess(
		blankToUndefined,
		z.string().trim().max(24, 'A VIN has 17 characters.').optional()
	),
	vinOverride: z.preprocess((v) => v === 'on' || v === 'true' || v === true, z.boolean()),
	odometer: z.preprocess(
		blankToUndefined,
		z.coerce
			.number({ error: 'The odometer reading is a number.' })
			.int('Enter the odometer in whole miles or kilometres.')
			.min(0, 'The odometer cannot be negative.')
			.max(2_000_000, 'That odometer reading is too large.')
			.optional()
	),
	odometerUnit: z.enum(['mi', 'km']).default('mi'),
	standardHours: z.preprocess(
		blankToUndefined,
		z.coerce
			.number({ error: 'Standard time is a number of hours.' })
			.min(0.1, 'Standard time is at least 0.1 h.')
			.max(99, 'Standard time is at most 99 h.')
			.optional()
	),
	supervisorId: z
		.string({ error: 'Choose the journeyworker who supervised you.' })
		.trim()
		.min(1, 'Choose the journeyworker who supervised you.')
		.max(40),
	notes: optionalText(2000, 'Notes'),
	tasks: z
		.array(
			z.object({
				taskId: z.coerce
					.number({ error: 'Choose a task.' })
					.int()
					.positive('Choose a task.')
					.max(2_147_483_647),
				hours: hours('Task time')
			}),
			{ error: 'Add at least one task you practised.' }
		)
		.min(1, 'Add at least one task you practised.')
		.max(10, 'At most 10 tasks on one entry.')
});

export type EntryInput = z.infer<typeof entrySchema>;

export const returnSchema = z.object({
	comment: z
		.string({ error: 'Say what the apprentice should fix.' })
		.trim()
		.min(3, 'Say what the apprentice should fix.')
		.max(1000, 'Keep the comment under 1000 characters.')
});

export const verifyManySchema = z.object({
	ids: z
		.array(z.coerce.number().int().positive().max(2_147_483_647), {
			error: 'Choose entries to verify.'
		})
		.min(1, 'Choose entries to verify.')
		.max(200, 'Verify at most 200 entries at once.')
});

export const rtiSchema = z.object({
	apprenticeId: z.string().trim().min(1).max(40).optional(),
	course: z.string().trim().min(2, 'Name the course or module.').max(160),
	provider: z.string().trim().min(2, 'Name the provider (college, online, maker).').max(160),
	completedOn: z.iso.date({ error: 'Choose the date.' }),
	hours: hours('Instruction time'),
	result: z.enum(['attended', 'passed', 'failed', 'in progress'], { error: 'Choose a result.' })
});
