/**
 * Work-log history for the demo scenario: supervised entries and related instruction from each
 * apprentice's start date up to `today`. Every vehicle, repair order and course is invented.
 *
 * `generateWorkLog` is pure and draws from small seeded generators keyed by e-mail and date, so
 * the same people and the same `today` always give the same rows; `seedWorkLog` stores them.
 */
import { QueryTypes } from 'sequelize';
import { LogEntry, LogEntryTask, RtiRecord, sequelize, write } from '../src/lib/server/db';
import { syncIdSequences } from '../src/lib/server/db/connection';
import type { EntryStatus, RtiResult } from '../src/lib/server/db';
import { checkDigit } from '../src/lib/vin';
import { DEMO_ACCOUNTS } from './demo';

export interface WorkLogPerson {
	id: string;
	email: string;
}

export interface WorkLogApprentice extends WorkLogPerson {
	siteCode: string;
	/** ISO date, YYYY-MM-DD. */
	startDate: string;
	supervisors: WorkLogPerson[];
}

export interface WorkLogTask {
	id: number;
	code: string;
	title: string;
	/** Area code, e.g. BRK. */
	area: string;
	tier: number;
}

export interface WorkLogInput {
	today: Date;
	apprentices: WorkLogApprentice[];
	tasks: WorkLogTask[];
	coordinatorId: string | null;
}

export interface EntryRow {
	apprenticeId: string;
	supervisorId: string;
	workDate: string;
	startTime: string;
	endTime: string;
	tenths: number;
	repairOrder: string;
	vehicleYear: number;
	vehicleMake: string;
	vehicleModel: string;
	vin: string;
	odometer: number | null;
	odometerUnit: 'mi' | 'km';
	standardTenths: number | null;
	notes: string;
	status: EntryStatus;
	returnComment: string | null;
	submittedAt: Date | null;
	reviewedAt: Date | null;
	reviewedById: string | null;
	correctsId: null;
	createdAt: Date;
	updatedAt: Date;
}

export interface GeneratedEntry {
	row: EntryRow;
	tasks: { taskId: number; tenths: number }[];
}

export interface RtiRow {
	apprenticeId: string;
	course: string;
	provider: string;
	completedOn: string;
	tenths: number;
	result: RtiResult;
	enteredById: string;
	confirmedById: string | null;
	confirmedAt: Date | null;
	createdAt: Date;
	updatedAt: Date;
}

export interface WorkLog {
	entries: GeneratedEntry[];
	rti: RtiRow[];
}

const DEMO_APPRENTICE = DEMO_ACCOUNTS.find((a) => a.role === 'apprentice')?.email;
const DEMO_SUPERVISOR = DEMO_ACCOUNTS.find((a) => a.role === 'supervisor')?.email;

type Pace = 'steady' | 'ahead' | 'slow' | 'stalled';

// The cohort story the progress screens should show: one apprentice ahead, two behind.
const STORY: Record<string, Pace> = {
	'bea.kowalczyk@riverbend-training.example': 'ahead',
	'gus.takahashi@riverbend-training.example': 'stalled',
	'nia.obuya@riverbend-training.example': 'slow'
};

// Days without entries before `today` for the stalled apprentice (over five weeks).
const STALL_DAYS = 44;
// Entries dated in this many recent days may be returned and not yet fixed.
const RETURN_WINDOW_DAYS = 42;
const RETURN_RATE = 0.04;
const DRAFT_WINDOW_DAYS = 3;
const BATCH = 500;

/* ---------- seeded randomness ---------- */

type Rng = () => number;

/** mulberry32: a tiny 32-bit generator, plenty for demo data. */
function mulberry32(seed: number): Rng {
	let a = seed >>> 0;
	return () => {
		a = (a + 0x6d2b79f5) >>> 0;
		let t = a;
		t = Math.imul(t ^ (t >>> 15), t | 1);
		t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
		return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
	};
}

/** FNV-1a, to turn a key such as 'e-mail|date' into a seed. */
function hash(text: string): number {
	let h = 0x811c9dc5;
	for (let i = 0; i < text.length; i++) {
		h ^= text.charCodeAt(i);
		h = Math.imul(h, 0x01000193);
	}
	return h >>> 0;
}

const rngFor = (key: string) => mulberry32(hash(key));
const int = (rnd: Rng, min: number, max: number) => min + Math.floor(rnd() * (max - min + 1));
const pick = <T>(rnd: Rng, items: readonly T[]): T => items[Math.floor(rnd() * items.length)];

function weighted<T>(rnd: Rng, items: readonly (readonly [T, number])[]): T {
	const total = items.reduce((sum, [, w]) => sum + w, 0);
	let r = rnd() * total;
	for (const [item, w] of items) {
		r -= w;
		if (r < 0) return item;
	}
	return items[items.length - 1][0];
}

/** `total` split into `n` random integer parts, each within [min, max]; needs n·min ≤ total ≤ n·max. */
function splitRange(rnd: Rng, total: number, n: number, min: number, max: number): number[] {
	const parts = Array.from({ length: n }, () => min);
	let left = total - n * min;
	while (left > 0) {
		const i = Math.floor(rnd() * n);
		const add = Math.min(left, max - parts[i], int(rnd, 1, 8));
		parts[i] += add;
		left -= add;
	}
	return parts;
}

