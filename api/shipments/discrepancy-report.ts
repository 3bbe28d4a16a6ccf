// The discrepancy report as a PDF: the shipment, its checks, its lines and their differences, the holds, the photos.
import { readFile } from 'node:fs/promises';
import { indicatorLabels, outcomeLabels, readingPlaceLabels } from '../../shared/receiving/arrival-checks.js';
import { lineDifference } from '../../shared/receiving/line-counts.js';
import type { ShipmentView } from '../../shared/receiving/shipment-view.js';
import { addPageFooters, createPdf, keepTogether, pdfFonts, pdfToBuffer, type PdfDocument } from '../pdf/pdf-document.js';
import { formatSiteTime } from '../pdf/site-time.js';
import type { PhotoStore } from '../photos/photo-store.js';
import { ShipmentPhoto } from '../../database/models/index.js';
import { drawTable } from './report-table.js';

const yesNo = (value: boolean) => (value ? 'Yes' : 'No');

const heldHeading = 'Lots on hold: do not use';
const heldCaution = 'Keep these vials refrigerated and do not use them until the flock veterinarian decides. The product label and the veterinarian govern; Vialyard only records.';

function heading(doc: PdfDocument, text: string): void {
  if (doc.y > doc.page.height - doc.page.margins.bottom - 60) doc.addPage();
  doc.moveDown(0.4).font(pdfFonts.bold).fontSize(12).fillColor('#14452f').text(text).moveDown(0.3);
  doc.font(pdfFonts.regular).fontSize(10).fillColor('#1b1f1d');
}

function facts(doc: PdfDocument, pairs: [string, string][]): void {
  for (const [label, value] of pairs) {
    const y = doc.y;
    doc.font(pdfFonts.semibold).fontSize(10).text(label, doc.page.margins.left, y, { width: 130 });
    doc.font(pdfFonts.regular).text(value || '—', doc.page.margins.left + 135, y, { width: 370 });
    doc.moveDown(0.15);
  }
  doc.x = doc.page.margins.left;
}

function lineResult(line: ShipmentView['lines'][number]): string {
  if (!line.accepted) return 'Refused';
  const stocked = line.vialsStocked ? `${line.vialsStocked} into ${line.fridgeName ?? 'stock'}` : 'None into stock';
  return line.holds.length ? `ON HOLD\n${stocked}` : stocked;
}

/**
 * The held lots and the caution after them go on one page: a caution alone at the top of the next page reads as
 * a stray sentence. When the whole block is taller than a page, the last lot and the caution still stay together.
 */
function drawHeldLots(doc: PdfDocument, held: ShipmentView['lines']): void {
  const bullets = held.map((line) => `•  Lot ${line.lotNumber} (${line.label}): ${line.holds.map((h) => h.reason).join(' ')}`);
  const width = doc.page.width - doc.page.margins.left - doc.page.margins.right;
  doc.font(pdfFonts.regular).fontSize(10);
  const gapBefore = 0.4 * doc.currentLineHeight(true);
  const bulletHeights = bullets.map((bullet) => doc.heightOfString(bullet, { width, indent: 6 }));
  const gapBeforeCaution = 0.3 * doc.currentLineHeight(true);
  const caution = doc.font(pdfFonts.italic).heightOfString(heldCaution, { width }) + gapBeforeCaution;
  doc.font(pdfFonts.bold).fontSize(12);
  const title = doc.heightOfString(heldHeading, { width }) + 0.3 * doc.currentLineHeight(true);
  // A few points spare for pdfkit's rounding of line positions.
  const spare = 4;
  const whole = gapBefore + title + bulletHeights.reduce((sum, h) => sum + h, 0) + caution + spare;
  if (whole <= doc.page.height - doc.page.margins.top - doc.page.margins.bottom) keepTogether(doc, whole);
  heading(doc, heldHeading);
  bullets.forEach((bullet, i) => {
    if (i === bullets.length - 1) keepTogether(doc, bulletHeights[i]! + caution + spare);
    doc.text(bullet, doc.page.margins.left, doc.y, { indent: 6 });
  });
  doc.moveDown(0.3).font(pdfFonts.italic).text(heldCaution);
  doc.font(pdfFonts.regular);
}

async function drawPhotos(doc: PdfDocument, shipment: ShipmentView, store: PhotoStore): Promise<void> {
  if (!shipment.photos.length) return;
  heading(doc, `Photos (${shipment.photos.length})`);
  const photos = await ShipmentPhoto.findAll({ where: { shipmentId: shipment.id }, order: [['id', 'ASC']] });
  const cellWidth = 245;
  const maxHeight = 200;
  // Two photos a row, each scaled to fit its cell.
  for (let i = 0; i < photos.length; i += 2) {
    const pair = photos.slice(i, i + 2).map((photo) => {
      const scale = Math.min(cellWidth / photo.width, maxHeight / photo.height);
      return { photo, width: photo.width * scale, height: photo.height * scale };
    });
    const rowHeight = Math.max(...pair.map((p) => p.height));
    if (doc.y + rowHeight > doc.page.height - doc.page.margins.bottom) doc.addPage();
    const top = doc.y;
    for (const [column, { photo, width, height }] of pair.entries()) {
      doc.image(await readFile(store.pathOf(photo.fileKey, 'display')), doc.page.margins.left + column * (cellWidth + 12), top, { width, height });
    }
    doc.x = doc.page.margins.left;
    doc.y = top + rowHeight + 10;
  }
}

