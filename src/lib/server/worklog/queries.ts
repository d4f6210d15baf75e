import type { EntryStatus } from '../db';
import { dialectSql } from '../db/dialect';
import { select } from '../db/sql';

export interface EntrySummary {
	id: number;
	workDate: string;
	startTime: string | null;
	endTime: string | null;
	tenths: number;
	repairOrder: string;
	vehicle: string;
	status: EntryStatus;
	returnComment: string | null;
	apprenticeId: string;
	apprenticeName: string;
	supervisorName: string;
	taskCodes: string;
	evidenceCount: number;
	thumbnailId: number | null;
	correctsId: number | null;
	submittedAt: string | null;
}

const SUMMARY = `
	SELECT e.id, e.work_date AS "workDate", e.start_time AS "startTime", e.end_time AS "endTime", e.tenths,
	       e.repair_order AS "repairOrder",
	       TRIM(COALESCE(e.vehicle_year || ' ', '') || e.vehicle_make || ' ' || e.vehicle_model) AS vehicle,
	       e.status, e.return_comment AS "returnComment", e.apprentice_id AS "apprenticeId",
	       a.name AS "apprenticeName", s.name AS "supervisorName",
	       (SELECT ${dialectSql.joined('t.code', ' ')} FROM log_entry_tasks lt JOIN framework_tasks t ON t.id = lt.task_id
	         WHERE lt.entry_id = e.id) AS "taskCodes",
	       (SELECT COUNT(*) FROM evidence v WHERE v.entry_id = e.id) AS "evidenceCount",
	       (SELECT MIN(v.id) FROM evidence v WHERE v.entry_id = e.id AND v.kind = 'image') AS "thumbnailId",
	       e.corrects_id AS "correctsId", e.submitted_at AS "submittedAt"
	  FROM log_entries e
	  JOIN users a ON a.id = e.apprentice_id
	  JOIN users s ON s.id = e.supervisor_id`;

/** One apprentice's entries, newest first. */
export async function forApprentice(
	apprenticeId: string,
	filter: { status?: EntryStatus; limit: number; offset: number }
) {
	const where = ['e.apprentice_id = :apprenticeId'];
	if (filter.status) where.push('e.status = :status');
	const replacements = { apprenticeId, ...filter };
	const [rows, [{ total }]] = await Promise.all([
		select<EntrySummary>(
			`${SUMMARY} WHERE ${where.join(' AND ')}
			 ORDER BY e.work_date DESC, e.start_time DESC, e.id DESC LIMIT :limit OFFSET :offset`,
			replacements
		),
		select<{ total: number }>(
			`SELECT COUNT(*) AS total FROM log_entries e WHERE ${where.join(' AND ')}`,
			replacements
		)
	]);
	return { rows, total };
}

export type QueueSort = 'oldest' | 'newest' | 'apprentice';
const ORDER: Record<QueueSort, string> = {
	oldest: 'e.submitted_at ASC, e.id ASC',
	newest: 'e.submitted_at DESC, e.id DESC',
	apprentice: 'a.name ASC, e.work_date ASC'
};

/** Entries waiting for a journeyworker: submitted by apprentices they supervise. */
export async function queue(
	supervisorId: string,
	filter: {
		status: EntryStatus;
		apprenticeId?: string;
		sort: QueueSort;
		limit: number;
		offset: number;
	}
) {
	const where = [
		'e.status = :status',
		'e.apprentice_id IN (SELECT apprentice_id FROM supervisions WHERE supervisor_id = :supervisorId)'
	];
	if (filter.apprenticeId) where.push('e.apprentice_id = :apprenticeId');
	const replacements = { supervisorId, ...filter };
	const [rows, [{ total }]] = await Promise.all([
		select<EntrySummary>(
			`${SUMMARY} WHERE ${where.join(' AND ')} ORDER BY ${ORDER[filter.sort]} LIMIT :limit OFFSET :offset`,
			replacements
		),
		select<{ total: number }>(
			`SELECT COUNT(*) AS total FROM log_entries e WHERE ${where.join(' AND ')}`,
			replacements
		)
	]);
	return { rows, total };
}

/** What an apprentice is likely to enter again: recent vehicles, repair orders and tasks. */
export async function suggestions(apprenticeId: string) {
	const [vehicles, repairOrders, tasks, supervisors] = await Promise.all([
		select<{
			vehicleYear: number | null;
			vehicleMake: string;
			vehicleModel: string;
			vin: string | null;
			odometer: number | null;
			odometerUnit: 'mi' | 'km';
		}>(
			// Per vehicle, the latest entry's details with the highest odometer seen.
			`SELECT "vehicleYear", "vehicleMake", "vehicleModel", vin, odometer, "odometerUnit"
			   FROM (SELECT vehicle_year AS "vehicleYear", vehicle_make AS "vehicleMake",
			                vehicle_model AS "vehicleModel", vin, odometer_unit AS "odometerUnit",
			                MAX(odometer) OVER vehicle AS odometer, MAX(work_date) OVER vehicle AS latest,
			                ROW_NUMBER() OVER (vehicle ORDER BY work_date DESC, id DESC) AS nth
			           FROM log_entries
			          WHERE apprentice_id = :apprenticeId AND (vin IS NOT NULL OR vehicle_make <> '')
			         WINDOW vehicle AS (PARTITION BY COALESCE(vin, vehicle_make || vehicle_model))) v
			  WHERE nth = 1 ORDER BY latest DESC LIMIT 6`,
			{ apprenticeId }
		),
		select<{ repairOrder: string }>(
			`SELECT repair_order AS "repairOrder" FROM log_entries WHERE apprentice_id = :apprenticeId
			  GROUP BY repair_order ORDER BY MAX(work_date) DESC LIMIT 6`,
			{ apprenticeId }
		),
		select<{ id: number; code: string; title: string }>(
			`SELECT t.id, t.code, t.title FROM log_entry_tasks lt
			   JOIN log_entries e ON e.id = lt.entry_id
			   JOIN framework_tasks t ON t.id = lt.task_id
			   JOIN frameworks f ON f.id = t.framework_id AND f.status = 'published'
			  WHERE e.apprentice_id = :apprenticeId
			  GROUP BY t.id ORDER BY MAX(e.work_date) DESC LIMIT 8`,
			{ apprenticeId }
		),
		select<{ id: string; name: string }>(
			`SELECT u.id, u.name FROM supervisions v JOIN users u ON u.id = v.supervisor_id
			  WHERE v.apprentice_id = :apprenticeId AND u.active ORDER BY u.name`,
			{ apprenticeId }
		)
	]);
	return { vehicles, repairOrders: repairOrders.map((r) => r.repairOrder), tasks, supervisors };
}
