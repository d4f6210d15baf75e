import { generateIdFromEntropySize } from 'lucia';
import { lucia } from './auth';
import { User, write, type Role } from './db';
import * as mail from './mail';
import { decoyHash, hashPassword, verifyPassword } from './password';
import * as throttle from './throttle';
import * as tokens from './tokens';
import type { TokenProblem } from './tokens';

export type SignInResult =
	| { ok: true; user: User }
	| { ok: false; reason: 'invalid' | 'inactive' }
	| { ok: false; reason: 'throttled'; retryAfter: number };

/** Checks a password, counting failures per account and per address. */
export async function signIn(
	email: string,
	password: string,
	address: string
): Promise<SignInResult> {
	const keys: [keyof typeof throttle.LIMITS, string][] = [
		['account', email],
		['address', address]
	];
	const wait = await throttle.retryAfter(keys);
	if (wait > 0) return { ok: false, reason: 'throttled', retryAfter: wait };

	const user = await User.findOne({ where: { email: email.toLowerCase() } });
	// Unknown e-mails cost the same argon2 work as a wrong password.
	const valid = await verifyPassword(user?.passwordHash ?? (await decoyHash()), password);
	if (!user || !user.passwordHash || !valid) {
		await throttle.recordFailure(keys);
		return { ok: false, reason: 'invalid' };
	}
	if (!user.active) return { ok: false, reason: 'inactive' };
	await throttle.clear('account', email);
	return { ok: true, user };
}

export interface Invitation {
	email: string;
	name: string;
	role: Role;
	siteId: number | null;
}

/** Creates the account without a password and e-mails a single-use link to set one. */
export async function invite(input: Invitation, invitedBy: string): Promise<User> {
	const { user, token } = await write(async (transaction) => {
		const user = await User.create(
			{
				id: generateIdFromEntropySize(10),
				email: input.email.toLowerCase(),
				name: input.name,
				role: input.role,
				siteId: input.siteId,
				passwordHash: null
			},
			{ transaction }
		);
		return { user, token: await tokens.issue(user.id, 'invite', transaction) };
	});
	await mail.send({
		to: user.email,
		subject: 'You are invited to Journeymark',
		text: [
			`Hello ${user.name},`,
			'',
			`${invitedBy} has invited you to Journeymark as ${user.role}.`,
			'Open this link to choose your password and sign in. It works once and expires in 7 days.',
			'',
			mail.link(`/welcome/${token}`),
			'',
			'If you did not expect this, ignore this message.'
		].join('\n')
	});
	return user;
}

/** Sends a reset link when the e-mail belongs to an active account; says nothing either way. */
export async function requestReset(email: string): Promise<void> {
	const user = await User.findOne({ where: { email: email.toLowerCase(), active: true } });
	if (!user || !user.passwordHash) return;
	const token = await write((transaction) => tokens.issue(user.id, 'reset', transaction));
	await mail.send({
		to: user.email,
		subject: 'Reset your Journeymark password',
		text: [
			`Hello ${user.name},`,
			'',
			'Someone asked to reset the password of your Journeymark account.',
			'Open this link within one hour to choose a new password. It works once.',
			'',
			mail.link(`/reset/${token}`),
			'',
			'If it was not you, ignore this message: your password stays as it is.'
		].join('\n')
	});
}

/** Sets the password from an invitation or reset link and ends every other session. */
export async function redeem(
	token: string,
	purpose: 'invite' | 'reset',
	password: string
): Promise<{ user: User } | { problem: TokenProblem }> {
	const passwordHash = await hashPassword(password);
	const result = await write(async (transaction) => {
		const found = await tokens.find(token, purpose, transaction);
		if ('problem' in found) return found;
		const { row } = found;
		await row.update({ usedAt: new Date() }, { transaction });
		await row.user.update({ passwordHash }, { transaction });
		return { user: row.user };
	});
	if ('user' in result) await lucia.invalidateUserSessions(result.user.id);
	return result;
}

export async function changeRole(userId: string, role: Role) {
	await write((transaction) => User.update({ role }, { where: { id: userId }, transaction }));
}

/** Deactivating ends the user's sessions at once; their records stay. */
export async function setActive(userId: string, active: boolean) {
	await write((transaction) => User.update({ active }, { where: { id: userId }, transaction }));
	if (!active) await lucia.invalidateUserSessions(userId);
}
