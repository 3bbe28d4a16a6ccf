// Draws a fridge's temperatures as vectors in a PDF: the allowed band shaded, the fridge's alarm limits dashed,
// the event's span marked, and the readings as a line (each bucket's minimum and maximum, so a spike still shows).
import type { TimedReading } from '../../shared/logs/reading-durations.js';
import { fromCelsius } from '../../shared/temperature/convert-temperature.js';
import type { TemperatureUnit } from '../../shared/temperature/temperature-unit.js';
import { pdfFonts, type PdfDocument } from '../pdf/pdf-document.js';

export interface ChartInput {
  readings: readonly TimedReading[];
  from: number;
  to: number;
  band: { lowC: number; highC: number };
  alarm: { lowC: number; highC: number };
  event: { start: number; end: number };
  label: (ms: number) => string;
  /** The reader's unit: the axis is labelled in it. */
  unit: TemperatureUnit;
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
  // Everything below is in the reader's unit (an infinite band edge stays infinite).
  const u = (c: number) => fromCelsius(c, input.unit);
  const points = thinned(input.readings, input.from, input.to).map((p) => ({ at: p.at, t: u(p.tempC) }));
  const band = { low: u(input.band.lowC), high: u(input.band.highC) };
  const alarm = { low: u(input.alarm.lowC), high: u(input.alarm.highC) };
  const finite = (n: number) => Number.isFinite(n);
  const lows = [...points.map((p) => p.t), band.low, alarm.low].filter(finite);
  const highs = [...points.map((p) => p.t), band.high, alarm.high].filter(finite);
  const minT = Math.floor(Math.min(...lows) - 1);
  const maxT = Math.ceil(Math.max(...highs) + 1);
  const x = (ms: number) => box.x + ((ms - input.from) / (input.to - input.from)) * box.width;
  const y = (t: number) => box.y + box.height - ((Math.min(Math.max(t, minT), maxT) - minT) / (maxT - minT)) * box.height;

  doc.save();
  // The allowed band (the product's range), shaded.
  doc.rect(box.x, y(Math.min(band.high, maxT)), box.width, y(Math.max(band.low, minT)) - y(Math.min(band.high, maxT))).fill('#dcefe3');
  // The event's span.
  const spanStart = Math.max(x(input.event.start), box.x);
  const spanEnd = Math.min(Math.max(x(input.event.end), spanStart + 1.5), box.x + box.width);
  doc.rect(spanStart, box.y, spanEnd - spanStart, box.height).fillOpacity(0.6).fill('#f0b4ab').fillOpacity(1);
  // Frame and grid.
  doc.lineWidth(0.5).strokeColor('#9aa5a0').rect(box.x, box.y, box.width, box.height).stroke();
  doc.font(pdfFonts.regular).fontSize(7).fillColor('#333333');
  // At most eight grid lines, on round numbers of either unit.
  const step = [1, 2, 5, 10, 20, 50].find((s) => (maxT - minT) / s <= 8) ?? 100;
  for (let t = Math.ceil(minT / step) * step; t <= maxT; t += step) {
    doc.moveTo(box.x, y(t)).lineTo(box.x + box.width, y(t)).lineWidth(0.25).strokeColor('#d5dbd8').stroke();
    doc.text(`${t} °${input.unit}`, box.x - 34, y(t) - 4, { width: 30, align: 'right', lineBreak: false });
  }
  for (let i = 0; i <= 4; i++) {
    const ms = input.from + ((input.to - input.from) * i) / 4;
    doc.text(input.label(ms), x(ms) - 45, box.y + box.height + 4, { width: 90, align: 'center', lineBreak: false });
  }
  // The fridge's alarm limits, dashed.
  for (const limit of [alarm.low, alarm.high]) {
    if (limit >= minT && limit <= maxT) doc.moveTo(box.x, y(limit)).lineTo(box.x + box.width, y(limit)).dash(3, { space: 2 }).lineWidth(0.6).strokeColor('#7a5c00').stroke().undash();
  }
  // The readings.
  if (points.length) {
    doc.moveTo(x(points[0].at), y(points[0].t));
    for (const p of points.slice(1)) doc.lineTo(x(p.at), y(p.t));
    doc.lineWidth(1).strokeColor('#1f4e79').stroke();
  }
  doc.restore();
  doc.fillColor('#1b1f1d');
}
