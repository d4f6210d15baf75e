/** `npm run audit:verify`: walks the audit hash chain of DATABASE_URL and reports the first broken link. */
import { verify } from '../src/lib/server/audit';
import { prepare, sequelize } from '../src/lib/server/db';

try {
	await prepare();
	const result = await verify();
	if (result.ok) {
		console.log(`Audit trail intact: ${result.count} events, every link checks out.`);
	} else {
		console.error(`Audit trail BROKEN at event ${result.brokenAt}: ${result.reason}`);
		process.exitCode = 2;
	}
} finally {
	await sequelize.close();
}
