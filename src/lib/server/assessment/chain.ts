/**
 * The audit hash chain: each event's hash covers its content and the previous event's hash, so
 * editing, reordering or removing an earlier event breaks every link after it.
 */
import canonicalize from 'canonicalize';
import { createHash } from 'node:crypto';

/** The previous hash of the first event. */
export const GENESIS = '0'.repeat(64);

const SHA256_HEX = /^[0-9a-f]{64}$/;

export interface ChainRow {
	id: number;
	previousHash: string;
	hash: string;
	content: object;
}

export type ChainVerdict =
	{ ok: true; count: number } | { ok: false; brokenAt: number; reason: string };

/** RFC 8785 canonical JSON: the same value always gives the same text, whatever its key order. */
export function canonicalJson(value: unknown): string {
	const text = canonicalize(value);
	if (text === undefined) throw new TypeError('Only JSON values can be canonicalised.');
	try {
		// The package writes `undefined` for a function inside an object; no one could re-create that.
		JSON.parse(text);
	} catch {
		throw new TypeError('Only JSON values can be canonicalised.');
	}
	return text;
}

/** SHA-256 of the UTF-8 bytes of `text`, as 64 lowercase hex digits. */
export function sha256Hex(text: string): string {
	return createHash('sha256').update(text, 'utf8').digest('hex');
}

/** The hash of one link: sha256(previousHash + '\n' + canonical JSON of the content). */
export function linkHash(previousHash: string, content: object): string {
	if (!SHA256_HEX.test(previousHash)) {
		throw new RangeError('A previous hash is 64 lowercase hex digits.');
	}
	return sha256Hex(`${previousHash}\n${canonicalJson(content)}`);
}

/**
 * Checks rows given in id order and reports the first broken link. A deleted row shows as a
 * break at the row after it, whose previousHash no longer matches. Removing the newest rows
 * leaves a valid shorter chain: compare `count` and the last hash with a copy kept elsewhere.
 */
/** `after` continues a walk done in batches: the hash and id of the last row already checked. */
export function verifyChain(
	rows: readonly ChainRow[],
	after: { hash: string; id: number } = { hash: GENESIS, id: -Infinity }
): ChainVerdict {
	let expectedPrevious = after.hash;
	let previousId = after.id;
	for (const row of rows) {
		if (!(row.id > previousId)) {
			return { ok: false, brokenAt: row.id, reason: `Row ${row.id} is out of id order.` };
		}
		if (row.previousHash !== expectedPrevious) {
			const before = previousId === -Infinity ? 'the genesis hash' : `row ${previousId}'s hash`;
			return {
				ok: false,
				brokenAt: row.id,
				reason: `Row ${row.id}'s previous hash does not match ${before}: a row before it was removed or this row was changed.`
			};
		}
		let expectedHash: string;
		try {
			expectedHash = linkHash(row.previousHash, row.content);
		} catch {
			return { ok: false, brokenAt: row.id, reason: `Row ${row.id}'s content cannot be hashed.` };
		}
		if (row.hash !== expectedHash) {
			return {
				ok: false,
				brokenAt: row.id,
				reason: `Row ${row.id}'s hash does not match its content: the row was changed.`
			};
		}
		expectedPrevious = row.hash;
		previousId = row.id;
	}
	return { ok: true, count: rows.length };
}
