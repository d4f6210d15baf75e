/**
 * `npm run digest`: e-mails this week's progress digest to every active coordinator of
 * DATABASE_URL, whether or not it went out already this week (a manual run always sends).
 * `npm run digest -- --once` claims the week first, like the Monday job of the app, and sends
 * only if no instance or earlier run did: the form for a scheduler on several hosts.
 */
import { prepare, sequelize } from '../src/lib/server/db';
import {
	sendCoordinatorDigests,
	sendWeeklyDigest,
	weekOf
} from '../src/lib/server/progress-digest';

const once = process.argv.slice(2).includes('--once');

try {
	await prepare();
	const sent = once ? await sendWeeklyDigest() : await sendCoordinatorDigests();
	if (sent === null) console.log(`The digest for the week of ${weekOf()} was already sent.`);
	else console.log(`Weekly digest sent to ${sent} coordinator${sent === 1 ? '' : 's'}.`);
} catch (err) {
	console.error('The weekly digest was not sent:', (err as Error).message);
	process.exitCode = 1;
} finally {
	await sequelize.close();
}