/* ---------- calendar (UTC day numbers) ---------- */

const DAY_MS = 86_400_000;
const dayOf = (iso: string) => Date.parse(`${iso}T00:00:00Z`) / DAY_MS;
const isoOf = (day: number) => new Date(day * DAY_MS).toISOString().slice(0, 10);
const weekdayOf = (day: number) => new Date(day * DAY_MS).getUTCDay();
const at = (day: number, minutes: number) => new Date(day * DAY_MS + minutes * 60_000);
const clock = (minutes: number) =>
	`${String(Math.floor(minutes / 60)).padStart(2, '0')}:${String(minutes % 60).padStart(2, '0')}`;
const isWeekend = (day: number) => weekdayOf(day) === 0 || weekdayOf(day) === 6;

/** The next Monday–Friday on or after `day`. */
function weekdayFrom(day: number): number {
	let d = day;
	while (isWeekend(d)) d++;
	return d;
}

/** The nth given weekday (0 = Sunday) of a month; n = -1 for the last one. */
function nthWeekday(year: number, month: number, weekday: number, n: number): number {
	if (n > 0) {
		const first = Date.UTC(year, month - 1, 1) / DAY_MS;
		return first + ((weekday - weekdayOf(first) + 7) % 7) + (n - 1) * 7;
	}
	const last = Date.UTC(year, month, 0) / DAY_MS;
	return last - ((weekdayOf(last) - weekday + 7) % 7);
}

const closedCache = new Map<number, Set<number>>();

/** Days every demo shop is shut: the year-end break and a few public holidays. */
function shopClosed(day: number): boolean {
	const year = new Date(day * DAY_MS).getUTCFullYear();
	let closed = closedCache.get(year);
	if (!closed) {
		closed = new Set<number>();
		closed.add(Date.UTC(year, 0, 1) / DAY_MS);
		for (let d = 24; d <= 31; d++) closed.add(Date.UTC(year, 11, d) / DAY_MS);
		closed.add(nthWeekday(year, 5, 1, -1));
		const july4 = Date.UTC(year, 6, 4) / DAY_MS;
		// A weekend holiday is taken on the nearest weekday.
		closed.add(weekdayOf(july4) === 6 ? july4 - 1 : weekdayOf(july4) === 0 ? july4 + 1 : july4);
		const thanksgiving = nthWeekday(year, 11, 4, 4);
		closed.add(thanksgiving).add(thanksgiving + 1);
		closedCache.set(year, closed);
	}
	return closed.has(day);
}

/* ---------- vehicles ---------- */

interface VehicleClass {
	make: string;
	models: readonly string[];
	hybrid?: boolean;
	/** Battery-electric: only seen on high-voltage jobs, never on an oil change. */
	electric?: boolean;
}

const CLASSES: Record<string, VehicleClass> = {
	hatch: { make: 'Compact hatch', models: ['base', 'LX-type trim', 'sport trim', 'eco trim'] },
	subcompact: { make: 'Subcompact sedan', models: ['base', 'value trim', 'LX-type trim'] },
	sedan: { make: 'Midsize sedan', models: ['base', 'LX-type trim', 'touring trim', 'V6 trim'] },
	suv: { make: 'Compact SUV', models: ['base', 'AWD trim', 'LX-type trim', 'touring trim'] },
	midsuv: { make: 'Midsize SUV', models: ['AWD trim', 'three-row trim', 'base'] },
	pickup: {
		make: 'Light pickup',
		models: ['work truck', 'crew cab', 'extended cab 4x4', 'regular cab']
	},
	hdpickup: { make: 'Heavy-duty pickup', models: ['crew cab diesel', 'work truck 4x4'] },
	minivan: { make: 'Minivan', models: ['base', 'LX-type trim', 'touring trim'] },
	van: {
		make: 'Full-size van',
		models: ['cargo, high roof', 'cargo, extended wheelbase', 'passenger']
	},
	hybrid: {
		make: 'Hybrid sedan',
		models: ['base', 'LX-type trim', 'plug-in trim'],
		hybrid: true
	},
	hybridSuv: { make: 'Hybrid compact SUV', models: ['AWD trim', 'base'], hybrid: true },
	ev: {
		make: 'Electric crossover',
		models: ['standard range', 'long range'],
		hybrid: true,
		electric: true
	}
};

// What rolls into each shop: the fleet garage sees vans and pickups, the others a retail mix.
const SHOP_MIX: Record<string, readonly (readonly [string, number])[]> = {
	fleet: [
		['van', 30],
		['pickup', 25],
		['hdpickup', 10],
		['sedan', 10],
		['suv', 10],
		['minivan', 8],
		['hybrid', 5],
		['ev', 2]
	],
	retail: [
		['hatch', 14],
		['subcompact', 8],
		['sedan', 20],
		['suv', 20],
		['midsuv', 8],
		['pickup', 12],
		['minivan', 7],
		['hybrid', 6],
		['hybridSuv', 3],
		['ev', 2]
	]
};
const HIGH_VOLTAGE_MIX = [
	['hybrid', 5],
	['hybridSuv', 3],
	['ev', 2]
] as const;

