// Daily checks: the quick form's record, and a fridge's checks over a range (default: the last 31 days).
import { z } from 'zod';
import { dailyCheckInputSchema } from '../../shared/fridges/daily-check-schemas.js';
import type { AppContext } from '../app-context.js';
import { fridgeReaders, fridgeWriters, fromBody, fromParam, idFrom, siteOfFridge } from '../fridges/fridge-access.js';
import { createSecureRouter } from '../http/secure-router.js';
import { parseInput } from '../http/validate.js';
import { listDailyChecks, recordDailyCheck } from './daily-checks-service.js';

const listQuerySchema = z.object({
  from: z.iso.datetime({ offset: true }).optional(),
  to: z.iso.datetime({ offset: true }).optional(),
});

export function dailyChecksRoutes(context: AppContext) {
  const router = createSecureRouter('/api/daily-checks');

  router.get('/fridges/:fridgeId', { ...fridgeReaders, siteOf: siteOfFridge(fromParam('fridgeId')) }, async (req, res) => {
    const query = parseInput(listQuerySchema, req.query, 'query');
    const to = query.to ? new Date(query.to) : new Date(Date.now() + 86_400_000);
    const from = query.from ? new Date(query.from) : new Date(to.getTime() - 32 * 86_400_000);
    res.json({ items: await listDailyChecks(idFrom(req.params.fridgeId), { from, to }) });
  });

  router.post('/', { ...fridgeWriters, siteOf: siteOfFridge(fromBody('fridgeId')) }, async (req, res) => {
    res.status(201).json(await recordDailyCheck(context.sequelize, req.user!.id, parseInput(dailyCheckInputSchema, req.body, 'daily check')));
  });

  return router;
}
