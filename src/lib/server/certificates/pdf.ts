/**
 * The certificate as PDF: page one is the certificate itself, the pages after it list every
 * task covered with its level and sign-off date. Fonts are embedded as subsets.
 */
import { PDFDocument, rgb, type PDFFont, type PDFPage } from 'pdf-lib';
import QRCode from 'qrcode';
import { LEVEL_WORD } from '../../certificates';
import type { CertificateContent } from './content';
import { cachedFontkit, fonts } from './fonts';

export const PAPER = { a4: [595.28, 841.89], letter: [612, 792] } as const;
export type Paper = keyof typeof PAPER;

const INK = rgb(0.106, 0.141, 0.188);
const MUTED = rgb(0.29, 0.333, 0.396);
const BRAND = rgb(0.078, 0.239, 0.31);
const SOFT = rgb(0.89, 0.929, 0.941);
const AMBER = rgb(0.941, 0.627, 0.294);
const PAPER_TINT = rgb(0.969, 0.961, 0.941);

interface Fonts {
	heading: PDFFont;
	text: PDFFont;
	textBold: PDFFont;
}

const dateText = (iso: string) =>
	new Date(iso).toLocaleDateString('en-US', {
		day: 'numeric',
		month: 'long',
		year: 'numeric',
		timeZone: 'UTC'
	});

// Advance widths per character: a full text layout per measurement made long task lists slow.
const advances = new WeakMap<PDFFont, Map<string, number>>();

/** Width of `text` from cached per-character advances (kerning ignored: used only to fit text). */
function measure(font: PDFFont, text: string, size: number): number {
	let table = advances.get(font);
	if (!table) advances.set(font, (table = new Map()));
	let units = 0;
	for (const ch of text) {
		let w = table.get(ch);
		if (w === undefined) table.set(ch, (w = font.widthOfTextAtSize(ch, 1000)));
		units += w;
	}
	return (units * size) / 1000;
}

/** Shrinks the size until `text` fits `width`. */
function fitted(font: PDFFont, text: string, size: number, width: number, min = 8) {
	while (size > min && measure(font, text, size) > width) size -= 0.5;
	return size;
}

/** Cuts `text` with an ellipsis so it fits `width`. */
function clipped(font: PDFFont, text: string, size: number, width: number) {
	if (measure(font, text, size) <= width) return text;
	let low = 0;
	let high = text.length;
	while (low < high) {
		const mid = Math.ceil((low + high) / 2);
		if (measure(font, `${text.slice(0, mid)}…`, size) <= width) low = mid;
		else high = mid - 1;
	}
	return `${text.slice(0, low).trimEnd()}…`;
}

/** Breaks `text` into lines no wider than `width`. */
function wrapped(font: PDFFont, text: string, size: number, width: number): string[] {
	const lines: string[] = [];
	let line = '';
	for (const word of text.split(/\s+/)) {
		const next = line ? `${line} ${word}` : word;
		if (line && measure(font, next, size) > width) {
			lines.push(line);
			line = word;
		} else line = next;
	}
	if (line) lines.push(line);
	return lines;
}

/** The Journeymark mark (a J drawn as a road bend ending in a milestone tick), as on screen. */
function mark(page: PDFPage, x: number, y: number, size: number) {
	const scale = size / 48;
	page.drawRectangle({ x, y: y - size, width: size, height: size, color: BRAND });
	page.drawSvgPath('M30 9 V29 a9 9 0 0 1 -18 0', {
		x,
		y,
		scale,
		borderColor: PAPER_TINT,
		borderWidth: 6 * scale
	});
	page.drawSvgPath('M25 15 l4 4 l8 -9', {
		x,
		y,
		scale,
		borderColor: AMBER,
		borderWidth: 4 * scale
	});
}

