/**
 * The benchmark scenario: an invented training partnership of many shops, four yearly intakes
 * and hundreds of apprentices, built into the database of this process (DATABASE_URL).
 * Work log and sign-offs come from the demo's own generators; rows go in as raw multi-row
 * INSERTs in one transaction, because model `create` would take many minutes at this size.
 */
import { generateIdFromEntropySize } from 'lucia';
import sqlite3 from 'sqlite3';
import { config } from '../src/lib/server/config';
import { analyse, prepare, User } from '../src/lib/server/db';
import { ensureDefault } from '../src/lib/server/framework';
import { hashPassword } from '../src/lib/server/password';
import { DEMO_PASSWORD, DEMO_PROGRAMME } from './demo';
import { generateSignOffs, loadSignOffTasks, type SignOffApprentice } from './signoffs';
import { generateWorkLog, type WorkLogApprentice } from './worklog';

export const BENCH_COORDINATOR = 'bench-coordinator@example.org';
export const BENCH_ADMIN = 'bench-admin@example.org';

export interface BenchScale {
	sites: number;
	apprentices: number;
	supervisors: number;
	/** Days of work log before `today`: the partnership moved its logbooks here on that day. */
	logDays: number;
	/** Sign-offs a journeyworker makes a week for one apprentice, at most. */
	assessmentsPerWeek: number;
}

/** 40 shops, 600 apprentices, 150 journeyworkers; about 400 entries and 100 sign-offs each. */
export const FULL_SCALE: BenchScale = {
	sites: 40,
	apprentices: 600,
	supervisors: 150,
	logDays: 250,
	assessmentsPerWeek: 4
};

export interface BenchCounts {
	sites: number;
	users: number;
	supervisions: number;
	entries: number;
	entryTasks: number;
	rti: number;
	quizAttempts: number;
	quizResponses: number;
	signOffs: number;
	auditEvents: number;
}

const FIRST_NAMES = (
	'Arlo Brisa Corin Dessa Emrys Faye Galen Hollis Ines Jory Kenna Lior Maren Nico Orla ' +
	'Pascal Quilla Rowan Saoirse Tamsin Ulric Vesna Wren Xavi Yara Zeke Anouk Bram Cleo ' +
	'Dario'
).split(' ');
const LAST_NAMES = (
	'Ashgrove Brennick Calloway Dunmore Everly Fairweather Galloway Hartigan Ingleby ' +
	'Jessop Kettering Lindqvist Marchetti Northam Okonkwo Pendry Quarles Ravensworth ' +
	'Stroud Thackeray Umberfield Vantongeren Whitlow Yarborough Zeller Abernathy Blackwood ' +
	'Corrigan Delacourt Emberly Fenwick'
).split(' ');
const TOWNS = (
	'Alder Crossing, Briar Ridge, Copper Hollow, Dunfield, Elmstead, Foxmoor, Glenhaven, ' +
	'Hollowmere, Ironvale, Juniper Flats, Kestrel Bay, Larkspur, Millbrook Falls, ' +
	'Northgate, Oakhurst, Pinecrest, Quarry Hill, Redwater, Stonebridge, Thornbury'
).split(', ');
const SHOP_KINDS = ['Service Bay', 'Fleet Garage', 'Auto Care', 'Motor Works'];

// Four yearly intakes, all on one programme; each apprentice starts within a few weeks of it.
const INTAKES = ['2023-09-04', '2024-09-02', '2025-09-01', '2026-09-07'];
const STAGGER_DAYS = 56;
const BATCH_ROWS = 400;

// The demo's programme, with a ratio that fits shops of about fifteen apprentices to four journeyworkers.
const PROGRAMME = { id: 1, ...DEMO_PROGRAMME, ratioApprentices: 6 };

const DAY_MS = 86_400_000;
const isoOf = (day: number) => new Date(day * DAY_MS).toISOString().slice(0, 10);
const dayOf = (iso: string) => Date.parse(`${iso}T00:00:00Z`) / DAY_MS;
/** How Sequelize stores DATE in SQLite, so the app reads these rows back unchanged. */
const sqliteDate = (d: Date) => d.toISOString().replace('T', ' ').replace('Z', ' +00:00');
const slug = (name: string) => name.toLowerCase().replace(/[^a-z]+/g, '.');

type Value = string | number | null;

function value(v: unknown): Value {
	if (v === null || v === undefined) return null;
	if (v instanceof Date) return sqliteDate(v);
	if (typeof v === 'boolean') return v ? 1 : 0;
	if (typeof v === 'object') return JSON.stringify(v);
	return v as string | number;
}

/** A raw connection with just enough of a promise interface for a bulk load. */
class Loader {
	readonly #db: sqlite3.Database;
	readonly #statements = new Map<string, sqlite3.Statement>();

	constructor(path: string) {
		this.#db = new sqlite3.Database(path);
	}

	exec(sql: string): Promise<void> {
		return new Promise((resolve, reject) =>
			this.#db.exec(sql, (err) => (err ? reject(err) : resolve()))
		);
	}

