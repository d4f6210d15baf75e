import type { Approach } from './db/models/Programme';
import { COUNTED, select } from './db/sql';

export interface ApprenticeRecord {
	name: string;
	cohortName: string;
	siteName: string | null;
	programmeName: string;
	approach: Approach;
	ojlHours: number;
	rtiHoursPerYear: number;
	startDate: string;
	plannedEndDate: string;
	priorCreditHours: number;
	supervisors: { name: string; email: string }[];
}

export async function apprenticeRecord(userId: string): Promise<ApprenticeRecord | null> {
	const [rows, supervisors] = await Promise.all([
		select<Omit<ApprenticeRecord, 'supervisors'>>(
			`SELECT u.name, c.name AS "cohortName", s.name AS "siteName", p.name AS "programmeName",
			        p.approach, p.ojl_hours AS "ojlHours", p.rti_hours_per_year AS "rtiHoursPerYear",
			        a.start_date AS "startDate", a.planned_end_date AS "plannedEndDate",
			        a.prior_credit_hours AS "priorCreditHours"
			   FROM apprentice_profiles a
			   JOIN users u ON u.id = a.user_id
			   JOIN cohorts c ON c.id = a.cohort_id
			   JOIN programmes p ON p.id = c.programme_id
			   LEFT JOIN sites s ON s.id = u.site_id
			  WHERE a.user_id = :userId`,
			{ userId }
		),
		select<{ name: string; email: string }>(
			`SELECT u.name, u.email FROM supervisions v JOIN users u ON u.id = v.supervisor_id
			  WHERE v.apprentice_id = :userId AND u.active ORDER BY u.name`,
			{ userId }
		)
	]);
	return rows[0] ? { ...rows[0], supervisors } : null;
}

export async function supervisedBy(supervisorId: string) {
	return select<{
		id: string;
		name: string;
		cohortName: string;
		siteName: string | null;
		startDate: string;
	}>(
		`SELECT u.id, u.name, c.name AS "cohortName", s.name AS "siteName", a.start_date AS "startDate"
		   FROM supervisions v
		   JOIN users u ON u.id = v.apprentice_id AND u.active
		   JOIN apprentice_profiles a ON a.user_id = u.id
		   JOIN cohorts c ON c.id = a.cohort_id
		   LEFT JOIN sites s ON s.id = u.site_id
		  WHERE v.supervisor_id = :supervisorId
		  ORDER BY u.name`,
		{ supervisorId }
	);
}

export async function cohortSummaries() {
	return select<{
		id: number;
		name: string;
		programmeName: string;
		startDate: string;
		plannedEndDate: string;
		apprentices: number;
	}>(
		`SELECT c.id, c.name, p.name AS "programmeName", c.start_date AS "startDate",
		        c.planned_end_date AS "plannedEndDate", COUNT(a.user_id) AS apprentices
		   FROM cohorts c
		   JOIN programmes p ON p.id = c.programme_id
		   LEFT JOIN apprentice_profiles a ON a.cohort_id = c.id
		  GROUP BY c.id, p.name ORDER BY c.start_date DESC`
	);
}

export async function siteSummaries() {
	return select<{
		id: number;
		code: string;
		name: string;
		town: string;
		apprentices: number;
		supervisors: number;
	}>(
		`SELECT s.id, s.code, s.name, s.town,
		        COUNT(CASE WHEN u.role = 'apprentice' AND u.active THEN 1 END) AS apprentices,
		        COUNT(CASE WHEN u.role = 'supervisor' AND u.active THEN 1 END) AS supervisors
		   FROM sites s LEFT JOIN users u ON u.site_id = s.id
		  GROUP BY s.id ORDER BY s.code`
	);
}

export interface ApprenticeRow {
	id: string;
	name: string;
	cohortName: string;
	siteName: string | null;
	verifiedTenths: number;
	waiting: number;
}

/** Every active apprentice with verified hours and entries waiting, in one aggregate query. */
export async function apprentices(): Promise<ApprenticeRow[]> {
	return select<ApprenticeRow>(
		`SELECT u.id, u.name, c.name AS "cohortName", s.name AS "siteName",
		        COALESCE(SUM(CASE WHEN ${COUNTED} THEN e.tenths END), 0) AS "verifiedTenths",
		        COUNT(CASE WHEN e.status = 'submitted' THEN 1 END) AS waiting
		   FROM apprentice_profiles a
		   JOIN users u ON u.id = a.user_id AND u.active
		   JOIN cohorts c ON c.id = a.cohort_id
		   LEFT JOIN sites s ON s.id = u.site_id
		   LEFT JOIN log_entries e ON e.apprentice_id = u.id
		  GROUP BY u.id, c.name, c.start_date, s.name ORDER BY c.start_date, u.name`
	);
}
