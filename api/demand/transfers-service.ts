// Planned transfers: purchasing earmarks spare vials of another site's lot for a short site; storage staff move them.
import { Op } from 'sequelize';
import { Fridge, Lot, PlannedTransfer, Site, StockBalance } from '../../database/models/index.js';
import type { PlannedTransferInput, PlannedTransferView } from '../../shared/demand/demand-schemas.js';
import type { AppContext } from '../app-context.js';
import { recordAudit } from '../audit/record-audit.js';
import { siteToday } from '../flocks/site-today.js';
import { canSeeSite } from '../http/access.js';
import { AppError } from '../http/app-error.js';
import { loadTransferViews } from './transfer-view.js';

export async function siteOfTransfer(id: number): Promise<number | null> {
  return (await PlannedTransfer.findByPk(id, { attributes: ['toSiteId'] }))?.toSiteId ?? null;
}

export async function planTransfer(context: AppContext, user: Express.User, toSiteId: number, input: PlannedTransferInput): Promise<PlannedTransferView> {
  const id = await context.sequelize.transaction(async (transaction) => {
    const toSite = await Site.findByPk(toSiteId, { transaction });
    if (!toSite) throw AppError.notFound('No such site.');
    const fromSite = await Site.findByPk(input.fromSiteId, { transaction });
    if (!fromSite || !canSeeSite(user, fromSite.id)) throw AppError.badRequest('No such site.', [{ field: 'fromSiteId', message: 'Unknown site.' }]);
    if (fromSite.id === toSiteId) throw AppError.badRequest('A transfer goes to another site.', [{ field: 'fromSiteId', message: 'Choose another site.' }]);
    if (input.plannedOn < siteToday(toSite)) throw AppError.badRequest('Plan the transfer for today or later.', [{ field: 'plannedOn', message: 'Not in the past.' }]);
    const lot = await Lot.findByPk(input.lotId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!lot) throw AppError.badRequest('No such lot.', [{ field: 'lotId', message: 'Unknown lot.' }]);
    const fridges = await Fridge.findAll({ where: { siteId: fromSite.id }, attributes: ['id'], transaction });
    const onHand = (await StockBalance.sum('vials', { where: { lotId: lot.id, fridgeId: { [Op.in]: fridges.map((f) => f.id) } }, transaction })) ?? 0;
    const promised = (await PlannedTransfer.sum('vials', { where: { lotId: lot.id, fromSiteId: fromSite.id, status: 'planned' }, transaction })) ?? 0;
    if (input.vials > onHand - promised) {
      throw AppError.conflict(`${fromSite.name} holds ${onHand} vials of lot ${lot.lotNumber}, ${promised} already planned to move.`, [
        { field: 'vials', message: `At most ${Math.max(0, onHand - promised)} vials.` },
      ]);
    }
    const transfer = await PlannedTransfer.create({ ...input, toSiteId, createdBy: user.id }, { transaction });
    await recordAudit({ actorId: user.id, action: 'planned_transfer.create', entity: 'planned_transfer', entityId: transfer.id, after: transfer.get({ plain: true }) }, transaction);
    return transfer.id;
  });
  return (await loadTransferViews({ id }))[0]!;
}

/** Closes a planned transfer: done once storage staff moved the vials, or cancelled. */
export async function closeTransfer(context: AppContext, actorId: number, id: number, status: 'done' | 'cancelled'): Promise<PlannedTransferView> {
  await context.sequelize.transaction(async (transaction) => {
    const transfer = await PlannedTransfer.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
    if (!transfer) throw AppError.notFound('No such planned transfer.');
    if (transfer.status !== 'planned') throw AppError.conflict(`This transfer is already ${transfer.status}.`);
    const before = transfer.get({ plain: true });
    await transfer.update({ status }, { transaction });
    await recordAudit({ actorId, action: `planned_transfer.${status === 'done' ? 'done' : 'cancel'}`, entity: 'planned_transfer', entityId: id, before, after: transfer.get({ plain: true }) }, transaction);
  });
  return (await loadTransferViews({ id }))[0]!;
}
