// The fridge chart's data for any range, downsampled on the server.
import { z } from 'zod';
import type { AppContext } from '../app-context.js';
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

export function readingsRoutes(context: AppContext) {
  const router = createSecureRouter('/api/readings');

  router.get('/fridges/:fridgeId/chart', { ...fridgeReaders, siteOf: siteOfFridge(fromParam('fridgeId')) }, async (req, res) => {
    const query = parseInput(chartQuerySchema, req.query, 'query');
    const to = query.to ? new Date(query.to) : new Date();
    const from = query.from ? new Date(query.from) : new Date(to.getTime() - WEEK_MS);
    res.json(await chartData(context.sequelize, idFrom(req.params.fridgeId), { from, to }));
  });

  return router;
}
