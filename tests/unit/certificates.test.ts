import { createPrivateKey, createPublicKey, generateKeyPairSync } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { gunzipSync } from 'node:zlib';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
	checkCharacter,
	normaliseSerial,
	SERIAL_ALPHABET,
	serialFromBytes,
	serialSchema
} from '$lib/certificates';
import { canonicalJson } from '$lib/server/assessment/chain';
import { addMonths } from '$lib/server/certificates/content';
import { encodeBitstring } from '$lib/server/certificates/credential';
import { FONT_FILES, woffToSfnt } from '$lib/server/certificates/fonts';
import { LookupLimiter } from '$lib/server/certificates/limit';
import {
	publicJwk,
	signBytes,
	signContent,
	verifyBytes,
	verifyContent
} from '$lib/server/certificates/signing';

const hex = (h: string) => Buffer.from(h, 'hex');

describe('Ed25519 signing', () => {
	// RFC 8032 §7.1 TEST 1 (REFERENCES.md: memory, confirmed by computation with Node's crypto).
	const secret = '9d61b19deffd5a60ba844af492ec2cc44449c5697b326919703bac031cae7f60';
	const publicHex = 'd75a980182b10ab7d54bfed3c964073a0ee172f3daa62325af021a68f707511a';
	const expected =
		'e5564300c360ac729086e2cc806e828a84877f1eb8e5d974d873e065224901555fb8821590a33bacc61e39701cf9b46bd25bf5f0595bbe24655141438e7a100b';
	const privateKey = createPrivateKey({
		key: {
			kty: 'OKP',
			crv: 'Ed25519',
			d: hex(secret).toString('base64url'),
			x: hex(publicHex).toString('base64url')
		},
		format: 'jwk'
	});

	it('signs the empty message of RFC 8032 TEST 1 to the published signature', () => {
		const signature = signBytes(privateKey, new Uint8Array(0));
		expect(signature.toString('hex')).toBe(expected);
		const publicKey = createPublicKey(privateKey);
		expect(Buffer.from(publicJwk(publicKey).x, 'base64url').toString('hex')).toBe(publicHex);
		expect(verifyBytes(publicKey, new Uint8Array(0), signature)).toBe(true);
		expect(verifyBytes(publicKey, new Uint8Array([0]), signature)).toBe(false);
	});

	it('signs the canonical form, so key order does not matter and any change breaks it', () => {
		const { publicKey, privateKey: key } = generateKeyPairSync('ed25519');
		const a = signContent(key, { serial: 'JM-1', holder: 'A', n: [1, 2] });
		const b = signContent(key, { n: [1, 2], holder: 'A', serial: 'JM-1' });
		expect(a.text).toBe('{"holder":"A","n":[1,2],"serial":"JM-1"}');
		expect(a.signature).toBe(b.signature); // Ed25519 is deterministic, RFC 8032 §5.1.6
		expect(verifyContent(publicKey, a.text, a.signature)).toBe(true);
		expect(verifyContent(publicKey, a.text.replace('"A"', '"B"'), a.signature)).toBe(false);
		expect(verifyContent(publicKey, a.text, 'not-a-signature')).toBe(false);
		const other = generateKeyPairSync('ed25519').publicKey;
		expect(verifyContent(other, a.text, a.signature)).toBe(false);
	});

	it('writes numbers, strings and literals as RFC 8785 does', () => {
		// RFC 8785 §3.2.2 sample values (memory): numbers in ECMAScript form, keys sorted.
		// The RFC's input is JSON text, so it is parsed here as a verifier would read it.
		const input = JSON.parse(
			'{"numbers":[333333333.33333329,1E30,4.50,2e-3,0.000000000000000000000000001],"literals":[null,true,false],"string":"\u20ac$\\u000F\\u000aA\'B\\u0022\\u005c\\\\\\"\\/"}'
		);
		expect(canonicalJson(input)).toBe(
			'{"literals":[null,true,false],"numbers":[333333333.3333333,1e+30,4.5,0.002,1e-27],"string":"€$\\u000f\\nA\'B\\"\\\\\\\\\\"/"}'
		);
	});

	it('publishes keys as JWKs with their RFC 7638 thumbprint as kid', () => {
		// RFC 7638 §3.1 example key and thumbprint.
		const n =
			'0vx7agoebGcQSuuPiLJXZptN9nndrQmbXEps2aiAFbWhM78LhWx4cbbfAAtVT86zwu1RK7aPFFxuhDR1L6tSoc_BJECPebWKRXjBZCiFV4n3oknjhMstn64tZ_2W-5JsGY4Hc5n9yBXArwl93lqt7_RN5w6Cf0h4QyQ5v-65YGjQR0_FDW2QvzqY368QQMicAtaSqzs8KJZgnYb9c7d0zgdAZHzu6qMQvRL5hajrn1n91CbOpbISD08qNLyrdkt-bFTWhAI4vMQFh6WeZu0fM4lFd2NcRwr3XPksINHaQ-G_xBniIqbw0Ls1jF44-csFCur-kEgU8awapJzKnqDKgw';
		const key = createPublicKey({ key: { kty: 'RSA', n, e: 'AQAB' }, format: 'jwk' });
		const jwk = publicJwk(key);
		expect(jwk.kid).toBe('NzbLsXh8uDCcd-6MNwXF4W_7noWXFZAfHkxZsRGC9Xs');
		expect(jwk).toMatchObject({ kty: 'RSA', alg: 'RS256', use: 'sig', e: 'AQAB' });
	});
});

