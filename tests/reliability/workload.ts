/**
 * Apprentices logging hours through `POST /api/log-entries` while journeyworkers verify them
 * through `POST /api/log-entries/:id/verify` (each verification appends to the audit chain).
 *
 * Every entry is valid by construction so a 4xx means a defect, in the app or here: dates lie
 * between the apprentice's start and yesterday (UTC, the server's "today" is UTC), each day's
 * total stays under the 16 h limit of `$lib/hours` counting the seeded entries, clock-timed
 * entries never overlap another timed entry that day, task splits add up exactly, and the
 * supervisor is one of the apprentice's journeyworkers (`supervisions`). Capacity is taken when
 * a request is sent and never given back, so an entry committed just before a crash but never
 * acknowledged cannot push a later one over the limit.
 */
import { Db, request, type Reply } from './harness';

export interface Person {
	id: string;
	email: string;
	siteId: number;
	cookie?: string;
}

interface Day {
	free: number;
	/** Timed intervals already on the day, minutes since midnight, half-open. */
	busy: [number, number][];
}

interface Apprentice extends Person {
	supervisors: string[];
	days: Map<string, Day>;
	dates: string[];
}

export interface Planned {
	apprenticeId: string;
	tenths: number;
	splits: { taskId: number; tenths: number }[];
	body: Record<string, unknown>;
}

export interface Ack {
	id: number;
	apprenticeId: string;
	tenths: number;
	splits: { taskId: number; tenths: number }[];
	/** ms since the run began, when the 201 arrived */
	at: number;
}

// The app's limit, $lib/hours DEFAULT_DAILY_LIMIT_HOURS (16 h, common practice, no source).
const DAY_LIMIT_TENTHS = 160;
const DAY_START = 6 * 60;
const DAY_END = 22 * 60;

/** A small seeded generator (mulberry32) so a failing run can be replayed with the same seed. */
export function random(seed: number) {
	let a = seed >>> 0;
	return () => {
		a = (a + 0x6d2b79f5) >>> 0;
		let t = a;
		t = Math.imul(t ^ (t >>> 15), t | 1);
		t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
		return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
	};
}

const clock = (minutes: number) =>
	`${String(Math.floor(minutes / 60)).padStart(2, '0')}:${String(minutes % 60).padStart(2, '0')}`;

export class Plan {
	readonly apprentices: Apprentice[] = [];
	readonly reviewers: Person[] = [];
	taskIds: number[] = [];
	#rand: () => number;
	#serial = 0;

	constructor(seed: number) {
		this.#rand = random(seed);
	}

	/** Reads people, supervisions, tasks and the seeded work log before the load starts. */
	async load(db: Db): Promise<void> {
		const yesterday = new Date(Date.now() - 86_400_000).toISOString().slice(0, 10);
		const people = await db.all<Person & { startDate: string }>(
			`SELECT u.id, u.email, u.site_id AS "siteId", p.start_date AS "startDate"
			 FROM users u JOIN apprentice_profiles p ON p.user_id = u.id
			 WHERE u.role = 'apprentice' AND u.active = 1 ORDER BY u.email`
		);
		const supervisions = await db.all<{ a: string; s: string }>(
			'SELECT apprentice_id AS a, supervisor_id AS s FROM supervisions'
		);
		const entries = await db.all<{
			a: string;
			d: string;
			t: number;
			st: string | null;
			et: string | null;
		}>(
			`SELECT apprentice_id AS a, work_date AS d, tenths AS t, start_time AS st, end_time AS et
			 FROM log_entries`
		);
		this.taskIds = (
			await db.all<{ id: number }>(
				`SELECT t.id FROM framework_tasks t JOIN frameworks f ON f.id = t.framework_id
				 WHERE f.status = 'published' ORDER BY t.id`
			)
		).map((t) => t.id);
		for (const p of people) {
			const days = new Map<string, Day>();
			for (
				let d = new Date(`${p.startDate}T00:00:00Z`);
				d.toISOString().slice(0, 10) <= yesterday;
				d = new Date(d.getTime() + 86_400_000)
			)
				days.set(d.toISOString().slice(0, 10), { free: DAY_LIMIT_TENTHS, busy: [] });
			this.apprentices.push({
				...p,
				supervisors: supervisions.filter((s) => s.a === p.id).map((s) => s.s),
				days,
				dates: [...days.keys()]
			});
		}
		const byId = new Map(this.apprentices.map((a) => [a.id, a]));
		for (const e of entries) {
			const day = byId.get(e.a)?.days.get(e.d);
			if (!day) continue;
			day.free -= e.t;
			if (e.st && e.et) {
				const [sh, sm] = e.st.split(':').map(Number);
				const [eh, em] = e.et.split(':').map(Number);
				day.busy.push([sh * 60 + sm, eh * 60 + em]);
			}
		}
		// One journeyworker per shop verifies, so no two reviewers race for the same entry.
		const reviewers = await db.all<Person>(
			`SELECT id, email, site_id AS "siteId" FROM users
			 WHERE role = 'supervisor' AND active = 1 ORDER BY email`
		);
		for (const r of reviewers)
			if (!this.reviewers.some((x) => x.siteId === r.siteId)) this.reviewers.push(r);
		if (this.apprentices.some((a) => a.supervisors.length === 0))
			throw new Error('An apprentice has no journeyworker in `supervisions`.');
	}

