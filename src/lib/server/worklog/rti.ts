import { QueryTypes } from 'sequelize';
import type { z } from 'zod';
import type { rtiSchema } from '$lib/schemas/worklog';
import type { SignedInUser } from '../auth';
import { ApprenticeProfile, RtiRecord, sequelize, write } from '../db';
import { EntryProblem } from './errors';

type RtiInput = z.infer<typeof rtiSchema>;

/** Related instruction is entered by the apprentice (then confirmed) or by a coordinator. */
export async function record(user: SignedInUser, input: RtiInput): Promise<RtiRecord> {
	const apprenticeId = user.role === 'apprentice' ? user.id : input.apprenticeId;
	if (user.role !== 'apprentice' && user.role !== 'coordinator') {
		throw new EntryProblem(403, { form: 'Only apprentices and coordinators record instruction.' });
	}
	if (!apprenticeId || !(await ApprenticeProfile.findByPk(apprenticeId))) {
		throw new EntryProblem(400, { apprenticeId: 'Choose an apprentice.' });
	}
	if (input.completedOn > new Date().toISOString().slice(0, 10)) {
		throw new EntryProblem(400, { completedOn: 'Instruction cannot be dated in the future.' });
	}
	const byCoordinator = user.role === 'coordinator';
	return write((transaction) =>
		RtiRecord.create(
			{
				apprenticeId,
				course: input.course,
				provider: input.provider,
				completedOn: input.completedOn,
				tenths: Math.round(input.hours * 10),
				result: input.result,
				enteredById: user.id,
				confirmedById: byCoordinator ? user.id : null,
				confirmedAt: byCoordinator ? new Date() : null
			},
			{ transaction }
		)
	);
}

export async function confirm(user: SignedInUser, id: number): Promise<void> {
	if (user.role !== 'coordinator') {
		throw new EntryProblem(403, { form: 'Only coordinators confirm instruction.' });
	}
	await write(async (transaction) => {
		const row = await RtiRecord.findByPk(id, { transaction });
		if (!row) throw new EntryProblem(404, { form: 'No such record.' });
		if (row.confirmedAt) throw new EntryProblem(409, { form: 'This record is already confirmed.' });
		await row.update({ confirmedById: user.id, confirmedAt: new Date() }, { transaction });
	});
}

export interface RtiRow {
	id: number;
	apprenticeId: string;
	apprenticeName: string;
	course: string;
	provider: string;
	completedOn: string;
	tenths: number;
	result: string;
	confirmed: number;
}

/** Records of one apprentice, or every record waiting for confirmation when `apprenticeId` is null. */
export async function list(apprenticeId: string | null): Promise<RtiRow[]> {
	return sequelize.query<RtiRow>(
		`SELECT r.id, r.apprentice_id AS "apprenticeId", u.name AS "apprenticeName", r.course, r.provider,
		        r.completed_on AS "completedOn", r.tenths, r.result, r.confirmed_at IS NOT NULL AS confirmed
		   FROM rti_records r JOIN users u ON u.id = r.apprentice_id
		  WHERE ${apprenticeId ? 'r.apprentice_id = :apprenticeId' : 'r.confirmed_at IS NULL'}
		  ORDER BY r.completed_on DESC LIMIT 500`,
		{ type: QueryTypes.SELECT, replacements: { apprenticeId } }
	);
}
