/** `npm run seed`: applies migrations, then loads the demo scenario into DATABASE_URL. */
import { prepare, sequelize } from '../src/lib/server/db';
import { ensureDefault } from '../src/lib/server/framework';
import { DEMO_ACCOUNTS, DEMO_PASSWORD, seedDemo } from './demo';

try {
	await prepare();
	await ensureDefault();
	const result = await seedDemo();
	console.log(`Demo data ${result}. Sign in with any of these (password "${DEMO_PASSWORD}"):`);
	for (const a of DEMO_ACCOUNTS) console.log(`  ${a.role.padEnd(12)} ${a.email}`);
} catch (err) {
	console.error((err as Error).message);
	process.exitCode = 1;
} finally {
	await sequelize.close();
}
