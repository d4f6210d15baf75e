/** Checks and prepares an uploaded photo or PDF for storage. */
import { fileTypeFromBuffer } from 'file-type';
import sharp, { type Sharp } from 'sharp';

export interface UploadLimits {
	maxBytes: number;
}

export type UploadResult =
	| {
			ok: true;
			kind: 'image' | 'pdf';
			mime: string;
			/** What to store: a re-encoded image without metadata, or the PDF as uploaded. */
			bytes: Buffer;
			/** WebP about 320 px wide for images; null for PDFs. */
			thumbnail: Buffer | null;
			width?: number;
			height?: number;
			extension: string;
	  }
	| { ok: false; status: 400 | 413 | 415; message: string };

type Refusal = Extract<UploadResult, { ok: false }>;

export const DEFAULT_UPLOAD_LIMITS: UploadLimits = { maxBytes: 10 * 1024 * 1024 };

// common practice, no published source: big enough to read a torque stamp, small enough to store.
const MAX_SIDE = 2400;
// common practice, no published source
const JPEG_QUALITY = 82;
const THUMB_WIDTH = 320;
// Keeps a very tall photo's thumbnail from filling a phone screen.
const THUMB_MAX_HEIGHT = 640;
// ISO 32000-1 §7.5.5 (from memory) puts %%EOF on the last line; writers often add trailing
// bytes, so look in the last 1024 (common practice, no published source).
const PDF_TAIL = 1024;

const NOT_PHOTO_OR_PDF = 'This file is not a photo or a PDF.';
const HEIC_MESSAGE =
	"Phone set to HEIC? Switch the camera to 'Most compatible' (JPEG) or share as JPEG.";
const UNREADABLE_PHOTO =
	'This photo could not be read; it may be damaged. Take it again or share it as JPEG.';

// The HEIF family (HEIC, HEIF, AVIF) is accepted only when this machine's sharp can decode it.
const HEIF_FAMILY = new Set([
	'image/heic',
	'image/heic-sequence',
	'image/heif',
	'image/heif-sequence',
	'image/avif'
]);
// What sharp must see in the bytes for each detected type, so the two detectors agree.
const SHARP_FORMAT: Record<string, string> = {
	'image/jpeg': 'jpeg',
	'image/png': 'png',
	'image/webp': 'webp'
};

// Rounds up so a file just over the limit never reads as equal to it.
function megabytes(bytes: number): string {
	return `${Math.ceil((bytes / (1024 * 1024)) * 10) / 10} MB`;
}

const refuse = (status: Refusal['status'], message: string): Refusal => ({
	ok: false,
	status,
	message
});

/**
 * Decides what an upload is from its bytes alone (OWASP ASVS V12): the declared name and the
 * browser's content type are never trusted, so the name is accepted and deliberately unused.
 */
export async function processUpload(
	bytes: Uint8Array,
	_declaredName: string,
	limits: UploadLimits = DEFAULT_UPLOAD_LIMITS
): Promise<UploadResult> {
	if (bytes.byteLength === 0) return refuse(400, 'The file is empty.');
	if (bytes.byteLength > limits.maxBytes) {
		return refuse(
			413,
			`This file is ${megabytes(bytes.byteLength)}; the limit is ${megabytes(limits.maxBytes)}.`
		);
	}
	const detected = await fileTypeFromBuffer(bytes);
	if (!detected) return refuse(415, NOT_PHOTO_OR_PDF);
	if (detected.mime === 'application/pdf') return checkPdf(bytes);
	if (HEIF_FAMILY.has(detected.mime)) return reencode(bytes, 'heif');
	const format = SHARP_FORMAT[detected.mime];
	if (format) return reencode(bytes, format);
	if (detected.mime.startsWith('image/')) {
		return refuse(
			415,
			`Only JPEG, PNG and WebP photos can be attached; this is a ${detected.ext.toUpperCase()} image.`
		);
	}
	return refuse(415, NOT_PHOTO_OR_PDF);
}

function checkPdf(bytes: Uint8Array): UploadResult {
	const pdf = Buffer.from(bytes);
	const header = pdf.subarray(0, 8).toString('latin1');
	const tail = pdf.subarray(Math.max(0, pdf.length - PDF_TAIL)).toString('latin1');
	// ISO 32000-1 §7.5.2 (from memory): the header is %PDF- and a version such as 1.7.
	if (!/^%PDF-\d\.\d/.test(header) || !tail.includes('%%EOF')) {
		return refuse(
			400,
			'This PDF is incomplete or damaged. Save or download it again, then attach it.'
		);
	}
	return {
		ok: true,
		kind: 'pdf',
		mime: 'application/pdf',
		bytes: pdf,
		thumbnail: null,
		extension: 'pdf'
	};
}

async function hasTransparency(image: Sharp, hasAlpha: boolean): Promise<boolean> {
	// An alpha channel is often present but fully opaque; only real transparency keeps PNG.
	return hasAlpha && !(await image.stats()).isOpaque;
}

async function reencode(bytes: Uint8Array, expectedFormat: string): Promise<UploadResult> {
	const heif = expectedFormat === 'heif';
	try {
		const source = sharp(bytes);
		const meta = await source.metadata();
		if (meta.format !== expectedFormat) return refuse(415, NOT_PHOTO_OR_PDF);
		const transparent =
			expectedFormat === 'png' && (await hasTransparency(source.clone(), Boolean(meta.hasAlpha)));

		// sharp writes no EXIF, XMP, IPTC or GPS unless asked, so every output below is clean.
		const pipeline = source
			.clone()
			.autoOrient()
			.resize({ width: MAX_SIDE, height: MAX_SIDE, fit: 'inside', withoutEnlargement: true });
		let mime: string;
		let extension: string;
		if (expectedFormat === 'webp') {
			pipeline.webp({ quality: JPEG_QUALITY });
			[mime, extension] = ['image/webp', 'webp'];
		} else if (transparent) {
			pipeline.png();
			[mime, extension] = ['image/png', 'png'];
		} else {
			pipeline.flatten({ background: '#ffffff' }).jpeg({ quality: JPEG_QUALITY });
			[mime, extension] = ['image/jpeg', 'jpg'];
		}
		const { data, info } = await pipeline.toBuffer({ resolveWithObject: true });
		const thumbnail = await sharp(data)
			.resize({
				width: THUMB_WIDTH,
				height: THUMB_MAX_HEIGHT,
				fit: 'inside',
				withoutEnlargement: true
			})
			.webp({ quality: 70 })
			.toBuffer();
		return {
			ok: true,
			kind: 'image',
			mime,
			bytes: data,
			thumbnail,
			width: info.width,
			height: info.height,
			extension
		};
	} catch {
		// The prebuilt sharp has no HEVC decoder, so most iPhone photos end here.
		return refuse(heif ? 415 : 400, heif ? HEIC_MESSAGE : UNREADABLE_PHOTO);
	}
}
