import type { Sequelize } from 'sequelize';
import { ApprenticeProfile } from './ApprenticeProfile';
import { Area } from './Area';
import { AuditEvent } from './AuditEvent';
import { Certificate } from './Certificate';
import { Cohort } from './Cohort';
import { Evidence } from './Evidence';
import { Framework } from './Framework';
import { LogEntry } from './LogEntry';
import { LogEntryTask } from './LogEntryTask';
import { LoginThrottle } from './LoginThrottle';
import { Programme } from './Programme';
import { QuizAttempt } from './QuizAttempt';
import { QuizResponse } from './QuizResponse';
import { RtiRecord } from './RtiRecord';
import { Session } from './Session';
import { SignOff } from './SignOff';
import { SignOffPhoto } from './SignOffPhoto';
import { Site } from './Site';
import { SupervisorProfile } from './SupervisorProfile';
import { Task } from './Task';
import { TaskQuestion } from './TaskQuestion';
import { TaskSpec } from './TaskSpec';
import { TaskStep } from './TaskStep';
import { Supervision } from './Supervision';
import { User } from './User';
import { UserToken } from './UserToken';

export {
	Certificate,
	SignOffPhoto,
	AuditEvent,
	QuizAttempt,
	QuizResponse,
	SignOff,
	Evidence,
	LogEntry,
	LogEntryTask,
	RtiRecord,
	ApprenticeProfile,
	Area,
	Framework,
	Task,
	TaskQuestion,
	TaskSpec,
	TaskStep,
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
export type { FrameworkStatus } from './Framework';
export type { EntryStatus } from './LogEntry';
export { ENTRY_STATUSES } from './LogEntry';
export type { RtiResult } from './RtiRecord';
export type { SignOffKind, StepResult } from './SignOff';
export type { DrawnQuestion } from './QuizAttempt';
export type { RevocationReason, ScopeKind } from './Certificate';
export { REVOCATION_REASONS, SCOPE_KINDS } from './Certificate';

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
		LoginThrottle,
		Framework,
		Area,
		Task,
		TaskStep,
		TaskSpec,
		TaskQuestion,
		LogEntry,
		LogEntryTask,
		Evidence,
		RtiRecord,
		QuizAttempt,
		QuizResponse,
		SignOff,
		SignOffPhoto,
		AuditEvent,
		Certificate
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

	Framework.belongsTo(Framework, { foreignKey: 'basedOnId', as: 'basedOn' });
	Framework.belongsTo(User, { foreignKey: 'createdById', as: 'createdBy' });
	Framework.hasMany(Area, { foreignKey: 'frameworkId', as: 'areas' });
	Area.belongsTo(Framework, { foreignKey: 'frameworkId', as: 'framework' });
	Area.hasMany(Task, { foreignKey: 'areaId', as: 'tasks' });
	Task.belongsTo(Area, { foreignKey: 'areaId', as: 'area' });
	Task.belongsTo(Framework, { foreignKey: 'frameworkId', as: 'framework' });
	Task.hasMany(TaskStep, { foreignKey: 'taskId', as: 'steps' });
	Task.hasMany(TaskSpec, { foreignKey: 'taskId', as: 'specs' });
	Task.hasMany(TaskQuestion, { foreignKey: 'taskId', as: 'questions' });

	LogEntry.belongsTo(User, { foreignKey: 'apprenticeId', as: 'apprentice' });
	LogEntry.belongsTo(User, { foreignKey: 'supervisorId', as: 'supervisor' });
	LogEntry.belongsTo(User, { foreignKey: 'reviewedById', as: 'reviewedBy' });
	LogEntry.belongsTo(LogEntry, { foreignKey: 'correctsId', as: 'corrects' });
	LogEntry.hasMany(LogEntryTask, { foreignKey: 'entryId', as: 'tasks', onDelete: 'CASCADE' });
	LogEntryTask.belongsTo(LogEntry, { foreignKey: 'entryId', as: 'entry' });
	LogEntryTask.belongsTo(Task, { foreignKey: 'taskId', as: 'task' });
	LogEntry.hasMany(Evidence, { foreignKey: 'entryId', as: 'evidence', onDelete: 'CASCADE' });
	Evidence.belongsTo(LogEntry, { foreignKey: 'entryId', as: 'entry' });
	Evidence.belongsTo(User, { foreignKey: 'uploadedById', as: 'uploadedBy' });
	RtiRecord.belongsTo(User, { foreignKey: 'apprenticeId', as: 'apprentice' });
	RtiRecord.belongsTo(User, { foreignKey: 'enteredById', as: 'enteredBy' });
	RtiRecord.belongsTo(User, { foreignKey: 'confirmedById', as: 'confirmedBy' });

	QuizAttempt.belongsTo(User, { foreignKey: 'apprenticeId', as: 'apprentice' });
	QuizAttempt.belongsTo(Task, { foreignKey: 'taskId', as: 'task' });
	QuizAttempt.hasMany(QuizResponse, { foreignKey: 'attemptId', as: 'responses' });
	QuizResponse.belongsTo(QuizAttempt, { foreignKey: 'attemptId', as: 'attempt' });
	QuizResponse.belongsTo(TaskQuestion, { foreignKey: 'questionId', as: 'question' });
	SignOff.belongsTo(User, { foreignKey: 'apprenticeId', as: 'apprentice' });
	SignOff.belongsTo(User, { foreignKey: 'supervisorId', as: 'supervisor' });
	SignOff.belongsTo(Task, { foreignKey: 'taskId', as: 'task' });
	SignOff.belongsTo(Framework, { foreignKey: 'frameworkId', as: 'framework' });
	SignOff.belongsTo(QuizAttempt, { foreignKey: 'quizAttemptId', as: 'quizAttempt' });
	SignOff.belongsTo(SignOff, { foreignKey: 'refersToId', as: 'refersTo' });
	SignOff.hasMany(SignOffPhoto, { foreignKey: 'signOffId', as: 'photos' });
	SignOffPhoto.belongsTo(SignOff, { foreignKey: 'signOffId', as: 'signOff' });

	Certificate.belongsTo(User, { foreignKey: 'apprenticeId', as: 'apprentice' });
	Certificate.belongsTo(Programme, { foreignKey: 'programmeId', as: 'programme' });
	Certificate.belongsTo(User, { foreignKey: 'issuedById', as: 'issuedBy' });
	Certificate.belongsTo(User, { foreignKey: 'revokedById', as: 'revokedBy' });
}
