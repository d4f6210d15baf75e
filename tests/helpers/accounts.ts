/** Demo accounts as the signed-in users route handlers and services expect. */
import type { SignedInUser } from '$lib/server/auth';
import { User } from '$lib/server/db';
import { DEMO_ACCOUNTS } from '../../seed/demo';

export const signed = (u: User) =>
	({
		id: u.id,
		email: u.email,
		name: u.name,
		role: u.role,
		active: true,
		siteId: u.siteId ?? null
	}) as SignedInUser;

/** The demo account of a role (apprentice@example.org and so on), signed in. */
export const byRole = async (role: string) =>
	signed(
		await User.findOne({
			where: { email: DEMO_ACCOUNTS.find((a) => a.role === role)!.email },
			rejectOnEmpty: true
		})
	);