// Letters a VIN may use (never I, O or Q), and the model-year codes of 49 CFR 565.15 position 10.
const VIN_CHARS = [...'ABCDEFGHJKLMNPRSTUVWXYZ0123456789'];
const YEAR_CODES = '123456789ABCDEFGHJKLMNPRSTVWXY';

interface Vehicle {
	year: number;
	make: string;
	model: string;
	vin: string;
	/** Odometer on day 0 of the scenario clock, and how far it is driven each day. */
	baseOdometer: number;
	perDay: number;
	unit: 'mi' | 'km';
	hybrid: boolean;
	electric: boolean;
}

/** A random 17-character VIN whose 9th character is the right check digit. */
function makeVin(rnd: Rng, year: number): string {
	const chars = Array.from({ length: 17 }, () => pick(rnd, VIN_CHARS));
	chars[8] = '0';
	chars[9] = YEAR_CODES[(year - 2001) % 30];
	for (let i = 11; i < 17; i++) chars[i] = String(int(rnd, 0, 9));
	const vin = chars.join('');
	return vin.slice(0, 8) + checkDigit(vin) + vin.slice(9);
}

// Odometers are anchored to 1 January 2025 so every visit of one vehicle reads higher than the last.
const ODOMETER_EPOCH = dayOf('2025-01-01');

function makeVehicle(rnd: Rng, classKey: string): Vehicle {
	const cls = CLASSES[classKey];
	const year = int(rnd, cls.electric ? 2017 : cls.hybrid ? 2012 : 2008, 2025);
	const age = 2025 - year;
	const unit = rnd() < 0.04 ? 'km' : 'mi';
	const perYear = int(rnd, 7_000, 15_000);
	const miles = age * perYear + int(rnd, 200, 6_000);
	const scale = unit === 'km' ? 1.609344 : 1;
	return {
		year,
		make: cls.make,
		model: pick(rnd, cls.models),
		vin: makeVin(rnd, year),
		baseOdometer: Math.round(miles * scale),
		perDay: (perYear / 365) * scale,
		unit,
		hybrid: Boolean(cls.hybrid),
		electric: Boolean(cls.electric)
	};
}

const odometerOn = (v: Vehicle, day: number) =>
	Math.floor(v.baseOdometer + v.perDay * (day - ODOMETER_EPOCH));

interface Shop {
	code: string;
	mix: readonly (readonly [string, number])[];
	/** Customers and fleet units that keep coming back. */
	regulars: Vehicle[];
	repeatRate: number;
	/** First repair order number; each shop numbers its own. */
	roBase: number;
}

const shopCache = new Map<string, Shop>();

function shopFor(code: string): Shop {
	let shop = shopCache.get(code);
	if (!shop) {
		const rnd = rngFor(`shop|${code}`);
		const fleet = code === 'MFS';
		const mix = fleet ? SHOP_MIX.fleet : SHOP_MIX.retail;
		const regulars = Array.from({ length: fleet ? 80 : 60 }, () =>
			makeVehicle(rnd, weighted(rnd, mix))
		);
		shop = {
			code,
			mix,
			regulars,
			repeatRate: fleet ? 0.35 : 0.06,
			roBase: 10_000 + (hash(code) % 8) * 10_000
		};
		shopCache.set(code, shop);
	}
	return shop;
}

// A battery-electric vehicle has no engine, clutch or gearbox to work on.
const ELECTRIC_AREAS = new Set(['HVS', 'BRK', 'SUS', 'HAC', 'ELE', 'SAF']);

/** Whether a job of this area makes sense on this vehicle. */
const suits = (v: Vehicle, area: string) =>
	area === 'HVS' ? v.hybrid : !v.electric || ELECTRIC_AREAS.has(area);

function vehicleFor(rnd: Rng, shop: Shop, area: string): Vehicle {
	const highVoltage = area === 'HVS';
	const fits = (v: Vehicle) => suits(v, area);
	if (rnd() < shop.repeatRate) {
		const candidates = shop.regulars.filter(fits);
		if (candidates.length) return pick(rnd, candidates);
	}
	for (;;) {
		const v = makeVehicle(rnd, weighted(rnd, highVoltage ? HIGH_VOLTAGE_MIX : shop.mix));
		if (fits(v)) return v;
	}
}

/* ---------- what work an apprentice gets ---------- */

