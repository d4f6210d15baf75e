import { describe, expect, it } from 'vitest';
import {
	formatSpec,
	hasTwoSystems,
	fromSI,
	parseUnit,
	plausible,
	siUnitOf,
	toSI,
	UNIT_SYMBOLS,
	UNITS,
	type Unit
} from '../../src/lib/units';

describe('conversion factors', () => {
	it('converts torque with the published factors', () => {
		// NIST SP 811, Appendix B: 1 lbf·ft = 1.355 818 N·m
		expect(toSI(1, 'lbf·ft')).toBeCloseTo(1.355818, 6);
		// NIST SP 811, Appendix B: 1 lbf·in = 0.112 984 8 N·m
		expect(toSI(1, 'lbf·in')).toBeCloseTo(0.1129848, 7);
		// NIST SP 811: 1 lbf·ft is exactly 12 lbf·in
		expect(toSI(12, 'lbf·in')).toBeCloseTo(toSI(1, 'lbf·ft'), 12);
	});

	it('converts length, volume and pressure with the published factors', () => {
		// NIST SP 811, Appendix B: 1 in = 2.54 cm exactly
		expect(toSI(1, 'in')).toBe(25.4);
		expect(fromSI(25.4, 'in')).toBe(1);
		// NIST SP 811, Appendix B: 1 US gallon = 3.785 412 L
		expect(toSI(1, 'gal')).toBeCloseTo(3.785412, 6);
		// NIST SP 811, Appendix B: 1 US liquid quart = 0.946 352 9 L
		expect(toSI(1, 'qt')).toBeCloseTo(0.9463529, 7);
		// NIST SP 811, Appendix B: 1 psi = 6.894 757 kPa
		expect(toSI(1, 'psi')).toBeCloseTo(6.894757, 6);
	});

	it('converts temperature with the exact formula', () => {
		// NIST SP 811, Appendix B: t/°C = (t/°F − 32)/1.8
		expect(toSI(212, '°F')).toBe(100);
		expect(toSI(32, '°F')).toBe(0);
		expect(toSI(-40, '°F')).toBe(-40);
		expect(fromSI(100, '°F')).toBe(212);
		expect(fromSI(-40, '°F')).toBe(-40);
	});

	it('leaves SI units and one-system units unchanged', () => {
		for (const unit of ['N·m', 'mm', 'L', 'kPa', '°C', 'V', 'A', 'Ω', 'rpm', '%', 'ms'] as const) {
			expect(toSI(12.5, unit)).toBe(12.5);
		}
	});

	it('returns every unit to its value after a round trip', () => {
		for (const unit of UNIT_SYMBOLS) {
			for (const value of [-40, 0, 0.05, 1, 89, 177, 2500]) {
				expect(fromSI(toSI(value, unit), unit)).toBeCloseTo(value, 9);
			}
		}
	});

	it('names the SI unit of each quantity', () => {
		expect(siUnitOf('lbf·in')).toBe('N·m');
		expect(siUnitOf('in')).toBe('mm');
		expect(siUnitOf('qt')).toBe('L');
		expect(siUnitOf('gal')).toBe('L');
		expect(siUnitOf('psi')).toBe('kPa');
		expect(siUnitOf('°F')).toBe('°C');
		expect(siUnitOf('Ω')).toBe('Ω');
		for (const unit of Object.keys(UNITS) as Unit[]) expect(UNITS[siUnitOf(unit)].si).toBe(true);
	});
});

