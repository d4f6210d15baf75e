import { z } from 'zod';

export const ROLE_NAMES = ['apprentice', 'supervisor', 'coordinator', 'admin'] as const;

export const email = z
	.string({ error: 'Enter your e-mail address.' })
	.trim()
	.min(1, 'Enter your e-mail address.')
	.max(254, 'That e-mail address is too long.')
	.pipe(z.email('Enter a valid e-mail address, like name@shop.example.'))
	.transform((v) => v.toLowerCase());

export const loginSchema = z.object({
	email,
	password: z
		.string({ error: 'Enter your password.' })
		.min(1, 'Enter your password.')
		.max(128, 'Passwords are at most 128 characters.')
});

export const newPasswordSchema = z
	.object({
		password: z
			.string({ error: 'Choose a password.' })
			.min(12, 'Use at least 12 characters; a few words in a row work well.')
			.max(128, 'Passwords are at most 128 characters.'),
		confirm: z.string({ error: 'Type the password again.' })
	})
	.refine((v) => v.password === v.confirm, {
		path: ['confirm'],
		message: 'The two passwords are not the same.'
	});

export const forgotSchema = z.object({ email });

export const inviteSchema = z.object({
	email,
	name: z
		.string({ error: 'Enter the person’s name.' })
		.trim()
		.min(2, 'Enter the person’s name.')
		.max(120, 'Names are at most 120 characters.'),
	role: z.enum(ROLE_NAMES, { error: 'Choose a role.' }),
	siteId: z
		.string()
		.optional()
		.transform((v) => (v ? Number(v) : null))
		.pipe(z.number().int().positive().nullable())
});

export const userActionSchema = z.object({
	userId: z.string().trim().min(1).max(40)
});

export const changeRoleSchema = userActionSchema.extend({
	role: z.enum(ROLE_NAMES, { error: 'Choose a role.' })
});