// Area mix by months on the job: safety and light work first, diagnosis later.
const PHASES: { fromMonth: number; areas: readonly (readonly [string, number])[] }[] = [
	{
		fromMonth: 0,
		areas: [
			['SAF', 50],
			['MLR', 45],
			['BRK', 5]
		]
	},
	{
		fromMonth: 0.5,
		areas: [
			['MLR', 40],
			['BRK', 22],
			['SUS', 12],
			['SAF', 8],
			['MDA', 5],
			['ELE', 5],
			['HAC', 4],
			['ENG', 4]
		]
	},
	{
		fromMonth: 4,
		areas: [
			['MLR', 22],
			['BRK', 18],
			['SUS', 14],
			['ELE', 12],
			['ENG', 10],
			['HAC', 8],
			['MDA', 7],
			['EPF', 5],
			['ATX', 2],
			['SAF', 1],
			['HVS', 1]
		]
	},
	{
		fromMonth: 9,
		areas: [
			['EPF', 18],
			['ELE', 17],
			['ENG', 12],
			['MLR', 11],
			['BRK', 10],
			['SUS', 9],
			['HAC', 8],
			['MDA', 6],
			['ATX', 5],
			['HVS', 4]
		]
	}
];

// Tasks that go with nearly any job: lifting the car, torquing, the inspection.
const HELPER_TASKS = ['SAF-01', 'SAF-05', 'MLR-11', 'SAF-02'];

const NOTES: Record<string, readonly string[]> = {
	SAF: ['Walked through the bay safety rules with my journeyworker first.'],
	MLR: [
		'Multipoint inspection found a weeping valve cover gasket; quoted to the customer.',
		'Front tyres near the wear bars; noted on the RO.',
		'Coolant was low; pressure test found no external leak.'
	],
	BRK: [
		'Customer complaint: grinding from the front when braking.',
		'Inner pads worn to 2 mm; rotors under discard thickness.',
		'Pedal low on the road test before the repair, firm after bleeding.'
	],
	SUS: [
		'Pulls right; toe was out of specification.',
		'Clunk over bumps traced to a worn stabiliser link.'
	],
	ELE: [
		'No-crank complaint; found a corroded ground strap.',
		'Battery drained overnight; traced the draw to a glovebox lamp switch.'
	],
	ENG: ['Oil leak at the rear of the head; cleaned and dye-checked first.'],
	EPF: [
		'Check-engine lamp on with a misfire on cylinder 3.',
		'Lean codes on both banks; smoke test found a split intake hose.'
	],
	HAC: ['Warm air from the vents on the passenger side.'],
	MDA: ['Clicking on full-lock turns; outer joint boot torn.'],
	ATX: ['Delayed engagement into drive when cold.'],
	HVS: ['Hybrid warning lamp on; followed the high-voltage isolation steps with my journeyworker.']
};

interface ReturnReason {
	comment: string;
	fits: (e: GeneratedEntry, a: WorkLogApprentice, diagnosis: boolean) => boolean;
	/** Puts the mistake the comment points at into the entry. */
	apply?: (e: GeneratedEntry) => void;
}

const RETURN_REASONS: ReturnReason[] = [
	{
		comment: 'RO number is missing the RO- prefix; copy it exactly from the repair order.',
		fits: () => true,
		apply: (e) => {
			e.row.repairOrder = e.row.repairOrder.replace(/^RO-/, '');
		}
	},
	{
		comment:
			'Split more of this time to the diagnosis task; most of this job was finding the fault.',
		fits: (e, _a, diagnosis) => diagnosis && e.tasks.length > 1
	},
	{
		comment: 'The odometer is missing; copy the mileage in from the repair order.',
		fits: () => true,
		apply: (e) => {
			e.row.odometer = null;
		}
	},
	{
		comment: 'Add the standard labour time from the repair order so the job counts for efficiency.',
		fits: (e) => e.row.standardTenths === null
	},
	{
		comment: 'I was not on shift that afternoon; choose the journeyworker who supervised you.',
		fits: (_e, a) => a.supervisors.length > 1
	},
	{
		comment: 'Say in the notes what you found, not only which task you did.',
		fits: (e) => e.row.notes === ''
	}
];

interface PaceRule {
	/** Chance of working on an ordinary workday. */
	workRate: number;
	/** Hours on the job on a worked day, in tenths. */
	dayMin: number;
	dayMax: number;
	efficiencyBonus: number;
}

function paceRule(kind: Pace, email: string): PaceRule {
	if (kind === 'ahead') return { workRate: 0.99, dayMin: 82, dayMax: 90, efficiencyBonus: 0.08 };
	if (kind === 'slow') return { workRate: 0.48, dayMin: 40, dayMax: 60, efficiencyBonus: -0.05 };
	// Steady apprentices differ a little, centred between 6.4 h and 7.6 h a worked day.
	const centre = 64 + (hash(email) % 13);
	return { workRate: 0.96, dayMin: centre - 10, dayMax: centre + 10, efficiencyBonus: 0 };
}

/** One summer week of leave, Monday of a week between early June and mid-August. */
function leaveWeek(email: string, year: number): number {
	const june8 = Date.UTC(year, 5, 8) / DAY_MS;
	const monday = june8 + ((1 - weekdayOf(june8) + 7) % 7);
	return monday + 7 * (hash(`${email}|leave|${year}`) % 10);
}

/* ---------- related instruction ---------- */

