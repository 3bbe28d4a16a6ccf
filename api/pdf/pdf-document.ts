// Starts a PDF with Source Sans 3 embedded (the .woff files: pdfkit's subsetter fails on .woff2) and collects it into a buffer.
import PDFDocument from 'pdfkit';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { madeByVialyard } from './site-time.js';

const fontDir = join(dirname(createRequire(import.meta.url).resolve('@fontsource/source-sans-3/package.json')), 'files');

export const pdfFonts = {
  regular: 'SourceSans3',
  semibold: 'SourceSans3-Semibold',
  bold: 'SourceSans3-Bold',
  italic: 'SourceSans3-Italic',
} as const;

export type PdfDocument = InstanceType<typeof PDFDocument>;

export function createPdf(info: { title: string; subject?: string }): PdfDocument {
  const doc = new PDFDocument({ size: 'LETTER', margin: 50, bufferPages: true, info: { Title: info.title, Subject: info.subject ?? '', Creator: 'Vialyard' } });
  doc.registerFont(pdfFonts.regular, join(fontDir, 'source-sans-3-latin-400-normal.woff'));
  doc.registerFont(pdfFonts.semibold, join(fontDir, 'source-sans-3-latin-600-normal.woff'));
  doc.registerFont(pdfFonts.bold, join(fontDir, 'source-sans-3-latin-700-normal.woff'));
  doc.registerFont(pdfFonts.italic, join(fontDir, 'source-sans-3-latin-400-italic.woff'));
  doc.font(pdfFonts.regular);
  return doc;
}

/** Ends the document and resolves with its bytes. */
export function pdfToBuffer(doc: PdfDocument): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    doc.on('data', (chunk: Buffer) => chunks.push(chunk));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
    doc.end();
  });
}

/** When the document was made, on the clock of the site it is about. */
export interface MadeAt {
  at: Date | string | number;
  timeZone: string;
}

/**
 * Writes "<label> · Made by Vialyard on <site time>" and "Page n of m" on every buffered page (call before
 * pdfToBuffer): one wording in every PDF, so the label should not name Vialyard again.
 */
export function addPageFooters(doc: PdfDocument, label: string, made: MadeAt): void {
  const footer = `${label} · ${madeByVialyard(made.at, made.timeZone)}`;
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    const bottom = doc.page.height - 36;
    const savedMargin = doc.page.margins.bottom;
    doc.page.margins.bottom = 0;
    doc.font(pdfFonts.regular).fontSize(8).fillColor('#555555');
    doc.text(footer, 50, bottom, { width: doc.page.width - 200, lineBreak: false });
    doc.text(`Page ${i - range.start + 1} of ${range.count}`, doc.page.width - 150, bottom, { width: 100, align: 'right', lineBreak: false });
    doc.page.margins.bottom = savedMargin;
  }
}

/** Starts a new page when `height` points would not fit above the bottom margin (a block that must stay whole). */
export function keepTogether(doc: PdfDocument, height: number): void {
  if (doc.y + height > doc.page.height - doc.page.margins.bottom) doc.addPage();
}
