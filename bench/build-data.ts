/**
 * Builds bench data of a given scale into a fresh file, in its own process: the app's modules
 * read DATABASE_URL once, when they load, so the bench runner spawns this instead of importing
 * them. Used by `npm run bench -- --quick` for its smaller scenario.
 *
 *   tsx bench/build-data.ts <file> <full|quick>
 */
import { rmSync } from 'node:fs';
import path from 'node:path';

/** A quarter of the full scenario: same shape, same generators, a quarter of the people. */
const QUICK_SCALE = {
	sites: 10,
	apprentices: 150,
	supervisors: 38,
	logDays: 250,
	assessmentsPerWeek: 4
};

const [file, scaleName] = process.argv.slice(2);
if (!file || !['full', 'quick'].includes(scaleName)) {
	console.error('Usage: tsx bench/build-data.ts <file> <full|quick>');
	process.exit(2);
}
const target = path.resolve(file);
for (const suffix of ['', '-wal', '-shm', '-journal']) rmSync(target + suffix, { force: true });
process.env.DATABASE_URL = target;
const started = Date.now();
const { buildBench, FULL_SCALE } = await import('../seed/bench-build');
const { sequelize } = await import('../src/lib/server/db');
try {
	const counts = await buildBench(scaleName === 'full' ? FULL_SCALE : QUICK_SCALE);
	const seconds = ((Date.now() - started) / 1000).toFixed(1);
	console.log(
		`Bench data (${scaleName}) in ${path.relative(process.cwd(), target)}, built in ${seconds} s: ` +
			`${counts.users} users, ${counts.entries} entries, ${counts.signOffs} sign-offs.`
	);
} catch (err) {
	console.error((err as Error).stack ?? err);
	process.exitCode = 1;
} finally {
	await sequelize.close();
}
