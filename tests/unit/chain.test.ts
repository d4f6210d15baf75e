import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import {
	GENESIS,
	canonicalJson,
	linkHash,
	sha256Hex,
	verifyChain,
	type ChainRow
} from '$lib/server/assessment/chain';

/** A valid chain of `n` audit rows with ids 1..n. */
function chainOf(n: number): ChainRow[] {
	const rows: ChainRow[] = [];
	let previousHash = GENESIS;
	for (let id = 1; id <= n; id++) {
		const content = { kind: 'sign-off', subject: `sign-off:${id}`, level: (id % 4) + 1 };
		const hash = linkHash(previousHash, content);
		rows.push({ id, previousHash, hash, content });
		previousHash = hash;
	}
	return rows;
}

describe('sha256Hex', () => {
	it('hashes "abc" to the published example value', () => {
		// FIPS 180-4 SHA-256 example "abc" (NIST example values; value from REFERENCES.md).
		expect(sha256Hex('abc')).toBe(
			'ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad'
		);
	});

	it('hashes the empty string to the well-known value', () => {
		// SHA-256 of the empty message, from memory.
		expect(sha256Hex('')).toBe('e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855');
	});

	it('hashes the UTF-8 bytes of the text', () => {
		expect(sha256Hex('€')).toBe(
			createHash('sha256')
				.update(Buffer.from([0xe2, 0x82, 0xac]))
				.digest('hex')
		);
	});
});

describe('canonicalJson (RFC 8785)', () => {
	it('sorts keys and writes numbers and non-ASCII text the ECMAScript way', () => {
		// RFC 8785 §3.2.3 sorted keys; §3.2.2.3 numbers as ECMAScript writes them; §3.2.2.2
		// non-ASCII characters written as themselves (sections from memory).
		expect(canonicalJson({ b: 1, a: [1e2, 0.000001, '\u20ac'] })).toBe(
			'{"a":[100,0.000001,"€"],"b":1}'
		);
	});

	it('formats edge numbers as ECMAScript Number.prototype.toString does', () => {
		// RFC 8785 §3.2.2.3 defers to ECMAScript number serialisation; −0 becomes 0 (from memory).
		expect(canonicalJson([1e21, 1e-7, -0, 5e-324, 1.7976931348623157e308])).toBe(
			'[1e+21,1e-7,0,5e-324,1.7976931348623157e+308]'
		);
	});

	it('reproduces the RFC author’s "values" test vector', () => {
		// cyberphone/json-canonicalization testdata/input/values.json → output/values.json (seen);
		// the same example appears in RFC 8785 §3.2.2 (from memory).
		const input = String.raw`{
  "numbers": [1E30, 4.50, 333333333.33333329, 2e-3, 0.000000000000000000000000001],
  "escaping": "\u20ac$\u000F\u000aA'\u0042\u0022\u005c\\\"\/",
  "literals": [null, true, false]
}`;
		const output = String.raw`{"escaping":"€$\u000f\nA'B\"\\\\\"/","literals":[null,true,false],"numbers":[1e+30,4.5,333333333.3333333,0.002,1e-27]}`;
		expect(canonicalJson(JSON.parse(input))).toBe(output);
	});

	it('sorts keys by UTF-16 code units, as in the RFC author’s "weird" test vector', () => {
		// cyberphone/json-canonicalization testdata/input/weird.json → output/weird.json (seen);
		// RFC 8785 §3.2.3 sorts by UTF-16 code units, so U+1F602 (D83D DE02) precedes U+FB33.
		const input = String.raw`{
  "\u20ac": "Euro Sign",
  "1": "One",
  "\u0080": "Control\u007f",
  "\ud83d\ude02": "Smiley",
  "\u00f6": "Latin Small Letter O With Diaeresis",
  "\ufb33": "Hebrew Letter Dalet With Dagesh",
  "</script>": "Browser Challenge"
}`;
		const output =
			'{"1":"One","</script>":"Browser Challenge","\u0080":"Control\u007f",' +
			'"\u00f6":"Latin Small Letter O With Diaeresis","\u20ac":"Euro Sign",' +
			'"\ud83d\ude02":"Smiley","\ufb33":"Hebrew Letter Dalet With Dagesh"}';
		expect(canonicalJson(JSON.parse(input))).toBe(output);
	});

	it('gives the same text whatever order the keys were written in', () => {
		expect(canonicalJson({ z: { y: 1, x: [2, { b: 0, a: 1 }] }, a: null })).toBe(
			canonicalJson({ a: null, z: { x: [2, { a: 1, b: 0 }], y: 1 } })
		);
	});

	it('refuses what is not JSON', () => {
		expect(() => canonicalJson(undefined)).toThrow(TypeError);
		expect(() => canonicalJson({ run: () => 1 })).toThrow(TypeError);
		expect(() => canonicalJson({ n: Number.NaN })).toThrow();
		expect(() => canonicalJson({ n: Infinity })).toThrow();
	});
});

