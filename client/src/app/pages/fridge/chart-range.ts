// The chart's time range: a day, week, month or year ending at a moment, or any range the user picks.

export type RangeSpan = 'day' | 'week' | 'month' | 'year' | 'custom';

export interface ChartRange {
  span: RangeSpan;
  from: Date;
  to: Date;
}

const DAY_MS = 86_400_000;

export const spanLabels: Record<RangeSpan, string> = { day: 'Day', week: 'Week', month: 'Month', year: 'Year', custom: 'Range' };

const spanMs = (span: Exclude<RangeSpan, 'custom'>) => ({ day: DAY_MS, week: 7 * DAY_MS, month: 30 * DAY_MS, year: 365 * DAY_MS })[span];

/**
 * The span ending at `to`, rounded up to the whole minute: people opening the same fridge within a minute ask for the
 * same range, which the server then serves from its cache (no reading lies in the future, so nothing changes).
 */
export function rangeEnding(span: Exclude<RangeSpan, 'custom'>, to: Date): ChartRange {
  const end = new Date(Math.ceil(to.getTime() / 60_000) * 60_000);
  return { span, from: new Date(end.getTime() - spanMs(span)), to: end };
}

/** Moves a range back (−1) or forward (+1) by its own length. */
export function shiftRange(range: ChartRange, direction: -1 | 1): ChartRange {
  const length = range.to.getTime() - range.from.getTime();
  return { span: range.span, from: new Date(range.from.getTime() + direction * length), to: new Date(range.to.getTime() + direction * length) };
}
