import { describe, expect, it } from 'vitest';
import { checkDigit, normaliseVin, validateVin, weightedSum } from '../../src/lib/vin';

describe('weightedSum and checkDigit against published examples', () => {
	it('matches the sample in the regulation', () => {
		// 49 CFR 565.15(c): sample 1G4AH59H?5G118341, products sum to 411, 411 / 11 leaves 4
		expect(weightedSum('1G4AH59H?5G118341')).toBe(411);
		expect(checkDigit('1G4AH59H?5G118341')).toBe('4');
		expect(validateVin('1G4AH59H45G118341')).toEqual({ ok: true, vin: '1G4AH59H45G118341' });
	});

	it('matches the NHTSA guide for new manufacturers', () => {
		// NHTSA VIN guide for new manufacturers: 1J9RP1A36A1644345, sum 314, check digit 6
		expect(weightedSum('1J9RP1A36A1644345')).toBe(314);
		expect(checkDigit('1J9RP1A36A1644345')).toBe('6');
		expect(validateVin('1J9RP1A36A1644345').ok).toBe(true);
	});

	it('writes a remainder of 10 as X', () => {
		// Widely used hypothetical VIN 1M8GDM9A?KP042788: sum 351, 351 = 31 × 11 + 10 → X
		expect(weightedSum('1M8GDM9A?KP042788')).toBe(351);
		expect(checkDigit('1M8GDM9A?KP042788')).toBe('X');
		expect(validateVin('1M8GDM9AXKP042788')).toEqual({ ok: true, vin: '1M8GDM9AXKP042788' });
	});
});

// Computed by hand from 49 CFR 565.15 tables (Table IV letter values, Table V weights
// 8 7 6 5 4 3 2 10 0 9 8 7 6 5 4 3 2); invented VINs, products per position 1–17:
//
// | VIN               | products                                             | sum | mod 11 |
// | 1HGCM826?3A004352 | 8 56 42 15 16 24 4 60 0 27 8 0 0 20 12 15 4          | 311 | 3      |
// | WVWZZZ1J?YW000001 | 48 35 36 45 36 27 2 10 0 72 48 0 0 0 0 0 2           | 361 | 9      |
// | 5YJ3E1EA?KF317000 | 40 56 6 15 20 3 10 10 0 18 48 21 6 35 0 0 0          | 288 | 2      |
// | JN1TBNT3?0W000123 | 8 35 6 15 8 15 6 30 0 0 48 0 0 0 4 6 6               | 187 | 0      |
// | SALGS2RE?KA523801 | 16 7 18 35 8 6 18 50 0 18 8 35 12 15 32 0 2          | 280 | 5      |
// | 4US3CU1P?NL000777 | 32 28 12 15 12 12 2 70 0 45 24 0 0 0 28 21 14        | 315 | 7      |
// | 2FMDK3JC?BBA41556 | 16 42 24 20 8 9 2 30 0 18 16 7 24 5 20 15 12         | 268 | 4      |
// | 3VWDX7AJ?BM351260 | 24 35 36 20 28 21 2 10 0 18 32 21 30 5 8 18 0        | 308 | 0      |
//
// e.g. 1HGCM826?3A004352: 1×8, H8×7, G7×6, C3×5, M4×4, 8×3, 2×2, 6×10, ?×0, 3×9, A1×8,
// 0×7, 0×6, 4×5, 3×4, 5×3, 2×2 = 311 = 28 × 11 + 3.
const HAND_COMPUTED: [template: string, sum: number, digit: string][] = [
	['1HGCM826?3A004352', 311, '3'],
	['WVWZZZ1J?YW000001', 361, '9'],
	['5YJ3E1EA?KF317000', 288, '2'],
	['JN1TBNT3?0W000123', 187, '0'],
	['SALGS2RE?KA523801', 280, '5'],
	['4US3CU1P?NL000777', 315, '7'],
	['2FMDK3JC?BBA41556', 268, '4'],
	['3VWDX7AJ?BM351260', 308, '0']
];

