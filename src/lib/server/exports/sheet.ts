/**
 * A small page-flow writer over pdf-lib for the export records: headings, wrapped text, figure
 * boxes and tables that continue on a new page with their header repeated, then page numbers and
 * the agency footer on every page once the page count is known.
 */
import { PDFDocument, rgb, type PDFFont, type PDFPage } from 'pdf-lib';
import { cachedFontkit, fonts } from '../certificates/fonts';

const INK = rgb(0x1b / 255, 0x24 / 255, 0x30 / 255);
const MUTED = rgb(0x4a / 255, 0x55 / 255, 0x65 / 255);
const BRAND = rgb(0x14 / 255, 0x3d / 255, 0x4f / 255);
const BRAND_SOFT = rgb(0xe3 / 255, 0xed / 255, 0xf0 / 255);
const SIGNAL = rgb(0xa8 / 255, 0x4a / 255, 0x00 / 255);
const LINE = rgb(0xd6 / 255, 0xd2 / 255, 0xc8 / 255);
const WHITE = rgb(1, 1, 1);

/** US Letter, the paper registration agencies here file. */
const PAGE: [number, number] = [612, 792];
const MARGIN = 48;
const FOOTER = 54;
const CONTENT = PAGE[0] - MARGIN * 2;
/** Height a section heading takes, with the space above it. */
const HEADING = 30;

export interface Column {
	label: string;
	/** Share of the content width. */
	width: number;
	align?: 'left' | 'right';
}

type Glyphs = { hasGlyphForCodePoint(cp: number): boolean };

export class Sheet {
	private page!: PDFPage;
	private y = 0;
	/** A section heading not drawn yet: it goes on the page of the content that follows it. */
	private heading: string | null = null;
	private constructor(
		readonly doc: PDFDocument,
		private headingFont: PDFFont,
		private text: PDFFont,
		private bold: PDFFont,
		private glyphs: Glyphs,
		private running: string
	) {}

	static async create(title: string, running: string): Promise<Sheet> {
		const doc = await PDFDocument.create();
		doc.registerFontkit(cachedFontkit);
		doc.setTitle(title);
		doc.setCreator('Journeymark');
		doc.setProducer('Journeymark');
		const bytes = await fonts();
		const [heading, text, bold] = await Promise.all([
			doc.embedFont(bytes.heading, { subset: true }),
			doc.embedFont(bytes.text, { subset: true }),
			doc.embedFont(bytes.textBold, { subset: true })
		]);
		// Lato and Merriweather share the Latin range; a character outside it would print as a box.
		const glyphs = cachedFontkit.create(bytes.text) as unknown as Glyphs;
		const sheet = new Sheet(doc, heading, text, bold, glyphs, running);
		sheet.addPage(true);
		return sheet;
	}

	/** Text the embedded fonts can draw: accents kept where the font has them, else stripped. */
	clean(value: string): string {
		let out = '';
		for (const ch of value.replace(/\s+/g, ' ')) {
			const cp = ch.codePointAt(0)!;
			if (this.glyphs.hasGlyphForCodePoint(cp)) out += ch;
			else {
				const base = ch.normalize('NFD').charAt(0);
				out += base !== ch && this.glyphs.hasGlyphForCodePoint(base.codePointAt(0)!) ? base : '?';
			}
		}
		return out;
	}

	private addPage(first = false) {
		this.page = this.doc.addPage(PAGE);
		this.y = PAGE[1] - MARGIN;
		if (!first) {
			this.draw(this.running, MARGIN, this.y - 9, 9, this.text, MUTED);
			this.page.drawLine({
				start: { x: MARGIN, y: this.y - 14 },
				end: { x: PAGE[0] - MARGIN, y: this.y - 14 },
				thickness: 0.5,
				color: LINE
			});
			this.y -= 28;
		}
	}

	newPage() {
		this.addPage();
	}

	/** Starts a new page unless `height` points fit, then draws a heading waiting to go first. */
	private ensure(height: number) {
		const heading = this.heading;
		if (this.y - height - (heading ? HEADING : 0) < FOOTER + 8) this.addPage();
		if (heading) {
			this.heading = null;
			this.drawHeading(heading);
		}
	}

