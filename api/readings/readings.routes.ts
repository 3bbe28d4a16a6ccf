// The fridge chart's data for any range, downsampled on the server.
import { z } from 'zod';
import type { ChartData } from '../../shared/fridges/chart-data.js';
import type { AppContext } from '../app-context.js';
import { dataVersion } from '../cache/data-versions.js';
import { sendCachedJson, VersionedCache } from '../cache/versioned-cache.js';
import { fridgeReaders, fromParam, idFrom, siteOfFridge } from '../fridges/fridge-access.js';
import { createSecureRouter } from '../http/secure-router.js';
import { parseInput } from '../http/validate.js';
import { chartData } from './chart-query.js';

/** Default: the week up to now. */
const chartQuerySchema = z.object({
  from: z.iso.datetime({ offset: true, message: 'A date and time with its offset.' }).optional(),
  to: z.iso.datetime({ offset: true, message: 'A date and time with its offset.' }).optional(),
});

const WEEK_MS = 7 * 86_400_000;

/**
 * Charts of ranges given in full (the page asks for whole minutes, so viewers of the same fridge share them), kept
 * until a write to what a chart reads advances the storage data version. A year's chart is ~80 kB.
 */
const charts = new VersionedCache<ChartData>(64);

export function readingsRoutes(context: AppContext) {
  const router = createSecureRouter('/api/readings');

  router.get('/fridges/:fridgeId/chart', { ...fridgeReaders, siteOf: siteOfFridge(fromParam('fridgeId')) }, async (req, res) => {
    const query = parseInput(chartQuerySchema, req.query, 'query');
    const fridgeId = idFrom(req.params.fridgeId);
    const to = query.to ? new Date(query.to) : new Date();
    const from = query.from ? new Date(query.from) : new Date(to.getTime() - WEEK_MS);
    const compute = () => chartData(context.sequelize, fridgeId, { from, to });
    const version = query.to ? await dataVersion('storage') : null;
    sendCachedJson(res, version === null ? await compute() : await charts.get(version, `${fridgeId}|${from.getTime()}|${to.getTime()}`, compute));
  });

  return router;
}