function frontPage(
	doc: PDFDocument,
	f: Fonts,
	c: CertificateContent,
	size: readonly number[],
	qr: Awaited<ReturnType<PDFDocument['embedPng']>>,
	verifyUrl: string
) {
	const [w, h] = size;
	const page = doc.addPage([w, h]);
	const m = 36;
	page.drawRectangle({ x: 0, y: 0, width: w, height: h, color: PAPER_TINT });
	page.drawRectangle({
		x: m,
		y: m,
		width: w - 2 * m,
		height: h - 2 * m,
		color: rgb(1, 1, 1),
		borderColor: BRAND,
		borderWidth: 1.5
	});
	// A band down the left edge carries the mark: the design's own signature.
	page.drawRectangle({ x: m, y: m, width: 14, height: h - 2 * m, color: BRAND });
	page.drawRectangle({ x: m + 14, y: m, width: 3, height: h - 2 * m, color: AMBER });

	const left = m + 44;
	const right = w - m - 30;
	const inner = right - left;
	let y = h - m - 40;
	mark(page, left, y + 4, 30);
	page.drawText('JOURNEYMARK', {
		x: left + 40,
		y: y - 10,
		font: f.textBold,
		size: 11,
		color: BRAND
	});
	page.drawText(c.issuer.name, { x: left + 40, y: y - 24, font: f.text, size: 9.5, color: MUTED });

	y -= 88;
	const kind =
		c.scope.kind === 'programme' ? 'Certificate of programme completion' : 'Interim credential';
	page.drawText(kind.toUpperCase(), {
		x: left,
		y,
		font: f.textBold,
		size: 10.5,
		color: rgb(0.659, 0.29, 0)
	});
	y -= 36;
	page.drawText('This certifies that', { x: left, y, font: f.text, size: 13, color: MUTED });
	y -= 44;
	const nameSize = fitted(f.heading, c.holder, 32, inner, 16);
	page.drawText(c.holder, { x: left, y, font: f.heading, size: nameSize, color: BRAND });
	y -= 14;
	page.drawRectangle({ x: left, y, width: inner, height: 1, color: AMBER });
	y -= 30;
	const claim =
		c.scope.kind === 'programme'
			? 'has completed the supervised on-the-job learning, related instruction and assessed tasks of'
			: `has been assessed to the required level on every task of the area ${c.scope.areas[0]?.name ?? c.scope.code} (${c.scope.code}) in`;
	for (const line of wrapped(f.text, claim, 12.5, inner)) {
		page.drawText(line, { x: left, y, font: f.text, size: 12.5, color: INK });
		y -= 17;
	}
	y -= 8;
	for (const line of wrapped(f.heading, c.programme.name, 15, inner)) {
		page.drawText(line, { x: left, y, font: f.heading, size: 15, color: INK });
		y -= 22;
	}

	// Figures, each a large number with its unit and a label underneath.
	y -= 18;
	const figures = [
		{ value: String(c.scope.tasks.length), label: 'tasks assessed' },
		{ value: String(c.scope.areas.length), label: c.scope.areas.length === 1 ? 'area' : 'areas' },
		{
			value: `${c.scope.hours.verified.toLocaleString('en-US')} h`,
			label: 'verified on-the-job hours'
		},
		...(c.scope.kind === 'programme'
			? [
					{
						value: `${c.scope.hours.relatedInstruction.toLocaleString('en-US')} h`,
						label: 'related instruction'
					}
				]
			: [])
	];
	const boxW = inner / figures.length;
	page.drawRectangle({ x: left, y: y - 52, width: inner, height: 62, color: SOFT });
	figures.forEach((fig, i) => {
		const x = left + i * boxW + 12;
		page.drawText(fig.value, {
			x,
			y: y - 20,
			font: f.heading,
			size: fitted(f.heading, fig.value, 20, boxW - 20),
			color: BRAND
		});
		page.drawText(fig.label, {
			x,
			y: y - 38,
			font: f.text,
			size: fitted(f.text, fig.label, 9.5, boxW - 20, 6),
			color: MUTED
		});
	});
	y -= 84;

	// Areas covered, in two columns when there are many.
	page.drawText('Areas covered', { x: left, y, font: f.textBold, size: 10.5, color: INK });
	y -= 16;
	const columns = c.scope.areas.length > 4 ? 2 : 1;
	const colW = inner / columns;
	const perColumn = Math.ceil(c.scope.areas.length / columns);
	c.scope.areas.forEach((a, i) => {
		const x = left + Math.floor(i / perColumn) * colW;
		const rowY = y - (i % perColumn) * 14;
		const text = `${a.code}  ${a.name} — ${a.tasks} ${a.tasks === 1 ? 'task' : 'tasks'}`;
		page.drawText(clipped(f.text, text, 9.5, colW - 8), {
			x,
			y: rowY,
			font: f.text,
			size: 9.5,
			color: INK
		});
	});
	y -= perColumn * 14 + 14;

	// Dates and issuer.
	const dates = [
		{ label: 'Issued', value: dateText(c.issuedAt) },
		{ label: 'Valid until', value: c.expiresAt ? dateText(c.expiresAt) : 'No expiry date' },
		{ label: 'Issued for the sponsor by', value: c.issuer.signedBy }
	];
	dates.forEach((d, i) => {
		const x = left + (i * inner) / 3;
		page.drawText(d.label, { x, y, font: f.text, size: 9, color: MUTED });
		page.drawText(clipped(f.textBold, d.value, 11, inner / 3 - 8), {
			x,
			y: y - 15,
			font: f.textBold,
			size: 11,
			color: INK
		});
	});

	// Verification block at the foot: QR code, serial and what to check.
	const qrSize = 104;
	const baseY = m + 26;
	page.drawImage(qr, { x: left, y: baseY, width: qrSize, height: qrSize });
	const tx = left + qrSize + 16;
	const tw = right - tx;
	page.drawText('Serial', { x: tx, y: baseY + qrSize - 10, font: f.text, size: 9, color: MUTED });
	page.drawText(c.serial, {
		x: tx,
		y: baseY + qrSize - 30,
		font: f.textBold,
		size: fitted(f.textBold, c.serial, 17, tw),
		color: INK
	});
	let ty = baseY + qrSize - 48;
	const note = `Scan the code or open ${verifyUrl} to see whether this certificate is still valid. Check the holder's identity against a photo ID. The registration agency's records govern.`;
	for (const line of wrapped(f.text, note, 8.5, tw)) {
		page.drawText(line, { x: tx, y: ty, font: f.text, size: 8.5, color: MUTED });
		ty -= 11;
	}
	page.drawText(clipped(f.text, `Signed Ed25519, key ${c.keyId}`, 7.5, tw), {
		x: tx,
		y: ty - 2,
		font: f.text,
		size: 7.5,
		color: MUTED
	});
	return page;
}

