// Fridges: the visible list with statuses, the storage overview, one fridge, its changes, and its monthly record.
import { z } from 'zod';
import { fridgeInputSchema } from '../../shared/fridges/fridge-schemas.js';
import type { AppContext } from '../app-context.js';
import { currentMinute, dataVersion } from '../cache/data-versions.js';
import { sendCachedJson, VersionedCache } from '../cache/versioned-cache.js';
import { createSecureRouter } from '../http/secure-router.js';
import { parseInput } from '../http/validate.js';
import { fridgeReaders, fridgeWriters, fromBody, fromParam, idFrom, siteOfFridge, siteOfSite } from './fridge-access.js';
import { createFridge, getFridge, listFridges, updateFridge, visibleSiteIds } from './fridges-service.js';
import { monthlyRecord } from './monthly-record.js';
import { monthlyRecordCsv } from './monthly-record-csv.js';
import { monthlyRecordPdf } from './monthly-record-pdf.js';
import { storageOverview, type StorageOverview } from './storage-overview.js';

const listQuerySchema = z.object({ siteId: z.coerce.number().int().positive().optional() });
const recordQuerySchema = z.object({
  /** Default: the month now at the fridge's site. */
  month: z.string().regex(/^\d{4}-(0[1-9]|1[0-2])$/, 'A month as YYYY-MM.').optional(),
  format: z.enum(['pdf', 'csv']).default('pdf'),
});

/**
 * Storage homes per site set, kept for the minute (what they say about "now" — today's checks, no recent data, calibrations
 * due — moves by the minute at most) and until a write to what they read advances the storage data version.
 */
const overviews = new VersionedCache<StorageOverview>();

export function fridgesRoutes(context: AppContext) {
  const router = createSecureRouter('/api/fridges');
  const siteOfThisFridge = siteOfFridge(fromParam('fridgeId'));

  router.get('/', fridgeReaders, async (req, res) => {
    const query = parseInput(listQuerySchema, req.query, 'query');
    res.json({ items: await listFridges(context.sequelize, req.user!, query.siteId) });
  });

  router.get('/overview', fridgeReaders, async (req, res) => {
    const siteIds = visibleSiteIds(req.user!);
    const compute = () => storageOverview(context.sequelize, siteIds);
    const version = await dataVersion('storage');
    sendCachedJson(res, version === null ? await compute() : await overviews.get(version, `${siteIds?.join(',') ?? 'all'}|${currentMinute()}`, compute));
  });

  router.post('/', { ...fridgeWriters, siteOf: siteOfSite(fromBody('siteId')) }, async (req, res) => {
    res.status(201).json(await createFridge(context.sequelize, req.user!.id, parseInput(fridgeInputSchema, req.body, 'fridge')));
  });

  router.get('/:fridgeId', { ...fridgeReaders, siteOf: siteOfThisFridge }, async (req, res) => {
    res.json(await getFridge(context.sequelize, idFrom(req.params.fridgeId)));
  });

  router.put('/:fridgeId', { ...fridgeWriters, siteOf: siteOfThisFridge }, async (req, res) => {
    res.json(await updateFridge(context.sequelize, req.user!.id, idFrom(req.params.fridgeId), parseInput(fridgeInputSchema, req.body, 'fridge')));
  });

  router.get('/:fridgeId/record', { ...fridgeReaders, siteOf: siteOfThisFridge }, async (req, res) => {
    const query = parseInput(recordQuerySchema, req.query, 'query');
    const fridgeId = idFrom(req.params.fridgeId);
    const record = await monthlyRecord(context.sequelize, fridgeId, query.month);
    const month = record.month;
    const unit = req.user!.displayUnit;
    const name = `fridge-record-${record.fridge.code}-${month}`;
    if (query.format === 'csv') {
      res.type('text/csv; charset=utf-8').attachment(`${name}.csv`).send(monthlyRecordCsv(record, unit));
    } else {
      res.type('application/pdf').attachment(`${name}.pdf`).send(await monthlyRecordPdf(record, unit));
    }
  });

  return router;
}
