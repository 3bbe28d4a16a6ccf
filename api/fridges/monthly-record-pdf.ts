// The monthly fridge record as a PDF for inspectors: the day table, the checks with initials, the excursions.
import type { MonthlyRecord } from '../../shared/fridges/monthly-record.js';
import { fromCelsius, toCelsius } from '../../shared/temperature/convert-temperature.js';
import type { TemperatureUnit } from '../../shared/temperature/temperature-unit.js';
import { addPageFooters, createPdf, pdfFonts, pdfToBuffer, type PdfDocument } from '../pdf/pdf-document.js';
import { durationText, localTime, statusText, tempText } from './record-formatting.js';

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
  doc.font(pdfFonts.bold).fontSize(16).fillColor(INK).text(`Monthly fridge record · ${record.month}`, left, doc.page.margins.top);
  doc.font(pdfFonts.semibold).fontSize(11).text(`${fridge.code} · ${fridge.name}`);
  const low = fromCelsius(toCelsius(record.alarm.low, record.alarm.unit), unit).toFixed(1);
  const high = fromCelsius(toCelsius(record.alarm.high, record.alarm.unit), unit).toFixed(1);
  doc.font(pdfFonts.regular).fontSize(9).fillColor(MUTED)
    .text(`${fridge.siteName}${fridge.place ? ` · ${fridge.place}` : ''} · times in ${fridge.timeZone}`)
    .text(`Alarm range ${record.alarm.low}–${record.alarm.high} °${record.alarm.unit} as entered (${low}–${high} ${u}); temperatures below in ${u}.`)
    .text(`Time without readings this month: ${durationText(record.gapMinutes)}. Keep this record at least 3 years, or longer where local rules ask.`);
  doc.moveDown(0.6);

  const dayColumns: Column[] = [
    { title: 'Date', width: 62 },
    { title: `Min ${u}`, width: 46 },
    { title: `Max ${u}`, width: 46 },
    { title: 'Readings', width: 48 },
    { title: `Checks: time, initials, current / min / max ${u}`, width: 310 },
  ];
  const dayRows = record.days.map((d) => [
    d.date,
    tempText(d.minC, unit) || '—',
    tempText(d.maxC, unit) || '—',
    String(d.readings),
    d.checks.length
      ? d.checks.map((c) => `${c.time} ${c.initials}  ${tempText(c.currentC, unit)}${c.minC !== null || c.maxC !== null ? ` / ${tempText(c.minC, unit) || '—'} / ${tempText(c.maxC, unit) || '—'}` : ''}`).join('\n')
      : 'no check recorded',
  ]);
  let y = table(doc, dayColumns, dayRows, doc.y);

  y += 14;
  if (y > doc.page.height - doc.page.margins.bottom - 120) {
    doc.addPage();
    y = doc.page.margins.top;
  }
  doc.font(pdfFonts.bold).fontSize(12).fillColor(INK).text('Excursions and what was done', left, y);
  y = doc.y + 4;
  if (!record.excursions.length) {
    doc.font(pdfFonts.regular).fontSize(9).text('No excursion this month.', left, y);
  } else {
    const columns: Column[] = [
      { title: 'Kind', width: 34 },
      { title: 'Start', width: 72 },
      { title: 'End', width: 72 },
      { title: 'Duration', width: 66 },
      { title: `Peak ${u}`, width: 44 },
      { title: 'Status', width: 50 },
      { title: 'What was done', width: 174 },
    ];
    const rows = record.excursions.map((e) => [
      e.kind,
      localTime(e.start, fridge.timeZone),
      localTime(e.end, fridge.timeZone),
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
      { width: doc.page.width - left - doc.page.margins.right },
    );
  }
  addPageFooters(doc, `Vialyard · ${fridge.code} · ${record.month} · generated ${record.generatedAt.slice(0, 16).replace('T', ' ')} UTC`);
  return pdfToBuffer(doc);
}