const COURSES: { course: string; provider: string; hours: number; result: RtiResult }[] = [
	{
		course: 'Shop safety and hand tools orientation',
		provider: 'Riverbend Technical College',
		hours: 16,
		result: 'attended'
	},
	{
		course: 'Brake systems fundamentals',
		provider: 'Riverbend Technical College',
		hours: 40,
		result: 'passed'
	},
	{
		course: 'Maintenance and light repair practices',
		provider: 'Riverbend Technical College',
		hours: 32,
		result: 'passed'
	},
	{
		course: 'Electrical circuits I',
		provider: 'Alder Coast Trade Institute (online)',
		hours: 40,
		result: 'passed'
	},
	{
		course: 'Suspension, steering and alignment',
		provider: 'Riverbend Technical College',
		hours: 32,
		result: 'passed'
	},
	{
		course: 'Heating and air conditioning with refrigerant handling',
		provider: 'Millrace Adult Learning Centre',
		hours: 24,
		result: 'passed'
	},
	{
		course: 'Electrical circuits II: networks and modules',
		provider: 'Alder Coast Trade Institute (online)',
		hours: 40,
		result: 'passed'
	},
	{
		course: 'Engine performance fundamentals',
		provider: 'Riverbend Technical College',
		hours: 40,
		result: 'passed'
	}
];
// Days after the start date each course ends; the programme spreads them over the first years.
const COURSE_DAYS = [4, 60, 120, 185, 250, 330, 400, 450];
// Recent records wait for the coordinator to confirm them.
const RTI_WAIT_DAYS = 21;

function rtiFor(a: WorkLogApprentice, todayDay: number, coordinatorId: string | null): RtiRow[] {
	const rnd = rngFor(`${a.email}|rti`);
	const start = dayOf(a.startDate);
	const rows: RtiRow[] = [];
	COURSES.forEach((c, i) => {
		const nudge = int(rnd, -3, 3);
		const entered = rnd();
		const late = rnd();
		const confirmLag = int(rnd, 2, 6);
		let day = start + COURSE_DAYS[i] + (i === 0 ? 0 : nudge);
		// Courses end on a day the college is open: weekends and holidays move back a day.
		while (isWeekend(day) || shopClosed(day)) day--;
		if (day > todayDay) return;
		const byCoordinator = coordinatorId !== null && entered < 0.3;
		const confirmed =
			byCoordinator || (coordinatorId !== null && day < todayDay - RTI_WAIT_DAYS && late > 0.06);
		const result: RtiResult =
			STORY[a.email] === 'slow' && c.course === 'Electrical circuits I' ? 'failed' : c.result;
		const createdAt = at(day + (byCoordinator ? 1 : 0), 18 * 60 + 15);
		const confirmedAt = confirmed
			? byCoordinator
				? createdAt
				: at(Math.min(day + confirmLag, todayDay - 1), 10 * 60)
			: null;
		rows.push({
			apprenticeId: a.id,
			course: c.course,
			provider: c.provider,
			completedOn: isoOf(day),
			tenths: c.hours * 10,
			result,
			enteredById: byCoordinator && coordinatorId ? coordinatorId : a.id,
			confirmedById: confirmed ? coordinatorId : null,
			confirmedAt,
			createdAt,
			updatedAt: confirmedAt ?? createdAt
		});
	});
	return rows;
}

/* ---------- the generator ---------- */

interface Context {
	tasksByArea: Map<string, WorkLogTask[]>;
	byCode: Map<string, WorkLogTask>;
	titles: Map<number, string>;
	todayDay: number;
	nowMinutes: number;
	now: Date;
	/** When each journeyworker last went through their queue. */
	reviewCutoff: Map<string, Date>;
}

function taskWeight(t: WorkLogTask): number {
	// Tier 1 tasks are everyday work; tier 3 comes up rarely.
	return t.tier === 1 ? 4 : t.tier === 2 ? 2 : 1;
}

function chooseTasks(rnd: Rng, ctx: Context, area: string, count: number): WorkLogTask[] {
	const pool = ctx.tasksByArea.get(area) ?? [];
	const chosen: WorkLogTask[] = [];
	const take = (t: WorkLogTask | undefined) => {
		if (t && !chosen.includes(t)) chosen.push(t);
	};
	const weights = pool.map((t) => [t, taskWeight(t)] as const);
	take(weighted(rnd, weights));
	for (let tries = 0; chosen.length < count && tries < 12; tries++) {
		take(rnd() < 0.75 ? weighted(rnd, weights) : ctx.byCode.get(pick(rnd, HELPER_TASKS)));
	}
	return chosen;
}

function areaFor(rnd: Rng, ctx: Context, months: number): string {
	const phase = [...PHASES].reverse().find((p) => months >= p.fromMonth) ?? PHASES[0];
	const available = phase.areas.filter(([code]) => ctx.tasksByArea.has(code));
	return available.length ? weighted(rnd, available) : [...ctx.tasksByArea.keys()][0];
}

/** When the apprentice sends a day's entries: after the last job, or the next morning. */
function submitTime(rnd: Rng, day: number, endMinutes: number): Date {
	return rnd() < 0.7
		? at(day, endMinutes + int(rnd, 2, 10) * 6)
		: at(weekdayFrom(day + 1), int(rnd, 7 * 60, 8 * 60 + 30));
}

