// The excursion report (PDF): fridge and period, the chart as vectors with the allowed band, the event's figures,
// each held lot's exposure with vials and doses at risk, the troubleshooting record and the signed decisions.
import type { Sequelize } from 'sequelize';
import { holdDecisionLabels } from '../../shared/lots/lot-status.js';
import { fromCelsius } from '../../shared/temperature/convert-temperature.js';
import type { TemperatureUnit } from '../../shared/temperature/temperature-unit.js';
import { mergeBackupReadings } from '../../shared/logs/merge-backup-readings.js';
import { Fridge, Logger, Site } from '../../database/models/index.js';
import { addPageFooters, createPdf, pdfFonts, pdfToBuffer, type PdfDocument } from '../pdf/pdf-document.js';
import { loadFridgeReadings } from '../readings/load-fridge-readings.js';
import { drawTable } from '../shipments/report-table.js';
import { formatSiteTime } from '../pdf/site-time.js';
import { degreeMinutesPair, temperaturePair } from '../pdf/temperature-text.js';
import { exposureEventDetail, type ExposureEventDetail } from './exposure-event-detail.js';
import { drawTemperatureChart } from './report-chart.js';

const HOUR = 3_600_000;
const whole = (n: number | null | undefined) => (n === null || n === undefined ? '—' : Math.round(n).toLocaleString('en-US'));

function heading(doc: PdfDocument, text: string): void {
  if (doc.y > doc.page.height - 120) doc.addPage();
  doc.moveDown(0.6).font(pdfFonts.semibold).fontSize(12).fillColor('#1b1f1d').text(text, doc.page.margins.left).font(pdfFonts.regular).fontSize(10);
}

function pairs(doc: PdfDocument, rows: [string, string][]): void {
  for (const [label, value] of rows) {
    doc.font(pdfFonts.semibold).fontSize(10).text(`${label}: `, { continued: true }).font(pdfFonts.regular).text(value || '—');
  }
}

/** `unit` is the reader's display unit: it comes first everywhere, the other scale in brackets. */
export async function excursionReportPdf(sequelize: Sequelize, eventId: number, unit: TemperatureUnit = 'C', now = new Date()): Promise<{ fileName: string; pdf: Buffer }> {
  const detail = await exposureEventDetail(sequelize, eventId);
  const { event } = detail;
  const fridge = (await Fridge.findByPk(event.fridgeId))!;
  const site = (await Site.findByPk(fridge.siteId))!;
  const at = (ms: number | string) => formatSiteTime(ms, site.timeZone);
  const c1 = (n: number | null | undefined) => temperaturePair(n, unit);
  const start = new Date(event.start).getTime();
  const end = new Date(event.end).getTime();
  // The chart shows the 24 hours the MKT covers, and some hours after the event.
  const from = Math.min(start - 6 * HOUR, end - 24 * HOUR);
  const to = end + 6 * HOUR;
  const loggers = await Logger.findAll({ where: { fridgeId: fridge.id }, attributes: ['id', 'role'] });
  const readings = await sequelize.transaction({ readOnly: true }, async (transaction) => {
    const loaded = await loadFridgeReadings(transaction, loggers.map((l) => ({ id: l.id, role: l.role })), from, to);
    return mergeBackupReadings(loaded.primary, loaded.backup).readings;
  });

  const doc = createPdf({ title: `Excursion report ${event.id}: ${event.title}`, subject: 'Excursion report' });
  doc.font(pdfFonts.bold).fontSize(18).text('Excursion report');
  doc.font(pdfFonts.regular).fontSize(11).text(event.title);
  if (event.cause === 'freeze') doc.font(pdfFonts.semibold).fillColor('#8c1d18').text('Severe: a freeze-sensitive product may have frozen.').fillColor('#1b1f1d');
  doc.moveDown(0.4);
  pairs(doc, [
    ['Site', site.name],
    ['Fridge', `${fridge.name} (${fridge.code}), ${fridge.place}`],
    ['Period shown', `${at(from)} to ${at(to)}`],
    ['Product range judged', event.cause === 'freeze' ? `at or below ${c1(0)} (freeze-sensitive)` : `${c1(event.lowC)} to ${c1(event.highC)}`],
    ['Fridge alarm range', `${c1(event.fridgeLowC)} to ${c1(event.fridgeHighC)}${event.fridgeAlarmed ? '' : ' (the fridge raised no alarm)'}`],
  ]);

  const chartTop = doc.y + 10;
  drawTemperatureChart(doc, { readings, from, to, band: event.cause === 'freeze' ? { lowC: 0, highC: Infinity } : { lowC: event.lowC, highC: event.highC }, alarm: { lowC: event.fridgeLowC, highC: event.fridgeHighC }, event: { start, end }, label: (ms) => at(ms).slice(5, 16), unit }, { x: 90, y: chartTop, width: doc.page.width - 140, height: 170 });
  doc.y = chartTop + 190;
  doc.x = doc.page.margins.left;
  doc.fontSize(8).fillColor('#555555').text(`Shaded green: the allowed range. Shaded red: the event. Dashed: the fridge's alarm limits. ${readings.length.toLocaleString('en-US')} readings in the period; times in ${site.timeZone}.`).fillColor('#1b1f1d');

  heading(doc, 'Figures');
  pairs(doc, [
    ['Start', at(event.start)],
    ['End', `${at(event.end)}${event.openEnded ? ' (still outside when the data ends)' : ''}`],
    ['Minutes outside', event.minutes === null ? 'unknown (seen at a daily check)' : whole(event.minutes)],
    [event.kind === 'high' ? 'Peak (highest)' : 'Peak (lowest)', c1(event.peakC)],
    ['Degree-minutes', degreeMinutesPair(event.degreeMinutesC, unit)],
    ['MKT, 24 h ending at the end', c1(event.mkt24hC)],
  ]);
  lotsSection(doc, detail, unit);
  troubleshootingSection(doc, detail, at, c1);
  decisionsSection(doc, detail, at);
  doc.moveDown().fontSize(8).fillColor('#555555').text('Vialyard records and computes; the veterinarian decides. The product label and local rules apply. Keep this record at least 3 years.');
  addPageFooters(doc, `Excursion report ${event.id} · ${fridge.name}`, { at: now, timeZone: site.timeZone });
  return { fileName: `excursion-report-${event.id}.pdf`, pdf: await pdfToBuffer(doc) };
}

