/**
 * The cohort benchmark's baseline: one hand-written SQL query, run with the raw `sqlite3` driver
 * (no ORM), that computes the per-apprentice totals `GET /api/cohorts/all/progress` returns.
 * Written from the product's rules, not from the app's progress queries, so that agreeing
 * totals are a real cross-check:
 *
 * - verified on-the-job hours: verified entries, less any verified entry that a verified
 *   correction (an entry whose `corrects_id` points to it) has replaced — counted once, however
 *   many corrections point to it;
 * - pending hours: entries submitted and waiting for review;
 * - returned: entries sent back and not yet resubmitted;
 * - tasks at the required level per priority tier: a sign-off stands when it is a sign-off or a
 *   correction and no later record (revocation or correction) refers to it; it counts for the
 *   task of the current framework (the newest published version) with the same code, at the
 *   highest standing level, against that task's required level;
 * - related instruction: records a coordinator confirmed whose result is attended or passed.
 *
 * Scope: every active apprentice with an apprentice record, as the `all` cohort.
 */
import sqlite3 from 'sqlite3';

export const COHORT_SQL = `
WITH current_framework AS (
  SELECT id FROM frameworks WHERE status = 'published' ORDER BY version DESC LIMIT 1
),
by_status AS (
  SELECT apprentice_id, status, SUM(tenths) AS tenths, COUNT(*) AS entries
    FROM log_entries GROUP BY apprentice_id, status
),
replaced AS (
  SELECT e.apprentice_id, SUM(e.tenths) AS tenths
    FROM log_entries e
   WHERE e.status = 'verified'
     AND e.id IN (SELECT corrects_id FROM log_entries WHERE status = 'verified' AND corrects_id IS NOT NULL)
   GROUP BY e.apprentice_id
),
hours AS (
  SELECT apprentice_id,
         SUM(CASE status WHEN 'verified' THEN tenths ELSE 0 END) AS verified_tenths,
         SUM(CASE status WHEN 'submitted' THEN tenths ELSE 0 END) AS pending_tenths,
         SUM(CASE status WHEN 'returned' THEN entries ELSE 0 END) AS returned
    FROM by_status GROUP BY apprentice_id
),
standing AS (
  SELECT so.apprentice_id, so.task_id, MAX(so.level) AS level
    FROM sign_offs so
   WHERE so.kind IN ('sign-off', 'correction')
     AND NOT EXISTS (SELECT 1 FROM sign_offs later WHERE later.refers_to_id = so.id)
   GROUP BY so.apprentice_id, so.task_id
),
best AS (
  SELECT st.apprentice_id, cur.tier, cur.required_level, MAX(st.level) AS level
    FROM standing st
    JOIN framework_tasks signed ON signed.id = st.task_id
    JOIN framework_tasks cur
      ON cur.framework_id = (SELECT id FROM current_framework) AND cur.code = signed.code
   GROUP BY st.apprentice_id, cur.id
),
tiers AS (
  SELECT apprentice_id,
         SUM(tier = 1 AND level >= required_level) AS tier1,
         SUM(tier = 2 AND level >= required_level) AS tier2,
         SUM(tier = 3 AND level >= required_level) AS tier3
    FROM best GROUP BY apprentice_id
),
instruction AS (
  SELECT apprentice_id, SUM(tenths) AS tenths
    FROM rti_records
   WHERE confirmed_at IS NOT NULL AND result IN ('attended', 'passed')
   GROUP BY apprentice_id
)
SELECT u.id,
       COALESCE(h.verified_tenths, 0) - COALESCE(r.tenths, 0) AS "verifiedTenths",
       COALESCE(h.pending_tenths, 0) AS "pendingTenths",
       COALESCE(h.returned, 0) AS returned,
       COALESCE(t.tier1, 0) AS tier1,
       COALESCE(t.tier2, 0) AS tier2,
       COALESCE(t.tier3, 0) AS tier3,
       COALESCE(i.tenths, 0) AS "rtiTenths"
  FROM apprentice_profiles p
  JOIN users u ON u.id = p.user_id AND u.active = 1
  LEFT JOIN hours h ON h.apprentice_id = u.id
  LEFT JOIN replaced r ON r.apprentice_id = u.id
  LEFT JOIN tiers t ON t.apprentice_id = u.id
  LEFT JOIN instruction i ON i.apprentice_id = u.id
`;

