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