/** A day or two after submission, in working hours on a weekday. */
function reviewTime(rnd: Rng, submitted: Date): Date {
	const day = Math.floor(submitted.getTime() / DAY_MS);
	return at(weekdayFrom(day + int(rnd, 1, 2)), int(rnd, 7 * 60 + 30, 16 * 60 + 30));
}

function apprenticeEntries(a: WorkLogApprentice, ctx: Context, rtiDays: Set<number>) {
	const entries: GeneratedEntry[] = [];
	const kind = STORY[a.email] ?? 'steady';
	const pace = paceRule(kind, a.email);
	const shop = shopFor(a.siteCode);
	const supervisors = [...a.supervisors].sort((x, y) => x.email.localeCompare(y.email));
	if (supervisors.length === 0) return entries;
	const primary =
		supervisors.find((s) => s.email === DEMO_SUPERVISOR) ??
		supervisors[hash(a.email) % supervisors.length];
	const start = dayOf(a.startDate);
	const stallFrom = kind === 'stalled' ? ctx.todayDay - STALL_DAYS : Infinity;
	const leave = new Set<number>();
	for (let year = 2025; year <= 2030; year++) {
		const monday = leaveWeek(a.email, year);
		// Nobody takes leave in their first three months.
		if (monday - start < 90) continue;
		for (let d = 0; d < 5; d++) leave.add(monday + d);
	}

	for (let day = start; day <= ctx.todayDay && day < stallFrom; day++) {
		if (isWeekend(day) || shopClosed(day) || leave.has(day) || rtiDays.has(day)) continue;
		const rnd = rngFor(`${a.email}|${isoOf(day)}`);
		if (rnd() > pace.workRate) continue;

		const months = (day - start) / 30.44;
		const total = int(rnd, pace.dayMin, pace.dayMax);
		const lower = Math.max(2, Math.ceil(total / 40));
		const count = int(rnd, lower, Math.min(4, Math.floor(total / 5)));
		const parts = splitRange(rnd, total, count, 5, 40);

		// Clock times in six-minute steps between 07:00 and 17:30, jobs in sequence with gaps.
		const workMinutes = total * 6;
		const free = 630 - workMinutes;
		let cursor = 7 * 60 + 6 * int(rnd, 0, Math.floor(Math.min(60, free / 2) / 6));
		const gapCap = Math.floor(Math.min((7 * 60 + free - cursor) / (count - 1), 42) / 6);

		const draftDay =
			day === ctx.todayDay || (day >= ctx.todayDay - DRAFT_WINDOW_DAYS && rnd() < 0.12);
		const dayEntries: GeneratedEntry[] = [];
		let vehicle: Vehicle | null = null;
		let repairOrder = '';
		let area = '';
		for (let j = 0; j < count; j++) {
			if (j > 0) cursor += 6 * int(rnd, 0, gapCap);
			const tenths = parts[j];
			const from = cursor;
			const to = cursor + tenths * 6;
			cursor = to;

			// About a third of follow-on entries continue the same repair order.
			const sameJob = vehicle !== null && rnd() < 0.3;
			if (!sameJob || vehicle === null) {
				area = areaFor(rnd, ctx, months);
				vehicle = vehicleFor(rnd, shop, area);
				repairOrder = `RO-${shop.roBase + (day - ODOMETER_EPOCH) * 9 + int(rnd, 0, 8)}`;
			} else if (rnd() < 0.5) {
				// A second job on the same car, kept to work that car can have.
				const next = areaFor(rnd, ctx, months);
				if (suits(vehicle, next)) area = next;
			}

			const want = weighted(rnd, [
				[1, 50],
				[2, 35],
				[3, 15]
			] as const);
			const tasks = chooseTasks(rnd, ctx, area, Math.min(want, tenths));
			const split = splitRange(rnd, tenths, tasks.length, 1, tenths);

			let standardTenths: number | null = null;
			if (rnd() < 0.6) {
				// Efficiency climbs with experience, from about 80 % towards 105 %.
				const efficiency =
					0.8 + 0.25 * Math.min(1, months / 15) + pace.efficiencyBonus + (rnd() - 0.5) * 0.3;
				const raw = Math.round(tenths * efficiency);
				// Integer bounds (7/10, 13/10) so float noise cannot push a job outside 70–130 %.
				standardTenths = Math.min(
					Math.floor((tenths * 13) / 10),
					Math.max(Math.ceil((tenths * 7) / 10), raw)
				);
			}
			const notes = rnd() < 0.25 ? pick(rnd, NOTES[area] ?? ['']) : '';
			const supervisor = rnd() < 0.65 ? primary : pick(rnd, supervisors);
			const created = at(day, to);
			dayEntries.push({
				row: {
					apprenticeId: a.id,
					supervisorId: supervisor.id,
					workDate: isoOf(day),
					startTime: clock(from),
					endTime: clock(to),
					tenths,
					repairOrder,
					vehicleYear: vehicle.year,
					vehicleMake: vehicle.make,
					vehicleModel: vehicle.model,
					vin: vehicle.vin,
					odometer: odometerOn(vehicle, day),
					odometerUnit: vehicle.unit,
					standardTenths,
					notes,
					status: 'draft',
					returnComment: null,
					submittedAt: null,
					reviewedAt: null,
					reviewedById: null,
					correctsId: null,
					createdAt: created,
					updatedAt: created
				},
				tasks: tasks.map((t, i) => ({ taskId: t.id, tenths: split[i] }))
			});
		}

		// Today only holds the jobs already finished at the moment of seeding.
		const logged =
			day === ctx.todayDay
				? dayEntries.filter((e) => minutesOf(e.row.endTime) <= ctx.nowMinutes)
				: dayEntries;
		if (logged.length === 0) continue;
		const submittedAt = submitTime(rnd, day, minutesOf(logged[logged.length - 1].row.endTime));
		for (const e of logged) {
			// Every draw happens whatever the outcome, so one entry's status never shifts the next.
			const reviewedAt = reviewTime(rnd, submittedAt);
			const returned = rnd() < RETURN_RATE;
			const reasonRoll = rnd();
			if (draftDay || submittedAt > ctx.now) continue;
			e.row.status = 'submitted';
			e.row.submittedAt = submittedAt;
			e.row.updatedAt = submittedAt;
			if (reviewedAt > (ctx.reviewCutoff.get(e.row.supervisorId) ?? ctx.now)) continue;
			e.row.reviewedAt = reviewedAt;
			e.row.reviewedById = e.row.supervisorId;
			e.row.updatedAt = reviewedAt;
			if (returned && day >= ctx.todayDay - RETURN_WINDOW_DAYS) {
				giveBack(e, a, ctx, reasonRoll);
			} else {
				e.row.status = 'verified';
			}
		}
		entries.push(...logged);
	}
	return entries;
}

