import { error, redirect } from '@sveltejs/kit';
import type { PageLoad } from './$types';
import type { EntryDetail } from '$lib/server/worklog';
import { apiQuery, readFilter } from './filter';

interface QueuePage {
	total: number;
	entries: EntryDetail[];
}

/**
 * The queue reads the same JSON API on the server and in the browser, so a change of filter
 * or page fetches only data and the page updates in place.
 */
export const load = (async ({ fetch, url, data }) => {
	const filter = readFilter(url.searchParams);
	// One request: the review needs every task title, the notes and the photos.
	const response = await fetch(`/api/log-entries?${apiQuery(filter)}&view=full`);
	if (response.status === 401) redirect(303, `/login?next=${encodeURIComponent(url.pathname)}`);
	if (!response.ok) error(response.status, 'The review queue could not be loaded.');
	const list: QueuePage = await response.json();
	return {
		...data,
		filter,
		total: list.total,
		entries: list.entries,
		verifiedCount: Number(url.searchParams.get('verified')) || 0,
		returnedOne: url.searchParams.has('returned')
	};
}) satisfies PageLoad;
