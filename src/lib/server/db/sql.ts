/** Raw SELECTs and the SQL conditions every aggregate shares, so every screen counts the same way. */
import { QueryTypes, type Sequelize } from 'sequelize';
import { sequelize } from '.';

/** Runs a SELECT with named replacements and returns its rows (on `db`, the main connection by default). */
export const select = <T extends object>(
	sql: string,
	replacements: Record<string, unknown> = {},
	db: Sequelize = sequelize
): Promise<T[]> => db.query<T>(sql, { type: QueryTypes.SELECT, replacements });

/**
 * A verified entry counts unless a verified correction has replaced it. Used wherever verified
 * hours are summed so every screen agrees. The subquery is uncorrelated on purpose: SQLite
 * builds the short list of replaced ids once instead of probing per row.
 */
export const COUNTED = `e.status = 'verified'
	AND e.id NOT IN (SELECT corrects_id FROM log_entries
	                  WHERE corrects_id IS NOT NULL AND status = 'verified')`;

/** Sign-offs and corrections that no later record revoked or corrected. */
export const STANDING = `s.kind IN ('sign-off', 'correction')
	AND s.id NOT IN (SELECT refers_to_id FROM sign_offs WHERE refers_to_id IS NOT NULL)`;