const minutesOf = (hhmm: string) => Number(hhmm.slice(0, 2)) * 60 + Number(hhmm.slice(3, 5));

/** Marks a reviewed entry returned, with a comment and the mistake it points at. */
function giveBack(e: GeneratedEntry, a: WorkLogApprentice, ctx: Context, roll: number) {
	const diagnosis = e.tasks.some((t) => /^Diagnose/.test(ctx.titles.get(t.taskId) ?? ''));
	const reasons = RETURN_REASONS.filter((r) => r.fits(e, a, diagnosis));
	const reason = reasons[Math.floor(roll * reasons.length)];
	reason.apply?.(e);
	e.row.status = 'returned';
	e.row.returnComment = reason.comment;
}

/**
 * The demo apprentice's screen should show every state: entries waiting for the demo
 * journeyworker, a returned one to fix and a couple of drafts.
 */
function featureDemo(entries: GeneratedEntry[], a: WorkLogApprentice, ctx: Context) {
	const demoSupervisor = a.supervisors.find((s) => s.email === DEMO_SUPERVISOR);
	const newest = [...entries].reverse();
	let drafts = entries.filter((e) => e.row.status === 'draft').length;
	for (const e of newest) {
		if (drafts >= 2) break;
		if (e.row.status === 'draft') continue;
		Object.assign(e.row, {
			status: 'draft',
			submittedAt: null,
			reviewedAt: null,
			reviewedById: null,
			returnComment: null,
			updatedAt: e.row.createdAt
		});
		drafts++;
	}
	if (demoSupervisor) {
		const cutoff = ctx.reviewCutoff.get(demoSupervisor.id) ?? ctx.now;
		const waiting = (e: GeneratedEntry) =>
			e.row.status === 'submitted' && e.row.supervisorId === demoSupervisor.id;
		let count = entries.filter(waiting).length;
		for (const e of newest) {
			if (count >= 3) break;
			// Only entries sent after the journeyworker's last review can still be waiting.
			if (waiting(e) || !e.row.submittedAt || e.row.submittedAt <= cutoff) continue;
			if (e.row.status === 'returned') continue;
			Object.assign(e.row, {
				status: 'submitted',
				supervisorId: demoSupervisor.id,
				reviewedAt: null,
				reviewedById: null,
				updatedAt: e.row.submittedAt
			});
			count++;
		}
	}
	if (!entries.some((e) => e.row.status === 'returned')) {
		const oldest = ctx.todayDay - RETURN_WINDOW_DAYS;
		const candidate = newest.find(
			(e) => e.row.status === 'verified' && dayOf(e.row.workDate) >= oldest
		);
		if (candidate) giveBack(candidate, a, ctx, 0);
	}
}