describe('checkDigit on VINs computed by hand from 49 CFR 565.15 tables', () => {
	it.each(HAND_COMPUTED)('%s sums to %i, check digit %s', (template, sum, digit) => {
		expect(weightedSum(template)).toBe(sum);
		expect(checkDigit(template)).toBe(digit);
		const vin = template.replace('?', digit);
		expect(validateVin(vin)).toEqual({ ok: true, vin });
	});

	it('covers every letter the regulation allows', () => {
		// 49 CFR 565.15(c), Table IV: 23 letters (all but I, O, Q)
		const letters = new Set(
			[...HAND_COMPUTED.map(([v]) => v), '1J9RP1A36A1644345', '1M8GDM9A?KP042788']
				.join('')
				.replace(/[^A-Z]/g, '')
		);
		expect([...letters].sort().join('')).toBe('ABCDEFGHJKLMNPRSTUVWXYZ');
	});
});

describe('validateVin', () => {
	it('normalises spaces, hyphens and lower case before checking', () => {
		expect(validateVin('  1hgcm826-33a0 04352 ')).toEqual({ ok: true, vin: '1HGCM82633A004352' });
		expect(normaliseVin(' 1j9rp1a36a-1644345\t')).toBe('1J9RP1A36A1644345');
	});

	it('refuses the wrong length with the count', () => {
		expect(validateVin('1HGCM82633A00435')).toEqual({
			ok: false,
			problem: 'length',
			message: 'A VIN has 17 characters; this has 16.'
		});
		expect(validateVin('1HGCM82633A0043521')).toMatchObject({
			problem: 'length',
			message: 'A VIN has 17 characters; this has 18.'
		});
		expect(validateVin('   ')).toMatchObject({ problem: 'length' });
	});

	it('refuses I, O and Q and points at 1 and 0', () => {
		// 49 CFR 565.15(c): I, O and Q are never used
		for (const vin of ['1HGCM826330O04352', '1HGCM8263IA004352', '1HGCM8263QA004352']) {
			expect(validateVin(vin)).toEqual({
				ok: false,
				problem: 'characters',
				message: 'VINs never use the letters I, O or Q — check for 1 and 0.'
			});
		}
	});

	it('names a stray symbol', () => {
		expect(validateVin('1HGCM826*3A004352')).toEqual({
			ok: false,
			problem: 'characters',
			message: 'A VIN has only letters and digits; remove the “*”.'
		});
		expect(validateVin('VIN:1HGCM82633A004352')).toMatchObject({ problem: 'characters' });
	});

	it('gives the expected check digit when it does not match', () => {
		// 49 CFR 565.15(c) sample with 4 replaced by 7
		const result = validateVin('1G4AH59H75G118341');
		expect(result).toEqual({
			ok: false,
			problem: 'check-digit',
			expected: '4',
			message:
				'The check digit (9th character) should be 4 for this VIN. Check each character; pre-1981 or non-North-American vehicles may not follow this rule.'
		});
	});

	it('catches a single mistyped character', () => {
		// NHTSA guide VIN with the 12th character 6 typed as 8: the sum changes by 2 × 7
		expect(validateVin('1J9RP1A36A1844345')).toMatchObject({
			ok: false,
			problem: 'check-digit',
			expected: String((314 + 14) % 11)
		});
	});

	it('expects X, not a digit, when the remainder is 10', () => {
		expect(validateVin('1M8GDM9A0KP042788')).toMatchObject({
			problem: 'check-digit',
			expected: 'X'
		});
	});
});

describe('weightedSum input guard', () => {
	it('refuses anything that is not 17 VIN characters', () => {
		expect(() => weightedSum('1G4AH59H45G11834')).toThrow(RangeError);
		expect(() => weightedSum('1G4AH59H45G11834O')).toThrow(/position 17/);
	});
});
