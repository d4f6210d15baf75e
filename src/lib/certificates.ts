/**
 * Certificate words and serial numbers, shared by the server and the browser (the verify form
 * checks a typed serial before it is sent).
 *
 * A serial reads `JM-XXXX-XXXX-XXXX-XXXX-C`: 80 random bits as 16 characters of Crockford's
 * base-32 alphabet (no I, L, O or U, so nothing is mistaken for a digit), then one check
 * character that catches any single mistyped character and any swap of neighbours.
 */
import { z } from 'zod';

export const SERIAL_ALPHABET = '0123456789ABCDEFGHJKMNPQRSTVWXYZ';
const BODY_LENGTH = 16;
/** Longer input than this is refused before it is even normalised. */
export const SERIAL_MAX_INPUT = 40;

/** The check character: a weighted sum modulo 31 (prime), so every weight is invertible. */
export function checkCharacter(body: string): string {
	let sum = 0;
	for (let i = 0; i < body.length; i++) sum += SERIAL_ALPHABET.indexOf(body[i]) * (i + 1);
	return SERIAL_ALPHABET[sum % 31];
}

/** Formats 10 random bytes (80 bits) as a serial. */
export function serialFromBytes(bytes: Uint8Array): string {
	if (bytes.length < 10) throw new RangeError('A serial needs 10 random bytes.');
	let value = 0n;
	for (const b of bytes.subarray(0, 10)) value = (value << 8n) | BigInt(b);
	let body = '';
	for (let i = 0; i < BODY_LENGTH; i++) {
		body = SERIAL_ALPHABET[Number(value & 31n)] + body;
		value >>= 5n;
	}
	const groups = body.match(/.{4}/g)!.join('-');
	return `JM-${groups}-${checkCharacter(body)}`;
}

/**
 * Normalises what a person typed or scanned (any case, spaces or no dashes, O for 0, I or L for
 * 1) to the canonical serial, or null if it cannot be one.
 */
export function normaliseSerial(input: string): string | null {
	if (input.length > SERIAL_MAX_INPUT) return null;
	let text = input.toUpperCase().replace(/[\s-]/g, '');
	if (!text.startsWith('JM')) return null;
	text = text.slice(2).replace(/O/g, '0').replace(/[IL]/g, '1');
	if (text.length !== BODY_LENGTH + 1) return null;
	for (const c of text) if (!SERIAL_ALPHABET.includes(c)) return null;
	const body = text.slice(0, BODY_LENGTH);
	if (checkCharacter(body) !== text[BODY_LENGTH]) return null;
	return `JM-${body.match(/.{4}/g)!.join('-')}-${text[BODY_LENGTH]}`;
}

export const CERTIFICATE_STATUSES = ['valid', 'revoked', 'expired'] as const;
export type CertificateStatus = (typeof CERTIFICATE_STATUSES)[number];

export const STATUS_WORD: Record<CertificateStatus, string> = {
	valid: 'Valid',
	revoked: 'Withdrawn',
	expired: 'Lapsed'
};

export const REVOCATION_REASONS = [
	'issued-in-error',
	'sign-off-withdrawn',
	'misconduct',
	'superseded',
	'holder-request'
] as const;
export type RevocationReason = (typeof REVOCATION_REASONS)[number];

/** The reason category shown publicly; the coordinator's note stays private. */
export const REASON_LABEL: Record<RevocationReason, string> = {
	'issued-in-error': 'Issued in error',
	'sign-off-withdrawn': 'An assessment it relied on was withdrawn',
	misconduct: 'Withdrawn after an investigation',
	superseded: 'Replaced by a later certificate',
	'holder-request': 'Withdrawn at the holder’s request'
};

export const LEVEL_WORD: Record<1 | 2 | 3 | 4, string> = {
	1: 'Observed',
	2: 'Assisted',
	3: 'Supervised',
	4: 'Independent'
};

/** Coordinator's issue form: programme completion, or one area as an interim credential. */
export const issueSchema = z.object({
	apprenticeId: z.string().trim().min(1, 'Choose an apprentice.').max(40),
	scope: z
		.string()
		.trim()
		.regex(/^(programme|area:[A-Z]{2,5})$/, 'Choose what the certificate covers.')
});

export const revokeSchema = z.object({
	reason: z.enum(REVOCATION_REASONS, { error: 'Choose a reason category.' }),
	note: z.string().trim().max(1000, 'Keep the note under 1,000 characters.').default('')
});

export const serialSchema = z
	.string()
	.max(SERIAL_MAX_INPUT, 'A serial is 24 characters, like JM-7K3Q-9XBD-W2HF-M4TR-C.')
	.transform((value, ctx) => {
		const serial = normaliseSerial(value.trim());
		if (!serial) {
			ctx.addIssue({
				code: 'custom',
				message:
					'That is not a Journeymark serial. Check it against the certificate: JM- then 20 letters and digits.'
			});
			return z.NEVER;
		}
		return serial;
	});