/** Every entry and instruction record of the scenario, as rows ready to store. */
export function generateWorkLog(input: WorkLogInput): WorkLog {
	const nowMs = input.today.getTime();
	const todayDay = Math.floor(nowMs / DAY_MS);
	const tasks = [...input.tasks].sort((x, y) => x.code.localeCompare(y.code));
	const tasksByArea = new Map<string, WorkLogTask[]>();
	for (const t of tasks) tasksByArea.set(t.area, [...(tasksByArea.get(t.area) ?? []), t]);

	const reviewCutoff = new Map<string, Date>();
	for (const a of input.apprentices) {
		for (const s of a.supervisors) {
			// The demo journeyworker is a week behind on reviews; the others two to six days.
			const lag = s.email === DEMO_SUPERVISOR ? 7 : 2 + (hash(s.email) % 5);
			reviewCutoff.set(s.id, at(todayDay - lag, 17 * 60));
		}
	}
	const ctx: Context = {
		tasksByArea,
		byCode: new Map(tasks.map((t) => [t.code, t])),
		titles: new Map(tasks.map((t) => [t.id, t.title])),
		todayDay,
		nowMinutes: Math.floor((nowMs - todayDay * DAY_MS) / 60_000),
		now: input.today,
		reviewCutoff
	};

	const log: WorkLog = { entries: [], rti: [] };
	if (tasks.length === 0) return log;
	const apprentices = [...input.apprentices].sort((x, y) => x.email.localeCompare(y.email));
	for (const a of apprentices) {
		const rti = rtiFor(a, todayDay, input.coordinatorId);
		// A day at college is a day off the shop floor.
		const entries = apprenticeEntries(a, ctx, new Set(rti.map((r) => dayOf(r.completedOn))));
		if (a.email === DEMO_APPRENTICE) featureDemo(entries, a, ctx);
		log.entries.push(...entries);
		log.rti.push(...rti);
	}
	return log;
}

/* ---------- storing it ---------- */

/** The people, shops and tasks the generator needs, read from the seeded demo. */
export async function loadWorkLogInput(today: Date): Promise<WorkLogInput> {
	const select = <T extends object>(sql: string) =>
		sequelize.query<T>(sql, { type: QueryTypes.SELECT });
	const [apprentices, supervisions, tasks, coordinators] = await Promise.all([
		select<{ id: string; email: string; siteCode: string | null; startDate: string }>(
			`SELECT u.id, u.email, s.code AS "siteCode", p.start_date AS "startDate"
			   FROM apprentice_profiles p
			   JOIN users u ON u.id = p.user_id
			   LEFT JOIN sites s ON s.id = u.site_id`
		),
		select<{ apprenticeId: string; id: string; email: string }>(
			`SELECT v.apprentice_id AS "apprenticeId", u.id, u.email
			   FROM supervisions v JOIN users u ON u.id = v.supervisor_id`
		),
		select<WorkLogTask>(
			`SELECT t.id, t.code, t.title, a.code AS area, t.tier
			   FROM framework_tasks t
			   JOIN framework_areas a ON a.id = t.area_id
			  WHERE t.framework_id = (SELECT id FROM frameworks WHERE status = 'published'
			                           ORDER BY version DESC LIMIT 1)`
		),
		select<{ id: string }>(`SELECT id FROM users WHERE role = 'coordinator' ORDER BY email LIMIT 1`)
	]);
	return {
		today,
		apprentices: apprentices.map((a) => ({
			id: a.id,
			email: a.email,
			siteCode: a.siteCode ?? 'SHOP',
			startDate: a.startDate,
			supervisors: supervisions
				.filter((s) => s.apprenticeId === a.id)
				.map((s) => ({ id: s.id, email: s.email }))
		})),
		tasks,
		coordinatorId: coordinators[0]?.id ?? null
	};
}

function chunks<T>(rows: T[], size = BATCH): T[][] {
	const out: T[][] = [];
	for (let i = 0; i < rows.length; i += size) out.push(rows.slice(i, i + size));
	return out;
}

export interface WorkLogCounts {
	entries: number;
	tasks: number;
	rti: number;
}

/** Stores the generated history in one transaction; does nothing when entries already exist. */
export async function seedWorkLog(today = new Date()): Promise<WorkLogCounts | 'already seeded'> {
	if ((await LogEntry.count()) > 0) return 'already seeded';
	const log = generateWorkLog(await loadWorkLogInput(today));
	return write(async (transaction) => {
		const [{ maxId }] = await sequelize.query<{ maxId: number | null }>(
			'SELECT MAX(id) AS "maxId" FROM log_entries',
			{ type: QueryTypes.SELECT, transaction }
		);
		// Ids are given here so the task rows can point at their entries without a read-back.
		let id = maxId ?? 0;
		const entryRows = log.entries.map((e) => ({ id: ++id, ...e.row }));
		const taskRows = log.entries.flatMap((e, i) =>
			e.tasks.map((t) => ({ entryId: entryRows[i].id, taskId: t.taskId, tenths: t.tenths }))
		);
		for (const batch of chunks(entryRows)) await LogEntry.bulkCreate(batch, { transaction });
		for (const batch of chunks(taskRows)) await LogEntryTask.bulkCreate(batch, { transaction });
		for (const batch of chunks(log.rti)) await RtiRecord.bulkCreate(batch, { transaction });
		await syncIdSequences(sequelize, transaction);
		return { entries: entryRows.length, tasks: taskRows.length, rti: log.rti.length };
	});
}