export async function discrepancyReportPdf(shipment: ShipmentView, store: PhotoStore, generatedAt = new Date()): Promise<Buffer> {
  const zone = shipment.siteTimeZone;
  const doc = createPdf({ title: `Discrepancy report, shipment ${shipment.id}`, subject: `${shipment.siteName}, arrived ${formatSiteTime(shipment.arrivedAt, zone)}` });
  doc.font(pdfFonts.semibold).fontSize(9).fillColor('#4c5a54').text('VIALYARD · DISCREPANCY REPORT');
  doc.font(pdfFonts.bold).fontSize(18).fillColor('#14452f').text(`Shipment ${shipment.id} at ${shipment.siteName}`);
  doc.font(pdfFonts.semibold).fontSize(12).fillColor(shipment.outcome === 'refused' ? '#8c1d18' : '#6b3d00').text(outcomeLabels[shipment.outcome]);
  doc.moveDown(0.5).font(pdfFonts.regular).fontSize(10).fillColor('#1b1f1d');

  heading(doc, 'Shipment');
  facts(doc, [
    ['Supplier', shipment.supplierName ?? 'Unannounced, supplier not given'],
    ['Order', shipment.purchaseOrderReference ?? 'None (unannounced)'],
    ['Carrier', shipment.carrier],
    ['Tracking number', shipment.trackingNumber],
    ['Arrived', formatSiteTime(shipment.arrivedAt, zone)],
    ['Shipped', shipment.shippedAt ? formatSiteTime(shipment.shippedAt, zone) : 'Not known'],
    ['Transit', shipment.transitHours === null ? 'Not known' : `${shipment.transitHours.toFixed(1)} h`],
    ['Received by', shipment.receivedBy],
  ]);

  heading(doc, 'Findings');
  for (const finding of shipment.discrepancies) doc.text(`•  ${finding.message}`, { indent: 6 });
  for (const warning of shipment.warnings) doc.text(`•  Note: ${warning.message}`, { indent: 6 });

  if (shipment.notes) {
    heading(doc, 'Notes from receiving');
    doc.text(shipment.notes);
  }
  heading(doc, 'Arrival checks');
  const reading = shipment.reading ? `${shipment.reading.value} °${shipment.reading.unit}, ${readingPlaceLabels[shipment.reading.place].toLowerCase()}` : 'Not taken';
  drawTable(doc, [{ header: 'Check', width: 250 }, { header: 'Answer', width: 262 }], [
    ['Outer container intact', yesNo(shipment.checks.containerIntact)],
    ['Coolant present', yesNo(shipment.checks.coolantPresent)],
    ['Temperature indicator', indicatorLabels[shipment.checks.indicator]],
    ['Contents cold', yesNo(shipment.checks.contentsCold)],
    ['Temperature reading', reading],
  ]);

  heading(doc, 'Lines');
  drawTable(
    doc,
    [
      { header: 'Lot and presentation', width: 140 },
      { header: 'Expiry', width: 58 },
      { header: 'Expected', width: 48, align: 'right' },
      { header: 'Intact', width: 40, align: 'right' },
      { header: 'Broken', width: 42, align: 'right' },
      { header: 'Missing', width: 44, align: 'right' },
      { header: 'Difference', width: 52, align: 'right' },
      { header: 'Result', width: 88 },
    ],
    shipment.lines.map((line) => {
      const difference = lineDifference(line);
      return [
        `${line.lotNumber}\n${line.label}`,
        line.expiryDayGiven ? line.expiry : line.expiry.slice(0, 7),
        String(line.vialsExpected),
        String(line.vialsIntact),
        String(line.vialsBroken),
        String(line.vialsMissing),
        String(line.vialsIntact - line.vialsExpected) + (difference.unaccounted ? ' *' : ''),
        lineResult(line),
      ];
    }),
  );
  if (shipment.lines.some((line) => lineDifference(line).unaccounted !== 0)) {
    doc.fontSize(8).text('* intact, broken and missing do not add up to the vials expected.').fontSize(10).moveDown(0.5);
  }

  const held = shipment.lines.filter((line) => line.holds.length);
  if (held.length) drawHeldLots(doc, held);
  await drawPhotos(doc, shipment, store);
  addPageFooters(doc, `Discrepancy report · shipment ${shipment.id}`, { at: generatedAt, timeZone: zone });
  return pdfToBuffer(doc);
}
