/**
 * The only SQL that differs between SQLite and PostgreSQL: date arithmetic and joined lists in
 * queries (`sqlFor`), and the few statements one database has and the other lacks
 * (`STATEMENTS`). Every other query is written once in SQL both accept (quoted camelCase
 * aliases, booleans tested as booleans, counts with CASE rather than sums of comparisons, full
 * GROUP BY lists, INSERT … ON CONFLICT).
 */
import { config } from '../config';

export type Dialect = 'sqlite' | 'postgres';

export function sqlFor(dialect: Dialect) {
	const pg = dialect === 'postgres';
	/** Days from `earlier` to `later` (dates or ISO date strings); a number, may be fractional on SQLite. */
	const days = (later: string, earlier: string) =>
		pg
			? `(CAST(${later} AS date) - CAST(${earlier} AS date))`
			: `(julianday(${later}) - julianday(${earlier}))`;
	return {
		dialect,
		/** Whole weeks from `earlier` to `later`, truncated toward zero. */
		wholeWeeks: (later: string, earlier: string) =>
			pg ? `(${days(later, earlier)} / 7)` : `CAST(${days(later, earlier)} / 7 AS INTEGER)`,
		/** Whole years of 365.25 days from `earlier` to `later`, truncated toward zero. */
		wholeYears: (later: string, earlier: string) =>
			pg
				? `CAST(TRUNC(${days(later, earlier)} / 365.25) AS INTEGER)`
				: `CAST(${days(later, earlier)} / 365.25 AS INTEGER)`,
		/** The Monday of the week a date falls in, as 'YYYY-MM-DD'. */
		weekStart: (date: string) =>
			pg
				? `to_char(date_trunc('week', CAST(${date} AS date)), 'YYYY-MM-DD')`
				: `date(${date}, 'weekday 0', '-6 days')`,
		/** The values of a group joined by `separator` (order not guaranteed). */
		joined: (expr: string, separator: string) =>
			pg
				? `string_agg(CAST(${expr} AS text), '${separator}')`
				: `GROUP_CONCAT(${expr}, '${separator}')`,
		/** The distinct values of a group joined by commas (order not guaranteed). */
		joinedDistinct: (expr: string) =>
			pg ? `string_agg(DISTINCT CAST(${expr} AS text), ',')` : `GROUP_CONCAT(DISTINCT ${expr})`,
		/** Days from `earlier` to `later` (dates or ISO date strings), as above. */
		days,
		/** The day of the week of a date as an integer, 0 for Sunday to 6 for Saturday. */
		dayOfWeek: (date: string) =>
			pg
				? `CAST(EXTRACT(DOW FROM CAST(${date} AS date)) AS INTEGER)`
				: `CAST(strftime('%w', ${date}) AS INTEGER)`
	};
}

/** The configured database's dialect. */
export const dialectSql = sqlFor(config.database.dialect);

/** Statements for one database only; callers check the dialect first. */
export const STATEMENTS = {
	/** SQLite: readers keep reading while one writer writes. */
	walMode: 'PRAGMA journal_mode = WAL',
	/** PostgreSQL: held until the transaction ends; makes writers take turns across instances. */
	transactionLock: (key: number) => `SELECT pg_advisory_xact_lock(${Math.trunc(key)})`,
	/** PostgreSQL: held by one connection until released (the migration run). */
	sessionLock: (key: number) => `SELECT pg_advisory_lock(${Math.trunc(key)})`,
	sessionUnlock: (key: number) => `SELECT pg_advisory_unlock(${Math.trunc(key)})`,
	/** PostgreSQL: tables whose `id` comes from a sequence. */
	sequencedTables: `SELECT table_name AS "table" FROM information_schema.columns
	  WHERE table_schema = current_schema() AND column_name = 'id'
	    AND column_default LIKE 'nextval(%'`,
	/** PostgreSQL: the next id `table` hands out is one past its highest. */
	advanceSequence: (table: string) => {
		const quoted = `"${table.replace(/"/g, '')}"`;
		return `SELECT setval(pg_get_serial_sequence('${quoted}', 'id'),
		                      COALESCE((SELECT MAX(id) FROM ${quoted}), 0) + 1, false)`;
	}
} as const;
