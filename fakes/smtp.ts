/**
 * A local stand-in for the SMTP provider: accepts every message and stores it as JSON in a
 * folder, newest last, so people (the admin mail page) and tests can read what was sent.
 */
import { mkdir, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';

export interface StoredMail {
	id: string;
	receivedAt: string;
	from: string;
	to: string[];
	subject: string;
	text: string;
	html: string | null;
	attachments: { filename: string; contentType: string; size: number }[];
}

export async function startFakeSmtp(options: { port: number; dir: string; host?: string }) {
	await mkdir(options.dir, { recursive: true });
	const server = new SMTPServer({
		authOptional: true,
		disabledCommands: ['STARTTLS', 'AUTH'],
		logger: false,
		size: 25 * 1024 * 1024,
		async onData(stream, session, callback) {
			try {
				const parsed = await simpleParser(stream);
				const receivedAt = new Date();
				const id = `${receivedAt.getTime()}-${Math.random().toString(36).slice(2, 8)}`;
				const mail: StoredMail = {
					id,
					receivedAt: receivedAt.toISOString(),
					from: parsed.from?.text ?? '',
					to: session.envelope.rcptTo.map((r) => r.address),
					subject: parsed.subject ?? '',
					text: parsed.text ?? '',
					html: typeof parsed.html === 'string' ? parsed.html : null,
					attachments: parsed.attachments.map((a) => ({
						filename: a.filename ?? 'attachment',
						contentType: a.contentType,
						size: a.size
					}))
				};
				await writeFile(path.join(options.dir, `${id}.json`), JSON.stringify(mail, null, 2));
				callback();
			} catch (err) {
				callback(err as Error);
			}
		}
	});
	await new Promise<void>((resolve, reject) => {
		server.once('error', reject);
		server.listen(options.port, options.host ?? '127.0.0.1', () => resolve());
	});
	const address = (server as unknown as { server: import('node:net').Server }).server.address();
	return {
		port: typeof address === 'object' && address ? address.port : options.port,
		close: () => new Promise<void>((resolve) => server.close(() => resolve()))
	};
}

if (import.meta.url === `file://${process.argv[1]}`) {
	const port = Number(process.env.FAKE_SMTP_PORT ?? 2525);
	const dir = path.resolve(process.env.FAKE_MAIL_DIR ?? 'data/mail');
	await startFakeSmtp({ port, dir });
	console.log(`Fake SMTP server on 127.0.0.1:${port}, storing mail in ${dir}`);
}
