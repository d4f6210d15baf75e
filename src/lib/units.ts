/** Units a specification may be entered in. Convertible quantities are stored in SI. */
export const UNITS = {
	'N·m': { quantity: 'torque', si: true },
	'lbf·ft': { quantity: 'torque', si: false },
	'lbf·in': { quantity: 'torque', si: false },
	mm: { quantity: 'length', si: true },
	in: { quantity: 'length', si: false },
	L: { quantity: 'volume', si: true },
	qt: { quantity: 'volume', si: false },
	gal: { quantity: 'volume', si: false },
	kPa: { quantity: 'pressure', si: true },
	psi: { quantity: 'pressure', si: false },
	'°C': { quantity: 'temperature', si: true },
	'°F': { quantity: 'temperature', si: false },
	// Same in both unit systems: shown once.
	V: { quantity: 'voltage', si: true },
	A: { quantity: 'current', si: true },
	Ω: { quantity: 'resistance', si: true },
	rpm: { quantity: 'speed', si: true },
	'%': { quantity: 'ratio', si: true },
	ms: { quantity: 'time', si: true }
} as const;

export type Unit = keyof typeof UNITS;
export type Quantity = (typeof UNITS)[Unit]['quantity'];

/** Every unit symbol, in the order of `UNITS`. */
export const UNIT_SYMBOLS = Object.keys(UNITS) as [Unit, ...Unit[]];

// Exact definitions (NIST SP 811, Appendix B): the factors below follow from them.
const NEWTONS_PER_LBF = 4.4482216152605;
const MM_PER_INCH = 25.4;
// 231 cubic inches exactly (NIST Handbook 44, Appendix C).
const LITRES_PER_US_GALLON = 3.785411784;

/** Multiply a value in this unit by the factor to get its quantity's SI unit. */
const FACTORS: Record<Exclude<Unit, '°F'>, number> = {
	'N·m': 1,
	'lbf·ft': NEWTONS_PER_LBF * 0.3048,
	'lbf·in': NEWTONS_PER_LBF * 0.0254,
	mm: 1,
	in: MM_PER_INCH,
	L: 1,
	qt: LITRES_PER_US_GALLON / 4,
	gal: LITRES_PER_US_GALLON,
	kPa: 1,
	psi: (NEWTONS_PER_LBF / MM_PER_INCH ** 2) * 1000,
	'°C': 1,
	V: 1,
	A: 1,
	Ω: 1,
	rpm: 1,
	'%': 1,
	ms: 1
};

const SI_UNIT: Record<Quantity, Unit> = {
	torque: 'N·m',
	length: 'mm',
	volume: 'L',
	pressure: 'kPa',
	temperature: '°C',
	voltage: 'V',
	current: 'A',
	resistance: 'Ω',
	speed: 'rpm',
	ratio: '%',
	time: 'ms'
};

export function isUnit(text: string): text is Unit {
	return Object.hasOwn(UNITS, text);
}

export function quantityOf(unit: Unit): Quantity {
	return UNITS[unit].quantity;
}

/** The SI unit in which values of this unit's quantity are stored. */
export function siUnitOf(unit: Unit): Unit {
	return SI_UNIT[quantityOf(unit)];
}

export function toSI(value: number, unit: Unit): number {
	if (unit === '°F') return ((value - 32) * 5) / 9;
	return value * FACTORS[unit];
}

export function fromSI(valueSI: number, unit: Unit): number {
	if (unit === '°F') return (valueSI * 9) / 5 + 32;
	return valueSI / FACTORS[unit];
}

/** Spellings a keyboard can type, so an imported file need not contain "·", "°" or "Ω". */
const ALIASES: Record<string, Unit> = {
	nm: 'N·m',
	lbfft: 'lbf·ft',
	lbft: 'lbf·ft',
	ftlb: 'lbf·ft',
	ftlbf: 'lbf·ft',
	lbfin: 'lbf·in',
	lbin: 'lbf·in',
	inlb: 'lbf·in',
	inlbf: 'lbf·in',
	mm: 'mm',
	in: 'in',
	l: 'L',
	qt: 'qt',
	gal: 'gal',
	kpa: 'kPa',
	psi: 'psi',
	'°c': '°C',
	degc: '°C',
	'°f': '°F',
	degf: '°F',
	v: 'V',
	a: 'A',
	ω: 'Ω',
	ohm: 'Ω',
	ohms: 'Ω',
	rpm: 'rpm',
	'%': '%',
	ms: 'ms'
};