	private draw(
		value: string,
		x: number,
		y: number,
		size: number,
		font: PDFFont,
		color = INK,
		width?: number,
		align: 'left' | 'right' = 'left'
	) {
		const text = this.clean(value);
		const left = align === 'right' && width ? x + width - font.widthOfTextAtSize(text, size) : x;
		this.page.drawText(text, { x: left, y, size, font, color });
	}

	/** Breaks text into lines no wider than `width`; a word longer than the line is cut. */
	wrap(value: string, font: PDFFont, size: number, width: number): string[] {
		const words = this.clean(value).split(' ');
		const lines: string[] = [];
		let line = '';
		for (let word of words) {
			while (font.widthOfTextAtSize(word, size) > width && word.length > 1) {
				let cut = word.length - 1;
				while (cut > 1 && font.widthOfTextAtSize(word.slice(0, cut), size) > width) cut--;
				if (line) lines.push(line);
				lines.push(word.slice(0, cut));
				line = '';
				word = word.slice(cut);
			}
			const next = line ? `${line} ${word}` : word;
			if (font.widthOfTextAtSize(next, size) > width && line) {
				lines.push(line);
				line = word;
			} else line = next;
		}
		if (line || lines.length === 0) lines.push(line);
		return lines;
	}

	/** The name mark and title block at the top of the first page. */
	masthead(kind: string, title: string, subtitle: string, meta: string[]) {
		const top = PAGE[1];
		this.page.drawRectangle({ x: 0, y: top - 40, width: PAGE[0], height: 40, color: BRAND });
		this.draw('Journeymark', MARGIN, top - 26, 14, this.headingFont, WHITE);
		this.draw(kind.toUpperCase(), MARGIN, top - 26, 9, this.bold, WHITE, CONTENT, 'right');
		this.y = top - 40 - 14;
		this.titleBlock(title, subtitle, meta);
	}

	/** Name, programme and dates in large type at the current position. */
	titleBlock(title: string, subtitle: string, meta: string[]) {
		this.ensure(90);
		for (const line of this.wrap(title, this.headingFont, 20, CONTENT)) {
			this.y -= 22;
			this.draw(line, MARGIN, this.y, 20, this.headingFont);
		}
		for (const line of this.wrap(subtitle, this.bold, 12, CONTENT)) {
			this.y -= 18;
			this.draw(line, MARGIN, this.y, 12, this.bold, BRAND);
		}
		this.y -= 2;
		for (const line of this.wrap(meta.join('   ·   '), this.text, 9.5, CONTENT)) {
			this.y -= 14;
			this.draw(line, MARGIN, this.y, 9.5, this.text, MUTED);
		}
		this.y -= 12;
	}

	/** A section heading; drawn with whatever comes next so it never ends a page alone. */
	section(title: string) {
		this.heading = title;
	}

	private drawHeading(title: string) {
		this.y -= 12;
		this.draw(title, MARGIN, this.y, 12.5, this.headingFont, BRAND);
		this.page.drawLine({
			start: { x: MARGIN, y: this.y - 5 },
			end: { x: MARGIN + 36, y: this.y - 5 },
			thickness: 2,
			color: SIGNAL
		});
		this.y -= 18;
	}

	paragraph(value: string, options: { size?: number; bold?: boolean; indent?: number } = {}) {
		const size = options.size ?? 10;
		const font = options.bold ? this.bold : this.text;
		const indent = options.indent ?? 0;
		for (const line of this.wrap(value, font, size, CONTENT - indent)) {
			this.ensure(size + 4);
			this.draw(line, MARGIN + indent, this.y - size, size, font);
			this.y -= size + 4;
		}
		this.y -= 4;
	}

