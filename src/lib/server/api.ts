import { error, json } from '@sveltejs/kit';
import type { z } from 'zod';
import { EntryProblem } from './worklog/errors';

const MAX_JSON_BYTES = 100_000;

/** Reads a JSON body and validates it; bad or oversized bodies get a 4xx with field messages. */
export async function readJson<S extends z.ZodType>(
	request: Request,
	schema: S
): Promise<z.infer<S>> {
	const type = request.headers.get('content-type') ?? '';
	if (!type.includes('application/json')) error(415, 'Send JSON (content-type: application/json).');
	const text = await request.text();
	if (text.length > MAX_JSON_BYTES) error(413, 'The request is too large.');
	let body: unknown;
	try {
		body = JSON.parse(text);
	} catch {
		error(400, 'The body is not valid JSON.');
	}
	const parsed = schema.safeParse(body);
	if (!parsed.success) {
		const errors: Record<string, string> = {};
		for (const issue of parsed.error.issues)
			errors[issue.path.join('.') || 'form'] ??= issue.message;
		throw new EntryProblem(400, errors);
	}
	return parsed.data;
}

/** Runs a handler and turns refusals into JSON `{ message, errors }` with their status. */
export async function answer(work: () => Promise<unknown>): Promise<Response> {
	try {
		const result = await work();
		return result instanceof Response ? result : json(result);
	} catch (err) {
		if (err instanceof EntryProblem) {
			return json({ message: err.message, errors: err.errors }, { status: err.status });
		}
		throw err;
	}
}

/** A positive integer id from a route parameter, or 404. */
export function idParam(value: string | undefined): number {
	const id = Number(value);
	if (!Number.isInteger(id) || id <= 0 || id > 2_147_483_647) error(404, 'Not found.');
	return id;
}

/** A cohort number, or `all` for every cohort; anything else is a 404. */
export function cohortParam(value: string | undefined): number | 'all' {
	if (value === 'all') return 'all';
	if (!/^\d{1,10}$/.test(value ?? '')) error(404, 'There is no cohort with that number.');
	return idParam(value);
}