	#pick<T>(items: readonly T[]): T {
		return items[Math.floor(this.#rand() * items.length)];
	}

	/** The next valid entry for one apprentice, its capacity taken at once. */
	next(apprentice: Apprentice, label: string): Planned {
		const tenths = 1 + Math.floor(this.#rand() * 12); // 0.1 h to 1.2 h
		const timed = this.#rand() < 0.3;
		const offset = Math.floor(this.#rand() * apprentice.dates.length);
		for (let i = 0; i < apprentice.dates.length; i++) {
			const date = apprentice.dates[(offset + i) % apprentice.dates.length];
			const day = apprentice.days.get(date)!;
			if (day.free < tenths) continue;
			let times: { startTime: string; endTime: string } | null = null;
			if (timed) {
				const minutes = tenths * 6;
				const first = DAY_START + 6 * Math.floor((this.#rand() * (DAY_END - DAY_START)) / 6);
				for (let start = first; start + minutes <= DAY_END && !times; start += 6) {
					const end = start + minutes;
					if (day.busy.every(([s, e]) => end <= s || e <= start)) {
						day.busy.push([start, end]);
						times = { startTime: clock(start), endTime: clock(end) };
					}
				}
				if (!times) continue;
			}
			day.free -= tenths;
			return this.#entry(apprentice, date, tenths, times, label);
		}
		throw new Error(`${apprentice.email} has no day left with ${tenths / 10} h free.`);
	}

	#entry(
		apprentice: Apprentice,
		workDate: string,
		tenths: number,
		times: { startTime: string; endTime: string } | null,
		label: string
	): Planned {
		const first = this.#pick(this.taskIds);
		let second = this.#pick(this.taskIds);
		while (second === first) second = this.#pick(this.taskIds);
		const part =
			tenths >= 2 && this.#rand() < 0.5 ? 1 + Math.floor(this.#rand() * (tenths - 1)) : 0;
		const splits = part
			? [
					{ taskId: first, tenths: part },
					{ taskId: second, tenths: tenths - part }
				]
			: [{ taskId: first, tenths }];
		this.#serial += 1;
		const body: Record<string, unknown> = {
			workDate,
			...(times ?? { hours: tenths / 10 }),
			repairOrder: `RO-${label}-${this.#serial}`,
			supervisorId: this.#pick(apprentice.supervisors),
			tasks: splits.map((s) => ({ taskId: s.taskId, hours: s.tenths / 10 })),
			intent: this.#rand() < 0.7 ? 'submit' : 'draft'
		};
		if (this.#rand() < 0.5) {
			// Valid check digits, 49 CFR 565.15.
			body.vin = this.#pick(['1M8GDM9AXKP042788', '1HGCM82633A004352']);
			body.vehicleYear = 2015 + Math.floor(this.#rand() * 10);
			body.vehicleMake = 'Test make';
			body.odometer = Math.floor(this.#rand() * 200_000);
		}
		return { apprenticeId: apprentice.id, tenths, splits, body };
	}
}

// ---------------------------------------------------------------- the run

export interface Stats {
	requests: number;
	posts: number;
	reviews: number;
	byStatus: Record<string, number>;
	/** 5xx, connection errors outside a crash, unexpected 4xx: each fails the run. */
	errors: string[];
	/** Requests in flight when the server was killed (expected to fail). */
	interrupted: number;
	latencies: number[];
}

export const newStats = (): Stats => ({
	requests: 0,
	posts: 0,
	reviews: 0,
	byStatus: {},
	errors: [],
	interrupted: 0,
	latencies: []
});

/** Shared by every client: when to stop, and a gate closed while the server is down. */
export class Control {
	stopped = false;
	#gate: Promise<void> | null = null;
	#open: (() => void) | null = null;
	/** Incremented at each kill; a request that began in an earlier epoch may fail. */
	epoch = 0;
	readonly began = Date.now();

	close(): void {
		this.#gate = new Promise((r) => (this.#open = r));
		this.epoch += 1;
	}
	open(): void {
		this.#open?.();
		this.#gate = null;
	}
	async wait(): Promise<void> {
		while (this.#gate) await this.#gate;
	}
}

export interface Run {
	baseUrl: string;
	plan: Plan;
	control: Control;
	stats: Stats;
	acks: Ack[];
	/** Entry ids journeyworkers verified (200 with status `verified`). */
	verified: number[];
}

async function send(
	r: Run,
	method: string,
	url: string,
	cookie: string,
	body?: unknown
): Promise<Reply | null> {
	await r.control.wait();
	const epoch = r.control.epoch;
	const started = Date.now();
	r.stats.requests += 1;
	try {
		const reply = await request(method, `${r.baseUrl}${url}`, {
			headers: {
				cookie,
				origin: r.baseUrl,
				accept: 'application/json',
				...(body === undefined ? {} : { 'content-type': 'application/json' })
			},
			body: body === undefined ? undefined : JSON.stringify(body)
		});
		r.stats.latencies.push(Date.now() - started);
		r.stats.byStatus[reply.status] = (r.stats.byStatus[reply.status] ?? 0) + 1;
		return reply;
	} catch (err) {
		// In flight when the server was SIGKILLed (the gate closes just before the kill).
		if (r.control.epoch !== epoch) r.stats.interrupted += 1;
		else r.stats.errors.push(`${method} ${url}: ${(err as Error).message}`);
		return null;
	}
}

/** One apprentice's browser: posts entries back to back until told to stop. */
export async function logger(r: Run, apprentice: Apprentice, label: string): Promise<void> {
	while (!r.control.stopped) {
		const planned = r.plan.next(apprentice, label);
		r.stats.posts += 1;
		const reply = await send(r, 'POST', '/api/log-entries', apprentice.cookie!, planned.body);
		if (!reply) continue;
		if (reply.status !== 201) {
			r.stats.errors.push(
				`POST /api/log-entries ${reply.status}: ${reply.text.slice(0, 300)} for ${JSON.stringify(planned.body)}`
			);
			continue;
		}
		const entry = JSON.parse(reply.text) as { id: number; tenths: number };
		if (entry.tenths !== planned.tenths)
			r.stats.errors.push(
				`entry ${entry.id} acknowledged ${entry.tenths} tenths, sent ${planned.tenths}`
			);
		r.acks.push({
			id: entry.id,
			apprenticeId: planned.apprenticeId,
			tenths: planned.tenths,
			splits: planned.splits,
			at: Date.now() - r.control.began
		});
	}
}

/** A journeyworker working through the review queue, one verification per request. */
export async function reviewer(r: Run, person: Person): Promise<void> {
	while (!r.control.stopped) {
		const queue = await send(
			r,
			'GET',
			'/api/log-entries?status=submitted&size=20&sort=newest',
			person.cookie!
		);
		if (!queue) continue;
		if (queue.status !== 200) {
			r.stats.errors.push(`GET review queue ${queue.status}: ${queue.text.slice(0, 300)}`);
			await new Promise((res) => setTimeout(res, 200));
			continue;
		}
		const { entries } = JSON.parse(queue.text) as { entries: { id: number }[] };
		if (entries.length === 0) await new Promise((res) => setTimeout(res, 100));
		for (const { id } of entries) {
			if (r.control.stopped) break;
			r.stats.reviews += 1;
			const reply = await send(r, 'POST', `/api/log-entries/${id}/verify`, person.cookie!, {});
			if (!reply) break; // the server went away; read the queue again after the restart
			const entry = reply.status === 200 ? (JSON.parse(reply.text) as { status?: string }) : {};
			if (entry.status === 'verified') r.verified.push(id);
			else r.stats.errors.push(`verify ${id} ${reply.status}: ${reply.text.slice(0, 300)}`);
		}
	}
}

/** nearest-rank percentile */
export function percentile(values: number[], p: number): number {
	if (values.length === 0) return 0;
	const sorted = [...values].sort((a, b) => a - b);
	return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)];
}
