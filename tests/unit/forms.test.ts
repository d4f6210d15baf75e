import { describe, expect, it } from 'vitest';
import { inviteSchema, loginSchema, newPasswordSchema } from '$lib/schemas/account';
import { formToObject, keepValues, parseForm } from '$lib/schemas/forms';

const form = (entries: Record<string, string>) => {
	const data = new FormData();
	for (const [k, v] of Object.entries(entries)) data.append(k, v);
	return data;
};

describe('form validation', () => {
	it('gives one clear message per field', () => {
		const result = parseForm(loginSchema, form({ email: 'not-an-email' }));
		expect(result).toEqual({
			ok: false,
			errors: { email: expect.stringMatching(/valid e-mail/), password: 'Enter your password.' }
		});
	});

	it('normalises e-mail addresses', () => {
		const result = parseForm(loginSchema, form({ email: '  Dale@Shop.Example ', password: 'x' }));
		expect(result).toEqual({ ok: true, data: { email: 'dale@shop.example', password: 'x' } });
	});

	it('refuses oversized and mismatched passwords', () => {
		expect(
			parseForm(loginSchema, form({ email: 'a@b.example', password: 'x'.repeat(129) })).ok
		).toBe(false);
		const mismatch = parseForm(newPasswordSchema, form({ password: 'x'.repeat(12), confirm: 'y' }));
		expect(mismatch).toMatchObject({
			ok: false,
			errors: { confirm: expect.stringMatching(/not the same/) }
		});
	});

	it('refuses unknown roles and strange shop ids', () => {
		const bad = parseForm(
			inviteSchema,
			form({ email: 'a@b.example', name: 'Al', role: 'owner', siteId: '-1' })
		);
		expect(bad).toMatchObject({ ok: false, errors: { role: 'Choose a role.' } });
		expect('siteId' in (bad.ok ? {} : bad.errors)).toBe(true);
		const good = parseForm(
			inviteSchema,
			form({ email: 'a@b.example', name: 'Al', role: 'admin', siteId: '' })
		);
		expect(good).toEqual({
			ok: true,
			data: { email: 'a@b.example', name: 'Al', role: 'admin', siteId: null }
		});
	});

	it('never echoes passwords back to the page', () => {
		expect(
			keepValues(form({ email: 'a@b.example', password: 'secret', confirm: 'x' }), 'confirm')
		).toEqual({
			email: 'a@b.example'
		});
	});
});

describe('nested form fields', () => {
	it('turns dotted names into arrays and objects', () => {
		expect(
			formToObject(
				form({ 'tasks.0.taskId': '4', 'tasks.0.hours': '1.5', 'tasks.1.taskId': '9', note: 'x' })
			)
		).toEqual({ tasks: [{ taskId: '4', hours: '1.5' }, { taskId: '9' }], note: 'x' });
	});

	it('ignores prototype keys and huge indexes', () => {
		const result = formToObject(
			form({ '__proto__.admin': 'yes', 'tasks.9999.hours': '1', 'a.constructor.x': '1' })
		);
		expect(result).toEqual({});
		expect(({} as Record<string, unknown>).admin).toBeUndefined();
	});
});
