// Shipments: receiving clerks and admins record them with photos; storage, purchasing and veterinarians read them.
import type { Request } from 'express';
import { z } from 'zod';
import { shipmentInputSchema } from '../../shared/receiving/shipment-input-schema.js';
import type { AppContext } from '../app-context.js';
import { AppError } from '../http/app-error.js';
import { createSecureRouter } from '../http/secure-router.js';
import { parseIdParam } from '../http/params.js';
import { parseInput } from '../http/validate.js';
import { PhotoStore } from '../photos/photo-store.js';
import { photoUpload, uploadedPhotos } from '../photos/photo-upload.js';
import { processPhotos } from '../photos/process-photo.js';
import { shipmentReaders } from '../photos/photos.routes.js';
import { listExpectedOrders } from '../purchase-orders/purchase-orders-service.js';
import { addShipmentPhotos } from './add-photos.js';
import { discrepancyReportPdf } from './discrepancy-report.js';
import { receiveShipment } from './receive-shipment.js';
import { receivingContext } from './receiving-context.js';
import { mailDiscrepancyReport, reportFileName } from './report-mail.js';
import { listShipments, loadShipmentView, siteOfShipment } from './shipment-views.js';

type Params = { params: Record<string, string | string[]> };

const listQuerySchema = z.object({
  siteId: z.coerce.number().int().positive().optional(),
  limit: z.coerce.number().int().min(1).max(200).default(50),
});

/** A multipart request carries the shipment as JSON text in its "shipment" field; a JSON request is the shipment. */
function shipmentBody(req: Request): unknown {
  const field = (req.body as Record<string, unknown> | undefined)?.shipment;
  if (typeof field !== 'string') return req.body;
  try {
    return JSON.parse(field);
  } catch {
    throw AppError.badRequest('The shipment field is not valid JSON.', [{ field: 'shipment', message: 'Not valid JSON.' }]);
  }
}

export function shipmentsRoutes(context: AppContext) {
  const router = createSecureRouter('/api/shipments');
  const receivers = ['admin', 'receiving'] as const;
  const siteOfParam = async (req: Params) => parseIdParam(req.params.siteId);
  const siteOfRecord = async (req: Params) => siteOfShipment(parseIdParam(req.params.shipmentId));
  const store = new PhotoStore(context.config.UPLOADS_DIR);

  router.get('/', { roles: shipmentReaders }, async (req, res) => {
    res.json({ items: await listShipments(req.user!, parseInput(listQuerySchema, req.query, 'query')) });
  });

  router.get('/expected', { roles: shipmentReaders }, async (req, res) => {
    const { siteId } = parseInput(listQuerySchema, req.query, 'query');
    res.json({ items: await listExpectedOrders(req.user!, siteId) });
  });

  router.get('/sites/:siteId/context', { roles: receivers, siteOf: siteOfParam }, async (req, res) => {
    res.json(await receivingContext(parseIdParam(req.params.siteId)));
  });

  router.post('/sites/:siteId', { roles: receivers, siteOf: siteOfParam }, photoUpload, async (req, res) => {
    const input = parseInput(shipmentInputSchema, shipmentBody(req), 'shipment');
    const photos = await processPhotos(uploadedPhotos(req));
    const { view, created } = await receiveShipment(context, req.user!.id, parseIdParam(req.params.siteId), input, photos);
    res.status(created ? 201 : 200).json(view);
  });

  router.get('/:shipmentId', { roles: shipmentReaders, siteOf: siteOfRecord }, async (req, res) => {
    res.json(await loadShipmentView(parseIdParam(req.params.shipmentId)));
  });

  router.post('/:shipmentId/photos', { roles: receivers, siteOf: siteOfRecord }, photoUpload, async (req, res) => {
    const photos = await processPhotos(uploadedPhotos(req));
    res.json(await addShipmentPhotos(context, req.user!.id, parseIdParam(req.params.shipmentId), photos));
  });

  router.get('/:shipmentId/report', { roles: shipmentReaders, siteOf: siteOfRecord }, async (req, res) => {
    const shipment = await loadShipmentView(parseIdParam(req.params.shipmentId));
    const pdf = await discrepancyReportPdf(shipment, store);
    res.type('application/pdf').attachment(reportFileName(shipment.id)).send(pdf);
  });

  router.post('/:shipmentId/report/mail', { roles: receivers, siteOf: siteOfRecord }, async (req, res) => {
    const id = parseIdParam(req.params.shipmentId);
    const to = await mailDiscrepancyReport(context, id);
    if (!to.length) throw new AppError(502, 'mail_failed', 'The report could not be mailed just now; try again later.');
    res.json(await loadShipmentView(id));
  });

  return router;
}
