import { readdir, readFile } from 'node:fs/promises';
import path from 'node:path';
import type { StoredMail } from '../../fakes/smtp';

/** Waits for the fake SMTP server to store a message to `to` matching `subject`. */
export async function waitForMail(
	dir: string,
	to: string,
	subject: RegExp,
	timeoutMs = 10_000
): Promise<StoredMail> {
	const deadline = Date.now() + timeoutMs;
	while (Date.now() < deadline) {
		const names = (await readdir(dir).catch(() => [] as string[])).sort().reverse();
		for (const name of names) {
			const mail = JSON.parse(await readFile(path.join(dir, name), 'utf8')) as StoredMail;
			if (mail.to.includes(to) && subject.test(mail.subject)) return mail;
		}
		await new Promise((r) => setTimeout(r, 100));
	}
	throw new Error(`No mail to ${to} matching ${subject} within ${timeoutMs} ms`);
}

/** The first link into the app found in a message's text. */
export function firstLink(mail: StoredMail): string {
	const match = mail.text.match(/https?:\/\/\S+/);
	if (!match) throw new Error(`No link in mail "${mail.subject}"`);
	return match[0];
}
