/** Vehicle identification number checks, per 49 CFR 565.15 (used in the browser and on the server). */

// 49 CFR 565.15(c), Table IV: letters stand for these values; I, O and Q are never used.
const LETTER_VALUES: Readonly<Record<string, number>> = {
	A: 1,
	B: 2,
	C: 3,
	D: 4,
	E: 5,
	F: 6,
	G: 7,
	H: 8,
	J: 1,
	K: 2,
	L: 3,
	M: 4,
	N: 5,
	P: 7,
	R: 9,
	S: 2,
	T: 3,
	U: 4,
	V: 5,
	W: 6,
	X: 7,
	Y: 8,
	Z: 9
};

// 49 CFR 565.15(c), Table V: position weights; the check digit itself (9th) weighs 0.
const WEIGHTS = [8, 7, 6, 5, 4, 3, 2, 10, 0, 9, 8, 7, 6, 5, 4, 3, 2] as const;

export const VIN_LENGTH = 17;
const CHECK_POSITION = 8;

export type VinResult =
	| { ok: true; vin: string }
	| {
			ok: false;
			problem: 'length' | 'characters' | 'check-digit';
			message: string;
			/** The check digit the other 16 characters call for (only for 'check-digit'). */
			expected?: string;
	  };

function valueOf(char: string, position: number): number {
	// The 9th character is what is being checked, so any placeholder ('?') is allowed there.
	if (position === CHECK_POSITION) return 0;
	if (char >= '0' && char <= '9') return Number(char);
	const value = LETTER_VALUES[char];
	if (value === undefined) {
		throw new RangeError(`"${char}" at position ${position + 1} cannot appear in a VIN.`);
	}
	return value;
}

/** Sum of each character's value times its position weight (49 CFR 565.15(c)). */
export function weightedSum(vin17: string): number {
	if (vin17.length !== VIN_LENGTH) {
		throw new RangeError(`A VIN has ${VIN_LENGTH} characters; got ${vin17.length}.`);
	}
	let sum = 0;
	for (let i = 0; i < VIN_LENGTH; i++) sum += valueOf(vin17[i], i) * WEIGHTS[i];
	return sum;
}

/** The check digit ('0'–'9' or 'X') the other 16 characters call for. */
export function checkDigit(vin17: string): string {
	const remainder = weightedSum(vin17) % 11;
	return remainder === 10 ? 'X' : String(remainder);
}

/** Upper-cased, without the spaces and hyphens people type or copy from paperwork. */
export function normaliseVin(text: string): string {
	return text
		.trim()
		.toUpperCase()
		.replace(/[\s-]+/g, '');
}

/** Checks a VIN as typed; on success returns it normalised, ready to store. */
export function validateVin(text: string): VinResult {
	const vin = normaliseVin(text);
	if (/[IOQ]/.test(vin)) {
		return {
			ok: false,
			problem: 'characters',
			message: 'VINs never use the letters I, O or Q — check for 1 and 0.'
		};
	}
	const stray = vin.match(/[^A-Z0-9]/u);
	if (stray) {
		return {
			ok: false,
			problem: 'characters',
			message: `A VIN has only letters and digits; remove the “${stray[0]}”.`
		};
	}
	if (vin.length !== VIN_LENGTH) {
		return {
			ok: false,
			problem: 'length',
			message:
				vin.length === 0
					? 'Enter the 17-character VIN.'
					: `A VIN has 17 characters; this has ${vin.length}.`
		};
	}
	const expected = checkDigit(vin);
	if (vin[CHECK_POSITION] !== expected) {
		return {
			ok: false,
			problem: 'check-digit',
			expected,
			message: `The check digit (9th character) should be ${expected} for this VIN. Check each character; pre-1981 or non-North-American vehicles may not follow this rule.`
		};
	}
	return { ok: true, vin };
}
