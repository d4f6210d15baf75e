import type { Transaction } from 'sequelize';
import type { SignedInUser } from '../auth';
import { Supervision, type LogEntry } from '../db';

/** Whether `supervisorId` is assigned to supervise `apprenticeId`. */
export async function supervises(
	supervisorId: string,
	apprenticeId: string,
	transaction?: Transaction
): Promise<boolean> {
	if (supervisorId === apprenticeId) return false;
	return (await Supervision.count({ where: { supervisorId, apprenticeId }, transaction })) > 0;
}

/** Who may see an entry: its apprentice, their journeyworkers, coordinators and admins. */
export async function canView(user: SignedInUser, entry: Pick<LogEntry, 'apprenticeId'>) {
	switch (user.role) {
		case 'apprentice':
			return entry.apprenticeId === user.id;
		case 'supervisor':
			return supervises(user.id, entry.apprenticeId);
		case 'coordinator':
		case 'admin':
			return true;
	}
}
