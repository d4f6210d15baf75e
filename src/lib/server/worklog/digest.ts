import { QueryTypes, UniqueConstraintError } from 'sequelize';
import { sequelize, write } from '../db';
import { dialectSql } from '../db/dialect';
import * as mail from '../mail';

interface Waiting {
	supervisorId: string;
	email: string;
	name: string;
	waiting: number;
	oldest: string;
	apprentices: string;
}

/**
 * E-mails each journeyworker who has entries waiting a short list of them, at most once a day.
 * The day's row is claimed in the database before sending, so two instances never both send.
 */
export async function sendReviewDigests(now = new Date()): Promise<number> {
	const day = now.toISOString().slice(0, 10);
	const rows = await sequelize.query<Waiting>(
		`SELECT v.supervisor_id AS "supervisorId", s.email, s.name, COUNT(e.id) AS waiting,
		        MIN(e.work_date) AS oldest, ${dialectSql.joinedDistinct('a.name')} AS apprentices
		   FROM supervisions v
		   JOIN users s ON s.id = v.supervisor_id AND s.active
		   JOIN log_entries e ON e.apprentice_id = v.apprentice_id AND e.status = 'submitted'
		   JOIN users a ON a.id = e.apprentice_id
		  WHERE NOT EXISTS (SELECT 1 FROM review_digests d WHERE d.supervisor_id = v.supervisor_id AND d.day = :day)
		  GROUP BY v.supervisor_id, s.email, s.name`,
		{ type: QueryTypes.SELECT, replacements: { day } }
	);
	let sent = 0;
	for (const row of rows) {
		const claimed = await write(async (transaction) => {
			try {
				await sequelize.query(
					`INSERT INTO review_digests (supervisor_id, day, waiting, sent_at) VALUES (:id, :day, :waiting, :now)`,
					{ replacements: { id: row.supervisorId, day, waiting: row.waiting, now }, transaction }
				);
				return true;
			} catch (err) {
				// Another instance claimed this journeyworker's digest for today first.
				if (err instanceof UniqueConstraintError) return false;
				throw err;
			}
		});
		if (!claimed) continue;
		await mail.send({
			to: row.email,
			subject: `${row.waiting} ${row.waiting === 1 ? 'entry is' : 'entries are'} waiting for your review`,
			text: [
				`Hello ${row.name},`,
				'',
				`${row.waiting} logged ${row.waiting === 1 ? 'entry waits' : 'entries wait'} for you to verify or return, the oldest from ${row.oldest}.`,
				`From: ${row.apprentices.split(',').join(', ')}.`,
				'',
				mail.link('/supervisor/queue')
			].join('\n')
		});
		sent++;
	}
	return sent;
}