function lotsSection(doc: PdfDocument, detail: ExposureEventDetail, unit: TemperatureUnit): void {
  heading(doc, 'Lots held');
  const total = detail.lots.reduce((sum, lot) => ({ vials: sum.vials + lot.vials, doses: sum.doses + lot.doses }), { vials: 0, doses: 0 });
  doc.text(`${detail.lots.length} lot${detail.lots.length === 1 ? '' : 's'}; at risk: ${total.vials.toLocaleString('en-US')} vials, ${total.doses.toLocaleString('en-US')} doses.`);
  drawTable(doc, [
    { header: 'Lot', width: 70 }, { header: 'Product', width: 110 }, { header: 'Vials', width: 40, align: 'right' }, { header: 'Doses', width: 55, align: 'right' },
    { header: 'Min above', width: 50, align: 'right' }, { header: 'Min below', width: 50, align: 'right' }, { header: 'Min unknown', width: 55, align: 'right' }, { header: 'MKT in storage', width: 82, align: 'right' },
  ], detail.lots.map((lot) => [
    `${lot.lotNumber}${lot.cause === 'freeze' ? ' (freeze)' : ''}`, lot.product, whole(lot.vials), whole(lot.doses),
    whole(lot.exposure.minutesAbove), whole(lot.exposure.minutesBelow), whole(lot.exposure.minutesUnknown), lot.exposure.mktStorageC === null ? '—' : `${fromCelsius(lot.exposure.mktStorageC, unit).toFixed(1)} °${unit}`,
  ]));
}

function troubleshootingSection(doc: PdfDocument, detail: ExposureEventDetail, at: (ms: string) => string, c1: (n: number | null) => string): void {
  heading(doc, 'Troubleshooting record');
  const t = detail.troubleshooting;
  if (!t) {
    doc.text('Not filled in yet.');
    return;
  }
  pairs(doc, [
    ['Found', t.foundAt ? at(t.foundAt) : ''],
    ['Found by', t.foundBy],
    ['Unit temperature when found', c1(t.unitTempC)],
    ['Min / max when found', `${c1(t.unitMinC)} / ${c1(t.unitMaxC)}`],
    ['Room temperature', c1(t.roomTempC)],
    ['What happened', t.whatHappened],
    ['Estimated minutes since the last in-range reading', whole(t.minutesSinceInRange)],
    ['Back in proper storage', t.backInStorageAt ? at(t.backInStorageAt) : ''],
    ['Who was contacted', t.contacted],
    ['Preventive action', t.preventiveAction],
    ['Last changed', `${at(t.updatedAt)} by ${t.updatedBy}`],
  ]);
}

function decisionsSection(doc: PdfDocument, detail: ExposureEventDetail, at: (ms: string) => string): void {
  heading(doc, 'Signed decisions');
  const decisions = detail.lots.flatMap((lot) => lot.decisions.map((d) => ({ lot, d })));
  if (!decisions.length) {
    doc.text('No decision signed yet: every lot above stays "do not use".');
    return;
  }
  for (const { lot, d } of decisions) {
    doc.font(pdfFonts.semibold).text(`Lot ${lot.lotNumber}: ${holdDecisionLabels[d.decision]}${d.condition ? ` (${d.condition})` : ''}${d.current ? '' : ' (superseded)'}`);
    doc.font(pdfFonts.regular).text(`Signed by ${d.signerName}, ${at(d.signedAt)}. Meaning: ${d.signatureMeaning}${d.notes ? ` Notes: ${d.notes}` : ''}`);
  }
}
