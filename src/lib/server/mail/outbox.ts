import { readdir, readFile } from 'node:fs/promises';
import path from 'node:path';
import { config } from '../config';

/** A message as the local fake SMTP server stores it (see fakes/smtp.ts). */
export interface StoredMail {
	id: string;
	receivedAt: string;
	from: string;
	to: string[];
	subject: string;
	text: string;
	attachments: { filename: string; contentType: string; size: number }[];
}

/** Whether this instance sends to the local fake mail server whose messages can be listed. */
export function available(): boolean {
	return Boolean(config.FAKE_MAIL_DIR);
}

/** Stored messages, newest first. */
export async function list(limit = 100): Promise<StoredMail[]> {
	if (!config.FAKE_MAIL_DIR) return [];
	const dir = path.resolve(config.FAKE_MAIL_DIR);
	const names = await readdir(dir).catch(() => [] as string[]);
	const newest = names
		.filter((n) => n.endsWith('.json'))
		.sort()
		.reverse()
		.slice(0, limit);
	return Promise.all(
		newest.map(async (n) => JSON.parse(await readFile(path.join(dir, n), 'utf8')) as StoredMail)
	);
}
