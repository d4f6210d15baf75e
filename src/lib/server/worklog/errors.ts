/** A refusal with field messages; routes turn it into `fail(status, { errors })` or JSON. */
export class EntryProblem extends Error {
	constructor(
		readonly status: 400 | 403 | 404 | 409 | 413 | 415 | 429,
		readonly errors: Record<string, string>
	) {
		super(Object.values(errors)[0] ?? 'The entry was refused.');
	}
}

export const notFound = () =>
	new EntryProblem(404, { form: 'No such entry, or it is not yours to see.' });
