// The monthly fridge record as a PDF for inspectors: the day table, the checks with initials, the excursions.
import type { MonthlyRecord } from '../../shared/fridges/monthly-record.js';
import { fromCelsius, toCelsius } from '../../shared/temperature/convert-temperature.js';
import type { TemperatureUnit } from '../../shared/temperature/temperature-unit.js';
import { addPageFooters, createPdf, pdfFonts, pdfToBuffer, type PdfDocument } from '../pdf/pdf-document.js';
import { siteDayBounds, siteMonthBounds } from '../../shared/fridges/site-date.js';
import { zoneNames } from '../pdf/site-time.js';
import { coverageLines, dayReadingsText, dayWithoutText, durationText, kindText, recordTime, statusText, tempText } from './record-formatting.js';

interface Column {
  title: string;
  width: number;
}

const INK = '#1b1f20';
const MUTED = '#555555';
const RULE = '#9aa5a7';

function tableHeader(doc: PdfDocument, columns: Column[], y: number): number {
  let x = doc.page.margins.left;
  doc.font(pdfFonts.semibold).fontSize(8.5).fillColor(INK);
  for (const c of columns) {
    doc.text(c.title, x + 2, y, { width: c.width - 4, lineBreak: false });
    x += c.width;
  }
  const bottom = y + 13;
  doc.moveTo(doc.page.margins.left, bottom).lineTo(x, bottom).lineWidth(0.8).strokeColor(RULE).stroke();
  return bottom + 3;
}

/** Writes the rows, starting a new page (with the header again) when one would not fit. */
function table(doc: PdfDocument, columns: Column[], rows: string[][], startY: number): number {
  let y = tableHeader(doc, columns, startY);
  const limit = doc.page.height - doc.page.margins.bottom - 20;
  doc.font(pdfFonts.regular).fontSize(8.5);
  for (const cells of rows) {
    const height = Math.max(...cells.map((text, i) => doc.heightOfString(text || ' ', { width: columns[i].width - 4 }))) + 3;
    if (y + height > limit) {
      doc.addPage();
      y = tableHeader(doc, columns, doc.page.margins.top);
      doc.font(pdfFonts.regular).fontSize(8.5);
    }
    let x = doc.page.margins.left;
    doc.fillColor(INK);
    cells.forEach((text, i) => {
      doc.text(text, x + 2, y, { width: columns[i].width - 4 });
      x += columns[i].width;
    });
    y += height;
    doc.moveTo(doc.page.margins.left, y - 1).lineTo(x, y - 1).lineWidth(0.3).strokeColor('#d5dbdc').stroke();
  }
  return y;
}

export async function monthlyRecordPdf(record: MonthlyRecord, unit: TemperatureUnit): Promise<Buffer> {
  const { fridge } = record;
  const doc = createPdf({ title: `Monthly fridge record ${fridge.code} ${record.month}`, subject: 'Fridge temperatures, checks and excursions' });
  const u = `°${unit}`;
  const left = doc.page.margins.left;
  const width = doc.page.width - left - doc.page.margins.right;
  const period = record.inProgress ? `${record.month}, to ${record.through}` : record.month;
  doc.font(pdfFonts.bold).fontSize(16).fillColor(INK).text(`Monthly fridge record · ${period}`, left, doc.page.margins.top);
  doc.font(pdfFonts.semibold).fontSize(11).text(`${fridge.code} · ${fridge.name}`);
  const low = fromCelsius(toCelsius(record.alarm.low, record.alarm.unit), unit).toFixed(1);
  const high = fromCelsius(toCelsius(record.alarm.high, record.alarm.unit), unit).toFixed(1);
  const zones = zoneNames(siteMonthBounds(record.month, fridge.timeZone).start, siteDayBounds(record.through, fridge.timeZone).end - 1, fridge.timeZone);
  doc.font(pdfFonts.regular).fontSize(9).fillColor(MUTED)
    .text(`${fridge.siteName}${fridge.place ? ` · ${fridge.place}` : ''} · times on the site's clock, ${fridge.timeZone} (${zones})`, { width })
    .text(`Alarm range ${record.alarm.low}–${record.alarm.high} °${record.alarm.unit} as entered (${low}–${high} ${u}); temperatures below in ${u}.`, { width });
  for (const line of coverageLines(record)) doc.text(line, { width });
  doc.text('Keep this record at least 3 years, or longer where local rules ask.', { width });
  doc.moveDown(0.6);

  const dayColumns: Column[] = [
    { title: 'Date', width: 58 },
    { title: `Min ${u}`, width: 40 },
    { title: `Max ${u}`, width: 40 },
    { title: 'Readings', width: 70 },
    { title: 'Without readings', width: 72 },
    { title: `Checks: time, initials, current / min / max ${u}`, width: 232 },
  ];
  const dayRows = record.days.map((d) => [
    d.date,
    tempText(d.minC, unit) || '—',
    tempText(d.maxC, unit) || '—',
    dayReadingsText(d) || '—',
    dayWithoutText(d) || '—',
    d.checks.length
      ? d.checks.map((c) => `${c.time} ${c.initials}  ${tempText(c.currentC, unit)}${c.minC !== null || c.maxC !== null ? ` / ${tempText(c.minC, unit) || '—'} / ${tempText(c.maxC, unit) || '—'}` : ''}`).join('\n')
      : 'no check recorded',
  ]);
  let y = table(doc, dayColumns, dayRows, doc.y);
  if (record.days.some((d) => d.backupReadings)) {
    doc.font(pdfFonts.regular).fontSize(8).fillColor(MUTED).text('"backup": readings of the backup logger where it filled a gap of the primary; it may read less often, so such days count fewer readings.', left, y + 4, { width });
    y = doc.y;
  }

  y += 14;
  // Room for the heading, the table's header, a first row and the caution; otherwise they start the next page.
  if (y > doc.page.height - doc.page.margins.bottom - 90) {
    doc.addPage();
    y = doc.page.margins.top;
  }
  doc.font(pdfFonts.bold).fontSize(12).fillColor(INK).text('Excursions and what was done', left, y);
  y = doc.y + 4;
  if (!record.excursions.length) {
    doc.font(pdfFonts.regular).fontSize(9).text(record.inProgress ? 'No excursion this month so far.' : 'No excursion this month.', left, y);
  } else {
    const columns: Column[] = [
      { title: 'Kind', width: 42 },
      { title: 'Start', width: 88 },
      { title: 'End', width: 88 },
      { title: 'Duration', width: 54 },
      { title: `Peak ${u}`, width: 40 },
      { title: 'Status', width: 44 },
      { title: 'What was done', width: 156 },
    ];
    const rows = record.excursions.map((e) => [
      kindText[e.kind],
      recordTime(e.start, record),
      recordTime(e.end, record),
      durationText(e.minutes),
      tempText(e.peakC, unit),
      statusText[e.status] ?? e.status,
      e.actionTaken || '(not recorded yet)',
    ]);
    y = table(doc, columns, rows, y);
    doc.font(pdfFonts.italic).fontSize(8.5).fillColor(MUTED).text(
      'During an excursion the vaccine stays in proper storage, marked "do not use"; it is not discarded unless directed. The veterinarian decides what happens to it.',
      left,
      y + 8,
      { width },
    );
  }
  addPageFooters(doc, `Monthly fridge record · ${fridge.code} · ${record.month}`, { at: record.generatedAt, timeZone: fridge.timeZone });
  return pdfToBuffer(doc);
}
