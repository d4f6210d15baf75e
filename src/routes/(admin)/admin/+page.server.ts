import { fail } from '@sveltejs/kit';
import { UniqueConstraintError } from 'sequelize';
import type { Actions, PageServerLoad } from './$types';
import * as accounts from '$lib/server/accounts';
import { requireRole } from '$lib/server/auth';
import { Site, User } from '$lib/server/db';
import { changeRoleSchema, inviteSchema, userActionSchema } from '$lib/schemas/account';
import { keepValues, parseForm } from '$lib/schemas/forms';

export const load = (async (event) => {
	requireRole(event, 'admin');
	const [users, sites] = await Promise.all([
		User.findAll({
			attributes: ['id', 'name', 'email', 'role', 'active', 'passwordHash', 'siteId'],
			order: [
				['role', 'ASC'],
				['name', 'ASC']
			]
		}),
		Site.findAll({ attributes: ['id', 'code', 'name'], order: [['code', 'ASC']] })
	]);
	return {
		users: users.map((u) => ({
			id: u.id,
			name: u.name,
			email: u.email,
			role: u.role,
			active: u.active,
			invited: u.passwordHash === null,
			siteId: u.siteId ?? null
		})),
		sites: sites.map((s) => ({ id: s.id, label: `${s.code} · ${s.name}` })),
		me: event.locals.user!.id
	};
}) satisfies PageServerLoad;

export const actions = {
	invite: async (event) => {
		const admin = requireRole(event, 'admin');
		const form = await event.request.formData();
		const values = keepValues(form);
		const parsed = parseForm(inviteSchema, form);
		if (!parsed.ok) return fail(400, { action: 'invite', values, errors: parsed.errors });
		if (parsed.data.siteId && !(await Site.findByPk(parsed.data.siteId))) {
			return fail(400, {
				action: 'invite',
				values,
				errors: { siteId: 'Choose a shop from the list.' }
			});
		}
		try {
			await accounts.invite(parsed.data, admin.name);
		} catch (err) {
			if (err instanceof UniqueConstraintError) {
				return fail(409, {
					action: 'invite',
					values,
					errors: { email: 'Someone already has an account with this e-mail.' }
				});
			}
			throw err;
		}
		return { action: 'invite', invited: parsed.data.email };
	},
	role: async (event) => {
		const admin = requireRole(event, 'admin');
		const parsed = parseForm(changeRoleSchema, await event.request.formData());
		if (!parsed.ok) return fail(400, { action: 'role', errors: parsed.errors });
		if (parsed.data.userId === admin.id) {
			return fail(400, { action: 'role', errors: { form: 'You cannot change your own role.' } });
		}
		if (!(await User.findByPk(parsed.data.userId))) {
			return fail(404, { action: 'role', errors: { form: 'That user no longer exists.' } });
		}
		await accounts.changeRole(parsed.data.userId, parsed.data.role);
		return { action: 'role', done: true };
	},
	active: async (event) => {
		const admin = requireRole(event, 'admin');
		const form = await event.request.formData();
		const parsed = parseForm(userActionSchema, form);
		if (!parsed.ok) return fail(400, { action: 'active', errors: parsed.errors });
		if (parsed.data.userId === admin.id) {
			return fail(400, {
				action: 'active',
				errors: { form: 'You cannot switch off your own account.' }
			});
		}
		const user = await User.findByPk(parsed.data.userId);
		if (!user)
			return fail(404, { action: 'active', errors: { form: 'That user no longer exists.' } });
		await accounts.setActive(user.id, !user.active);
		return { action: 'active', done: true };
	}
} satisfies Actions;