describe('serials', () => {
	it('reads JM, four groups of four and a check character, from 80 random bits', () => {
		fc.assert(
			fc.property(fc.uint8Array({ minLength: 10, maxLength: 10 }), (bytes) => {
				const serial = serialFromBytes(bytes);
				expect(serial).toMatch(
					/^JM-[0-9A-HJKMNP-TV-Z]{4}(-[0-9A-HJKMNP-TV-Z]{4}){3}-[0-9A-HJKMNP-TV-Z]$/
				);
				expect(normaliseSerial(serial)).toBe(serial);
			})
		);
		expect(serialFromBytes(new Uint8Array(10))).toBe('JM-0000-0000-0000-0000-0');
		expect(serialFromBytes(new Uint8Array(10).fill(255))).toBe(
			`JM-ZZZZ-ZZZZ-ZZZZ-ZZZZ-${checkCharacter('Z'.repeat(16))}`
		);
	});

	it('catches every single mistyped character and every swap of neighbours', () => {
		fc.assert(
			fc.property(
				fc.uint8Array({ minLength: 10, maxLength: 10 }),
				fc.integer({ min: 0, max: 15 }),
				fc.integer({ min: 1, max: 31 }),
				(bytes, position, shift) => {
					const body = serialFromBytes(bytes).slice(3, -2).replace(/-/g, '');
					const check = checkCharacter(body);
					const typo = body.split('');
					const value = SERIAL_ALPHABET.indexOf(typo[position]);
					typo[position] = SERIAL_ALPHABET[(value + shift) % 32];
					// Only 0 and Z differ by 31 ≡ 0 (mod 31): the one pair a mod-31 sum cannot tell apart.
					if (Math.abs(SERIAL_ALPHABET.indexOf(typo[position]) - value) !== 31)
						expect(checkCharacter(typo.join(''))).not.toBe(check);
					if (position < 15 && body[position] !== body[position + 1]) {
						const swapped = body.split('');
						[swapped[position], swapped[position + 1]] = [swapped[position + 1], swapped[position]];
						const gap = Math.abs(
							SERIAL_ALPHABET.indexOf(body[position]) - SERIAL_ALPHABET.indexOf(body[position + 1])
						);
						if (gap !== 31) expect(checkCharacter(swapped.join(''))).not.toBe(check);
					}
				}
			)
		);
	});

	it('accepts what people type: any case, spaces, O for 0, I and L for 1', () => {
		const serial = serialFromBytes(Uint8Array.from([1, 2, 3, 4, 5, 6, 7, 8, 9, 10]));
		expect(normaliseSerial(serial.toLowerCase())).toBe(serial);
		expect(normaliseSerial(serial.replace(/-/g, ' '))).toBe(serial);
		expect(serialSchema.parse(`  ${serial}  `)).toBe(serial);
		const withZero = 'JM-0000-0000-0000-0000-0';
		expect(normaliseSerial('jm-oooo-0000-0000-0000-o')).toBe(withZero);
		expect(normaliseSerial('JM-0000-0000-0000-0000-1')).toBeNull();
		expect(normaliseSerial('XX-0000-0000-0000-0000-0')).toBeNull();
		expect(normaliseSerial('JM-' + '0'.repeat(500))).toBeNull();
		expect(serialSchema.safeParse('JM-' + '0'.repeat(60)).success).toBe(false);
		expect(serialSchema.safeParse('hello').error?.issues[0].message).toMatch(
			/not a Journeymark serial/
		);
	});
});

