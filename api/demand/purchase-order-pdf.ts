// The purchase order as a PDF for the supplier: who orders, what (packs, vials, doses, prices), by when, and how it must travel.
import { pdfFonts, addPageFooters, createPdf, pdfToBuffer, type PdfDocument } from '../pdf/pdf-document.js';

export interface OrderPdfLine {
  label: string;
  packs: number;
  vials: number;
  doses: number;
  unitPrice: number | null;
  storage: string;
}

export interface OrderPdfData {
  reference: string;
  issuedOn: string;
  expectedDate: string;
  siteName: string;
  siteCode: string;
  /** The ordering site's zone: the footer's "made" time is on its clock. */
  siteTimeZone: string;
  supplierName: string;
  supplierEmail: string;
  orderedBy: { name: string; email: string };
  carrier: string;
  notes: string;
  lines: OrderPdfLine[];
}

const ink = '#1f2a24';
const muted = '#5b6660';
const rule = '#b9c4bd';

// As the app shows money (Angular's CurrencyPipe with its defaults: locale en-US, USD, symbol, two decimals): "$1,250.00".
const usd = new Intl.NumberFormat('en-US', { style: 'currency', currency: 'USD', minimumFractionDigits: 2, maximumFractionDigits: 2 });
const money = (value: number) => usd.format(value);
const count = (value: number) => value.toLocaleString('en-US');

function party(doc: PdfDocument, x: number, y: number, heading: string, lines: string[]): void {
  doc.font(pdfFonts.semibold).fontSize(9).fillColor(muted).text(heading.toUpperCase(), x, y, { width: 240, characterSpacing: 0.5 });
  doc.font(pdfFonts.regular).fontSize(11).fillColor(ink);
  for (const line of lines) doc.text(line, x, doc.y + 2, { width: 240 });
}

const columns = [
  { title: 'Product and pack', width: 190, align: 'left' as const },
  { title: 'Packs', width: 45, align: 'right' as const },
  { title: 'Vials', width: 50, align: 'right' as const },
  { title: 'Doses', width: 70, align: 'right' as const },
  { title: 'Price / vial', width: 70, align: 'right' as const },
  { title: 'Amount', width: 75, align: 'right' as const },
];

function row(doc: PdfDocument, y: number, cells: string[], font: string): number {
  let x = 50;
  let height = 0;
  doc.font(font).fontSize(10).fillColor(ink);
  cells.forEach((cell, i) => {
    const column = columns[i]!;
    doc.text(cell, x, y, { width: column.width - 6, align: column.align });
    height = Math.max(height, doc.heightOfString(cell, { width: column.width - 6 }));
    x += column.width;
  });
  return y + height + 6;
}

export async function purchaseOrderPdf(data: OrderPdfData, now = new Date()): Promise<Buffer> {
  const doc = createPdf({ title: `Purchase order ${data.reference}`, subject: `Order from ${data.siteName} to ${data.supplierName}` });
  doc.font(pdfFonts.bold).fontSize(22).fillColor(ink).text('Purchase order', 50, 50);
  doc.font(pdfFonts.semibold).fontSize(12).text(data.reference, 350, 56, { width: 212, align: 'right' });
  doc.font(pdfFonts.regular).fontSize(10).fillColor(muted).text(`Issued ${data.issuedOn}`, 350, doc.y + 2, { width: 212, align: 'right' });

  const top = 110;
  party(doc, 50, top, 'Ordered by', [data.siteName, `Site ${data.siteCode}`, data.orderedBy.name, data.orderedBy.email]);
  const leftBottom = doc.y;
  party(doc, 320, top, 'Supplier', [data.supplierName, data.supplierEmail]);
  doc.y = Math.max(leftBottom, doc.y) + 14;

  doc.font(pdfFonts.semibold).fontSize(11).fillColor(ink).text(`Deliver by ${data.expectedDate}`, 50, doc.y);
  if (data.carrier) doc.font(pdfFonts.regular).fontSize(10).text(`Carrier: ${data.carrier}`, 50, doc.y + 2);
  let y = doc.y + 14;

  y = row(doc, y, columns.map((c) => c.title), pdfFonts.semibold);
  doc.moveTo(50, y - 3).lineTo(550, y - 3).strokeColor(rule).lineWidth(0.8).stroke();
  let total = 0;
  let priced = true;
  for (const line of data.lines) {
    if (y > doc.page.height - 160) {
      doc.addPage();
      y = row(doc, 50, columns.map((c) => c.title), pdfFonts.semibold);
    }
    const amount = line.unitPrice === null ? null : Math.round(line.vials * line.unitPrice * 100) / 100;
    if (amount === null) priced = false;
    else total += amount;
    y = row(
      doc,
      y,
      [line.label, count(line.packs), count(line.vials), count(line.doses), line.unitPrice === null ? 'to quote' : money(line.unitPrice), amount === null ? '—' : money(amount)],
      pdfFonts.regular,
    );
  }
  doc.moveTo(50, y - 3).lineTo(550, y - 3).strokeColor(rule).lineWidth(0.8).stroke();
  doc.font(pdfFonts.semibold).fontSize(11).fillColor(ink).text(priced ? `Total ${money(total)}` : `Total of priced lines ${money(total)}; other lines to quote`, 50, y + 4, { width: 500, align: 'right' });

  doc.y += 18;
  doc.font(pdfFonts.semibold).fontSize(11).text('Shipping', 50, doc.y);
  doc.font(pdfFonts.regular).fontSize(10).fillColor(ink);
  doc.text('Ship refrigerated with coolant, never frozen, by the fastest route. Each shipment is checked cold on arrival and may be refused if it is warm or damaged.', 50, doc.y + 2, { width: 500 });
  for (const storage of [...new Set(data.lines.map((line) => line.storage))]) doc.text(`• ${storage}`, 60, doc.y + 2, { width: 490 });
  if (data.notes) {
    doc.font(pdfFonts.semibold).fontSize(11).text('Notes', 50, doc.y + 12);
    doc.font(pdfFonts.regular).fontSize(10).text(data.notes, 50, doc.y + 2, { width: 500 });
  }
  doc.font(pdfFonts.italic).fontSize(9).fillColor(muted).text(
    `Please confirm this order and its delivery date by replying to ${data.orderedBy.email}.`,
    50,
    doc.y + 16,
    { width: 500 },
  );
  addPageFooters(doc, `Purchase order ${data.reference} · ${data.siteName}`, { at: now, timeZone: data.siteTimeZone });
  return pdfToBuffer(doc);
}
