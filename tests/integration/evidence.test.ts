import { randomBytes } from 'node:crypto';
import { fileTypeFromBuffer } from 'file-type';
import { PDFDocument } from 'pdf-lib';
import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { processUpload } from '../../src/lib/server/evidence';

const NOT_PHOTO = 'This file is not a photo or a PDF.';
const HEIC = "Phone set to HEIC? Switch the camera to 'Most compatible' (JPEG) or share as JPEG.";

function canvas(width: number, height: number, channels: 3 | 4 = 3, alpha = 1) {
	return sharp({
		create: { width, height, channels, background: { r: 40, g: 90, b: 160, alpha } }
	});
}

// Left half red, right half blue: shows which way a rotation went.
function twoColour(width: number, height: number) {
	const half = Math.floor(width / 2);
	return sharp({ create: { width, height, channels: 3, background: '#0000ff' } }).composite([
		{
			input: { create: { width: half, height, channels: 3, background: '#ff0000' } },
			left: 0,
			top: 0
		}
	]);
}

// Random pixels do not compress, so file sizes are predictable.
function noise(width: number, height: number) {
	return sharp(randomBytes(width * height * 3), { raw: { width, height, channels: 3 } });
}

async function pixel(image: Buffer, x: number, y: number): Promise<number[]> {
	const { data, info } = await sharp(image).raw().toBuffer({ resolveWithObject: true });
	const at = (y * info.width + x) * info.channels;
	return [...data.subarray(at, at + 3)];
}

const isRed = ([r, g, b]: number[]) => r > 200 && g < 60 && b < 60;
const isBlue = ([r, g, b]: number[]) => b > 200 && r < 60 && g < 60;

async function minimalPdf(): Promise<Uint8Array> {
	const doc = await PDFDocument.create();
	doc.addPage([595, 842]);
	return doc.save();
}

// A HEIF container branded 'heic' whose image is not one sharp can decode here: a sharp AVIF with
// its brand, item type and codec box renamed to HEVC's. The prebuilt sharp has no HEVC decoder.
async function undecodableHeic(): Promise<Buffer> {
	const file = Buffer.from(await canvas(64, 48).avif().toBuffer());
	file.write('heic', 8, 'latin1');
	for (const [from, to] of [
		['av01', 'hvc1'],
		['av1C', 'hvcC']
	]) {
		for (let i = file.indexOf(from, 0, 'latin1'); i >= 0; i = file.indexOf(from, i, 'latin1')) {
			file.write(to, i, 'latin1');
		}
	}
	return file;
}

describe('type from content, never from the name', () => {
	it('treats a PNG named .pdf as an image', async () => {
		const png = await canvas(300, 200).png().toBuffer();
		const result = await processUpload(png, 'brake-report.pdf');
		expect(result).toMatchObject({ ok: true, kind: 'image', mime: 'image/jpeg', extension: 'jpg' });
		if (!result.ok) return;
		expect((await sharp(result.bytes).metadata()).format).toBe('jpeg');
	});

	it('treats a PDF named .jpg as a PDF', async () => {
		const pdf = await minimalPdf();
		expect(await processUpload(pdf, 'IMG_2231.jpg')).toMatchObject({ ok: true, kind: 'pdf' });
	});

	it.each([
		['a script', '<script>fetch("/api/session")</script>'],
		['an HTML page', '<!doctype html><html><body onload="alert(1)"></body></html>'],
		['a shell script', '#!/bin/sh\nrm -rf ~\n'],
		['an SVG', '<svg xmlns="http://www.w3.org/2000/svg"><script>alert(1)</script></svg>']
	])('refuses %s renamed .jpg with 415', async (_what, text) => {
		// OWASP ASVS 4.0.3 V12: file type from content; never served as HTML/JS
		expect(await processUpload(Buffer.from(text), 'photo.jpg')).toEqual({
			ok: false,
			status: 415,
			message: NOT_PHOTO
		});
	});

	it('refuses other binary files', async () => {
		const zip = Buffer.from([0x50, 0x4b, 0x03, 0x04, ...Buffer.alloc(60)]);
		expect(await processUpload(zip, 'photo.jpg')).toMatchObject({ ok: false, status: 415 });
	});

	it('names image formats it does not take', async () => {
		const gif = await canvas(20, 20).gif().toBuffer();
		expect(await processUpload(gif, 'wiring.gif')).toEqual({
			ok: false,
			status: 415,
			message: 'Only JPEG, PNG and WebP photos can be attached; this is a GIF image.'
		});
	});
});

