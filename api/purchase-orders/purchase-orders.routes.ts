// Purchase orders: purchasing and admins enter them; receiving and veterinarians read those of their sites.
import { purchaseOrderInputSchema, purchaseOrderListQuerySchema } from '../../shared/receiving/purchase-order-schemas.js';
import type { AppContext } from '../app-context.js';
import { createSecureRouter } from '../http/secure-router.js';
import { parseIdParam } from '../http/params.js';
import { parseInput } from '../http/validate.js';
import {
  cancelPurchaseOrder,
  createPurchaseOrder,
  listPurchaseOrders,
  loadPurchaseOrderView,
  siteOfPurchaseOrder,
  updatePurchaseOrder,
} from './purchase-orders-service.js';

type Params = { params: Record<string, string | string[]> };

export function purchaseOrdersRoutes(context: AppContext) {
  const router = createSecureRouter('/api/purchase-orders');
  const readers = ['admin', 'purchasing', 'receiving', 'veterinarian'] as const;
  const keepers = ['admin', 'purchasing'] as const;
  const siteOfParam = async (req: Params) => parseIdParam(req.params.siteId);
  const siteOfOrder = async (req: Params) => siteOfPurchaseOrder(parseIdParam(req.params.purchaseOrderId));

  router.get('/', { roles: readers }, async (req, res) => {
    res.json({ items: await listPurchaseOrders(req.user!, parseInput(purchaseOrderListQuerySchema, req.query, 'query')) });
  });

  router.post('/sites/:siteId', { roles: keepers, siteOf: siteOfParam }, async (req, res) => {
    const input = parseInput(purchaseOrderInputSchema, req.body, 'purchase order');
    res.status(201).json(await createPurchaseOrder(context, req.user!.id, parseIdParam(req.params.siteId), input));
  });

  router.get('/:purchaseOrderId', { roles: readers, siteOf: siteOfOrder }, async (req, res) => {
    res.json(await loadPurchaseOrderView(parseIdParam(req.params.purchaseOrderId)));
  });

  router.put('/:purchaseOrderId', { roles: keepers, siteOf: siteOfOrder }, async (req, res) => {
    const input = parseInput(purchaseOrderInputSchema, req.body, 'purchase order');
    res.json(await updatePurchaseOrder(context, req.user!.id, parseIdParam(req.params.purchaseOrderId), input));
  });

  router.post('/:purchaseOrderId/cancel', { roles: keepers, siteOf: siteOfOrder }, async (req, res) => {
    res.json(await cancelPurchaseOrder(context, req.user!.id, parseIdParam(req.params.purchaseOrderId)));
  });

  return router;
}
