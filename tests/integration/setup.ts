import { mkdtempSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll } from 'vitest';
import { startFakeSmtp } from '../../fakes/smtp';

// Each test file gets its own SQLite file and mail folder, set before any server module loads.
const dir = mkdtempSync(path.join(os.tmpdir(), 'journeymark-it-'));
process.env.DATABASE_URL = path.join(dir, 'test.db');
process.env.FAKE_MAIL_DIR = path.join(dir, 'mail');
process.env.ORIGIN = 'http://localhost:3999';
const mail = await startFakeSmtp({ port: 0, dir: process.env.FAKE_MAIL_DIR });
process.env.SMTP_URL = `smtp://127.0.0.1:${mail.port}`;

afterAll(() => mail.close());
