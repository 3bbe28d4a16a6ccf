// One excursion, and the note of what was done about it (the veterinarian's review and decisions come later).
import type { Sequelize } from 'sequelize';
import type { ExcursionView } from '../../shared/fridges/excursion-view.js';
import { Excursion } from '../../database/models/index.js';
import { recordAudit } from '../audit/record-audit.js';
import { AppError } from '../http/app-error.js';
import { excursionViews } from './excursion-view.js';

export async function getExcursion(sequelize: Sequelize, id: number): Promise<ExcursionView> {
  const row = await Excursion.findByPk(id);
  if (!row) throw AppError.notFound('No such excursion.');
  return (await excursionViews(sequelize, [row]))[0];
}

export async function recordActionTaken(sequelize: Sequelize, actorId: number, id: number, actionTaken: string): Promise<ExcursionView> {
  await sequelize.transaction(async (transaction) => {
    const row = await Excursion.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
    if (!row) throw AppError.notFound('No such excursion.');
    const before = { actionTaken: row.actionTaken };
    await row.update({ actionTaken }, { transaction });
    await recordAudit({ actorId, action: 'excursion.action', entity: 'excursion', entityId: id, before, after: { actionTaken } }, transaction);
  });
  return getExcursion(sequelize, id);
}
