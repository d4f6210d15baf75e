/** `npm run seed`: applies migrations, then loads the demo scenario into DATABASE_URL. */
import { analyse, prepare, sequelize } from '../src/lib/server/db';
import { ensureDefault } from '../src/lib/server/framework';
import { seedCertificates } from './certificates';
import { DEMO_ACCOUNTS, DEMO_PASSWORD, seedDemo } from './demo';
import { seedSignOffs } from './signoffs';
import { seedWorkLog } from './worklog';

try {
	await prepare();
	await ensureDefault();
	const result = await seedDemo();
	// Only a fresh demo gets history, so running the seed again never duplicates it.
	if (result === 'seeded') {
		const started = Date.now();
		const log = await seedWorkLog();
		if (log !== 'already seeded') {
			console.log(
				`Work log: ${log.entries} entries, ${log.tasks} task splits, ${log.rti} instruction records (${Date.now() - started} ms).`
			);
		}
		const signed = Date.now();
		const assessed = await seedSignOffs();
		if (assessed !== 'already seeded') {
			console.log(
				`Assessment: ${assessed.attempts} knowledge checks, ${assessed.signOffs} sign-offs, ${assessed.auditEvents} audit events (${Date.now() - signed} ms).`
			);
		}
		const certified = await seedCertificates();
		if (certified !== 'already seeded') {
			for (const c of certified.issued)
				console.log(`Certificate ${c.serial}: ${c.fate}, ${c.area}, ${c.holder}`);
			for (const s of certified.skipped) console.log(`Demo certificate skipped: ${s}`);
		}
		await analyse();
	}
	console.log(`Demo data ${result}. Sign in with any of these (password "${DEMO_PASSWORD}"):`);
	for (const a of DEMO_ACCOUNTS) console.log(`  ${a.role.padEnd(12)} ${a.email}`);
} catch (err) {
	console.error((err as Error).message, (err as { errors?: unknown }).errors ?? '');
	process.exitCode = 1;
} finally {
	await sequelize.close();
}
