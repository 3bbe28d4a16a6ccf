// Purchase orders entered by hand: listed per visible site, created and changed while open, cancelled.
import { Op, type Transaction, type WhereOptions } from 'sequelize';
import { Presentation, PurchaseOrder, PurchaseOrderLine, Supplier } from '../../database/models/index.js';
import type { PurchaseOrderInput, PurchaseOrderStatus, PurchaseOrderView } from '../../shared/receiving/purchase-order-schemas.js';
import type { AppContext } from '../app-context.js';
import { recordAudit } from '../audit/record-audit.js';
import { AppError } from '../http/app-error.js';
import { purchaseOrderIncludes, toPurchaseOrderView } from './purchase-order-view.js';

export async function siteOfPurchaseOrder(id: number): Promise<number | null> {
  return (await PurchaseOrder.findByPk(id, { attributes: ['siteId'] }))?.siteId ?? null;
}

export function visibleSitesWhere(user: Express.User, siteId?: number): WhereOptions {
  if (siteId !== undefined) return { siteId: user.allSites || user.siteIds.includes(siteId) ? siteId : -1 };
  return user.allSites ? {} : { siteId: user.siteIds };
}

export async function listPurchaseOrders(user: Express.User, query: { status?: PurchaseOrderStatus; siteId?: number }): Promise<PurchaseOrderView[]> {
  const orders = await PurchaseOrder.findAll({
    where: { ...visibleSitesWhere(user, query.siteId), ...(query.status && { status: query.status }) },
    include: purchaseOrderIncludes,
    order: [['expectedDate', 'DESC'], ['id', 'DESC']],
    limit: 200,
  });
  return orders.map((order) => toPurchaseOrderView(order));
}

/** Open orders due today or overdue, and those expected within the coming week, on the user's sites. */
export async function listExpectedOrders(user: Express.User, siteId?: number): Promise<PurchaseOrderView[]> {
  const horizon = new Date(Date.now() + 8 * 86_400_000).toISOString().slice(0, 10);
  const orders = await PurchaseOrder.findAll({
    where: { ...visibleSitesWhere(user, siteId), status: 'open', expectedDate: { [Op.lte]: horizon } },
    include: purchaseOrderIncludes,
    order: [['expectedDate', 'ASC'], ['id', 'ASC']],
  });
  return orders.map((order) => toPurchaseOrderView(order));
}

export async function loadPurchaseOrderView(id: number, transaction?: Transaction): Promise<PurchaseOrderView> {
  const order = await PurchaseOrder.findByPk(id, { include: purchaseOrderIncludes, transaction });
  if (!order) throw AppError.notFound('No such purchase order.');
  return toPurchaseOrderView(order);
}

async function assertReferences(input: PurchaseOrderInput, exceptId: number | null, transaction: Transaction): Promise<void> {
  if (!(await Supplier.findByPk(input.supplierId, { transaction }))) {
    throw AppError.badRequest('No such supplier.', [{ field: 'supplierId', message: 'Unknown supplier.' }]);
  }
  const ids = [...new Set(input.lines.map((line) => line.presentationId))];
  const found = new Set((await Presentation.findAll({ where: { id: ids }, attributes: ['id'], transaction })).map((p) => p.id));
  const missing = input.lines.findIndex((line) => !found.has(line.presentationId));
  if (missing >= 0) throw AppError.badRequest('No such presentation.', [{ field: `lines.${missing}.presentationId`, message: 'Unknown presentation.' }]);
  const clash = await PurchaseOrder.findOne({ where: { reference: input.reference }, transaction });
  if (clash && clash.id !== exceptId) throw AppError.conflict('Another order has this number.', [{ field: 'reference', message: 'Already in use.' }]);
}

async function writeLines(orderId: number, input: PurchaseOrderInput, transaction: Transaction): Promise<void> {
  await PurchaseOrderLine.destroy({ where: { purchaseOrderId: orderId }, transaction });
  await PurchaseOrderLine.bulkCreate(
    input.lines.map((line, index) => ({ purchaseOrderId: orderId, lineNo: index + 1, presentationId: line.presentationId, packs: line.packs })),
    { transaction },
  );
}

export async function createPurchaseOrder(context: AppContext, actorId: number, siteId: number, input: PurchaseOrderInput): Promise<PurchaseOrderView> {
  return context.sequelize.transaction(async (transaction) => {
    await assertReferences(input, null, transaction);
    const { lines: _lines, ...fields } = input;
    const order = await PurchaseOrder.create({ ...fields, siteId, createdBy: actorId }, { transaction });
    await writeLines(order.id, input, transaction);
    const view = await loadPurchaseOrderView(order.id, transaction);
    await recordAudit({ actorId, action: 'purchase_order.create', entity: 'purchase_order', entityId: order.id, after: view }, transaction);
    return view;
  });
}

async function lockOpenOrder(id: number, transaction: Transaction): Promise<PurchaseOrder> {
  const order = await PurchaseOrder.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
  if (!order) throw AppError.notFound('No such purchase order.');
  if (order.status !== 'open') throw AppError.conflict(`This order is ${order.status}; only open orders can change.`);
  return order;
}

export async function updatePurchaseOrder(context: AppContext, actorId: number, id: number, input: PurchaseOrderInput): Promise<PurchaseOrderView> {
  return context.sequelize.transaction(async (transaction) => {
    const order = await lockOpenOrder(id, transaction);
    await assertReferences(input, id, transaction);
    const before = await loadPurchaseOrderView(id, transaction);
    const { lines: _lines, ...fields } = input;
    await order.update(fields, { transaction });
    await writeLines(id, input, transaction);
    const after = await loadPurchaseOrderView(id, transaction);
    await recordAudit({ actorId, action: 'purchase_order.update', entity: 'purchase_order', entityId: id, before, after }, transaction);
    return after;
  });
}

export async function cancelPurchaseOrder(context: AppContext, actorId: number, id: number): Promise<PurchaseOrderView> {
  return context.sequelize.transaction(async (transaction) => {
    const order = await lockOpenOrder(id, transaction);
    await order.update({ status: 'cancelled' }, { transaction });
    const after = await loadPurchaseOrderView(id, transaction);
    await recordAudit({ actorId, action: 'purchase_order.cancel', entity: 'purchase_order', entityId: id, after }, transaction);
    return after;
  });
}
