// Whether and when each purchase order went to its supplier, from the sendings ledger.
import { PurchaseOrderSending } from '../../database/models/index.js';
import type { SentOrderView } from '../../shared/demand/sent-order-view.js';
import type { PurchaseOrderView } from '../../shared/receiving/purchase-order-schemas.js';

export async function withSendings(orders: PurchaseOrderView[]): Promise<SentOrderView[]> {
  const sendings = orders.length
    ? await PurchaseOrderSending.findAll({ where: { purchaseOrderId: orders.map((o) => o.id) }, order: [['sentAt', 'ASC'], ['id', 'ASC']] })
    : [];
  const last = new Map(sendings.map((s) => [s.purchaseOrderId, s]));
  return orders.map((order) => {
    const sending = last.get(order.id);
    return { ...order, lastSent: sending ? { at: sending.sentAt.toISOString(), to: sending.sentTo, mailed: sending.mailed } : null };
  });
}
