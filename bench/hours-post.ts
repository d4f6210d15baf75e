/**
 * Hours POST throughput: several bench apprentices log hours at once through
 * `POST /api/log-entries` (JSON, `entryBodySchema`), driven by autocannon.
 *
 * Every request is an entry the app must accept: one hour on one task of the current
 * framework, supervised by one of the apprentice's own journeyworkers, submitted for review.
 * Entries go on days before the apprentice's first logged day (after their programme start),
 * ten to a day, so the 16-hour daily limit and the overlap rule never refuse one.
 */
import autocannon from 'autocannon';

export interface PostingApprentice {
	email: string;
	cookie: string;
	supervisorId: string;
	/** The first day this apprentice may log (programme start). */
	startDate: string;
	/** The day before their first existing entry: new entries go from here backwards. */
	freeUntil: string;
}

export interface PostBench {
	requestsPerSecond: number;
	p50Ms: number;
	p99Ms: number;
	/** Answers that were not 2xx, connection errors and timeouts. */
	errors: number;
	acknowledged: number;
	apprentices: number;
	connections: number;
	durationSeconds: number;
}

const ENTRIES_PER_DAY = 10;
const DAY_MS = 86_400_000;

const dayBefore = (iso: string, days: number) =>
	new Date(Date.parse(`${iso}T00:00:00Z`) - days * DAY_MS).toISOString().slice(0, 10);

/** How many entries an apprentice can take before their free days run out. */
export function capacity(a: PostingApprentice): number {
	const days = (Date.parse(a.freeUntil) - Date.parse(a.startDate)) / DAY_MS + 1;
	return Math.max(0, Math.floor(days)) * ENTRIES_PER_DAY;
}

/** Makes the n-th entry body: apprentices take turns, each filling days backwards. */
export function bodyMaker(apprentices: PostingApprentice[], taskId: number, prefix: string) {
	let n = 0;
	return () => {
		const i = n++;
		const who = apprentices[i % apprentices.length];
		const slot = Math.floor(i / apprentices.length);
		const body = {
			intent: 'submit',
			workDate: dayBefore(who.freeUntil, Math.floor(slot / ENTRIES_PER_DAY)),
			hours: 1,
			repairOrder: `${prefix}-${i}`,
			vehicleMake: 'Bench',
			vehicleModel: 'Load',
			supervisorId: who.supervisorId,
			notes: 'Throughput benchmark entry.',
			tasks: [{ taskId, hours: 1 }]
		};
		return { who, body: JSON.stringify(body) };
	};
}

export async function hoursPost(options: {
	base: string;
	apprentices: PostingApprentice[];
	taskId: number;
	durationSeconds: number;
	connections: number;
	prefix: string;
}): Promise<PostBench> {
	const { base, apprentices, taskId, durationSeconds, connections, prefix } = options;
	const next = bodyMaker(apprentices, taskId, prefix);
	const request = () => {
		const { who, body } = next();
		return {
			method: 'POST' as const,
			path: '/api/log-entries',
			headers: {
				'content-type': 'application/json',
				origin: base,
				cookie: who.cookie
			},
			body
		};
	};
	const run = (duration: number) =>
		autocannon({
			url: base,
			connections,
			duration,
			requests: [{ setupRequest: (req) => ({ ...req, ...request() }) }]
		});
	// One second to warm up (not counted in the figures, but its entries are acknowledged too).
	const warm = await run(1);
	const result = await run(durationSeconds);
	const errors = (r: autocannon.Result) => r.errors + r.timeouts + r.non2xx;
	return {
		requestsPerSecond: Math.round(result.requests.average),
		p50Ms: result.latency.p50,
		p99Ms: result.latency.p99,
		errors: errors(warm) + errors(result),
		acknowledged: warm['2xx'] + result['2xx'],
		apprentices: apprentices.length,
		connections,
		durationSeconds
	};
}
