import type { Sequelize } from 'sequelize';
import { ApprenticeProfile } from './ApprenticeProfile';
import { Cohort } from './Cohort';
import { LoginThrottle } from './LoginThrottle';
import { Programme } from './Programme';
import { Session } from './Session';
import { Site } from './Site';
import { SupervisorProfile } from './SupervisorProfile';
import { Supervision } from './Supervision';
import { User } from './User';
import { UserToken } from './UserToken';

export {
	ApprenticeProfile,
	Cohort,
	LoginThrottle,
	Programme,
	Session,
	Site,
	SupervisorProfile,
	Supervision,
	User,
	UserToken
};
export type { Role } from './User';
export { ROLES } from './User';

/** Initialises every model on one Sequelize instance, then wires the associations. */
export function initModels(sequelize: Sequelize) {
	for (const model of [
		User,
		Session,
		Site,
		Programme,
		Cohort,
		ApprenticeProfile,
		SupervisorProfile,
		Supervision,
		UserToken,
		LoginThrottle
	]) {
		model.initModel(sequelize);
	}

	User.belongsTo(Site, { foreignKey: 'siteId', as: 'site' });
	User.hasMany(Session, { foreignKey: 'userId', onDelete: 'CASCADE' });
	Session.belongsTo(User, { foreignKey: 'userId', as: 'user' });
	User.hasOne(ApprenticeProfile, { foreignKey: 'userId', as: 'apprenticeProfile' });
	ApprenticeProfile.belongsTo(User, { foreignKey: 'userId', as: 'user' });
	ApprenticeProfile.belongsTo(Cohort, { foreignKey: 'cohortId', as: 'cohort' });
	User.hasOne(SupervisorProfile, { foreignKey: 'userId', as: 'supervisorProfile' });
	SupervisorProfile.belongsTo(User, { foreignKey: 'userId', as: 'user' });
	Cohort.belongsTo(Programme, { foreignKey: 'programmeId', as: 'programme' });
	Cohort.hasMany(ApprenticeProfile, { foreignKey: 'cohortId', as: 'apprentices' });
	Supervision.belongsTo(User, { foreignKey: 'apprenticeId', as: 'apprentice' });
	Supervision.belongsTo(User, { foreignKey: 'supervisorId', as: 'supervisor' });
	UserToken.belongsTo(User, { foreignKey: 'userId', as: 'user' });
}
