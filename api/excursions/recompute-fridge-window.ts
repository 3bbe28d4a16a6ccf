// Recomputes a fridge's excursions, gaps and backup fills over the window new data touched, and stores the result.
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import { reconcileExcursions, type StoredExcursion } from '../../shared/fridges/reconcile-excursions.js';
import { excursionsAndGaps } from '../../shared/logs/excursions-and-gaps.js';
import type { Excursion as ComputedExcursion } from '../../shared/logs/excursion.js';
import type { LogGap } from '../../shared/logs/log-gap.js';
import { mergeBackupReadings, type MergedReading } from '../../shared/logs/merge-backup-readings.js';
import type { TimedReading } from '../../shared/logs/reading-durations.js';
import { Excursion, Fridge, Logger } from '../../database/models/index.js';
import { fridgeLimits } from '../fridges/fridge-view.js';
import { loadFridgeReadings, type FridgeReadings } from '../readings/load-fridge-readings.js';
import { applyExcursionPlan, type AppliedPlan } from './apply-excursion-plan.js';
import { findRecomputeWindow } from './find-recompute-window.js';
import { openExposureHolds } from '../holds/exposure-holds.js';

/** Readings loaded beyond the window on each side, so the readings at its edges are judged in context. */
const CONTEXT_MS = 24 * 3_600_000;

export interface RecomputeOptions {
  actorId: number | null;
  /** Readings the caller already holds for one logger over [from, to]; saves reading them back. */
  known?: { loggerId: number; from: number; to: number; readings: readonly TimedReading[] };
}

const overlaps = (a: { start: number; end: number }, w: { start: number; end: number }) => a.start <= w.end && a.end >= w.start;

function backupMinutes(excursion: ComputedExcursion, readings: readonly MergedReading[]): number {
  let ms = 0;
  for (const r of readings) if (r.fromBackup && r.at >= excursion.start && r.at < excursion.end) ms += r.standsForMs ?? 0;
  return ms / 60_000;
}

/** The caller holds a lock on the fridge row, so two recomputes of one fridge never interleave. */
export async function recomputeFridgeWindow(
  sequelize: Sequelize,
  transaction: Transaction,
  fridgeId: number,
  span: { start: number; end: number },
  options: RecomputeOptions,
): Promise<AppliedPlan> {
  const fridge = await Fridge.findByPk(fridgeId, { transaction });
  if (!fridge) throw new Error(`no fridge ${fridgeId}`);
  const loggers = (await Logger.findAll({ where: { fridgeId }, attributes: ['id', 'role'], transaction })).map((l) => ({ id: l.id, role: l.role }));
  const window = await findRecomputeWindow(sequelize, transaction, fridgeId, loggers.map((l) => l.id), span);
  const from = window.start - CONTEXT_MS;
  const to = window.end + CONTEXT_MS;
  const readings = await loadWindowReadings(transaction, loggers, from, to, options.known);

  const merged = mergeBackupReadings(readings.primary, readings.backup);
  const limits = fridgeLimits(fridge);
  const found = excursionsAndGaps(merged.readings, limits);
  const excursions = found.excursions.filter((e) => overlaps(e, window));
  const gaps = found.gaps.filter((g) => overlaps(g, window));
  const fills = merged.fills.filter((f) => overlaps(f, window));
  // The stored records replaced are those meeting the window or anything recomputed in it.
  const reach = [window, ...excursions, ...gaps, ...fills].reduce((r, s) => ({ start: Math.min(r.start, s.start), end: Math.max(r.end, s.end) }), window);

  const stored = await Excursion.findAll({
    where: { fridgeId, source: 'readings' },
    transaction,
  }).then((rows) => rows.filter((row) => overlaps({ start: row.startsAt.getTime(), end: row.endsAt.getTime() }, reach)));
  const storedViews: StoredExcursion[] = stored.map((row) => ({
    id: row.id,
    kind: row.kind,
    start: row.startsAt.getTime(),
    end: row.endsAt.getTime(),
    minutes: row.minutes ?? 0,
    peakC: row.peakC,
    status: row.status,
    followUpOfId: row.followUpOfId,
  }));
  const plan = reconcileExcursions(excursions, storedViews);
  const applied = await applyExcursionPlan(sequelize, transaction, {
    fridgeId,
    plan,
    limits,
    backupMinutes: (e) => backupMinutes(e, merged.readings),
    actorId: options.actorId,
  });
  await replaceSpans(sequelize, transaction, 'fridge_gaps', fridgeId, reach, gaps);
  await replaceSpans(sequelize, transaction, 'backup_fills', fridgeId, reach, fills);
  // Lots are judged by their own product's range, which may be narrower than the fridge's: holds follow from that.
  await openExposureHolds(sequelize, transaction, { fridge, readings: merged.readings, window: reach, actorId: options.actorId });
  return applied;
}

