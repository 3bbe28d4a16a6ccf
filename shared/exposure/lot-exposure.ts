// What one lot lived through: minutes outside its own product's range, excursions with their 24-hour MKT, freezing,
// time out of a fridge, and time with no data (shown as unknown, never as fine).
import { meanKineticTemperatureC } from '../logs/mean-kinetic-temperature.js';
import { classifyTemperatureC } from '../temperature/classify-temperature.js';
import type { ExposureInput, LotExcursion, LotExposure, Segment, TimeOutExposure, UnknownStretch } from './exposure-types.js';
import { unionLengthMs } from './interval-union.js';
import { staySegments } from './stay-segments.js';

const minute = 60_000;
const day = 24 * 60 * minute;
/** "At or below 0 °C" for freeze-sensitive products; the tolerance only absorbs unit-conversion noise. */
const freezingC = 1e-9;

function mktOver(segments: readonly Segment[], from: number, to: number): number | null {
  const temps: number[] = [];
  const weights: number[] = [];
  for (const s of segments) {
    const w = Math.min(s.end, to) - Math.max(s.start, from);
    if (w > 0) {
      temps.push(s.tempC);
      weights.push(w);
    }
  }
  const mkt = meanKineticTemperatureC(temps, weights);
  return Number.isFinite(mkt) ? mkt : null;
}

/** Runs of segments on the same side of the range that follow each other without a break in time. */
function excursionRuns(segments: readonly Segment[], input: ExposureInput): LotExcursion[] {
  const runs: LotExcursion[] = [];
  let open: LotExcursion | undefined;
  for (const s of segments) {
    const side = classifyTemperatureC(s.tempC, input.limits);
    const continues = open && side === open.kind && s.start <= open.end;
    if (open && !continues) {
      runs.push(open);
      open = undefined;
    }
    if (side === 'in') continue;
    if (!open) {
      open = { kind: side, fridgeIds: [s.fridgeId], start: s.start, end: s.end, minutes: 0, peakC: s.tempC, mkt24hC: NaN };
    }
    open.end = Math.max(open.end, s.end);
    open.minutes += (s.end - s.start) / minute;
    open.peakC = side === 'high' ? Math.max(open.peakC, s.tempC) : Math.min(open.peakC, s.tempC);
    if (!open.fridgeIds.includes(s.fridgeId)) open.fridgeIds.push(s.fridgeId);
  }
  if (open) runs.push(open);
  return runs.map((run) => ({ ...run, mkt24hC: mktOver(segments, run.end - day, run.end) ?? NaN }));
}

function timeOutExposure(input: ExposureInput): TimeOutExposure[] {
  return (input.timeOut ?? []).map((out) => {
    const minutes = out.to === null ? null : (out.to - out.from) / minute;
    const limit = input.timeOutLimitMinutes;
    // Vials still out: a transfer in transit is not fine yet; issued vials still out were used, not stored.
    // Back in a fridge with no limit known for the product: nobody can call it fine, so it counts as over.
    const overLimit = minutes === null ? out.reason === 'transfer' : limit === null || minutes > limit;
    return { ...out, minutes, overLimit };
  });
}

export function lotExposure(input: ExposureInput): LotExposure {
  const segments: Segment[] = [];
  const unknown: UnknownStretch[] = [];
  for (const stay of input.stays) {
    const to = Math.min(stay.to ?? input.asOf, input.asOf);
    const cut = staySegments(stay.fridgeId, input.readings.get(stay.fridgeId) ?? [], stay.from, to);
    segments.push(...cut.segments);
    unknown.push(...cut.unknown);
  }
  segments.sort((a, b) => a.start - b.start || a.fridgeId - b.fridgeId);
  unknown.sort((a, b) => a.start - b.start);

  const above = segments.filter((s) => classifyTemperatureC(s.tempC, input.limits) === 'high');
  const below = segments.filter((s) => classifyTemperatureC(s.tempC, input.limits) === 'low');
  const frozen = input.freezeSensitive ? segments.filter((s) => s.tempC <= freezingC) : [];
  // A loop, not Math.min(...): a year of one-minute readings is too many arguments for a spread.
  let minC = Infinity;
  let maxC = -Infinity;
  for (const s of segments) {
    minC = Math.min(minC, s.tempC);
    maxC = Math.max(maxC, s.tempC);
  }
  const timeOut = timeOutExposure(input);
  const storage = input.stays.map((s) => ({ start: s.from, end: Math.min(s.to ?? input.asOf, input.asOf) }));
  const first = storage.length ? Math.min(...storage.map((s) => s.start)) : input.asOf;
  const last = storage.length ? Math.max(...storage.map((s) => s.end)) : input.asOf;

  return {
    storageMinutes: unionLengthMs(storage) / minute,
    minutesAbove: unionLengthMs(above) / minute,
    minutesBelow: unionLengthMs(below) / minute,
    minutesUnknown: unionLengthMs(unknown) / minute,
    minC: segments.length ? minC : null,
    maxC: segments.length ? maxC : null,
    mktStorageC: mktOver(segments, first, last),
    excursions: excursionRuns(segments, input),
    unknown,
    froze: frozen.length > 0,
    firstFreezeAt: frozen.length ? frozen[0].start : null,
    timeOut,
    minutesOutOfFridge: timeOut.reduce((sum, out) => sum + (out.minutes ?? 0), 0),
    arrivalExposureUnknown: input.arrivalOutOfRange === true,
  };
}