	/**
	 * Inserts rows with multi-row statements of BATCH_ROWS rows. The columns are the first row's
	 * keys in snake_case, named explicitly so columns added later with defaults never get in the way.
	 */
	async insert(table: string, rows: readonly object[]): Promise<number> {
		if (rows.length === 0) return 0;
		const keys = Object.keys(rows[0]);
		const columns = keys.map((k) => k.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`));
		const tuple = `(${columns.map(() => '?').join(', ')})`;
		for (let i = 0; i < rows.length; i += BATCH_ROWS) {
			const batch = rows.slice(i, i + BATCH_ROWS) as Record<string, unknown>[];
			const sql = `INSERT INTO ${table} (${columns.join(', ')}) VALUES ${Array(batch.length).fill(tuple).join(', ')}`;
			let statement = this.#statements.get(sql);
			if (!statement) {
				statement = this.#db.prepare(sql);
				this.#statements.set(sql, statement);
			}
			const params = batch.flatMap((row) => keys.map((k) => value(row[k])));
			await new Promise<void>((resolve, reject) =>
				statement.run(params, (err) => (err ? reject(err) : resolve()))
			);
		}
		return rows.length;
	}

	async close() {
		for (const s of this.#statements.values()) await new Promise((r) => s.finalize(r));
		await new Promise<void>((resolve, reject) =>
			this.#db.close((err) => (err ? reject(err) : resolve()))
		);
	}
}

interface Person {
	id: string;
	email: string;
	name: string;
	siteId: number;
}

/** The n-th invented name; first and last names cycle at different speeds, so pairs repeat late. */
function nameOf(n: number): string {
	return `${FIRST_NAMES[n % FIRST_NAMES.length]} ${LAST_NAMES[(n * 7 + Math.floor(n / LAST_NAMES.length)) % LAST_NAMES.length]}`;
}

/**
 * Builds the scenario into this process's database, which must be empty. Returns row counts;
 * the CLI in bench.ts prints them with the time taken.
 */
export async function buildBench(
	scale: BenchScale = FULL_SCALE,
	today = new Date()
): Promise<BenchCounts> {
	await prepare();
	if ((await User.count()) > 0) throw new Error('The bench builds into an empty database only.');
	await ensureDefault();
	const current = await loadSignOffTasks();
	if (!current) throw new Error('No published framework to build the bench on.');
	const passwordHash = await hashPassword(DEMO_PASSWORD);
	const now = new Date();
	const todayDay = Math.floor(today.getTime() / DAY_MS);
	const goLive = todayDay - scale.logDays;

	const sites = Array.from({ length: scale.sites }, (_, i) => ({
		id: i + 1,
		code: `BS${String(i + 1).padStart(2, '0')}`,
		town: TOWNS[i % TOWNS.length],
		name: `${TOWNS[i % TOWNS.length]} ${SHOP_KINDS[Math.floor(i / TOWNS.length) % SHOP_KINDS.length]}`
	}));
	const person = (n: number, siteId: number): Person => {
		const name = nameOf(n);
		return {
			id: generateIdFromEntropySize(10),
			name,
			email: `${slug(name)}.${n}@bench-training.example`,
			siteId
		};
	};
	const supervisors = Array.from({ length: scale.supervisors }, (_, i) =>
		person(i, sites[i % sites.length].id)
	);
	const apprentices = Array.from({ length: scale.apprentices }, (_, i) =>
		person(scale.supervisors + i, sites[i % sites.length].id)
	);
	const coordinator = {
		id: generateIdFromEntropySize(10),
		email: BENCH_COORDINATOR,
		name: 'Marisol Quenneville'
	};
	const admin = { id: generateIdFromEntropySize(10), email: BENCH_ADMIN, name: 'Tobias Wrenfield' };

	const cohorts = INTAKES.map((start, i) => ({
		id: i + 1,
		name: `Intake ${start.slice(0, 4)}`,
		start,
		end: isoOf(dayOf(start) + 4 * 365)
	}));
	const profiles = apprentices.map((a, i) => {
		const cohort = cohorts[i % cohorts.length];
		let start = dayOf(cohort.start) + ((i * 37) % STAGGER_DAYS);
		while ([0, 6].includes(new Date(start * DAY_MS).getUTCDay())) start++;
		// Hours kept on paper before the move here are carried as credit, about 33 h a week.
		const paperWeeks = Math.max(0, (goLive - start) / 7);
		return {
			a,
			cohort,
			start: isoOf(start),
			end: isoOf(start + 4 * 365),
			logStart: isoOf(Math.max(start, goLive)),
			credit: Math.round((paperWeeks * 33) / 10) * 10
		};
	});
	// Each apprentice works beside two or three journeyworkers of their own shop.
	const bySite = new Map<number, Person[]>();
	for (const s of supervisors) bySite.set(s.siteId, [...(bySite.get(s.siteId) ?? []), s]);
	const supervisorsOf = new Map(
		apprentices.map((a, i) => {
			const here = bySite.get(a.siteId) ?? supervisors;
			const count = Math.min(here.length, 2 + (i % 2));
			return [a.id, Array.from({ length: count }, (_, k) => here[(i + k) % here.length])];
		})
	);

	const started = profiles.filter((p) => dayOf(p.start) <= todayDay);
	// The sign-off rules count months from the real start; the work log starts at go-live.
	const signOffApprentices: SignOffApprentice[] = started.map((p) => ({
		id: p.a.id,
		email: p.a.email,
		startDate: p.start,
		supervisors: supervisorsOf.get(p.a.id)!.map((s) => ({ id: s.id, email: s.email }))
	}));
	const log = generateWorkLog({
		today,
		apprentices: signOffApprentices.map((a, i): WorkLogApprentice => ({
			...a,
			siteCode: sites[started[i].a.siteId - 1].code,
			startDate: started[i].logStart
		})),
		tasks: current.tasks,
		coordinatorId: coordinator.id
	});
	const assessed = generateSignOffs({
		today,
		apprentices: signOffApprentices,
		tasks: current.tasks,
		framework: current.framework,
		coordinatorId: coordinator.id,
		work: log.entries.flatMap((e) =>
			e.row.status === 'verified' && e.row.reviewedAt
				? e.tasks.map((t) => ({
						apprenticeId: e.row.apprenticeId,
						taskId: t.taskId,
						tenths: t.tenths,
						reviewedAt: e.row.reviewedAt!.getTime()
					}))
				: []
		),
		// Journeyworkers differ in how many assessments they fit into a week.
		perWeek: (a) => Math.max(1, scale.assessmentsPerWeek - 1 + (a.email.length % 3))
	});

	if (config.database.dialect !== 'sqlite')
		throw new Error(
			'The benchmark scenario is built into a SQLite file; set DATABASE_URL to a path.'
		);
	const db = new Loader(config.databasePath);
	const counts: BenchCounts = {
		sites: 0,
		users: 0,
		supervisions: 0,
		entries: 0,
		entryTasks: 0,
		rti: 0,
		quizAttempts: 0,
		quizResponses: 0,
		signOffs: 0,
		auditEvents: 0
	};
	try {
		// Durability does not matter while loading a throw-away file; speed does.
		await db.exec('PRAGMA journal_mode = WAL; PRAGMA synchronous = OFF; BEGIN IMMEDIATE');
		const stamps = { createdAt: now, updatedAt: now };
		counts.sites = await db.insert(
			'sites',
			sites.map((site) => ({ ...site, ...stamps }))
		);
		const user = (
			p: { id: string; email: string; name: string },
			role: string,
			siteId: number | null
		) => ({
			...p,
			role,
			passwordHash,
			active: true,
			isDemo: true,
			siteId,
			...stamps
		});
		counts.users = await db.insert('users', [
			...supervisors.map((s) => user(s, 'supervisor', s.siteId)),
			...apprentices.map((a) => user(a, 'apprentice', a.siteId)),
			user(coordinator, 'coordinator', null),
			user(admin, 'admin', null)
		]);
		await db.insert('programmes', [{ ...PROGRAMME, ...stamps }]);
		await db.insert(
			'cohorts',
			cohorts.map((c) => ({
				id: c.id,
				name: c.name,
				programmeId: PROGRAMME.id,
				startDate: c.start,
				plannedEndDate: c.end,
				...stamps
			}))
		);
		await db.insert(
			'apprentice_profiles',
			profiles.map((p) => ({
				userId: p.a.id,
				cohortId: p.cohort.id,
				startDate: p.start,
				plannedEndDate: p.end,
				priorCreditHours: p.credit,
				...stamps
			}))
		);
		await db.insert(
			'supervisor_profiles',
			supervisors.map((s, i) => ({
				userId: s.id,
				qualification: 'Automotive service technician, journeyworker',
				qualifiedSince: `${2000 + (i % 22)}-06-30`,
				shift: i % 4 === 3 ? 'late' : 'day',
				...stamps
			}))
		);
		counts.supervisions = await db.insert(
			'supervisions',
			[...supervisorsOf].flatMap(([apprenticeId, list]) =>
				list.map((s) => ({ apprenticeId, supervisorId: s.id, ...stamps }))
			)
		);
		counts.entries = await db.insert(
			'log_entries',
			log.entries.map((e, i) => ({ id: i + 1, ...e.row }))
		);
		counts.entryTasks = await db.insert(
			'log_entry_tasks',
			log.entries.flatMap((e, i) => e.tasks.map((t) => ({ entryId: i + 1, ...t })))
		);
		counts.rti = await db.insert('rti_records', log.rti);
		counts.quizAttempts = await db.insert('quiz_attempts', assessed.attempts);
		counts.quizResponses = await db.insert('quiz_responses', assessed.responses);
		counts.signOffs = await db.insert('sign_offs', assessed.signOffs);
		counts.auditEvents = await db.insert('audit_events', assessed.audit);
		await db.exec('COMMIT; PRAGMA synchronous = NORMAL; PRAGMA optimize');
	} catch (err) {
		await db.exec('ROLLBACK').catch(() => undefined);
		throw err;
	} finally {
		await db.close();
	}
	await analyse();
	return counts;
}