describe('linkHash', () => {
	it('is sha256 of previousHash, a newline and the canonical content', () => {
		const expected = createHash('sha256')
			.update(`${'0'.repeat(64)}\n{"a":1,"b":"x"}`, 'utf8')
			.digest('hex');
		expect(GENESIS).toBe('0'.repeat(64));
		expect(linkHash(GENESIS, { b: 'x', a: 1 })).toBe(expected);
	});

	it('changes when the previous hash or the content changes', () => {
		const base = linkHash(GENESIS, { a: 1 });
		expect(linkHash('f'.repeat(64), { a: 1 })).not.toBe(base);
		expect(linkHash(GENESIS, { a: 2 })).not.toBe(base);
	});

	it('refuses a previous hash that is not 64 lowercase hex digits', () => {
		expect(() => linkHash('abc', {})).toThrow(RangeError);
		expect(() => linkHash('F'.repeat(64), {})).toThrow(RangeError);
	});
});

describe('verifyChain', () => {
	it('accepts an intact chain of 5 rows, and an empty one', () => {
		expect(verifyChain(chainOf(5))).toEqual({ ok: true, count: 5 });
		expect(verifyChain([])).toEqual({ ok: true, count: 0 });
	});

	it('reports an edit to row 3’s content at row 3', () => {
		const rows = chainOf(5);
		rows[2] = { ...rows[2], content: { ...rows[2].content, subject: 'sign-off:99' } };
		expect(verifyChain(rows)).toMatchObject({
			ok: false,
			brokenAt: 3,
			reason: expect.stringMatching(/hash does not match its content/)
		});
	});

	it('reports an edit to row 3’s hash at row 3', () => {
		const rows = chainOf(5);
		rows[2] = { ...rows[2], hash: 'a'.repeat(64) };
		expect(verifyChain(rows)).toMatchObject({ ok: false, brokenAt: 3 });
	});

	it('reports an edit to row 3’s previous hash at row 3', () => {
		const rows = chainOf(5);
		rows[2] = { ...rows[2], previousHash: 'b'.repeat(64) };
		expect(verifyChain(rows)).toMatchObject({
			ok: false,
			brokenAt: 3,
			reason: expect.stringMatching(/previous hash does not match row 2/)
		});
	});

	it('reports deleting row 3 at row 4, the row whose link now points at nothing', () => {
		const rows = chainOf(5);
		rows.splice(2, 1);
		expect(verifyChain(rows)).toMatchObject({
			ok: false,
			brokenAt: 4,
			reason: expect.stringMatching(/removed/)
		});
	});

	it('reports row 3 edited and re-hashed at row 4', () => {
		const rows = chainOf(5);
		const content = { ...rows[2].content, subject: 'sign-off:99' };
		rows[2] = { ...rows[2], content, hash: linkHash(rows[2].previousHash, content) };
		expect(verifyChain(rows)).toMatchObject({ ok: false, brokenAt: 4 });
	});

	it('reports only the first broken link', () => {
		const rows = chainOf(5);
		rows[1] = { ...rows[1], content: { forged: true } };
		rows[3] = { ...rows[3], content: { forged: true } };
		expect(verifyChain(rows)).toMatchObject({ ok: false, brokenAt: 2 });
	});

	it('needs the first row to start from the genesis hash', () => {
		const rows = chainOf(5).slice(1);
		expect(verifyChain(rows)).toMatchObject({
			ok: false,
			brokenAt: 2,
			reason: expect.stringMatching(/genesis/)
		});
	});

	it('refuses rows out of id order', () => {
		const rows = chainOf(5);
		[rows[2], rows[3]] = [rows[3], rows[2]];
		expect(verifyChain(rows)).toMatchObject({ ok: false, brokenAt: 4 });
		const repeated = chainOf(2);
		repeated[1] = { ...repeated[1], id: 1 };
		expect(verifyChain(repeated)).toMatchObject({
			ok: false,
			brokenAt: 1,
			reason: expect.stringMatching(/out of id order/)
		});
	});
});
