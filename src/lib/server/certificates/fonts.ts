/**
 * Fonts for certificate PDFs. @fontsource ships WOFF and WOFF2 only; pdf-lib's fontkit crashes
 * the process on WOFF2 and embeds WOFF slowly, so the WOFF files are unpacked to plain TrueType
 * once (WOFF 1.0 is zlib-compressed sfnt tables) and the bytes kept for the process.
 */
import fontkit from '@pdf-lib/fontkit';
import { readFile } from 'node:fs/promises';
import { createRequire } from 'node:module';
import path from 'node:path';
import { inflateSync } from 'node:zlib';

/** Rebuilds the sfnt (TrueType/OpenType) file a WOFF 1.0 file wraps. */
export function woffToSfnt(woff: Uint8Array): Buffer {
	const src = Buffer.from(woff.buffer, woff.byteOffset, woff.byteLength);
	if (src.toString('latin1', 0, 4) !== 'wOFF') throw new Error('Not a WOFF 1.0 file.');
	const flavor = src.readUInt32BE(4);
	const numTables = src.readUInt16BE(12);
	const tables: { tag: number; checksum: number; data: Buffer }[] = [];
	for (let i = 0; i < numTables; i++) {
		const at = 44 + i * 20;
		const offset = src.readUInt32BE(at + 4);
		const compLength = src.readUInt32BE(at + 8);
		const origLength = src.readUInt32BE(at + 12);
		const packed = src.subarray(offset, offset + compLength);
		const data = compLength < origLength ? inflateSync(packed) : Buffer.from(packed);
		if (data.length !== origLength) throw new Error('A WOFF table did not unpack to its size.');
		tables.push({ tag: src.readUInt32BE(at), checksum: src.readUInt32BE(at + 16), data });
	}
	const power = 2 ** Math.floor(Math.log2(numTables));
	const headerSize = 12 + numTables * 16;
	const size = tables.reduce((n, t) => n + Math.ceil(t.data.length / 4) * 4, headerSize);
	const out = Buffer.alloc(size);
	out.writeUInt32BE(flavor, 0);
	out.writeUInt16BE(numTables, 4);
	out.writeUInt16BE(power * 16, 6);
	out.writeUInt16BE(Math.log2(power), 8);
	out.writeUInt16BE(numTables * 16 - power * 16, 10);
	let offset = headerSize;
	tables.forEach((t, i) => {
		const record = 12 + i * 16;
		out.writeUInt32BE(t.tag, record);
		out.writeUInt32BE(t.checksum, record + 4);
		out.writeUInt32BE(offset, record + 8);
		out.writeUInt32BE(t.data.length, record + 12);
		t.data.copy(out, offset);
		offset += Math.ceil(t.data.length / 4) * 4;
	});
	return out;
}

export const FONT_FILES = {
	heading: '@fontsource/merriweather/files/merriweather-latin-700-normal.woff',
	text: '@fontsource/lato/files/lato-latin-400-normal.woff',
	textBold: '@fontsource/lato/files/lato-latin-700-normal.woff'
} as const;
export type FontName = keyof typeof FONT_FILES;

/** Finds a file inside an installed package without going through its `exports` map. */
function packageFile(spec: string): string {
	const [scope, name, ...rest] = spec.split('/');
	const require = createRequire(path.join(process.cwd(), 'package.json'));
	const root = path.dirname(require.resolve(`${scope}/${name}/package.json`));
	return path.join(root, ...rest);
}

// Unpacked once per process: the conversion is the slow part, the bytes never change.
let cached: Promise<Record<FontName, Buffer>> | undefined;

export function fonts(): Promise<Record<FontName, Buffer>> {
	cached ??= (async () => {
		const entries = await Promise.all(
			(Object.keys(FONT_FILES) as FontName[]).map(async (name) => {
				const woff = await readFile(packageFile(FONT_FILES[name]));
				return [name, woffToSfnt(woff)] as const;
			})
		);
		return Object.fromEntries(entries) as Record<FontName, Buffer>;
	})();
	cached.catch(() => (cached = undefined));
	return cached;
}

type Fontkit = typeof fontkit;
type ParsedFont = ReturnType<Fontkit['create']>;

// Parsed fonts by their bytes: parsing Merriweather took most of a certificate's time, and a parsed
// font is only read while a subset is cut from it.
const parsed = new WeakMap<Uint8Array, ParsedFont>();

const LAYOUTS_KEPT = 20_000;

/**
 * Shaping a line is most of a certificate's drawing time, and the same task titles and labels
 * recur on every certificate. A glyph run is only read by pdf-lib, so it is safe to reuse.
 */
function memoiseLayout(font: ParsedFont): ParsedFont {
	const layout = font.layout.bind(font);
	const runs = new Map<string, ReturnType<ParsedFont['layout']>>();
	font.layout = ((text: string, features?: unknown) => {
		const key = features ? `${JSON.stringify(features)}\u0000${text}` : text;
		let run = runs.get(key);
		if (!run) {
			if (runs.size >= LAYOUTS_KEPT) runs.clear();
			run = layout(text, features as never);
			runs.set(key, run);
		}
		return run;
	}) as ParsedFont['layout'];
	return font;
}

/** fontkit for pdf-lib's `registerFontkit`, reusing fonts it has parsed before. */
export const cachedFontkit: Fontkit = {
	...fontkit,
	create(buffer: Uint8Array, postscriptName?: string) {
		if (postscriptName) return fontkit.create(buffer, postscriptName);
		let font = parsed.get(buffer);
		if (!font) {
			font = memoiseLayout(fontkit.create(buffer));
			parsed.set(buffer, font);
		}
		return font;
	}
};
