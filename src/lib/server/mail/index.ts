import nodemailer from 'nodemailer';
import type { Attachment } from 'nodemailer/lib/mailer';
import { config } from '../config';

export interface Message {
	to: string;
	subject: string;
	text: string;
	html?: string;
	attachments?: Attachment[];
}

const transport = nodemailer.createTransport(config.SMTP_URL, { from: config.MAIL_FROM });

/** Sends one message through the configured SMTP server. */
export async function send(message: Message): Promise<void> {
	await transport.sendMail(message);
}

/** A link back into the app, for e-mails. */
export function link(path: string): string {
	return new URL(path, config.ORIGIN).href;
}