/** The unit written as `text`, by its symbol or a plain-keyboard spelling; null when unknown. */
export function parseUnit(text: string): Unit | null {
	const trimmed = text.trim();
	if (isUnit(trimmed)) return trimmed;
	// NFKC turns the ohm sign into omega; separators vary between "N·m", "N.m", "lb-ft" and "ft lb".
	const key = trimmed
		.normalize('NFKC')
		.toLowerCase()
		.replace(/[\s.·⋅•*-]/g, '');
	return Object.hasOwn(ALIASES, key) ? ALIASES[key] : null;
}

/** Rounds half away from zero; the nudge makes halves written in decimal (1.005) round up. */
function round(value: number, decimals: number): number {
	const factor = 10 ** decimals;
	const magnitude = Math.round(Math.abs(value) * factor * (1 + 2 * Number.EPSILON)) / factor;
	return value < 0 ? -magnitude : magnitude;
}

/** The number as a short decimal: no trailing zeros, no "-0", never exponent notation. */
function decimalText(value: number, decimals: number): string {
	const text = round(value, decimals).toFixed(decimals);
	const trimmed = text.includes('.') ? text.replace(/\.?0+$/, '') : text;
	return trimmed === '-0' ? '0' : trimmed;
}

function decimalsIn(text: string): number {
	const dot = text.indexOf('.');
	return dot === -1 ? 0 : text.length - dot - 1;
}

const SMALL_TORQUE_NM = 20;

/** The most decimals shown for a value in this unit, as technicians read these quantities. */
function maxDecimals(value: number, unit: Unit, valueSI: number): number {
	const size = Math.abs(value);
	let decimals: number;
	switch (unit) {
		case 'N·m':
		case 'lbf·ft':
			decimals = Math.abs(valueSI) >= SMALL_TORQUE_NM ? 0 : 1;
			break;
		case 'lbf·in':
		case 'kPa':
		case 'rpm':
			decimals = 0;
			break;
		case 'mm':
			decimals = size < 100 ? 1 : 0;
			break;
		case 'in':
		case 'gal':
			decimals = 2;
			break;
		case 'L':
			decimals = size < 1 ? 2 : 1;
			break;
		case 'psi':
			decimals = size < 10 ? 1 : 0;
			break;
		case '°C':
		case '°F':
			// Whole degrees, even near zero: a tenth of a degree is not a workshop reading.
			return 0;
		case 'qt':
		case '%':
		case 'ms':
			decimals = 1;
			break;
		default:
			decimals = 2;
	}
	// Small clearances and currents keep two significant digits (0.05 mm, 0.002 in, 0.007 A).
	const significant = size > 0 ? 1 - Math.floor(Math.log10(size)) : 0;
	return Math.max(decimals, significant);
}

/** The customary unit shown beside an SI value. */
const US_UNITS: Partial<Record<Quantity, (valueSI: number) => Unit>> = {
	torque: (nm) => (Math.abs(nm) >= SMALL_TORQUE_NM ? 'lbf·ft' : 'lbf·in'),
	length: () => 'in',
	volume: (litres) => (Math.abs(litres) >= 20 ? 'gal' : 'qt'),
	pressure: () => 'psi',
	temperature: () => '°F'
};

/** Whether the quantity is written differently in SI and US customary units. */
export function hasTwoSystems(unit: Unit): boolean {
	return quantityOf(unit) in US_UNITS;
}

function withUnit(number: string, unit: Unit): string {
	return `${number} ${unit}`;
}

/** A shorter reading may differ from the exact conversion by less than this share. */
const SHORTER_READING_TOLERANCE = 0.01;

/**
 * The other system's reading: the fewest decimals, up to the unit's maximum, that stay within
 * 1 % of the exact conversion and convert back to the value shown in the unit entered, the way
 * service manuals print "10 N·m (89 lbf·in)" but "12.7 mm (0.5 in)".
 */