describe('size', () => {
	it('refuses an empty file with 400', async () => {
		expect(await processUpload(new Uint8Array(0), 'empty.jpg')).toEqual({
			ok: false,
			status: 400,
			message: 'The file is empty.'
		});
	});

	it('refuses a file over the limit with 413 and says the limit in MB', async () => {
		const big = Buffer.alloc(10 * 1024 * 1024 + 1);
		expect(await processUpload(big, 'big.jpg')).toEqual({
			ok: false,
			status: 413,
			message: 'This file is 10.1 MB; the limit is 10 MB.'
		});
		const jpeg = await canvas(400, 400).jpeg().toBuffer();
		const small = { maxBytes: 512 * 1024 };
		expect(await processUpload(jpeg, 'ok.jpg', small)).toMatchObject({ ok: true });
		const noisy = await noise(800, 800).png().toBuffer();
		expect(noisy.length).toBeGreaterThan(small.maxBytes);
		expect(await processUpload(noisy, 'noisy.png', small)).toMatchObject({
			ok: false,
			status: 413,
			message: expect.stringContaining('the limit is 0.5 MB')
		});
	});
});

describe('images are re-encoded', () => {
	it('drops EXIF, including GPS position', async () => {
		const withGps = await canvas(640, 480)
			.jpeg()
			.withExif({
				IFD0: { Make: 'Invented Camera Co', Software: 'fixture' },
				IFD3: {
					GPSLatitudeRef: 'N',
					GPSLatitude: '51/1 30/1 0/1',
					GPSLongitudeRef: 'W',
					GPSLongitude: '0/1 7/1 30/1'
				}
			})
			.toBuffer();
		const before = await sharp(withGps).metadata();
		expect(before.exif).toBeInstanceOf(Buffer);
		// EXIF 2.3 (memory): tag 0x8825 points at the GPS IFD (little-endian here)
		expect(before.exif?.includes(Buffer.from([0x25, 0x88]))).toBe(true);
		expect(before.exif?.includes(Buffer.from('Invented Camera Co'))).toBe(true);

		const result = await processUpload(withGps, 'IMG_0001.jpg');
		expect(result.ok).toBe(true);
		if (!result.ok) return;
		const after = await sharp(result.bytes).metadata();
		expect(after.exif).toBeUndefined();
		expect(after.xmp).toBeUndefined();
		expect(after.iptc).toBeUndefined();
		expect(result.bytes.includes(Buffer.from('Invented Camera Co'))).toBe(false);
		expect((await sharp(result.thumbnail!).metadata()).exif).toBeUndefined();
	});

	it('applies the EXIF orientation to the pixels', async () => {
		// EXIF 2.3 (memory): Orientation 6 means turn the stored image 90° clockwise to display
		const sideways = await twoColour(200, 100).jpeg().withMetadata({ orientation: 6 }).toBuffer();
		expect((await sharp(sideways).metadata()).orientation).toBe(6);
		const result = await processUpload(sideways, 'sideways.jpg');
		expect(result).toMatchObject({ ok: true, width: 100, height: 200 });
		if (!result.ok) return;
		const meta = await sharp(result.bytes).metadata();
		expect([meta.width, meta.height, meta.orientation]).toEqual([100, 200, undefined]);
		// Turning clockwise brings the left (red) half to the top.
		expect(isRed(await pixel(result.bytes, 50, 20))).toBe(true);
		expect(isBlue(await pixel(result.bytes, 50, 180))).toBe(true);
	});

	it('caps the longest side at 2400 px and never enlarges', async () => {
		const wide = await canvas(3600, 1200).jpeg().toBuffer();
		expect(await processUpload(wide, 'wide.jpg')).toMatchObject({ width: 2400, height: 800 });
		const tall = await canvas(1000, 3000).png().toBuffer();
		expect(await processUpload(tall, 'tall.png')).toMatchObject({ width: 800, height: 2400 });
		const small = await canvas(640, 480).jpeg().toBuffer();
		expect(await processUpload(small, 'small.jpg')).toMatchObject({ width: 640, height: 480 });
	});

	it('makes a WebP thumbnail 320 px wide', async () => {
		const result = await processUpload(await canvas(1600, 1200).jpeg().toBuffer(), 'a.jpg');
		if (!result.ok) throw new Error(result.message);
		const thumb = await sharp(result.thumbnail!).metadata();
		expect([thumb.format, thumb.width, thumb.height]).toEqual(['webp', 320, 240]);
	});

	it('keeps PNG only when it has real transparency', async () => {
		const clear = await canvas(200, 200, 4, 0.4).png().toBuffer();
		const kept = await processUpload(clear, 'decal.png');
		expect(kept).toMatchObject({ ok: true, mime: 'image/png', extension: 'png' });
		if (!kept.ok) return;
		expect((await sharp(kept.bytes).metadata()).hasAlpha).toBe(true);

		const opaqueWithAlpha = await canvas(200, 200, 4, 1).png().toBuffer();
		expect((await sharp(opaqueWithAlpha).metadata()).hasAlpha).toBe(true);
		expect(await processUpload(opaqueWithAlpha, 'screen.png')).toMatchObject({
			ok: true,
			mime: 'image/jpeg'
		});
	});

	it('keeps WebP as WebP', async () => {
		const webp = await canvas(300, 300).webp().toBuffer();
		const result = await processUpload(webp, 'shared.webp');
		expect(result).toMatchObject({
			ok: true,
			kind: 'image',
			mime: 'image/webp',
			extension: 'webp'
		});
		if (!result.ok) return;
		expect((await sharp(result.bytes).metadata()).format).toBe('webp');
	});

	it('re-encodes JPEG at about quality 82', async () => {
		// common practice, no published source: quality 82; a quality-100 original shrinks
		const noisy = await noise(600, 400).jpeg({ quality: 100 }).toBuffer();
		const result = await processUpload(noisy, 'noisy.jpg');
		if (!result.ok) throw new Error(result.message);
		expect(result.bytes.length).toBeLessThan(noisy.length);
		const atQuality = (quality: number) => sharp(noisy).jpeg({ quality }).toBuffer();
		expect(result.bytes.length).toBeGreaterThan((await atQuality(75)).length);
		expect(result.bytes.length).toBeLessThan((await atQuality(90)).length);
	});

	it('refuses a damaged JPEG with 400', async () => {
		const jpeg = await twoColour(400, 300).jpeg().toBuffer();
		expect(await processUpload(jpeg.subarray(0, jpeg.length / 2), 'cut.jpg')).toEqual({
			ok: false,
			status: 400,
			message: 'This photo could not be read; it may be damaged. Take it again or share it as JPEG.'
		});
	});
});

