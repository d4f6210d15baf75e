import { mkdtempSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll } from 'vitest';
import { startFakeSmtp } from '../../fakes/smtp';
import { freshPostgresDatabase } from '../../seed/postgres';

// Each test file gets its own database and mail folder, set before any server module loads:
// a SQLite file by default, or a new PostgreSQL database when TEST_POSTGRES_URL names a server.
const dir = mkdtempSync(path.join(os.tmpdir(), 'journeymark-it-'));
const postgres = process.env.TEST_POSTGRES_URL
	? await freshPostgresDatabase(process.env.TEST_POSTGRES_URL)
	: null;
process.env.DATABASE_URL = postgres?.url ?? path.join(dir, 'test.db');
process.env.FAKE_MAIL_DIR = path.join(dir, 'mail');
process.env.ORIGIN = 'http://localhost:3999';
const mail = await startFakeSmtp({ port: 0, dir: process.env.FAKE_MAIL_DIR });
process.env.SMTP_URL = `smtp://127.0.0.1:${mail.port}`;

afterAll(async () => {
	await mail.close();
	if (postgres) {
		// The file's own connections must close before its database can be dropped.
		const db = await import('../../src/lib/server/db');
		await db.sequelize.close().catch(() => undefined);
		if (db.reader !== db.sequelize) await db.reader.close().catch(() => undefined);
		await postgres.drop();
	}
});
