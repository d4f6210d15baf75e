/**
 * Reads PDFs with pdf.js (the library browsers use), a second implementation beside pdf-lib
 * which wrote them: text per page, page sizes and the decoded images.
 */
import { getDocument, OPS } from 'pdfjs-dist/legacy/build/pdf.mjs';

export interface PdfImage {
	width: number;
	height: number;
	/** RGBA, 4 bytes per pixel. */
	rgba: Uint8ClampedArray;
}

export async function readPdf(bytes: Uint8Array) {
	const doc = await getDocument({
		data: new Uint8Array(bytes),
		useSystemFonts: false,
		isOffscreenCanvasSupported: false,
		verbosity: 0
	}).promise;
	const pages: { text: string; width: number; height: number; images: PdfImage[] }[] = [];
	for (let n = 1; n <= doc.numPages; n++) {
		const page = await doc.getPage(n);
		const content = await page.getTextContent();
		const text = content.items.map((i) => ('str' in i ? i.str : '')).join(' ');
		const [, , width, height] = page.view;
		const ops = await page.getOperatorList();
		const images: PdfImage[] = [];
		for (let i = 0; i < ops.fnArray.length; i++) {
			if (ops.fnArray[i] !== OPS.paintImageXObject) continue;
			const name = ops.argsArray[i][0] as string;
			const image = await new Promise<{
				width: number;
				height: number;
				kind: number;
				data: Uint8ClampedArray;
			}>((resolve) => page.objs.get(name, resolve));
			images.push({ width: image.width, height: image.height, rgba: toRgba(image) });
		}
		pages.push({ text, width, height, images });
	}
	await doc.destroy();
	return pages;
}

/** pdf.js image kinds: 1 grey 1 bit per pixel, 2 RGB 24 bit, 3 RGBA 32 bit. */
function toRgba(image: { width: number; height: number; kind: number; data: Uint8ClampedArray }) {
	const { width, height, kind, data } = image;
	if (kind === 3) return data;
	const out = new Uint8ClampedArray(width * height * 4);
	for (let p = 0; p < width * height; p++) {
		let r: number, g: number, b: number;
		if (kind === 2) [r, g, b] = [data[p * 3], data[p * 3 + 1], data[p * 3 + 2]];
		else {
			const rowBytes = Math.ceil(width / 8);
			const x = p % width;
			const y = Math.floor(p / width);
			const bit = (data[y * rowBytes + (x >> 3)] >> (7 - (x & 7))) & 1;
			r = g = b = bit ? 255 : 0;
		}
		out.set([r, g, b, 255], p * 4);
	}
	return out;
}

/** Enlarges an image by a whole factor with a white border, so a QR reader sees clear modules. */
export function enlarge(image: PdfImage, factor: number, border = 16): PdfImage {
	const width = image.width * factor + border * 2;
	const height = image.height * factor + border * 2;
	const rgba = new Uint8ClampedArray(width * height * 4).fill(255);
	for (let y = 0; y < image.height * factor; y++) {
		for (let x = 0; x < image.width * factor; x++) {
			const from = (Math.floor(y / factor) * image.width + Math.floor(x / factor)) * 4;
			const to = ((y + border) * width + x + border) * 4;
			rgba.set(image.rgba.subarray(from, from + 4), to);
		}
	}
	return { width, height, rgba };
}
