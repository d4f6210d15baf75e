/**
 * `npm run seed:bench [file]`: deletes and rebuilds the benchmark database (default
 * data/bench.db, or BENCH_DATABASE_URL), then prints the time taken and the row counts.
 */
import { rmSync } from 'node:fs';
import path from 'node:path';

const target = path.resolve(process.argv[2] ?? process.env.BENCH_DATABASE_URL ?? 'data/bench.db');
for (const suffix of ['', '-wal', '-shm', '-journal']) rmSync(target + suffix, { force: true });
// The app reads DATABASE_URL once, when its modules load: set it before importing them.
process.env.DATABASE_URL = target;
const started = Date.now();
const { buildBench, BENCH_COORDINATOR } = await import('./bench-build');
const { sequelize } = await import('../src/lib/server/db');
const { DEMO_PASSWORD } = await import('./demo');

try {
	const counts = await buildBench();
	const seconds = ((Date.now() - started) / 1000).toFixed(1);
	console.log(`Bench data in ${target}, built in ${seconds} s:`);
	for (const [table, n] of Object.entries(counts)) console.log(`  ${table.padEnd(14)} ${n}`);
	console.log(`Sign in as ${BENCH_COORDINATOR} (password "${DEMO_PASSWORD}").`);
} catch (err) {
	console.error((err as Error).message);
	process.exitCode = 1;
} finally {
	await sequelize.close();
}
