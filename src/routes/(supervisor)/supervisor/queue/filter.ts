/** The queue's filter as it appears in the page address, shared by the loads, actions and page. */

export const QUEUE_STATUSES = ['waiting', 'returned', 'verified'] as const;
export type QueueStatus = (typeof QUEUE_STATUSES)[number];
export const QUEUE_SORTS = ['oldest', 'newest', 'apprentice'] as const;
export type QueueSort = (typeof QUEUE_SORTS)[number];

export const PAGE_SIZE = 20;

/** What each filter word asks the log-entries API for. */
const API_STATUS: Record<QueueStatus, 'submitted' | 'returned' | 'verified'> = {
	waiting: 'submitted',
	returned: 'returned',
	verified: 'verified'
};

export interface QueueFilter {
	status: QueueStatus;
	apprentice: string;
	sort: QueueSort;
	page: number;
}

const pick = <T extends string>(value: string | null, allowed: readonly T[], fallback: T): T =>
	allowed.includes(value as T) ? (value as T) : fallback;

/** Reads the filter leniently: an odd value falls back to the default instead of an error page. */
export function readFilter(params: URLSearchParams): QueueFilter {
	const apprentice = (params.get('apprentice') ?? '').trim();
	const page = Number(params.get('page'));
	return {
		status: pick(params.get('status'), QUEUE_STATUSES, 'waiting'),
		apprentice: /^[\w-]{1,40}$/.test(apprentice) ? apprentice : '',
		sort: pick(params.get('sort'), QUEUE_SORTS, 'oldest'),
		page: Number.isInteger(page) && page >= 1 && page <= 10_000 ? page : 1
	};
}

/** The filter as a query string, leaving out defaults so plain links stay short. */
export function filterQuery(filter: QueueFilter, extra: Record<string, string> = {}): string {
	const query = new URLSearchParams();
	if (filter.status !== 'waiting') query.set('status', filter.status);
	if (filter.apprentice) query.set('apprentice', filter.apprentice);
	if (filter.sort !== 'oldest') query.set('sort', filter.sort);
	if (filter.page > 1) query.set('page', String(filter.page));
	for (const [key, value] of Object.entries(extra)) query.set(key, value);
	return query.toString();
}

/** The same filter in the words of `GET /api/log-entries`. */
export function apiQuery(filter: QueueFilter): string {
	const query = new URLSearchParams({
		status: API_STATUS[filter.status],
		sort: filter.sort,
		page: String(filter.page),
		size: String(PAGE_SIZE)
	});
	if (filter.apprentice) query.set('apprenticeId', filter.apprentice);
	return query.toString();
}

/** A form action that keeps the filter, so the page comes back as it was without JavaScript. */
export function actionUrl(name: 'verify' | 'return', filter: QueueFilter): string {
	const query = filterQuery(filter);
	return `?/${name}${query ? `&${query}` : ''}`;
}
