import { beforeAll, describe, expect, it } from 'vitest';
import * as accounts from '$lib/server/accounts';
import { lucia } from '$lib/server/auth';
import { prepare, Session, User, UserToken, write } from '$lib/server/db';
import { hashPassword } from '$lib/server/password';
import { LIMITS } from '$lib/server/throttle';
import { firstLink, waitForMail } from '../helpers/mail';

const mailDir = () => process.env.FAKE_MAIL_DIR!;
let n = 0;
const uniqueEmail = () => `person${++n}-${Date.now()}@shop.example`;

async function activeUser(password = 'a long enough password') {
	const email = uniqueEmail();
	const user = await write((transaction) =>
		User.create(
			{
				id: `u${n}x${Date.now()}`,
				email,
				name: 'Test Person',
				role: 'apprentice',
				siteId: null,
				passwordHash: null
			},
			{ transaction }
		)
	);
	const passwordHash = await hashPassword(password);
	await write((transaction) => user.update({ passwordHash }, { transaction }));
	return { user, email, password };
}

beforeAll(() => prepare());

describe('password hashing', () => {
	it('uses argon2id with the OWASP minimum parameters', async () => {
		// OWASP Password Storage Cheat Sheet: argon2id, m=19456 KiB, t=2, p=1
		expect(await hashPassword('x'.repeat(12))).toMatch(/^\$argon2id\$v=19\$m=19456,t=2,p=1\$/);
	});
});

describe('sign-in', () => {
	it('accepts the right password and refuses a wrong one', async () => {
		const { email, password } = await activeUser();
		expect((await accounts.signIn(email, password, '10.0.0.1')).ok).toBe(true);
		expect(await accounts.signIn(email, 'wrong password!!', '10.0.0.1')).toEqual({
			ok: false,
			reason: 'invalid'
		});
	});

	it('answers an unknown e-mail like a wrong password, with similar timing', async () => {
		const { email } = await activeUser();
		const time = async (address: string, mail: string) => {
			const start = performance.now();
			const result = await accounts.signIn(mail, 'wrong password!!', address);
			return { result, ms: performance.now() - start };
		};
		await time('10.0.0.9', uniqueEmail()); // warms the decoy hash
		const known = await time('10.0.0.2', email);
		const unknown = await time('10.0.0.3', uniqueEmail());
		expect(unknown.result).toEqual(known.result);
		// Both do one argon2 verification; a missing one would be several times faster.
		expect(unknown.ms).toBeGreaterThan(known.ms * 0.4);
	});

	it('pauses an account after repeated failures, even with the right password', async () => {
		const { email, password } = await activeUser();
		for (let i = 0; i < LIMITS.account.failures; i++) {
			await accounts.signIn(email, 'wrong password!!', `10.1.0.${i}`);
		}
		const result = await accounts.signIn(email, password, '10.1.1.1');
		expect(result.ok).toBe(false);
		expect(result).toMatchObject({ reason: 'throttled' });
		if (!result.ok && result.reason === 'throttled') {
			expect(result.retryAfter).toBeGreaterThan(0);
			expect(result.retryAfter).toBeLessThanOrEqual(LIMITS.account.blockMinutes * 60);
		}
	});

	it('pauses an address that tries many accounts', async () => {
		for (let i = 0; i < LIMITS.address.failures; i++) {
			await accounts.signIn(uniqueEmail(), 'wrong password!!', '10.2.0.1');
		}
		const { email, password } = await activeUser();
		expect(await accounts.signIn(email, password, '10.2.0.1')).toMatchObject({
			reason: 'throttled'
		});
		expect((await accounts.signIn(email, password, '10.2.0.2')).ok).toBe(true);
	});
});

describe('invitations and resets', () => {
	it('e-mails a single-use invitation link that sets the password', async () => {
		const email = uniqueEmail();
		const user = await accounts.invite(
			{ email, name: 'New Starter', role: 'supervisor', siteId: null },
			'Admin Person'
		);
		expect(user.passwordHash).toBeNull();
		const mail = await waitForMail(mailDir(), email, /invited/);
		const link = new URL(firstLink(mail));
		expect(link.origin).toBe(process.env.ORIGIN);
		const token = link.pathname.split('/').pop()!;

		const redeemed = await accounts.redeem(token, 'invite', 'a brand new password');
		expect('user' in redeemed).toBe(true);
		expect((await accounts.signIn(email, 'a brand new password', '10.3.0.1')).ok).toBe(true);
		// Used once: a second use is refused and the password stays.
		expect(await accounts.redeem(token, 'invite', 'another new password')).toEqual({
			problem: 'used'
		});
		expect((await accounts.signIn(email, 'a brand new password', '10.3.0.1')).ok).toBe(true);
		// Only the hash of the token is stored.
		expect(await UserToken.count({ where: { tokenHash: token } })).toBe(0);
	});

	it('refuses an expired link and an unknown one', async () => {
		const email = uniqueEmail();
		await accounts.invite(
			{ email, name: 'Late Starter', role: 'apprentice', siteId: null },
			'Admin'
		);
		const token = new URL(firstLink(await waitForMail(mailDir(), email, /invited/))).pathname
			.split('/')
			.pop()!;
		await write((transaction) =>
			UserToken.update({ expiresAt: new Date(Date.now() - 1000) }, { where: {}, transaction })
		);
		expect(await accounts.redeem(token, 'invite', 'a brand new password')).toEqual({
			problem: 'expired'
		});
		expect(await accounts.redeem('x'.repeat(43), 'invite', 'a brand new password')).toEqual({
			problem: 'unknown'
		});
		expect(await accounts.redeem('../../etc', 'reset', 'a brand new password')).toEqual({
			problem: 'unknown'
		});
	});

	it('resets a password by e-mail and signs out every other session', async () => {
		const { user, email } = await activeUser();
		await lucia.createSession(user.id, {});
		await accounts.requestReset(email);
		const token = new URL(firstLink(await waitForMail(mailDir(), email, /Reset/))).pathname
			.split('/')
			.pop()!;
		expect('user' in (await accounts.redeem(token, 'reset', 'my new longer password'))).toBe(true);
		expect(await Session.count({ where: { userId: user.id } })).toBe(0);
		expect((await accounts.signIn(email, 'my new longer password', '10.4.0.1')).ok).toBe(true);
	});

	it('sends nothing for an unknown e-mail and says nothing about it', async () => {
		await expect(accounts.requestReset('nobody@nowhere.example')).resolves.toBeUndefined();
	});
});

describe('deactivation', () => {
	it('ends the user’s sessions and refuses sign-in', async () => {
		const { user, email, password } = await activeUser();
		const session = await lucia.createSession(user.id, {});
		await accounts.setActive(user.id, false);
		expect((await lucia.validateSession(session.id)).session).toBeNull();
		expect(await accounts.signIn(email, password, '10.5.0.1')).toEqual({
			ok: false,
			reason: 'inactive'
		});
		await accounts.setActive(user.id, true);
		expect((await accounts.signIn(email, password, '10.5.0.1')).ok).toBe(true);
	});
});
