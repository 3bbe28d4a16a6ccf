// Automatic excursion and freeze holds: after a fridge's excursions are (re)computed, each lot that had vials there
// while a reading crossed its own product's range (or reached 0 °C, for a freeze-sensitive product) is held, in the
// same transaction. The exposure events behind the holds are kept: a recompute updates an undecided one, opens a
// follow-up beside a decided one, and never deletes one (its holds stay in the queue with their figures).
import { Op, QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import { reconcileExcursions, type StoredExcursion } from '../../shared/fridges/reconcile-excursions.js';
import {
  groupCheckCrossings, groupRuns, judgedGroups, lotsPresent, mkt24hEndingAt, type JudgedGroup,
} from '../../shared/exposure/product-exposure-runs.js';
import type { Excursion as ComputedExcursion } from '../../shared/logs/excursion.js';
import type { TimedReading } from '../../shared/logs/reading-durations.js';
import type { CelsiusLimits } from '../../shared/temperature/temperature-range.js';
import { Excursion, ExposureEvent, type DailyCheck, type Fridge } from '../../database/models/index.js';
import { recordAudit } from '../audit/record-audit.js';
import { fridgeLimits } from '../fridges/fridge-view.js';
import { openHold } from '../lots/holds.js';
import { judgedLotsOfFridge } from './judged-lots.js';
import { exposureReason } from './exposure-reason.js';

export const exposureSourceKind = 'exposure_event';

/** The range an event's lots were judged by, as stored: freezing is kept as 0 °C on both ends. */
function storedLimits(group: JudgedGroup): CelsiusLimits {
  return group.cause === 'freeze' ? { lowC: 0, highC: 0 } : group.limits;
}

async function decidedEventIds(sequelize: Sequelize, transaction: Transaction, ids: number[]): Promise<Set<number>> {
  if (!ids.length) return new Set();
  const rows = await sequelize.query<{ source_id: number }>(
    `SELECT DISTINCT h.source_id FROM holds h JOIN hold_decisions d ON d.hold_id = h.id
      WHERE h.source_kind = :kind AND h.source_id IN (:ids)`,
    { replacements: { kind: exposureSourceKind, ids }, type: QueryTypes.SELECT, transaction },
  );
  return new Set(rows.map((r) => r.source_id));
}

/** The fridge's own excursion record the event met, if any (same side, overlapping). */
async function fridgeExcursionId(transaction: Transaction, fridgeId: number, run: { kind: string; start: number; end: number }, source: 'readings' | 'daily_check'): Promise<number | null> {
  const row = await Excursion.findOne({
    where: { fridgeId, source, kind: run.kind, startsAt: { [Op.lte]: new Date(run.end) }, endsAt: { [Op.gte]: new Date(run.start) } },
    order: [['id', 'DESC']],
    transaction,
  });
  return row?.id ?? null;
}

export interface ExposureHoldContext {
  fridge: Fridge;
  /** The fridge's readings as the recompute judged them (backup filling the primary's gaps), in time order. */
  readings: readonly TimedReading[];
  window: { start: number; end: number };
  actorId: number | null;
}

export async function openExposureHolds(sequelize: Sequelize, transaction: Transaction, context: ExposureHoldContext): Promise<number[]> {
  const { fridge, readings, window } = context;
  const lots = (await judgedLotsOfFridge(sequelize, transaction, fridge.id)).filter((lot) => lot.stays.some((s) => s.fridgeId === fridge.id));
  if (!lots.length || readings.length < 2) return [];
  const alarm = fridgeLimits(fridge);
  const held: number[] = [];
  for (const group of judgedGroups(lots)) {
    const runs = groupRuns(readings, group, fridge.id, window);
    if (!runs.length) continue;
    const limits = storedLimits(group);
    const reach = runs.reduce((r, s) => ({ start: Math.min(r.start, s.start), end: Math.max(r.end, s.end) }), window);
    const stored = await ExposureEvent.findAll({
      where: { fridgeId: fridge.id, source: 'readings', cause: group.cause, startsAt: { [Op.lte]: new Date(reach.end) }, endsAt: { [Op.gte]: new Date(reach.start) } },
      transaction,
    }).then((rows) => rows.filter((row) => Math.abs(row.lowC - limits.lowC) < 1e-6 && Math.abs(row.highC - limits.highC) < 1e-6));
    const decided = await decidedEventIds(sequelize, transaction, stored.map((s) => s.id));
    const views: StoredExcursion[] = stored.map((row) => ({
      id: row.id, kind: row.kind, start: row.startsAt.getTime(), end: row.endsAt.getTime(), minutes: row.minutes ?? 0, peakC: row.peakC,
      status: decided.has(row.id) ? 'decided' : 'open', followUpOfId: row.followUpOfId,
    }));
    // Undecided records the data no longer shows are kept (the plan's deletes are ignored): their holds are records.
    const plan = reconcileExcursions(runs, views);
    const figures = async (run: ComputedExcursion) => ({
      kind: run.kind, startsAt: new Date(run.start), endsAt: new Date(run.end), minutes: run.minutes, peakC: run.peakC,
      degreeMinutesC: run.degreeMinutesC, openEnded: run.openEnded, mkt24hC: mkt24hEndingAt(readings, run.end),
      excursionId: await fridgeExcursionId(transaction, fridge.id, run, 'readings'),
      fridgeLowC: alarm.lowC, fridgeHighC: alarm.highC,
    });
    const events: { id: number; run: ComputedExcursion }[] = [];
    for (const update of plan.updates) {
      const row = stored.find((s) => s.id === update.id)!;
      const before = row.toJSON();
      await row.update({ ...(await figures(update.excursion)), followUpOfId: update.followUpOfId }, { transaction });
      await recordAudit({ actorId: context.actorId, action: 'exposure-event.recompute', entity: 'exposure_event', entityId: row.id, before, after: row.toJSON() }, transaction);
      events.push({ id: row.id, run: update.excursion });
    }
    for (const insert of plan.inserts) {
      const row = await ExposureEvent.create(
        { fridgeId: fridge.id, cause: group.cause, source: 'readings', ...(await figures(insert.excursion)), lowC: limits.lowC, highC: limits.highC, dailyCheckId: null, followUpOfId: insert.followUpOfId },
        { transaction },
      );
      await recordAudit({ actorId: context.actorId, action: 'exposure-event.open', entity: 'exposure_event', entityId: row.id, after: row.toJSON() }, transaction);
      events.push({ id: row.id, run: insert.excursion });
    }
    for (const { id, run } of events) {
      for (const lotId of lotsPresent(group.lots, fridge.id, run.start, run.end)) {
        const lot = lots.find((l) => l.lotId === lotId)!;
        const reason = exposureReason({ cause: group.cause, kind: run.kind, fridgeName: fridge.name, range: lot.range, peakC: run.peakC, minutes: run.minutes });
        const holdId = await openHold({ lotId, cause: group.cause, sourceKind: exposureSourceKind, sourceId: id, reason, openedBy: null }, transaction);
        if (holdId !== null) held.push(holdId);
      }
    }
  }
  return held;
}

/** A daily check whose values cross a present lot's own range (or reach 0 °C) holds it: one value seen, no duration. */
export async function openDailyCheckHolds(sequelize: Sequelize, transaction: Transaction, fridge: Fridge, check: DailyCheck, actorId: number): Promise<number[]> {
  const at = check.checkedAt.getTime();
  const lots = (await judgedLotsOfFridge(sequelize, transaction, fridge.id)).filter((lot) => lotsPresent([lot], fridge.id, at, at).length);
  const alarm = fridgeLimits(fridge);
  const held: number[] = [];
  for (const group of judgedGroups(lots)) {
    for (const crossed of groupCheckCrossings({ currentC: check.currentC, minC: check.minC, maxC: check.maxC }, group)) {
      const limits = storedLimits(group);
      const row = await ExposureEvent.create(
        {
          fridgeId: fridge.id, cause: group.cause, source: 'daily_check', kind: crossed.kind, startsAt: check.checkedAt, endsAt: check.checkedAt,
          minutes: null, peakC: crossed.peakC, degreeMinutesC: null, mkt24hC: null, lowC: limits.lowC, highC: limits.highC,
          fridgeLowC: alarm.lowC, fridgeHighC: alarm.highC, excursionId: await fridgeExcursionId(transaction, fridge.id, { kind: crossed.kind, start: at, end: at }, 'daily_check'),
          dailyCheckId: check.id, followUpOfId: null,
        },
        { transaction },
      );
      await recordAudit({ actorId, action: 'exposure-event.open', entity: 'exposure_event', entityId: row.id, after: row.toJSON() }, transaction);
      for (const lotId of lotsPresent(group.lots, fridge.id, at, at)) {
        const lot = lots.find((l) => l.lotId === lotId)!;
        const reason = exposureReason({ cause: group.cause, kind: crossed.kind, fridgeName: fridge.name, range: lot.range, peakC: crossed.peakC, minutes: null });
        const holdId = await openHold({ lotId, cause: group.cause, sourceKind: exposureSourceKind, sourceId: row.id, reason, openedBy: null }, transaction);
        if (holdId !== null) held.push(holdId);
      }
    }
  }
  return held;
}
