/** `npm run digest`: e-mails this week's progress digest to every active coordinator of DATABASE_URL. */
import { prepare, sequelize } from '../src/lib/server/db';
import { sendCoordinatorDigests } from '../src/lib/server/progress-digest';

try {
	await prepare();
	const sent = await sendCoordinatorDigests();
	console.log(`Weekly digest sent to ${sent} coordinator${sent === 1 ? '' : 's'}.`);
} catch (err) {
	console.error('The weekly digest was not sent:', (err as Error).message);
	process.exitCode = 1;
} finally {
	await sequelize.close();
}
