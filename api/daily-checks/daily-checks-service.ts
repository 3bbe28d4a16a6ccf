// Daily checks: record one (an out-of-range value opens an excursion record) and list a fridge's checks.
import { Op, type Sequelize } from 'sequelize';
import { checkExcursions } from '../../shared/fridges/check-out-of-range.js';
import type { DailyCheckInput, DailyCheckView } from '../../shared/fridges/daily-check-schemas.js';
import { toCelsius } from '../../shared/temperature/convert-temperature.js';
import { DailyCheck, Excursion, Fridge, User } from '../../database/models/index.js';
import { recordAudit } from '../audit/record-audit.js';
import { fridgeLimits } from '../fridges/fridge-view.js';
import { AppError } from '../http/app-error.js';
import { openDailyCheckHolds } from '../holds/exposure-holds.js';

type CheckRow = DailyCheck & { recorder?: User };

function toView(row: CheckRow, fridge: Fridge, excursionId: number | null): DailyCheckView {
  const crossed = checkExcursions({ currentC: row.currentC, minC: row.minC, maxC: row.maxC }, fridgeLimits(fridge));
  return {
    id: row.id,
    fridgeId: row.fridgeId,
    checkedAt: row.checkedAt.toISOString(),
    currentC: row.currentC,
    minC: row.minC,
    maxC: row.maxC,
    enteredUnit: row.enteredUnit,
    initials: row.initials,
    note: row.note,
    recordedBy: row.recorder?.name ?? '',
    outOfRange: crossed.length > 0,
    excursionId,
  };
}

/** A check may be written down a little after it was made, never for a time still to come. */
const FUTURE_SLACK_MS = 5 * 60_000;

export async function recordDailyCheck(sequelize: Sequelize, actorId: number, input: DailyCheckInput): Promise<DailyCheckView> {
  const checkedAt = input.checkedAt ? new Date(input.checkedAt) : new Date();
  if (checkedAt.getTime() > Date.now() + FUTURE_SLACK_MS) {
    throw AppError.badRequest('A check cannot be recorded for a time still to come.', [{ field: 'checkedAt', message: 'In the future.' }]);
  }
  const c = (value: number | null) => (value === null ? null : toCelsius(value, input.unit));
  return sequelize.transaction(async (transaction) => {
    const fridge = await Fridge.findByPk(input.fridgeId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!fridge) throw AppError.badRequest('No such fridge.', [{ field: 'fridgeId', message: 'Unknown fridge.' }]);
    const row = await DailyCheck.create(
      { fridgeId: fridge.id, checkedAt, currentC: c(input.current)!, minC: c(input.min), maxC: c(input.max), enteredUnit: input.unit, initials: input.initials, note: input.note, recordedBy: actorId },
      { transaction },
    );
    await recordAudit({ actorId, action: 'daily-check.create', entity: 'daily_check', entityId: row.id, after: row.toJSON() }, transaction);
    const limits = fridgeLimits(fridge);
    let excursionId: number | null = null;
    for (const crossed of checkExcursions({ currentC: row.currentC, minC: row.minC, maxC: row.maxC }, limits)) {
      const excursion = await Excursion.create(
        { fridgeId: fridge.id, source: 'daily_check', kind: crossed.kind, startsAt: checkedAt, endsAt: checkedAt, minutes: null, peakC: crossed.peakC, degreeMinutesC: null, lowC: limits.lowC, highC: limits.highC, followUpOfId: null, dailyCheckId: row.id },
        { transaction },
      );
      await recordAudit({ actorId, action: 'excursion.open', entity: 'excursion', entityId: excursion.id, after: excursion.toJSON() }, transaction);
      excursionId ??= excursion.id;
    }
    await openDailyCheckHolds(sequelize, transaction, fridge, row, actorId);
    const recorder = await User.findByPk(actorId, { transaction });
    return toView(Object.assign(row, { recorder: recorder ?? undefined }), fridge, excursionId);
  });
}

export async function listDailyChecks(fridgeId: number, range: { from: Date; to: Date }): Promise<DailyCheckView[]> {
  const fridge = await Fridge.findByPk(fridgeId);
  if (!fridge) throw AppError.notFound('No such fridge.');
  const rows: CheckRow[] = await DailyCheck.findAll({
    where: { fridgeId, checkedAt: { [Op.gte]: range.from, [Op.lt]: range.to } },
    include: [{ model: User, as: 'recorder', attributes: ['id', 'name'] }],
    order: [['checkedAt', 'DESC']],
    limit: 1000,
  });
  const excursions = rows.length ? await Excursion.findAll({ where: { dailyCheckId: rows.map((r) => r.id) }, attributes: ['id', 'dailyCheckId'] }) : [];
  return rows.map((row) => toView(row, fridge, excursions.find((e) => e.dailyCheckId === row.id)?.id ?? null));
}
