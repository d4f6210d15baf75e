/**
 * Where the cohort progress API's time goes, measured in-process on a database copy: the
 * runner spawns this when the API misses its target (or with `--breakdown`), because the app's
 * modules read DATABASE_URL once, when they load.
 *
 *   tsx bench/cohort-breakdown.ts <database file> <runs>
 *
 * Prints one JSON line: median milliseconds of the people query, the five aggregate queries
 * together, the whole `compute` (queries + engine), `cohort` (+ summaries) and JSON.stringify;
 * then each aggregate query alone — its SQL as Sequelize sent it, replayed one after another on
 * a raw sqlite3 connection, so the figures show which query costs what without the others
 * waiting beside it.
 */
export {};

const [file, runsArg] = process.argv.slice(2);
process.env.DATABASE_URL = file;
const runs = Math.max(1, Number(runsArg) || 5);

const progress = await import('../src/lib/server/progress');
const data = await import('../src/lib/server/progress/data');
const framework = await import('../src/lib/server/framework');
const { isoDate } = await import('../src/lib/server/progress/engine');
const { sequelize, reader } = await import('../src/lib/server/db');
const { RawDb } = await import('./cohort-sql');

const median = (xs: number[]) => {
	const s = [...xs].sort((a, b) => a - b);
	return Math.round(s[Math.floor(s.length / 2)] * 10) / 10;
};

async function time<T>(fn: () => Promise<T> | T): Promise<[number, T]> {
	const started = performance.now();
	const value = await fn();
	return [performance.now() - started, value];
}

try {
	const today = isoDate(new Date());
	const frameworkId = (await framework.current())?.id ?? -1;
	const scope = { cohortId: null };
	const samples: Record<string, number[]> = {
		people: [],
		aggregates: [],
		compute: [],
		cohort: [],
		stringify: []
	};
	for (let i = 0; i < runs + 1; i++) {
		const [people] = await time(() => data.people(scope));
		const [aggregates] = await time(() => data.fetchRaw(scope, frameworkId, today));
		const [compute] = await time(() => progress.compute(scope, today));
		const [cohort, body] = await time(() => progress.cohort('all', today));
		const [stringify] = await time(() => JSON.stringify(body));
		if (i === 0) continue; // warm-up
		samples.people.push(people);
		samples.aggregates.push(aggregates);
		samples.compute.push(compute);
		samples.cohort.push(cohort);
		samples.stringify.push(stringify);
	}
	// Capture the five queries as sent (Sequelize inlines the replacements into the text).
	const sent: string[] = [];
	const capture = (msg: string) => {
		const sql = /^Executing \([^)]*\): ([\s\S]*)$/.exec(msg)?.[1];
		if (sql) sent.push(sql);
	};
	// Sequelize reads `options.logging` at each query; its type definitions leave `options` out.
	const optionsOf = (db: typeof sequelize) => (db as unknown as { options: object }).options;
	for (const db of [sequelize, reader]) Object.assign(optionsOf(db), { logging: capture });
	await data.fetchRaw(scope, frameworkId, today);
	for (const db of [sequelize, reader]) Object.assign(optionsOf(db), { logging: false });
	const raw = new RawDb(file);
	const queries: Record<string, number> = {};
	for (const sql of sent) {
		const times: number[] = [];
		for (let i = 0; i < runs + 1; i++) {
			const [ms] = await time(() => raw.all(sql));
			if (i > 0) times.push(ms);
		}
		const words = sql.replace(/\s+/g, ' ').trim();
		const from = words.slice(words.indexOf(' FROM ') + 1);
		queries[`${Object.keys(queries).length + 1}. ${words.slice(0, 40)} … ${from.slice(0, 70)}`] =
			median(times);
	}
	await raw.close();
	const medians = Object.fromEntries(Object.entries(samples).map(([k, v]) => [k, median(v)]));
	console.log(JSON.stringify({ ...medians, queries }));
} finally {
	await sequelize.close();
	await reader.close();
}
