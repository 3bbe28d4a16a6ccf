// Demand: the projection (admins, purchasing, veterinarians), stock settings, orders sent to suppliers and planned transfers (admins, purchasing).
import { plannedTransferInputSchema, productStockSettingsSchema, safetyProposalRequestSchema } from '../../shared/demand/demand-schemas.js';
import { purchaseOrderInputSchema } from '../../shared/receiving/purchase-order-schemas.js';
import type { AppContext } from '../app-context.js';
import { sendCachedJson } from '../cache/versioned-cache.js';
import { createSecureRouter } from '../http/secure-router.js';
import { parseIdParam } from '../http/params.js';
import { parseInput } from '../http/validate.js';
import { siteOfPurchaseOrder } from '../purchase-orders/purchase-orders-service.js';
import { createAndSendOrder, renderPurchaseOrderPdf, sendPurchaseOrder } from './order-sending-service.js';
import { purchasingOverview } from './overview-service.js';
import { projectSites } from './projection-service.js';
import { proposeSafetyStockFor } from './safety-proposal-service.js';
import { saveStockSettings } from './stock-settings-service.js';
import { closeTransfer, planTransfer, siteOfTransfer } from './transfers-service.js';

type Params = { params: Record<string, string | string[]> };

export function demandRoutes(context: AppContext) {
  const router = createSecureRouter('/api/demand');
  const buyers = ['admin', 'purchasing'] as const;
  const planners = ['admin', 'purchasing', 'veterinarian'] as const;
  const orderReaders = ['admin', 'purchasing', 'receiving', 'veterinarian'] as const;
  const siteOfParam = async (req: Params) => parseIdParam(req.params.siteId);
  const siteOfOrder = async (req: Params) => siteOfPurchaseOrder(parseIdParam(req.params.purchaseOrderId));
  const siteOfPlannedTransfer = async (req: Params) => siteOfTransfer(parseIdParam(req.params.transferId));
  const siteId = (req: Params) => parseIdParam(req.params.siteId);
  const productId = (req: Params) => parseIdParam(req.params.productId);

  router.get('/overview', { roles: buyers }, async (req, res) => {
    sendCachedJson(res, await purchasingOverview(req.user!));
  });

  router.get('/sites/:siteId/projection', { roles: planners, siteOf: siteOfParam }, async (req, res) => {
    const [view] = await projectSites(req.user!, [siteId(req)]);
    sendCachedJson(res, view);
  });

  router.put('/sites/:siteId/products/:productId/settings', { roles: buyers, siteOf: siteOfParam }, async (req, res) => {
    const input = parseInput(productStockSettingsSchema, req.body, 'stock settings');
    res.json(await saveStockSettings(context, req.user!.id, siteId(req), productId(req), input));
  });

  router.post('/sites/:siteId/products/:productId/safety-stock-proposal', { roles: buyers, siteOf: siteOfParam }, async (req, res) => {
    const { serviceLevel } = parseInput(safetyProposalRequestSchema, req.body, 'proposal');
    res.json(await proposeSafetyStockFor(siteId(req), productId(req), serviceLevel));
  });

  router.post('/sites/:siteId/orders', { roles: buyers, siteOf: siteOfParam }, async (req, res) => {
    const input = parseInput(purchaseOrderInputSchema, req.body, 'purchase order');
    res.status(201).json(await createAndSendOrder(context, req.user!.id, siteId(req), input));
  });

  router.post('/sites/:siteId/transfers', { roles: buyers, siteOf: siteOfParam }, async (req, res) => {
    const input = parseInput(plannedTransferInputSchema, req.body, 'planned transfer');
    res.status(201).json(await planTransfer(context, req.user!, siteId(req), input));
  });

  router.post('/transfers/:transferId/cancel', { roles: buyers, siteOf: siteOfPlannedTransfer }, async (req, res) => {
    res.json(await closeTransfer(context, req.user!.id, parseIdParam(req.params.transferId), 'cancelled'));
  });

  router.post('/transfers/:transferId/done', { roles: ['admin', 'purchasing', 'storage'], siteOf: siteOfPlannedTransfer }, async (req, res) => {
    res.json(await closeTransfer(context, req.user!.id, parseIdParam(req.params.transferId), 'done'));
  });

  router.get('/purchase-orders/:purchaseOrderId/pdf', { roles: orderReaders, siteOf: siteOfOrder }, async (req, res) => {
    const { reference, pdf } = await renderPurchaseOrderPdf(parseIdParam(req.params.purchaseOrderId), req.user!.id);
    res.type('application/pdf').set('Content-Disposition', `inline; filename="purchase-order-${reference}.pdf"`).send(pdf);
  });

  router.post('/purchase-orders/:purchaseOrderId/send', { roles: buyers, siteOf: siteOfOrder }, async (req, res) => {
    res.json(await sendPurchaseOrder(context, req.user!.id, parseIdParam(req.params.purchaseOrderId)));
  });

  return router;
}
