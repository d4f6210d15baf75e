import path from 'node:path';
import { z } from 'zod';

/** Server settings, read once from the environment (see .env.example). */
const schema = z.object({
	DATABASE_URL: z.string().default('data/journeymark.db'),
	ORIGIN: z.url().default('http://localhost:3000'),
	SMTP_URL: z.string().default('smtp://127.0.0.1:2525'),
	MAIL_FROM: z.string().default('Journeymark <no-reply@journeymark.invalid>'),
	FAKE_MAIL_DIR: z.string().optional(),
	UPLOADS_DIR: z.string().default('data/uploads'),
	KEYS_DIR: z.string().default('data/keys'),
	/** Rendered certificate PDFs, cached by serial and paper size (safe to delete). */
	CERTIFICATES_DIR: z.string().default('data/certificates'),
	/** The sponsor named as issuer on certificates and portable credentials. */
	ISSUER_NAME: z.string().trim().min(1).max(120).default('Riverbend Training Partnership'),
	/** Public verification lookups allowed per address per minute. */
	VERIFY_LOOKUPS_PER_MINUTE: z.coerce.number().int().min(1).max(1_000_000).default(120),
	NODE_ENV: z.string().default('development'),
	QUIZ_QUESTIONS: z.coerce.number().int().min(1).max(50).default(5),
	QUIZ_PASS_MARK: z.coerce.number().int().min(1).max(100).default(80),
	QUIZ_RETAKE_WAIT_HOURS: z.coerce.number().min(0).max(720).default(12),
	QUIZ_TIME_LIMIT_MINUTES: z.coerce.number().int().min(1).max(240).default(30)
});

export type Config = z.infer<typeof schema> & { databasePath: string };

export function readConfig(env: Record<string, string | undefined> = process.env): Config {
	const parsed = schema.safeParse(env);
	if (!parsed.success) {
		const lines = parsed.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
		throw new Error(`Journeymark settings are invalid:\n${lines.join('\n')}`);
	}
	return { ...parsed.data, databasePath: sqlitePath(parsed.data.DATABASE_URL) };
}

/** Accepts a plain path, `file:path` or `sqlite:path`; `:memory:` passes through. */
export function sqlitePath(url: string): string {
	const bare = url.replace(/^(sqlite|file):(\/\/)?/, '');
	if (bare === ':memory:') return bare;
	if (/^[a-z]+:\/\//i.test(url) && !/^(sqlite|file):/.test(url)) {
		throw new Error(`DATABASE_URL "${url}" is not a SQLite path; only SQLite is supported here.`);
	}
	return path.resolve(bare);
}

export const config = readConfig();
