import type { Approach } from '../db/models/Programme';

export type Level = 1 | 2 | 3 | 4;

/** A task the apprentice stands at its required level or above. */
export interface CoveredTask {
	code: string;
	title: string;
	areaCode: string;
	tier: 1 | 2 | 3;
	level: Level;
	requiredLevel: Level;
	/** ISO timestamp of the sign-off that stands. */
	signedAt: string;
}

/** One area of the current framework, as an interim credential would cover it. */
export interface AreaStanding {
	code: string;
	name: string;
	/** Every task of the area stands at its required level. */
	complete: boolean;
	/** Plain sentences saying what is still missing; empty when complete. */
	missing: string[];
	tasks: CoveredTask[];
	verifiedTenths: number;
}

/** What a certificate for this apprentice could cover, computed by the progress engine. */
export interface Qualification {
	apprenticeId: string;
	holder: string;
	programme: {
		id: number;
		name: string;
		approach: Approach;
		certificateValidityMonths: number | null;
	};
	/** Whole-programme completion under the programme's approach. */
	completion: { qualifies: boolean; missing: string[] };
	/** Interim credentials exist only in competency-based and hybrid programmes, 29 CFR 29.5(b)(16). */
	interimAllowed: boolean;
	areas: AreaStanding[];
	/** Every task standing at its required level, in framework order. */
	tasks: CoveredTask[];
	totals: { verifiedTenths: number; creditHours: number; rtiTenths: number };
}
