// The holds a demo logger file's warm spell will call for, opened beforehand at the moment the spell began. A hold's
// opened_at defaults to the time it is written (here: the seeding) and the application may never change it; the demo
// tells of loggers whose readings reach Vialyard as they are taken. The import that follows finds each event already
// recorded, takes it over with its own figures (the same rules on the same readings) and opens no hold twice.
import type { Sequelize } from 'sequelize';
import { recordAudit } from '../../api/audit/record-audit.js';
import { fridgeLimits } from '../../api/fridges/fridge-view.js';
import { exposureSourceKind } from '../../api/holds/exposure-holds.js';
import { exposureReason } from '../../api/holds/exposure-reason.js';
import { judgedLotsOfFridge } from '../../api/holds/judged-lots.js';
import { groupRuns, judgedGroups, lotsPresent, mkt24hEndingAt } from '../../shared/exposure/product-exposure-runs.js';
import type { TimedReading } from '../../shared/logs/reading-durations.js';
import { celsiusToFahrenheit, fahrenheitToCelsius } from '../../shared/temperature/convert-temperature.js';
import { ExposureEvent, Fridge, Hold } from '../models/index.js';
import { noticeHoldOpened } from './demo-hold-notice.js';

/** The readings as the import will store them: the file's one decimal in its own unit, kept as a 4-byte real. */
export function readingsAsStored(rows: readonly [number, number][], unit: 'F' | 'C'): TimedReading[] {
  const written = (c: number) => (unit === 'F' ? fahrenheitToCelsius(Number(celsiusToFahrenheit(c).toFixed(1))) : Number(c.toFixed(1)));
  return rows.map(([at, c]) => ({ at, tempC: Math.fround(written(c)) }));
}

/** Opens what `openExposureHolds` would for these readings, each hold dated from its event's start; returns the hold ids. */
export async function openHoldsAtSpellStart(sequelize: Sequelize, fridgeCode: string, readings: readonly TimedReading[], actorId: number | null): Promise<number[]> {
  const fridge = (await Fridge.findOne({ where: { code: fridgeCode } }))!;
  const window = { start: readings[0]!.at, end: readings[readings.length - 1]!.at };
  const alarm = fridgeLimits(fridge);
  return sequelize.transaction(async (transaction) => {
    const lots = (await judgedLotsOfFridge(sequelize, transaction, fridge.id)).filter((lot) => lot.stays.some((s) => s.fridgeId === fridge.id));
    const held: number[] = [];
    for (const group of judgedGroups(lots)) {
      const limits = group.cause === 'freeze' ? { lowC: 0, highC: 0 } : group.limits;
      for (const run of groupRuns(readings, group, fridge.id, window)) {
        const event = await ExposureEvent.create(
          {
            fridgeId: fridge.id, cause: group.cause, source: 'readings', kind: run.kind, startsAt: new Date(run.start), endsAt: new Date(run.end),
            minutes: run.minutes, peakC: run.peakC, degreeMinutesC: run.degreeMinutesC, openEnded: run.openEnded, mkt24hC: mkt24hEndingAt(readings, run.end),
            excursionId: null, fridgeLowC: alarm.lowC, fridgeHighC: alarm.highC, lowC: limits.lowC, highC: limits.highC, dailyCheckId: null, followUpOfId: null,
          },
          { transaction },
        );
        await recordAudit({ actorId, action: 'exposure-event.open', entity: 'exposure_event', entityId: event.id, after: event.toJSON() }, transaction);
        for (const lotId of lotsPresent(group.lots, fridge.id, run.start, run.end)) {
          const lot = lots.find((l) => l.lotId === lotId)!;
          const hold = {
            lotId, cause: group.cause, sourceKind: exposureSourceKind, sourceId: event.id, openedBy: null, openedAt: event.startsAt,
            reason: exposureReason({ cause: group.cause, kind: run.kind, fridgeName: fridge.name, range: lot.range, peakC: run.peakC, minutes: run.minutes }),
          };
          held.push((await Hold.create(hold, { transaction })).id);
          await noticeHoldOpened(transaction, hold);
        }
      }
    }
    return held;
  });
}
