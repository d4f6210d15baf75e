import type { z } from 'zod';

export type FieldErrors = Record<string, string>;

/** Validates form data against a schema: the data, or the first message per field. */
export function parseForm<S extends z.ZodType>(
	schema: S,
	form: FormData
): { ok: true; data: z.infer<S> } | { ok: false; errors: FieldErrors } {
	const parsed = schema.safeParse(formToObject(form));
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

const MAX_INDEX = 50;

/**
 * Form fields as an object; dotted names nest, so `tasks.0.hours` becomes `{ tasks: [{ hours }] }`.
 * Indexes above 50 and odd key shapes are dropped rather than trusted.
 */
export function formToObject(form: FormData): Record<string, unknown> {
	const root: Record<string, unknown> = {};
	for (const key of new Set(form.keys())) {
		if (key.startsWith('$ACTION') || key.length > 100) continue;
		const all = form.getAll(key).filter((v): v is string | File => v !== null);
		const value = all.length > 1 ? all : all[0];
		const parts = key.split('.');
		const unsafe = (p: string) =>
			['', '__proto__', 'constructor', 'prototype'].includes(p) || Number(p) > MAX_INDEX;
		if (parts.some(unsafe)) continue;
		let node: Record<string, unknown> | unknown[] = root;
		for (let i = 0; i < parts.length; i++) {
			const part = parts[i];
			const last = i === parts.length - 1;
			const index = /^\d+$/.test(part) ? Number(part) : null;
			if (index !== null && !Array.isArray(node)) break;
			const slot = (index ?? part) as never;
			if (last) {
				(node as Record<string, unknown>)[slot] = value;
			} else {
				const nextIsIndex = /^\d+$/.test(parts[i + 1]);
				(node as Record<string, unknown>)[slot] ??= nextIsIndex ? [] : {};
				node = (node as Record<string, unknown>)[slot] as Record<string, unknown> | unknown[];
			}
		}
	}
	return root;
}