async function loadWindowReadings(
  transaction: Transaction,
  loggers: { id: number; role: 'primary' | 'backup' }[],
  from: number,
  to: number,
  known: RecomputeOptions['known'],
): Promise<FridgeReadings> {
  const knownLogger = known && loggers.find((l) => l.id === known.loggerId);
  if (!known || !knownLogger) return loadFridgeReadings(transaction, loggers, from, to);
  // The known logger's readings inside [known.from, known.to] are taken as given; only what lies around them is read back.
  const others = await loadFridgeReadings(transaction, loggers.filter((l) => l.id !== known.loggerId), from, to);
  const before = await loadFridgeReadings(transaction, [knownLogger], from, known.from - 1);
  const after = await loadFridgeReadings(transaction, [knownLogger], known.to + 1, to);
  const role = knownLogger.role;
  const own = [...before[role], ...known.readings.filter((r) => r.at >= from && r.at <= to), ...after[role]];
  const combined = mergeSorted(others[role], own);
  return role === 'primary' ? { primary: combined, backup: others.backup } : { primary: others.primary, backup: combined };
}

function mergeSorted<T extends { at: number }>(a: readonly T[], b: readonly T[]): readonly T[] {
  if (!a.length) return b;
  if (!b.length) return a;
  const out: T[] = [];
  let i = 0;
  // a and b are each sorted and free of repeats; where they meet on an instant the first is kept.
  let j = 0;
  while (i < a.length || j < b.length) {
    const next = j >= b.length || (i < a.length && a[i].at <= b[j].at) ? a[i++] : b[j++];
    if (!out.length || out[out.length - 1].at !== next.at) out.push(next);
  }
  return out;
}

async function replaceSpans(sequelize: Sequelize, transaction: Transaction, table: 'fridge_gaps' | 'backup_fills', fridgeId: number, reach: { start: number; end: number }, spans: LogGap[]): Promise<void> {
  await sequelize.query(`DELETE FROM ${table} WHERE fridge_id = :fridgeId AND starts_at <= :end AND ends_at >= :start`, {
    replacements: { fridgeId, start: new Date(reach.start).toISOString(), end: new Date(reach.end).toISOString() },
    type: QueryTypes.DELETE,
    transaction,
  });
  if (!spans.length) return;
  await sequelize.query(
    `INSERT INTO ${table} (fridge_id, starts_at, ends_at, minutes)
     SELECT :fridgeId, to_timestamp(s::float8 / 1000), to_timestamp(e::float8 / 1000), m FROM unnest(ARRAY[:starts]::bigint[], ARRAY[:ends]::bigint[], ARRAY[:minutes]::float8[]) AS t(s, e, m)`,
    { replacements: { fridgeId, starts: spans.map((s) => s.start), ends: spans.map((s) => s.end), minutes: spans.map((s) => s.minutes) }, type: QueryTypes.INSERT, transaction },
  );
}
