import { hash, verify } from '@node-rs/argon2';

/** OWASP Password Storage Cheat Sheet minimum for argon2id (the library's default algorithm). */
export const ARGON2_OPTIONS = { memoryCost: 19456, timeCost: 2, parallelism: 1 } as const;

export const MIN_PASSWORD_LENGTH = 12;
export const MAX_PASSWORD_LENGTH = 128;

export function hashPassword(password: string): Promise<string> {
	return hash(password, ARGON2_OPTIONS);
}

export async function verifyPassword(stored: string, password: string): Promise<boolean> {
	try {
		return await verify(stored, password);
	} catch {
		return false;
	}
}

/** A hash of a random password, verified against when the e-mail is unknown so timing matches. */
let decoy: Promise<string> | undefined;
export function decoyHash(): Promise<string> {
	decoy ??= hashPassword(crypto.randomUUID());
	return decoy;
}
