// Writes a reconciled excursion plan: updates, new records (follow-ups included), removals, links to files, audit.
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import type { ExcursionPlan } from '../../shared/fridges/reconcile-excursions.js';
import type { Excursion as ComputedExcursion } from '../../shared/logs/excursion.js';
import type { CelsiusLimits } from '../../shared/temperature/temperature-range.js';
import { Excursion } from '../../database/models/index.js';
import { recordAudit } from '../audit/record-audit.js';

export interface AppliedPlan {
  opened: number[];
  updated: number[];
  removed: number[];
}

interface PlanContext {
  fridgeId: number;
  plan: ExcursionPlan;
  limits: CelsiusLimits;
  backupMinutes: (excursion: ComputedExcursion) => number;
  actorId: number | null;
}

function figures(e: ComputedExcursion, backupMinutes: number, limits: CelsiusLimits) {
  return {
    kind: e.kind,
    startsAt: new Date(e.start),
    endsAt: new Date(e.end),
    minutes: e.minutes,
    peakC: e.peakC,
    degreeMinutesC: e.degreeMinutesC,
    openEnded: e.openEnded,
    backupMinutes,
    lowC: limits.lowC,
    highC: limits.highC,
  };
}

function unchanged(row: Excursion, next: ReturnType<typeof figures>): boolean {
  return (
    row.startsAt.getTime() === next.startsAt.getTime() &&
    row.endsAt.getTime() === next.endsAt.getTime() &&
    Math.abs((row.minutes ?? 0) - next.minutes) < 1e-6 &&
    Math.abs(row.peakC - next.peakC) < 1e-4 &&
    Math.abs((row.degreeMinutesC ?? 0) - next.degreeMinutesC) < 1e-4 &&
    row.openEnded === next.openEnded &&
    Math.abs(row.backupMinutes - next.backupMinutes) < 1e-6 &&
    Math.abs(row.lowC - next.lowC) < 1e-9 &&
    Math.abs(row.highC - next.highC) < 1e-9
  );
}

export async function applyExcursionPlan(sequelize: Sequelize, transaction: Transaction, context: PlanContext): Promise<AppliedPlan> {
  const { fridgeId, plan, limits, actorId } = context;
  const applied: AppliedPlan = { opened: [], updated: [], removed: [] };
  for (const id of plan.deletes) {
    const row = await Excursion.findByPk(id, { transaction });
    if (!row) continue;
    await row.destroy({ transaction });
    await recordAudit({ actorId, action: 'excursion.remove', entity: 'excursion', entityId: id, before: row.toJSON() }, transaction);
    applied.removed.push(id);
  }
  for (const update of plan.updates) {
    const row = await Excursion.findByPk(update.id, { transaction });
    if (!row) continue;
    const next = figures(update.excursion, context.backupMinutes(update.excursion), limits);
    if (unchanged(row, next) && row.followUpOfId === update.followUpOfId) continue;
    const before = row.toJSON();
    await row.update({ ...next, followUpOfId: update.followUpOfId }, { transaction });
    await recordAudit({ actorId, action: 'excursion.recompute', entity: 'excursion', entityId: row.id, before, after: row.toJSON() }, transaction);
    applied.updated.push(row.id);
  }
  for (const insert of plan.inserts) {
    const row = await Excursion.create(
      { fridgeId, source: 'readings', ...figures(insert.excursion, context.backupMinutes(insert.excursion), limits), followUpOfId: insert.followUpOfId, dailyCheckId: null },
      { transaction },
    );
    const action = insert.followUpOfId ? 'excursion.follow-up' : 'excursion.open';
    await recordAudit({ actorId, action, entity: 'excursion', entityId: row.id, after: row.toJSON() }, transaction);
    applied.opened.push(row.id);
  }
  await linkSourceFiles(sequelize, transaction, [...applied.opened, ...applied.updated]);
  return applied;
}

/** An excursion came from every file of its fridge's loggers whose readings span part of it. */
export async function linkSourceFiles(sequelize: Sequelize, transaction: Transaction, excursionIds: number[]): Promise<void> {
  if (!excursionIds.length) return;
  await sequelize.query('DELETE FROM excursion_imports WHERE excursion_id IN (:ids)', { replacements: { ids: excursionIds }, type: QueryTypes.DELETE, transaction });
  await sequelize.query(
    `INSERT INTO excursion_imports (excursion_id, log_import_id)
     SELECT e.id, i.id FROM excursions e
       JOIN loggers l ON l.fridge_id = e.fridge_id
       JOIN log_imports i ON i.logger_id = l.id AND i.first_at < e.ends_at AND i.last_at >= e.starts_at
     WHERE e.id IN (:ids)`,
    { replacements: { ids: excursionIds }, type: QueryTypes.INSERT, transaction },
  );
}
