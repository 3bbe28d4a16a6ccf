// Draws a simple ruled table in a pdfkit document, breaking to a new page when a row does not fit.
import { pdfFonts, type PdfDocument } from '../pdf/pdf-document.js';

export interface ReportColumn {
  header: string;
  width: number;
  align?: 'left' | 'right';
}

const padding = 4;

function rowHeight(doc: PdfDocument, columns: ReportColumn[], cells: string[]): number {
  return Math.max(...cells.map((cell, i) => doc.heightOfString(cell, { width: columns[i]!.width - 2 * padding }))) + 2 * padding;
}

function drawRow(doc: PdfDocument, columns: ReportColumn[], cells: string[], y: number, height: number, shaded: boolean): void {
  const left = doc.page.margins.left;
  const width = columns.reduce((sum, c) => sum + c.width, 0);
  if (shaded) doc.save().rect(left, y, width, height).fill('#eef2f0').restore();
  let x = left;
  cells.forEach((cell, i) => {
    const column = columns[i]!;
    doc.fillColor('#1b1f1d').text(cell, x + padding, y + padding, { width: column.width - 2 * padding, align: column.align ?? 'left' });
    x += column.width;
  });
  doc.save().moveTo(left, y + height).lineTo(left + width, y + height).lineWidth(0.5).strokeColor('#9aa5a0').stroke().restore();
}

export function drawTable(doc: PdfDocument, columns: ReportColumn[], rows: string[][]): void {
  const header = () => {
    doc.font(pdfFonts.semibold).fontSize(9);
    const height = rowHeight(doc, columns, columns.map((c) => c.header));
    const top = doc.y;
    drawRow(doc, columns, columns.map((c) => c.header), top, height, true);
    // doc.text() moves doc.y; the row's own height decides where the next one starts.
    doc.y = top + height;
    doc.font(pdfFonts.regular).fontSize(9);
  };
  header();
  for (const row of rows) {
    const height = rowHeight(doc, columns, row);
    if (doc.y + height > doc.page.height - doc.page.margins.bottom) {
      doc.addPage();
      header();
    }
    const top = doc.y;
    drawRow(doc, columns, row, top, height, false);
    doc.y = top + height;
  }
  doc.x = doc.page.margins.left;
  doc.moveDown(0.8);
}