describe('HEIC and HEIF', () => {
	it('refuses a HEIC this machine cannot decode with advice to switch to JPEG', async () => {
		const heic = await undecodableHeic();
		expect(await fileTypeFromBuffer(heic)).toEqual({ ext: 'heic', mime: 'image/heic' });
		await expect(sharp(heic).jpeg().toBuffer()).rejects.toThrow();
		expect(await processUpload(heic, 'IMG_4410.HEIC')).toEqual({
			ok: false,
			status: 415,
			message: HEIC
		});
	});

	it('accepts a HEIF-family image sharp can decode, as JPEG', async () => {
		// sharp's prebuilt libheif decodes AV1-coded HEIF (AVIF) but not HEVC-coded HEIC
		const avif = await twoColour(200, 100).avif().toBuffer();
		const result = await processUpload(avif, 'photo.avif');
		expect(result).toMatchObject({ ok: true, kind: 'image', mime: 'image/jpeg', width: 200 });
	});
});

describe('PDF', () => {
	it('accepts a minimal valid PDF and stores it as is', async () => {
		const pdf = await minimalPdf();
		const result = await processUpload(pdf, 'invoice.pdf');
		expect(result).toMatchObject({
			ok: true,
			kind: 'pdf',
			mime: 'application/pdf',
			extension: 'pdf',
			thumbnail: null
		});
		if (!result.ok) return;
		expect(result.bytes.equals(Buffer.from(pdf))).toBe(true);
	});

	it('accepts a hand-written PDF with a newline after %%EOF', async () => {
		// ISO 32000-1 §7.5.2 header and §7.5.5 end-of-file marker (memory)
		const pdf = Buffer.from(
			'%PDF-1.4\n1 0 obj <</Type /Catalog /Pages 2 0 R>> endobj\n' +
				'2 0 obj <</Type /Pages /Kids [] /Count 0>> endobj\ntrailer <</Root 1 0 R>>\n%%EOF\n'
		);
		expect(await processUpload(pdf, 'x.pdf')).toMatchObject({ ok: true, kind: 'pdf' });
	});

	it('refuses a truncated PDF', async () => {
		const pdf = await minimalPdf();
		expect(Buffer.from(pdf).includes('%%EOF')).toBe(true);
		expect(await processUpload(pdf.subarray(0, pdf.length - 40), 'cut.pdf')).toEqual({
			ok: false,
			status: 400,
			message: 'This PDF is incomplete or damaged. Save or download it again, then attach it.'
		});
	});

	it('refuses a file that only starts like a PDF', async () => {
		const fake = Buffer.from('%PDF- not really\n%%EOF');
		expect(await processUpload(fake, 'fake.pdf')).toMatchObject({ ok: false, status: 400 });
	});
});