describe('fonts for the PDF', () => {
	it('unpacks WOFF to an sfnt whose tables match the checksums the WOFF file records', () => {
		// OpenType spec, "Calculating checksums": sum of big-endian uint32 words, table padded to 4.
		const require = createRequire(import.meta.url);
		const [scope, name, ...rest] = FONT_FILES.text.split('/');
		const root = require.resolve(`${scope}/${name}/package.json`).replace(/package\.json$/, '');
		const sfnt = woffToSfnt(readFileSync(root + rest.join('/')));
		expect(sfnt.readUInt32BE(0)).toBe(0x00010000);
		const tables = sfnt.readUInt16BE(4);
		expect(tables).toBeGreaterThan(8);
		for (let i = 0; i < tables; i++) {
			const record = 12 + i * 16;
			const tag = sfnt.toString('latin1', record, record + 4);
			const offset = sfnt.readUInt32BE(record + 8);
			const length = sfnt.readUInt32BE(record + 12);
			let sum = 0;
			for (let at = offset; at < offset + length; at += 4) {
				const word = Buffer.alloc(4);
				sfnt.copy(word, 0, at, Math.min(at + 4, offset + length));
				sum = (sum + (tag === 'head' && at === offset + 8 ? 0 : word.readUInt32BE(0))) >>> 0;
			}
			expect(sum, tag).toBe(sfnt.readUInt32BE(record + 4));
		}
		expect(() => woffToSfnt(Buffer.from('wOF2....'))).toThrow(/WOFF 1.0/);
	});
});

describe('status list', () => {
	it('sets the bit of each revoked index, first index in the leftmost bit', () => {
		// W3C Bitstring Status List 1.0 §3.2: GZIP, multibase base64url ('u'), index 0 is the first bit.
		const encoded = encodeBitstring([0, 9, 131_071, -1, 131_072]);
		expect(encoded[0]).toBe('u');
		const bits = gunzipSync(Buffer.from(encoded.slice(1), 'base64url'));
		expect(bits.length).toBe(16_384);
		expect(bits[0]).toBe(0b1000_0000);
		expect(bits[1]).toBe(0b0100_0000);
		expect(bits[16_383]).toBe(0b0000_0001);
		expect(bits.reduce((n, b) => n + (b ? 1 : 0), 0)).toBe(3);
	});
});

describe('validity and lookups', () => {
	it('adds months on the calendar, keeping the day where the month has it', () => {
		expect(addMonths(new Date('2026-01-31T10:00:00Z'), 1).toISOString()).toBe(
			'2026-02-28T10:00:00.000Z'
		);
		expect(addMonths(new Date('2028-01-31T10:00:00Z'), 1).toISOString()).toBe(
			'2028-02-29T10:00:00.000Z'
		);
		expect(addMonths(new Date('2026-03-15T00:00:00Z'), 36).toISOString()).toBe(
			'2029-03-15T00:00:00.000Z'
		);
		expect(addMonths(new Date('2026-03-15T00:00:00Z'), -4).toISOString()).toBe(
			'2025-11-15T00:00:00.000Z'
		);
	});

	it('limits lookups per address per minute and says how long to wait', () => {
		const limiter = new LookupLimiter(3);
		const t = 1_000_000;
		expect([1, 2, 3].map(() => limiter.take('198.51.100.1', t))).toEqual([0, 0, 0]);
		expect(limiter.take('198.51.100.1', t + 1_000)).toBe(59);
		expect(limiter.take('198.51.100.2', t + 1_000)).toBe(0);
		expect(limiter.take('198.51.100.1', t + 60_000)).toBe(0);
	});
});