function taskPages(doc: PDFDocument, f: Fonts, c: CertificateContent, size: readonly number[]) {
	const [w, h] = size;
	const m = 48;
	const cols = { code: m, title: m + 62, level: w - m - 150, date: w - m - 70 };
	let page!: PDFPage;
	let y = 0;
	let number = 1;
	const start = () => {
		page = doc.addPage([w, h]);
		y = h - m;
		page.drawText(number === 1 ? 'Tasks covered' : 'Tasks covered (continued)', {
			x: m,
			y: y - 14,
			font: f.heading,
			size: 15,
			color: BRAND
		});
		page.drawText(`${c.holder} · ${c.serial}`, {
			x: m,
			y: y - 32,
			font: f.text,
			size: 9,
			color: MUTED
		});
		y -= 56;
		for (const [key, label] of [
			['code', 'Task'],
			['title', ''],
			['level', 'Level reached'],
			['date', 'Signed off']
		] as const)
			page.drawText(label, { x: cols[key], y, font: f.textBold, size: 8.5, color: MUTED });
		y -= 6;
		page.drawRectangle({ x: m, y, width: w - 2 * m, height: 0.8, color: BRAND });
		y -= 14;
		page.drawText(`Page ${number + 1}`, {
			x: w - m - 30,
			y: m - 24,
			font: f.text,
			size: 8,
			color: MUTED
		});
		number++;
	};
	start();
	const areaNames = new Map(c.scope.areas.map((a) => [a.code, a.name]));
	let area = '';
	for (const t of c.scope.tasks) {
		if (y < m + 20) start();
		if (t.area !== area) {
			area = t.area;
			if (y < m + 40) start();
			y -= 4;
			page.drawText(`${t.area} · ${areaNames.get(t.area) ?? ''}`, {
				x: m,
				y,
				font: f.textBold,
				size: 10,
				color: BRAND
			});
			y -= 15;
		}
		page.drawText(t.code, { x: cols.code, y, font: f.textBold, size: 9, color: INK });
		page.drawText(clipped(f.text, t.title, 9, cols.level - cols.title - 10), {
			x: cols.title,
			y,
			font: f.text,
			size: 9,
			color: INK
		});
		page.drawText(`${t.level} ${LEVEL_WORD[t.level]}`, {
			x: cols.level,
			y,
			font: f.text,
			size: 9,
			color: INK
		});
		page.drawText(new Date(t.signedAt).toISOString().slice(0, 10), {
			x: cols.date,
			y,
			font: f.text,
			size: 9,
			color: INK
		});
		y -= 13.5;
	}
	y -= 10;
	const footer =
		'Levels: 1 Observed, 2 Assisted, 3 Supervised, 4 Independent. Each task was signed off by a journeyworker after watching the apprentice carry it out to the trade standard.';
	for (const line of wrapped(f.text, footer, 8, w - 2 * m)) {
		if (y < m) start();
		page.drawText(line, { x: m, y, font: f.text, size: 8, color: MUTED });
		y -= 10;
	}
}

/** Renders the certificate; `verifyUrl` is what the QR code encodes. */
export async function render(
	c: CertificateContent,
	verifyUrl: string,
	paper: Paper = 'a4'
): Promise<Uint8Array> {
	const bytes = await fonts();
	const doc = await PDFDocument.create();
	doc.registerFontkit(cachedFontkit);
	const [heading, text, textBold] = await Promise.all([
		doc.embedFont(bytes.heading, { subset: true }),
		doc.embedFont(bytes.text, { subset: true }),
		doc.embedFont(bytes.textBold, { subset: true })
	]);
	const f = { heading, text, textBold };
	const png = await QRCode.toBuffer(verifyUrl, {
		errorCorrectionLevel: 'M',
		margin: 2,
		// One pixel per module: viewers scale it without smoothing, and a small image embeds fast.
		scale: 1,
		color: { dark: '#1b2430', light: '#ffffff' }
	});
	const qr = await doc.embedPng(png);
	doc.setTitle(`${c.scope.title}: ${c.holder}`);
	doc.setSubject(`Certificate ${c.serial}`);
	doc.setAuthor(c.issuer.name);
	doc.setCreator('Journeymark');
	doc.setProducer('Journeymark');
	doc.setCreationDate(new Date(c.issuedAt));
	doc.setModificationDate(new Date(c.issuedAt));
	frontPage(doc, f, c, PAPER[paper], qr, verifyUrl);
	taskPages(doc, f, c, PAPER[paper]);
	return doc.save({ objectsPerTick: Infinity });
}
