import type { Adapter, DatabaseSession, DatabaseUser } from 'lucia';
import { Op } from 'sequelize';
import { write } from '.';
import { Session, User } from './models';

export type UserAttributes = Pick<User, 'email' | 'name' | 'role' | 'active'> & {
	siteId: number | null;
};

function toUser(user: User): DatabaseUser {
	return {
		id: user.id,
		attributes: {
			email: user.email,
			name: user.name,
			role: user.role,
			active: user.active,
			siteId: user.siteId ?? null
		}
	};
}

function toSession(session: Session): DatabaseSession {
	return { id: session.id, userId: session.userId, expiresAt: session.expiresAt, attributes: {} };
}

/** Lucia's storage of sessions, on our Sequelize models. */
export const sequelizeAdapter: Adapter = {
	async getSessionAndUser(sessionId) {
		const session = await Session.findByPk(sessionId, {
			include: [{ model: User, as: 'user' }]
		});
		const user = (session as (Session & { user?: User }) | null)?.user;
		if (!session || !user) return [null, null];
		return [toSession(session), toUser(user)];
	},
	async getUserSessions(userId) {
		const sessions = await Session.findAll({ where: { userId } });
		return sessions.map(toSession);
	},
	async setSession(session) {
		await write((transaction) =>
			Session.create(
				{ id: session.id, userId: session.userId, expiresAt: session.expiresAt },
				{ transaction }
			)
		);
	},
	async updateSessionExpiration(sessionId, expiresAt) {
		await write((transaction) =>
			Session.update({ expiresAt }, { where: { id: sessionId }, transaction })
		);
	},
	async deleteSession(sessionId) {
		await write((transaction) => Session.destroy({ where: { id: sessionId }, transaction }));
	},
	async deleteUserSessions(userId) {
		await write((transaction) => Session.destroy({ where: { userId }, transaction }));
	},
	async deleteExpiredSessions() {
		await write((transaction) =>
			Session.destroy({ where: { expiresAt: { [Op.lte]: new Date() } }, transaction })
		);
	}
};
