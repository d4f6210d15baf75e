/** Records for integration tests, made through the app (hours) or as rows (sign-offs). */
import type { SignedInUser } from '$lib/server/auth';
import { SignOff } from '$lib/server/db';
import * as worklog from '$lib/server/worklog';

/** Logs and submits one entry on one task through the work log; verifies it when asked. */
export async function logHours(
	apprentice: SignedInUser,
	supervisor: SignedInUser,
	entry: { day: string; hours: number; taskId: number; verify: boolean; make?: string }
) {
	const created = await worklog.create(
		apprentice,
		{
			workDate: entry.day,
			hours: entry.hours,
			repairOrder: `RO-${entry.day.replaceAll('-', '')}`,
			vehicleMake: entry.make ?? 'Compact hatch',
			vehicleModel: 'base',
			vinOverride: false,
			odometerUnit: 'mi',
			supervisorId: supervisor.id,
			notes: '',
			tasks: [{ taskId: entry.taskId, hours: entry.hours }]
		},
		'submit'
	);
	if (entry.verify) await worklog.verify(supervisor, [created.id]);
	return created;
}

/**
 * A sign-off (or a revocation pointing back) stored as a row, for tests about what is counted
 * rather than about the e-signature, which `assessment.test.ts` covers.
 */
export function signOffRow(row: {
	apprenticeId: string;
	supervisorId: string;
	taskId: number;
	frameworkId: number;
	level: 1 | 2 | 3 | 4;
	signedAt: Date;
	kind?: 'sign-off' | 'revocation';
	refersToId?: number | null;
}) {
	const kind = row.kind ?? 'sign-off';
	return SignOff.create({
		kind,
		apprenticeId: row.apprenticeId,
		taskId: row.taskId,
		frameworkId: row.frameworkId,
		supervisorId: row.supervisorId,
		level: kind === 'revocation' ? null : row.level,
		results: null,
		quizAttemptId: null,
		verifiedTenths: 0,
		refersToId: row.refersToId ?? null,
		reason: kind === 'revocation' ? 'Recorded against the wrong apprentice.' : null,
		sessionHash: 'test',
		contentHash: `test-${row.taskId}-${row.level}-${kind}`,
		signedAt: row.signedAt
	} as never) as Promise<SignOff>;
}
