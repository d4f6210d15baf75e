import type { z } from 'zod';

export type FieldErrors = Record<string, string>;

/** Validates form data against a schema: the data, or the first message per field. */
export function parseForm<S extends z.ZodType>(
	schema: S,
	form: FormData
): { ok: true; data: z.infer<S> } | { ok: false; errors: FieldErrors } {
	const raw: Record<string, FormDataEntryValue | FormDataEntryValue[]> = {};
	for (const key of new Set(form.keys())) {
		const all = form.getAll(key);
		raw[key] = all.length > 1 ? all : all[0];
	}
	const parsed = schema.safeParse(raw);
	if (parsed.success) return { ok: true, data: parsed.data };
	const errors: FieldErrors = {};
	for (const issue of parsed.error.issues) {
		const field = issue.path.join('.') || 'form';
		errors[field] ??= issue.message;
	}
	return { ok: false, errors };
}

/** The submitted text values to show again in the form, without passwords. */
export function keepValues(form: FormData, ...omit: string[]): Record<string, string> {
	const values: Record<string, string> = {};
	for (const [key, value] of form) {
		if (typeof value === 'string' && !omit.includes(key) && !/password/i.test(key)) {
			values[key] = value.slice(0, 500);
		}
	}
	return values;
}
