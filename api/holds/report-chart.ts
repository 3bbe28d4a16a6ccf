// Draws a fridge's temperatures as vectors in a PDF: the allowed band shaded, the fridge's alarm limits dashed,
// the event's span marked, and the readings as a line (each bucket's minimum and maximum, so a spike still shows).
import type { TimedReading } from '../../shared/logs/reading-durations.js';
import { pdfFonts, type PdfDocument } from '../pdf/pdf-document.js';

export interface ChartInput {
  readings: readonly TimedReading[];
  from: number;
  to: number;
  band: { lowC: number; highC: number };
  alarm: { lowC: number; highC: number };
  event: { start: number; end: number };
  label: (ms: number) => string;
}

const BUCKETS = 400;

/** At most two points per bucket (its lowest and highest, in time order). */
function thinned(readings: readonly TimedReading[], from: number, to: number): TimedReading[] {
  const inside = readings.filter((r) => r.at >= from && r.at <= to);
  if (inside.length <= 2 * BUCKETS) return inside;
  const width = (to - from) / BUCKETS;
  const out: TimedReading[] = [];
  let bucket = -1;
  let low: TimedReading | undefined;
  let high: TimedReading | undefined;
  const flush = () => {
    if (low && high) out.push(...(low.at <= high.at ? [low, high] : [high, low]).filter((r, i, a) => i === 0 || r !== a[0]));
  };
  for (const r of inside) {
    const b = Math.floor((r.at - from) / width);
    if (b !== bucket) {
      flush();
      bucket = b;
      low = high = r;
    }
    if (r.tempC < low!.tempC) low = r;
    if (r.tempC > high!.tempC) high = r;
  }
  flush();
  return out;
}

export function drawTemperatureChart(doc: PdfDocument, input: ChartInput, box: { x: number; y: number; width: number; height: number }): void {
  const points = thinned(input.readings, input.from, input.to);
  const temps = points.map((p) => p.tempC);
  const finite = (n: number) => Number.isFinite(n);
  const lows = [...temps, input.band.lowC, input.alarm.lowC].filter(finite);
  const highs = [...temps, input.band.highC, input.alarm.highC].filter(finite);
  const minC = Math.floor(Math.min(...lows) - 1);
  const maxC = Math.ceil(Math.max(...highs) + 1);
  const x = (ms: number) => box.x + ((ms - input.from) / (input.to - input.from)) * box.width;
  const y = (c: number) => box.y + box.height - ((Math.min(Math.max(c, minC), maxC) - minC) / (maxC - minC)) * box.height;

  doc.save();
  // The allowed band (the product's range), shaded.
  doc.rect(box.x, y(Math.min(input.band.highC, maxC)), box.width, y(Math.max(input.band.lowC, minC)) - y(Math.min(input.band.highC, maxC))).fill('#dcefe3');
  // The event's span.
  const spanStart = Math.max(x(input.event.start), box.x);
  const spanEnd = Math.min(Math.max(x(input.event.end), spanStart + 1.5), box.x + box.width);
  doc.rect(spanStart, box.y, spanEnd - spanStart, box.height).fillOpacity(0.6).fill('#f0b4ab').fillOpacity(1);
  // Frame and grid.
  doc.lineWidth(0.5).strokeColor('#9aa5a0').rect(box.x, box.y, box.width, box.height).stroke();
  doc.font(pdfFonts.regular).fontSize(7).fillColor('#333333');
  const step = Math.max(1, Math.ceil((maxC - minC) / 8));
  for (let c = Math.ceil(minC / step) * step; c <= maxC; c += step) {
    doc.moveTo(box.x, y(c)).lineTo(box.x + box.width, y(c)).lineWidth(0.25).strokeColor('#d5dbd8').stroke();
    doc.text(`${c} °C`, box.x - 34, y(c) - 4, { width: 30, align: 'right', lineBreak: false });
  }
  for (let i = 0; i <= 4; i++) {
    const ms = input.from + ((input.to - input.from) * i) / 4;
    doc.text(input.label(ms), x(ms) - 45, box.y + box.height + 4, { width: 90, align: 'center', lineBreak: false });
  }
  // The fridge's alarm limits, dashed.
  for (const limit of [input.alarm.lowC, input.alarm.highC]) {
    if (limit >= minC && limit <= maxC) doc.moveTo(box.x, y(limit)).lineTo(box.x + box.width, y(limit)).dash(3, { space: 2 }).lineWidth(0.6).strokeColor('#7a5c00').stroke().undash();
  }
  // The readings.
  if (points.length) {
    doc.moveTo(x(points[0].at), y(points[0].tempC));
    for (const p of points.slice(1)) doc.lineTo(x(p.at), y(p.tempC));
    doc.lineWidth(1).strokeColor('#1f4e79').stroke();
  }
  doc.restore();
  doc.fillColor('#1b1f1d');
}