function convertedText(valueSI: number, unit: Unit, entered: { unit: Unit; text: string }): string {
	const value = fromSI(valueSI, unit);
	const most = maxDecimals(value, unit, valueSI);
	const enteredDecimals = decimalsIn(entered.text);
	for (let decimals = 0; decimals < most; decimals++) {
		const candidate = round(value, decimals);
		const close = Math.abs(candidate - value) < SHORTER_READING_TOLERANCE * Math.abs(value);
		const back = fromSI(toSI(candidate, unit), entered.unit);
		if (close && decimalText(back, enteredDecimals) === entered.text) {
			return decimalText(candidate, decimals);
		}
	}
	return decimalText(value, most);
}

/**
 * A specification as shown on screen, in SI and, when the quantity has one, US customary units.
 * The system the value was entered in shows the value entered; the other is converted.
 */
export function formatSpec(valueSI: number, unitEntered: Unit): { si: string; us: string | null } {
	const enteredValue = fromSI(valueSI, unitEntered);
	const enteredText = decimalText(enteredValue, maxDecimals(enteredValue, unitEntered, valueSI));
	const entered = { unit: unitEntered, text: enteredText };
	const siUnit = siUnitOf(unitEntered);
	const usUnitFor = US_UNITS[quantityOf(unitEntered)];
	if (!usUnitFor) return { si: withUnit(enteredText, unitEntered), us: null };
	if (UNITS[unitEntered].si) {
		const usUnit = usUnitFor(valueSI);
		return {
			si: withUnit(enteredText, unitEntered),
			us: withUnit(convertedText(valueSI, usUnit, entered), usUnit)
		};
	}
	return {
		si: withUnit(convertedText(valueSI, siUnit, entered), siUnit),
		us: withUnit(enteredText, unitEntered)
	};
}

/**
 * Limits, in SI, that catch a wrong unit or a slipped digit. They are common practice for light
 * vehicles, not published values: the largest hub nut is well under 1 000 N·m; signed lengths
 * cover toe-out and offsets; the pressure ceiling covers petrol direct-injection rails (about
 * 35 MPa) and gauge vacuum; temperatures span cold-climate coolant to exhaust gas; voltages reach
 * the 1 500 V DC rating of class 0 insulating gloves; currents may be negative while charging.
 */
const LIMITS: Record<Quantity, { min: number; max: number; noun: string; above?: boolean }> = {
	// A tightening torque of zero tells the technician nothing.
	torque: { min: 0, max: 3000, noun: 'torque', above: true },
	length: { min: -100, max: 3000, noun: 'length' },
	volume: { min: 0, max: 300, noun: 'volume' },
	pressure: { min: -101.325, max: 40_000, noun: 'pressure' },
	temperature: { min: -60, max: 1300, noun: 'temperature' },
	voltage: { min: -1500, max: 1500, noun: 'voltage' },
	current: { min: -2000, max: 2000, noun: 'current' },
	resistance: { min: 0, max: 1e9, noun: 'resistance' },
	speed: { min: 0, max: 20_000, noun: 'speed' },
	ratio: { min: -100, max: 200, noun: 'percentage' },
	time: { min: 0, max: 60_000, noun: 'time' }
};

/** Null when the value is believable for a light vehicle, else a message saying what is wrong. */
export function plausible(valueSI: number, unit: Unit): string | null {
	if (!Number.isFinite(valueSI)) return 'Enter a number.';
	const { min, max, noun, above } = LIMITS[quantityOf(unit)];
	const shown = (si: number) => {
		const value = fromSI(si, unit);
		return withUnit(decimalText(value, Math.abs(value) < 10 ? 1 : 0), unit);
	};
	if (above && valueSI <= min) return `A ${noun} must be more than zero.`;
	if (valueSI < min) {
		return min === 0
			? `A ${noun} cannot be negative.`
			: `A ${noun} below ${shown(min)} is not believable for a light vehicle; check the value and unit.`;
	}
	if (valueSI > max) {
		return `A ${noun} above ${shown(max)} is not believable for a light vehicle; check the value and unit.`;
	}
	return null;
}