describe('formatSpec', () => {
	const show = (value: number, unit: Unit) => formatSpec(toSI(value, unit), unit);

	it('shows large torques in whole N·m and whole lbf·ft', () => {
		// common practice, no published source
		expect(show(177, 'lbf·ft')).toEqual({ si: '240 N·m', us: '177 lbf·ft' });
		// common practice, no published source
		expect(show(140, 'lbf·ft')).toEqual({ si: '190 N·m', us: '140 lbf·ft' });
		// common practice, no published source
		expect(show(58, 'lbf·ft')).toEqual({ si: '79 N·m', us: '58 lbf·ft' });
		expect(show(240, 'N·m')).toEqual({ si: '240 N·m', us: '177 lbf·ft' });
		expect(show(110, 'N·m').us).toBe('81 lbf·ft');
	});

	it('shows small torques in N·m with up to one decimal and whole lbf·in', () => {
		// common practice, no published source
		expect(toSI(89, 'lbf·in')).toBeCloseTo(10.06, 2);
		expect(fromSI(toSI(89, 'lbf·in'), 'lbf·ft')).toBeCloseTo(7.42, 2);
		expect(show(89, 'lbf·in')).toEqual({ si: '10 N·m', us: '89 lbf·in' });
		expect(show(10, 'N·m')).toEqual({ si: '10 N·m', us: '89 lbf·in' });
		expect(show(8.5, 'N·m')).toEqual({ si: '8.5 N·m', us: '75 lbf·in' });
		expect(show(6, 'N·m').us).toBe('53 lbf·in');
	});

	it('shows lengths in mm and inches', () => {
		// common practice, no published source: a level 12 mm below the fill hole
		expect(show(12, 'mm')).toEqual({ si: '12 mm', us: '0.47 in' });
		expect(show(26, 'mm').us).toBe('1.02 in');
		expect(show(125.4, 'mm').si).toBe('125 mm');
		expect(show(25.86, 'mm').si).toBe('25.9 mm');
		expect(show(0.5, 'in')).toEqual({ si: '12.7 mm', us: '0.5 in' });
	});

	it('keeps two significant digits for clearances and runout', () => {
		expect(show(0.05, 'mm')).toEqual({ si: '0.05 mm', us: '0.002 in' });
		expect(show(0.015, 'mm').si).toBe('0.015 mm');
	});

	it('shows volumes in litres, quarts and gallons', () => {
		expect(show(4.7, 'L')).toEqual({ si: '4.7 L', us: '5 qt' });
		expect(show(0.45, 'L').si).toBe('0.45 L');
		expect(show(5, 'qt')).toEqual({ si: '4.7 L', us: '5 qt' });
		expect(show(15.85, 'gal')).toEqual({ si: '60 L', us: '15.85 gal' });
		expect(show(60, 'L').us).toBe('15.9 gal');
	});

	it('shows pressures in whole kPa and psi, psi with a decimal below 10', () => {
		expect(show(240, 'kPa')).toEqual({ si: '240 kPa', us: '35 psi' });
		expect(show(55, 'psi')).toEqual({ si: '379 kPa', us: '55 psi' });
		expect(show(7.5, 'psi').us).toBe('7.5 psi');
	});

	it('shows temperatures in whole degrees', () => {
		expect(show(212, '°F')).toEqual({ si: '100 °C', us: '212 °F' });
		expect(show(-40, '°C')).toEqual({ si: '-40 °C', us: '-40 °F' });
		expect(show(88.4, '°C')).toEqual({ si: '88 °C', us: '191 °F' });
	});

	it('shows one-system quantities once', () => {
		expect(show(12.6, 'V')).toEqual({ si: '12.6 V', us: null });
		expect(show(0.007, 'A')).toEqual({ si: '0.007 A', us: null });
		expect(show(750, 'rpm')).toEqual({ si: '750 rpm', us: null });
		expect(show(10, '%')).toEqual({ si: '10 %', us: null });
	});
});

describe('plausible', () => {
	it('accepts ordinary workshop values', () => {
		expect(plausible(toSI(140, 'lbf·ft'), 'lbf·ft')).toBeNull();
		expect(plausible(-1, 'mm')).toBeNull();
		expect(plausible(-37, '°C')).toBeNull();
		expect(plausible(-0.5, 'V')).toBeNull();
		expect(plausible(-60, 'kPa')).toBeNull();
	});

	it('rejects absurd values', () => {
		// common practice, no published source: no light-vehicle fastener needs 10 000 N·m
		expect(plausible(10_000, 'N·m')).toMatch(/torque/);
		expect(plausible(-5, 'N·m')).toMatch(/more than zero/);
		expect(plausible(toSI(-5, 'lbf·ft'), 'lbf·ft')).not.toBeNull();
		expect(plausible(3500, 'mm')).not.toBeNull();
		expect(plausible(400, 'L')).not.toBeNull();
		expect(plausible(-1, 'L')).not.toBeNull();
		expect(plausible(toSI(30_000, 'psi'), 'psi')).toMatch(/psi/);
		expect(plausible(1400, '°C')).not.toBeNull();
		expect(plausible(-70, '°C')).not.toBeNull();
		expect(plausible(2000, 'V')).not.toBeNull();
		expect(plausible(Number.NaN, 'V')).not.toBeNull();
	});
});

describe('parseUnit', () => {
	it('reads symbols and keyboard spellings', () => {
		expect(parseUnit('N·m')).toBe('N·m');
		expect(parseUnit(' Nm ')).toBe('N·m');
		expect(parseUnit('lb-ft')).toBe('lbf·ft');
		expect(parseUnit('ft lb')).toBe('lbf·ft');
		expect(parseUnit('in-lb')).toBe('lbf·in');
		expect(parseUnit('\u2126')).toBe('Ω');
		expect(parseUnit('degC')).toBe('°C');
		expect(parseUnit('l')).toBe('L');
	});

	it('refuses unknown units', () => {
		expect(parseUnit('furlong')).toBeNull();
		expect(parseUnit('Nmm')).toBeNull();
		expect(parseUnit('')).toBeNull();
		expect(parseUnit('constructor')).toBeNull();
	});
});

describe('rounding edge cases', () => {
	it('rounds decimal halves up and never prints exponents or negative zero', () => {
		expect(formatSpec(0.145, 'L').si).toBe('0.15 L');
		expect(formatSpec(0.125, 'L').si).toBe('0.13 L');
		expect(formatSpec(0.0000005, 'A').si).toBe('0.0000005 A');
		expect(formatSpec(-0.0001, '°C').si).toBe('0 °C');
	});

	it('says which quantities have two unit systems', () => {
		expect(hasTwoSystems('lbf·in')).toBe(true);
		expect(hasTwoSystems('°C')).toBe(true);
		expect(hasTwoSystems('V')).toBe(false);
		expect(hasTwoSystems('%')).toBe(false);
	});
});