export interface SqlTotals {
	id: string;
	verifiedTenths: number;
	pendingTenths: number;
	returned: number;
	tier1: number;
	tier2: number;
	tier3: number;
	rtiTenths: number;
}

/** The slice of the API's answer this check compares. */
export interface ApiApprentice {
	id: string;
	name: string;
	verifiedHours: number;
	pendingHours: number;
	rtiHours: number;
	tiers: { tier: number; met: number }[];
	reasons: string[];
}

export class RawDb {
	readonly #db: sqlite3.Database;

	constructor(file: string) {
		this.#db = new sqlite3.Database(file, sqlite3.OPEN_READONLY);
		this.#db.configure('busyTimeout', 10_000);
	}

	all<T>(sql: string, params: unknown[] = []): Promise<T[]> {
		return new Promise((resolve, reject) =>
			this.#db.all(sql, params, (err, rows) => (err ? reject(err) : resolve(rows as T[])))
		);
	}

	close(): Promise<void> {
		return new Promise((resolve, reject) => this.#db.close((e) => (e ? reject(e) : resolve())));
	}
}

const tenths = (hours: number) => Math.round(hours * 10);

/**
 * Every difference between the SQL totals and the API's, as readable lines (empty when they
 * agree). The API shows returned entries only once they reach the programme's limit, in the
 * at-risk reason "<n> returned entries not yet corrected."; below it the SQL count must be
 * under the limit.
 */
export function compareTotals(
	sql: SqlTotals[],
	api: ApiApprentice[],
	returnedLimit: (apprenticeId: string) => number
): string[] {
	const problems: string[] = [];
	const byId = new Map(sql.map((r) => [r.id, r]));
	if (sql.length !== api.length) {
		problems.push(`The SQL counts ${sql.length} apprentices, the API ${api.length}.`);
	}
	for (const a of api) {
		const s = byId.get(a.id);
		if (!s) {
			problems.push(`${a.name} (${a.id}) is in the API's answer but not in the SQL's.`);
			continue;
		}
		byId.delete(a.id);
		const met = (tier: number) => a.tiers.find((t) => t.tier === tier)?.met ?? 0;
		const pairs: [string, number, number][] = [
			['verified tenths', s.verifiedTenths, tenths(a.verifiedHours)],
			['pending tenths', s.pendingTenths, tenths(a.pendingHours)],
			['tier 1 tasks met', s.tier1, met(1)],
			['tier 2 tasks met', s.tier2, met(2)],
			['tier 3 tasks met', s.tier3, met(3)],
			['instruction tenths', s.rtiTenths, tenths(a.rtiHours)]
		];
		const shown = a.reasons
			.map((r) => /^(\d+) returned entries not yet corrected\.$/.exec(r))
			.find(Boolean);
		if (shown) pairs.push(['returned entries', s.returned, Number(shown[1])]);
		else if (s.returned >= returnedLimit(a.id)) {
			problems.push(
				`${a.name} (${a.id}): SQL counts ${s.returned} returned entries (limit ${returnedLimit(a.id)}) but the API gives no such reason.`
			);
		}
		for (const [what, mine, theirs] of pairs) {
			if (mine !== theirs)
				problems.push(`${a.name} (${a.id}): ${what} SQL ${mine}, API ${theirs}.`);
		}
	}
	for (const id of byId.keys()) problems.push(`${id} is in the SQL's answer but not the API's.`);
	return problems;
}