	/** A row of boxed figures: large number, unit and label beneath. */
	figures(items: { label: string; value: string }[]) {
		const gap = 8;
		const width = (CONTENT - gap * (items.length - 1)) / items.length;
		const height = 46;
		this.ensure(height + 8);
		items.forEach((item, i) => {
			const x = MARGIN + i * (width + gap);
			this.page.drawRectangle({
				x,
				y: this.y - height,
				width,
				height,
				color: BRAND_SOFT,
				borderColor: LINE,
				borderWidth: 0.5
			});
			this.draw(item.value, x + 8, this.y - 21, 15, this.bold, INK);
			this.draw(item.label, x + 8, this.y - 37, 8.5, this.text, MUTED);
		});
		this.y -= height + 8;
	}

	/** A table that breaks across pages, repeating its header row on each new page. */
	table(columns: Column[], rows: string[][], empty = 'Nothing recorded.') {
		const size = 9;
		const lineHeight = 11.5;
		const pad = 4;
		const widths = columns.map((c) => c.width * CONTENT);
		const cells = (row: string[], font: PDFFont) =>
			row.map((cell, i) => this.wrap(cell, font, size, widths[i] - pad * 2));
		const height = (lines: string[][]) =>
			Math.max(...lines.map((l) => l.length)) * lineHeight + pad * 2;
		const head = cells(
			columns.map((c) => c.label),
			this.bold
		);
		const header = () => {
			const h = height(head);
			this.page.drawRectangle({
				x: MARGIN,
				y: this.y - h,
				width: CONTENT,
				height: h,
				color: BRAND
			});
			let x = MARGIN;
			columns.forEach((c, i) => {
				head[i].forEach((line, n) =>
					this.draw(
						line,
						x + pad,
						this.y - pad - size - n * lineHeight,
						size,
						this.bold,
						WHITE,
						widths[i] - pad * 2,
						c.align
					)
				);
				x += widths[i];
			});
			this.y -= h;
		};
		// A header never ends a page alone: keep room for it and the first row (or the empty note).
		this.ensure(height(head) + (rows.length ? height(cells(rows[0], this.text)) : 14));
		header();
		if (rows.length === 0) {
			this.paragraph(empty, { size });
			return;
		}
		rows.forEach((row, r) => {
			const lines = cells(row, this.text);
			const h = height(lines);
			if (this.y - h < FOOTER + 8) {
				this.addPage();
				header();
			}
			if (r % 2 === 1) {
				this.page.drawRectangle({
					x: MARGIN,
					y: this.y - h,
					width: CONTENT,
					height: h,
					color: rgb(0.965, 0.96, 0.945)
				});
			}
			let x = MARGIN;
			columns.forEach((c, i) => {
				lines[i].forEach((line, n) =>
					this.draw(
						line,
						x + pad,
						this.y - pad - size - n * lineHeight,
						size,
						this.text,
						INK,
						widths[i] - pad * 2,
						c.align
					)
				);
				x += widths[i];
			});
			this.page.drawLine({
				start: { x: MARGIN, y: this.y - h },
				end: { x: MARGIN + CONTENT, y: this.y - h },
				thickness: 0.4,
				color: LINE
			});
			this.y -= h;
		});
		this.y -= 8;
	}

	/** Footers go on last, when the page count is known. */
	async finish(generatedOn: string, note: string): Promise<Uint8Array> {
		const pages = this.doc.getPages();
		pages.forEach((page, i) => {
			this.page = page;
			page.drawLine({
				start: { x: MARGIN, y: FOOTER - 6 },
				end: { x: PAGE[0] - MARGIN, y: FOOTER - 6 },
				thickness: 0.5,
				color: LINE
			});
			const label = `Page ${i + 1} of ${pages.length}`;
			const width = CONTENT - this.text.widthOfTextAtSize(label, 8) - 24;
			this.wrap(note, this.text, 8, width).forEach((line, n) =>
				this.draw(line, MARGIN, FOOTER - 18 - n * 10, 8, this.text, MUTED)
			);
			this.draw(label, MARGIN, FOOTER - 18, 8, this.bold, INK, CONTENT, 'right');
			this.draw(
				`Generated ${generatedOn}`,
				MARGIN,
				FOOTER - 38,
				8,
				this.text,
				MUTED,
				CONTENT,
				'right'
			);
		});
		return this.doc.save();
	}
}
