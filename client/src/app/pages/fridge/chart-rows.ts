// Turns chart data into what the canvas draws and what its table alternative lists, in the user's unit.
import type { ChartData } from '@shared/fridges/chart-data.js';
import { fromCelsius, type TemperatureUnit } from '@shared/temperature/index.js';

export interface ChartXY {
  x: number;
  y: number | null;
}

export interface ChartTableRow {
  at: number;
  /** A reading, or a bucket's lowest and highest. */
  value?: number;
  min?: number;
  max?: number;
  source: 'primary' | 'backup';
}

/** A null point where readings stop for much longer than usual, so the line breaks at a gap. */
function breakAtGaps(points: ChartXY[]): ChartXY[] {
  if (points.length < 3) return points;
  const steps = points.slice(1).map((p, i) => p.x - points[i].x).sort((a, b) => a - b);
  const usual = steps[steps.length >> 1];
  const out: ChartXY[] = [points[0]];
  for (let i = 1; i < points.length; i++) {
    if (points[i].x - points[i - 1].x > 3 * usual) out.push({ x: points[i - 1].x + usual, y: null });
    out.push(points[i]);
  }
  return out;
}

/** The series in the user's unit; `band` replaces the fridge's alarm range as the shaded allowed band. */
export function chartSeries(data: ChartData, unit: TemperatureUnit, band: { lowC: number; highC: number } | null = null) {
  const t = (c: number) => Math.round(fromCelsius(c, unit) * 100) / 100;
  const half = (data.bucketMinutes * 60_000) / 2;
  const primaryPoints = breakAtGaps(data.primary.points.map((p) => ({ x: Date.parse(p.at), y: t(p.tempC) })));
  const highs = breakAtGaps(data.primary.buckets.map((b) => ({ x: Date.parse(b.at) + half, y: t(b.maxC) })));
  const lows = breakAtGaps(data.primary.buckets.map((b) => ({ x: Date.parse(b.at) + half, y: t(b.minC) })));
  const backup = [
    ...data.backup.points.map((p) => ({ x: Date.parse(p.at), y: t(p.tempC) })),
    ...data.backup.buckets.flatMap((b) => [{ x: Date.parse(b.at) + half, y: t(b.maxC) }, { x: Date.parse(b.at) + half, y: t(b.minC) }]),
  ];
  return { primaryPoints, highs, lows, backup, low: t(band?.lowC ?? data.lowC), high: t(band?.highC ?? data.highC) };
}

export function chartTableRows(data: ChartData, unit: TemperatureUnit): ChartTableRow[] {
  const t = (c: number) => fromCelsius(c, unit);
  const rows: ChartTableRow[] = [
    ...data.primary.points.map((p) => ({ at: Date.parse(p.at), value: t(p.tempC), source: 'primary' as const })),
    ...data.primary.buckets.map((b) => ({ at: Date.parse(b.at), min: t(b.minC), max: t(b.maxC), source: 'primary' as const })),
    ...data.backup.points.map((p) => ({ at: Date.parse(p.at), value: t(p.tempC), source: 'backup' as const })),
    ...data.backup.buckets.map((b) => ({ at: Date.parse(b.at), min: t(b.minC), max: t(b.maxC), source: 'backup' as const })),
  ];
  return rows.sort((a, b) => a.at - b.at);
}
