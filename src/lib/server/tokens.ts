import { createHash, randomBytes } from 'node:crypto';
import { Op, type Transaction } from 'sequelize';
import { UserToken, type User } from './db';
import type { TokenPurpose } from './db/models/UserToken';

export const LIFETIME_HOURS: Record<TokenPurpose, number> = { invite: 7 * 24, reset: 1 };

export const hashToken = (token: string) => createHash('sha256').update(token).digest('hex');

/** Creates a single-use token; earlier unused tokens of the same purpose stop working. */
export async function issue(
	userId: string,
	purpose: TokenPurpose,
	transaction: Transaction,
	now = new Date()
): Promise<string> {
	await UserToken.update(
		{ usedAt: now },
		{ where: { userId, purpose, usedAt: null }, transaction }
	);
	const token = randomBytes(32).toString('base64url');
	await UserToken.create(
		{
			userId,
			purpose,
			tokenHash: hashToken(token),
			expiresAt: new Date(now.getTime() + LIFETIME_HOURS[purpose] * 3_600_000),
			usedAt: null
		},
		{ transaction }
	);
	return token;
}

export type TokenProblem = 'unknown' | 'used' | 'expired';

/** The token's row if it can still be used, else why not. */
export async function find(
	token: string,
	purpose: TokenPurpose,
	transaction?: Transaction,
	now = new Date()
): Promise<{ row: UserToken & { user: User } } | { problem: TokenProblem }> {
	if (!/^[A-Za-z0-9_-]{43}$/.test(token)) return { problem: 'unknown' };
	const row = (await UserToken.findOne({
		where: { tokenHash: hashToken(token), purpose },
		include: ['user'],
		transaction
	})) as (UserToken & { user: User }) | null;
	if (!row) return { problem: 'unknown' };
	if (row.usedAt) return { problem: 'used' };
	if (row.expiresAt <= now) return { problem: 'expired' };
	return { row };
}

export async function purgeExpired(transaction: Transaction, now = new Date()) {
	await UserToken.destroy({ where: { expiresAt: { [Op.lt]: now } }, transaction });
}
