// Groups consecutive out-of-range readings into excursions; a gap ends one, since nothing is known across it.
import { classifyTemperatureC } from '../temperature/classify-temperature.js';
import type { CelsiusLimits } from '../temperature/temperature-range.js';
import type { Excursion } from './excursion.js';
import type { ReadingDurations, TimedReading } from './reading-durations.js';

interface OpenRun {
  kind: 'high' | 'low';
  start: number;
  end: number;
  ms: number;
  peakC: number;
  degreeMs: number;
}

export function findExcursions(
  readings: readonly TimedReading[],
  durations: ReadingDurations,
  limits: CelsiusLimits,
): Excursion[] {
  const excursions: Excursion[] = [];
  let run: OpenRun | undefined;
  const close = (openEnded: boolean) => {
    if (!run) return;
    const { kind, start, end, ms, peakC, degreeMs } = run;
    excursions.push({ kind, start, end, minutes: ms / 60_000, peakC, degreeMinutesC: degreeMs / 60_000, openEnded });
    run = undefined;
  };
  for (let i = 0; i < readings.length; i++) {
    const { at, tempC } = readings[i];
    const side = classifyTemperatureC(tempC, limits);
    if (side === 'in' || (run && run.kind !== side)) close(false);
    if (side !== 'in') {
      const ms = durations.durationsMs[i];
      const outside = side === 'high' ? tempC - limits.highC : limits.lowC - tempC;
      if (!run) run = { kind: side, start: at, end: at, ms: 0, peakC: tempC, degreeMs: 0 };
      run.end = at + ms;
      run.ms += ms;
      run.peakC = side === 'high' ? Math.max(run.peakC, tempC) : Math.min(run.peakC, tempC);
      run.degreeMs += outside * ms;
    }
    if (durations.gapAfter[i]) close(false);
  }
  close(true);
  return excursions;
}
