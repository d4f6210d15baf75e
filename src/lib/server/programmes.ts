/** Programme rules: read for the editor, saved whole in one write, never half-way. */
import * as audit from './audit';
import type { SignedInUser } from './auth';
import { ApprenticeProfile, Cohort, Programme, write } from './db';
import type { ProgrammeRulesInput } from '$lib/schemas/programme';

export async function list() {
	const [programmes, cohorts] = await Promise.all([
		Programme.findAll({
			attributes: ['id', 'name', 'approach', 'ojlHours'],
			order: [['name', 'ASC']],
			raw: true
		}),
		Cohort.findAll({ attributes: ['id', 'name', 'programmeId'], raw: true })
	]);
	return programmes.map((p) => ({
		...p,
		cohorts: cohorts.filter((c) => c.programmeId === p.id).map((c) => c.name)
	}));
}

/** The stored rules in the shape the form and the API use. */
export function toInput(p: Programme): ProgrammeRulesInput {
	return {
		name: p.name,
		approach: p.approach,
		termYears: p.termYears,
		ojlHours: p.ojlHours,
		rtiHoursPerYear: p.rtiHoursPerYear,
		probationHours: p.probationHours,
		journeyworkerRate: p.journeyworkerRateCents / 100,
		wageSchedule: p.wageSchedule.map((s) => ({
			fromHours: s.fromHours,
			percent: s.percent,
			minTasks: s.minTasks ?? 0
		})),
		ratioRule: p.ratioRule,
		ratioApprentices: p.ratioApprentices,
		ratioJourneyworkers: p.ratioJourneyworkers,
		ratioEvery: p.ratioEvery,
		tier1: p.tierThresholds[0],
		tier2: p.tierThresholds[1],
		tier3: p.tierThresholds[2],
		stallWeeks: p.stallWeeks,
		returnedLimit: p.returnedLimit,
		certificateValidityMonths: p.certificateValidityMonths
	};
}

export async function get(id: number) {
	return Programme.findByPk(id);
}

/** Saves validated rules; returns null when the programme does not exist. */
export async function update(id: number, input: ProgrammeRulesInput) {
	return write(async (transaction) => {
		const p = await Programme.findByPk(id, { transaction });
		if (!p) return null;
		await p.update(
			{
				name: input.name,
				approach: input.approach,
				termYears: input.termYears,
				ojlHours: input.ojlHours,
				rtiHoursPerYear: input.rtiHoursPerYear,
				probationHours: input.probationHours,
				journeyworkerRateCents: Math.round(input.journeyworkerRate * 100),
				wageSchedule: input.wageSchedule.map((s) =>
					s.minTasks > 0 ? s : { fromHours: s.fromHours, percent: s.percent }
				),
				ratioRule: input.ratioRule,
				ratioApprentices: input.ratioApprentices,
				ratioJourneyworkers: input.ratioJourneyworkers,
				ratioEvery: input.ratioEvery,
				tierThresholds: [input.tier1, input.tier2, input.tier3],
				stallWeeks: input.stallWeeks,
				returnedLimit: input.returnedLimit,
				certificateValidityMonths: input.certificateValidityMonths
			},
			{ transaction }
		);
		return p;
	});
}

/**
 * Sets an apprentice's credit for prior experience. It cannot exceed the programme's hours, and
 * the change, with its reason, enters the audit trail.
 */
export async function setPriorCredit(
	actor: SignedInUser,
	apprenticeId: string,
	hours: number,
	reason: string
): Promise<{ ok: true } | { ok: false; error: string }> {
	return write(async (transaction) => {
		const profile = await ApprenticeProfile.findByPk(apprenticeId, {
			transaction,
			include: [{ model: Cohort, as: 'cohort', include: [{ model: Programme, as: 'programme' }] }]
		});
		const programme = (profile as unknown as { cohort?: { programme?: Programme } })?.cohort
			?.programme;
		if (!profile || !programme) return { ok: false, error: 'No such apprentice.' };
		if (hours > programme.ojlHours) {
			return {
				ok: false,
				error: `Prior credit cannot exceed the programme's ${programme.ojlHours.toLocaleString('en-US')} on-the-job hours.`
			};
		}
		const before = profile.priorCreditHours;
		await profile.update({ priorCreditHours: hours }, { transaction });
		await audit.append(transaction, {
			kind: 'credit.set',
			subject: `apprentice:${apprenticeId}`,
			actorId: actor.id,
			content: { apprenticeId, before, hours, reason }
		});
		return { ok: true };
	});
}
