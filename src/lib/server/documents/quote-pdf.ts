/**
 * Draws the quote document as an A4 PDF with pdfkit. Fonts are Work Sans from the installed
 * @fontsource package (its WOFF files: pdfkit's font reader embeds WOFF but not WOFF2), so nothing
 * is fetched from outside.
 */
import { createRequire } from 'node:module';
import PDFDocument from 'pdfkit';
import type { QuoteDocument } from '$lib/quotes/document';

const require = createRequire(import.meta.url);
const FONT_REGULAR = require.resolve('@fontsource/work-sans/files/work-sans-latin-400-normal.woff');
const FONT_BOLD = require.resolve('@fontsource/work-sans/files/work-sans-latin-600-normal.woff');

const INK = '#1b2a33';
const SOFT = '#51626c';
const RULE = '#d5dcdf';
const MARGIN = 50;

export function renderQuotePdf(doc: QuoteDocument, logo: Buffer | null): Promise<Buffer> {
	const pdf = new PDFDocument({ size: 'A4', margin: MARGIN, info: { Title: doc.title, Author: doc.letterhead.name } });
	pdf.registerFont('body', FONT_REGULAR);
	pdf.registerFont('bold', FONT_BOLD);
	const chunks: Buffer[] = [];
	pdf.on('data', (c: Buffer) => chunks.push(c));
	const finished = new Promise<Buffer>((resolve, reject) => {
		pdf.on('end', () => resolve(Buffer.concat(chunks)));
		pdf.on('error', reject);
	});
	draw(pdf, doc, logo);
	pdf.end();
	return finished;
}

type Pdf = InstanceType<typeof PDFDocument>;
const width = (pdf: Pdf) => pdf.page.width - 2 * MARGIN;

function heading(pdf: Pdf, text: string) {
	pdf.moveDown(0.8).font('bold').fontSize(11).fillColor(INK).text(text, MARGIN);
	pdf.moveDown(0.2);
}

function rule(pdf: Pdf) {
	pdf.moveTo(MARGIN, pdf.y).lineTo(MARGIN + width(pdf), pdf.y).strokeColor(RULE).lineWidth(0.6).stroke();
	pdf.moveDown(0.3);
}

function draw(pdf: Pdf, doc: QuoteDocument, logo: Buffer | null) {
	const top = pdf.y;
	if (logo) {
		try {
			pdf.image(logo, MARGIN + width(pdf) - 120, top, { fit: [120, 50], align: 'right' });
		} catch {
			// A logo pdfkit cannot read is left out rather than failing the document.
		}
	}
	pdf.font('bold').fontSize(16).fillColor(INK).text(doc.letterhead.name, MARGIN, top, { width: width(pdf) - 130 });
	pdf.font('body').fontSize(9).fillColor(SOFT);
	for (const line of doc.letterhead.lines) pdf.text(line, { width: width(pdf) - 130 });
	pdf.y = Math.max(pdf.y, top + 56);
	pdf.moveDown(0.6);
	rule(pdf);

	pdf.font('bold').fontSize(14).fillColor(INK).text(doc.title);
	pdf.moveDown(0.3);
	const factsTop = pdf.y;
	pdf.fontSize(9);
	for (const f of doc.facts) {
		pdf.font('bold').fillColor(SOFT).text(`${f.label}: `, MARGIN, pdf.y, { continued: true, width: 280 });
		pdf.font('body').fillColor(INK).text(f.value);
	}
	const factsBottom = pdf.y;
	pdf.y = factsTop;
	pdf.font('bold').fillColor(SOFT).text('For', MARGIN + 300, pdf.y, { width: width(pdf) - 300 });
	pdf.font('body').fillColor(INK);
	for (const line of doc.clientLines) pdf.text(line, MARGIN + 300, pdf.y, { width: width(pdf) - 300 });
	pdf.y = Math.max(pdf.y, factsBottom);
	pdf.x = MARGIN;

	heading(pdf, 'What we promise');
	pdf.font('body').fontSize(10).fillColor(INK);
	for (const p of doc.promise) pdf.text(p, MARGIN, pdf.y, { width: width(pdf) }).moveDown(0.3);

	heading(pdf, 'Equipment');
	pdf.font('body').fontSize(10);
	for (const e of doc.equipment) pdf.text(`${e.count} × ${e.name}`, MARGIN, pdf.y, { width: width(pdf) });

	heading(pdf, 'Price');
	priceTable(pdf, doc);

	heading(pdf, 'Terms');
	bullets(pdf, doc.terms, 9.5);
	if (doc.acceptance) pdf.moveDown(0.3).font('bold').fontSize(9.5).fillColor(INK).text(doc.acceptance, MARGIN);
	heading(pdf, 'Cautions');
	bullets(pdf, doc.cautions, 8.5);
	if (doc.notes) {
		heading(pdf, 'Notes');
		pdf.font('body').fontSize(9.5).fillColor(INK).text(doc.notes, MARGIN, pdf.y, { width: width(pdf) });
	}
}

function bullets(pdf: Pdf, items: string[], size: number) {
	pdf.font('body').fontSize(size).fillColor(INK);
	for (const item of items) pdf.text(`•  ${item}`, MARGIN, pdf.y, { width: width(pdf), indent: 0 }).moveDown(0.15);
}

function priceTable(pdf: Pdf, doc: QuoteDocument) {
	const cols = [MARGIN, MARGIN + 270, MARGIN + 320, MARGIN + 410];
	const right = MARGIN + width(pdf);
	const row = (cells: string[], font: 'body' | 'bold') => {
		const y = pdf.y;
		pdf.font(font).fontSize(9.5).fillColor(INK);
		pdf.text(cells[0], cols[0], y, { width: 260 });
		const bottom = pdf.y;
		pdf.text(cells[1], cols[1], y, { width: 40, align: 'right' });
		pdf.text(cells[2], cols[2], y, { width: 80, align: 'right' });
		pdf.text(cells[3], cols[3], y, { width: right - cols[3], align: 'right' });
		pdf.y = Math.max(bottom, pdf.y) + 2;
	};
	row(['Item', 'Qty', 'Day rate', 'Amount'], 'bold');
	rule(pdf);
	for (const l of doc.priceLines) row([l.description, String(l.quantity), l.dayRate, l.amount], 'body');
	rule(pdf);
	for (const t of doc.totals) {
		const y = pdf.y;
		pdf.font(t.label === 'Total' ? 'bold' : 'body').fontSize(9.5).fillColor(INK);
		pdf.text(t.label, cols[1] - 60, y, { width: 200 });
		pdf.text(t.value, cols[3], y, { width: right - cols[3], align: 'right' });
	}
	pdf.x = MARGIN;
}
