/** The review calls the queue makes from the browser, through the log-entries API. */

type Status = 'draft' | 'submitted' | 'verified' | 'returned';

export type Outcome =
	| { kind: 'verified' }
	| { kind: 'returned'; comment: string }
	/** `status` is what the entry is now, when someone else reviewed it meanwhile. */
	| { kind: 'refused'; reason: string; status?: Status };

export interface Refusal {
	id: number;
	reason: string;
}

const OFFLINE = 'Journeymark could not be reached. Check the connection and try again.';

async function post(url: string, body: unknown): Promise<{ ok: boolean; data: unknown }> {
	try {
		const response = await fetch(url, {
			method: 'POST',
			headers: { 'content-type': 'application/json', accept: 'application/json' },
			body: JSON.stringify(body)
		});
		return { ok: response.ok, data: await response.json().catch(() => ({})) };
	} catch {
		return { ok: false, data: { message: OFFLINE } };
	}
}

const reasonOf = (data: unknown, field?: string): string => {
	const body = data as { message?: string; errors?: Record<string, string> };
	return (field && body.errors?.[field]) || body.message || OFFLINE;
};

/** Verifies one or many entries; every id comes back either verified or with a reason. */
export async function verify(ids: number[]): Promise<{ verified: number[]; refused: Refusal[] }> {
	const { ok, data } =
		ids.length === 1
			? await post(`/api/log-entries/${ids[0]}/verify`, {})
			: await post('/api/log-entries/verify', { ids });
	if (!ok) return { verified: [], refused: ids.map((id) => ({ id, reason: reasonOf(data) })) };
	return ids.length === 1
		? { verified: ids, refused: [] }
		: (data as { verified: number[]; refused: Refusal[] });
}

/** Sends an entry back with a comment; the server e-mails it to the apprentice. */
export async function giveBack(id: number, comment: string): Promise<string | null> {
	const { ok, data } = await post(`/api/log-entries/${id}/return`, { comment });
	return ok ? null : reasonOf(data, 'comment');
}

/** What an entry's status is now, so a refused card stops offering a review that cannot happen. */
export async function statusOf(id: number): Promise<Status | undefined> {
	try {
		const response = await fetch(`/api/log-entries/${id}`, {
			headers: { accept: 'application/json' }
		});
		return response.ok ? ((await response.json()) as { status: Status }).status : undefined;
	} catch {
		return undefined;
	}
}
