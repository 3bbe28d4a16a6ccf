// One product's usable stock through the horizon: what is left after the vaccinations planned so far, in date, arrived.
import { addDays, type IsoDate } from '../planning/iso-date.js';
import type { LotStatus } from '../planning/plan-types.js';

export interface LevelLot {
  readonly id: number | string;
  readonly dosesPerVial: number;
  readonly vials: number;
  readonly expiry: IsoDate;
  readonly status: LotStatus;
  readonly availableFrom: IsoDate | null;
}

export interface Taking {
  readonly date: IsoDate;
  readonly lot: number | string;
  readonly vials: number;
}

export interface LevelPoint {
  readonly date: IsoDate;
  readonly doses: number;
}

/**
 * The level only changes on the days something happens, so it is measured on those days: today, each vaccination,
 * the day after each expiry, the day before each arrival, and the horizon's end.
 */
export function stockLevels(input: { today: IsoDate; horizonEnd: IsoDate; lots: readonly LevelLot[]; takings: readonly Taking[] }): LevelPoint[] {
  const { today, horizonEnd } = input;
  const within = (date: IsoDate) => date >= today && date <= horizonEnd;
  const dates = new Set<IsoDate>([today, horizonEnd]);
  for (const taking of input.takings) if (within(taking.date)) dates.add(taking.date);
  for (const lot of input.lots) {
    // An expiry past the horizon (stock on order has none yet) changes nothing inside it.
    if (lot.expiry < horizonEnd && within(addDays(lot.expiry, 1))) dates.add(addDays(lot.expiry, 1));
    if (lot.availableFrom !== null && within(addDays(lot.availableFrom, -1))) dates.add(addDays(lot.availableFrom, -1));
  }
  return [...dates].sort().map((date) => ({ date, doses: levelOn(date, input.lots, input.takings) }));
}

function levelOn(date: IsoDate, lots: readonly LevelLot[], takings: readonly Taking[]): number {
  return lots.reduce((sum, lot) => {
    if (lot.status !== 'usable' || lot.expiry < date || (lot.availableFrom !== null && lot.availableFrom > date)) return sum;
    const taken = takings.reduce((total, taking) => total + (taking.lot === lot.id && taking.date <= date ? taking.vials : 0), 0);
    return sum + (lot.vials - taken) * lot.dosesPerVial;
  }, 0);
}

/** The lowest point (the earliest of equal ones). */
export function lowestLevel(points: readonly LevelPoint[]): LevelPoint {
  if (!points.length) throw new RangeError('no stock levels to compare');
  return points.reduce((lowest, point) => (point.doses < lowest.doses ? point : lowest));
}

/** The first day the level is below the safety stock, or null. */
export function belowSafetyFrom(points: readonly LevelPoint[], safetyStockDoses: number): IsoDate | null {
  return points.find((point) => point.doses < safetyStockDoses)?.date ?? null;
}
