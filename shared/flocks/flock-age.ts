// A flock's age follows from its hatch date: day 0 is the hatch day; weeks are whole weeks completed.
import { daysBetween, type IsoDate } from '../planning/iso-date.js';

export function ageInDays(hatchDate: IsoDate, on: IsoDate): number {
  return daysBetween(hatchDate, on);
}

/** "6 weeks 3 days", "day 4", or "hatches in 2 days" before the hatch date. */
export function ageLabel(days: number): string {
  if (days < 0) return `hatches in ${-days} day${days === -1 ? '' : 's'}`;
  if (days < 7) return `day ${days}`;
  const weeks = Math.floor(days / 7);
  const rest = days % 7;
  return `${weeks} week${weeks === 1 ? '' : 's'}${rest ? ` ${rest} day${rest === 1 ? '' : 's'}` : ''}`;
}
