export interface BurnUpData {
	weeks: string[];
	actual: number[];
	plan: number[];
}

export interface RatioData {
	weeks: string[];
	sites: { id: number; code: string; name: string; peak: (number | null)[]; breaches: number[] }[];
	ratio:
		| { kind: 'fixed'; apprentices: number; journeyworkers: number }
		| { kind: 'first-then-every'; every: number };
}
