// Moves vials of a lot from one fridge to another (possibly another site): time out of a fridge over the
// product's limit opens a transfer hold; a planned transfer carried out this way is closed in the same transaction.
import { Fridge, Lot, PlannedTransfer, Presentation, Product } from '../../database/models/index.js';
import type { TransferInput } from '../../shared/lots/movement-schemas.js';
import { judgeTimeOut, timeOutReason } from '../../shared/lots/time-out.js';
import type { AppContext } from '../app-context.js';
import { recordAudit } from '../audit/record-audit.js';
import { canSeeSite } from '../http/access.js';
import { AppError } from '../http/app-error.js';
import { openHold } from './holds.js';
import { postMovement } from './stock-ledger.js';
import { checkMovementTimes } from './movement-times.js';

export interface TransferResult {
  movementId: number;
  timeOutMinutes: number;
  limitMinutes: number | null;
  holdOpened: boolean;
  plannedTransferId: number | null;
}

async function visibleFridge(user: Express.User, id: number, field: string, transaction: import('sequelize').Transaction): Promise<Fridge> {
  const fridge = await Fridge.findByPk(id, { transaction });
  if (!fridge || !canSeeSite(user, fridge.siteId)) throw AppError.badRequest('No such fridge on your sites.', [{ field, message: 'Unknown fridge.' }]);
  return fridge;
}

export async function transferVials(context: AppContext, user: Express.User, lotId: number, input: TransferInput, now = new Date()): Promise<TransferResult> {
  const leftAt = new Date(input.leftAt);
  const at = new Date(input.at);
  checkMovementTimes({ leftAt, at }, now);
  return context.sequelize.transaction(async (transaction) => {
    const lot = await Lot.findByPk(lotId, { include: [{ model: Presentation, as: 'presentation', include: [{ model: Product, as: 'product' }] }], transaction });
    const product = lot?.presentation?.product;
    if (!lot || !product) throw AppError.notFound('No such lot.');
    const from = await visibleFridge(user, input.fromFridgeId, 'fromFridgeId', transaction);
    const to = await visibleFridge(user, input.toFridgeId, 'toFridgeId', transaction);

    let planned: PlannedTransfer | null = null;
    if (input.plannedTransferId !== null) {
      planned = await PlannedTransfer.findByPk(input.plannedTransferId, { transaction, lock: transaction.LOCK.UPDATE });
      const field = [{ field: 'plannedTransferId', message: 'Not this lot\'s open transfer between these sites.' }];
      if (!planned || planned.lotId !== lotId || planned.fromSiteId !== from.siteId || planned.toSiteId !== to.siteId) {
        throw AppError.badRequest('That planned transfer is not for this lot between these sites.', field);
      }
      if (planned.status !== 'planned') throw AppError.conflict(`That planned transfer is already ${planned.status}.`, field);
    }

    // A transfer row-locks two balances; opposite transfers of one lot would lock them in opposite orders and
    // deadlock. Queuing on both fridges' keys, lowest first, makes them take turns instead.
    for (const fridgeId of [from.id, to.id].sort((a, b) => a - b)) {
      await context.sequelize.query('SELECT pg_advisory_xact_lock(:lotId, :fridgeId)', { replacements: { lotId, fridgeId }, transaction });
    }
    const movement = await postMovement(
      { lotId, kind: 'transfer', vials: input.vials, fromFridgeId: from.id, toFridgeId: to.id, leftAt, at, sourceKind: planned ? 'planned_transfer' : 'user', sourceId: planned?.id ?? null, reason: input.notes, recordedBy: user.id },
      transaction,
    );
    const judgement = judgeTimeOut(leftAt.getTime(), at.getTime(), product.timeOutLimitMinutes);
    if (judgement.over) {
      await openHold({ lotId, cause: 'transfer', sourceKind: 'stock_movement', sourceId: Number(movement.id), reason: timeOutReason(judgement), openedBy: null }, transaction);
    }
    if (planned) {
      const before = planned.get({ plain: true });
      await planned.update({ status: 'done' }, { transaction });
      await recordAudit({ actorId: user.id, action: 'planned_transfer.done', entity: 'planned_transfer', entityId: planned.id, before, after: planned.get({ plain: true }) }, transaction);
    }
    const result: TransferResult = {
      movementId: Number(movement.id),
      timeOutMinutes: judgement.minutes,
      limitMinutes: judgement.limitMinutes,
      holdOpened: judgement.over,
      plannedTransferId: planned?.id ?? null,
    };
    await recordAudit({ actorId: user.id, action: 'stock.transfer', entity: 'lot', entityId: lotId, after: { ...result, fromFridgeId: from.id, toFridgeId: to.id, vials: input.vials, leftAt: input.leftAt, at: input.at } }, transaction);
    return result;
  });
}
