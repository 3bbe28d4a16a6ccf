// Stock counts: which fridges are due, a fridge's count sheet, and submitting a count.
import { stockCountSchema } from '../../shared/lots/count-schemas.js';
import type { AppContext } from '../app-context.js';
import { fridgeReaders, fridgeWriters, fromParam, idFrom, siteOfFridge } from '../fridges/fridge-access.js';
import { createSecureRouter } from '../http/secure-router.js';
import { parseInput } from '../http/validate.js';
import { fridgeCountStates } from './count-due-service.js';
import { countSheet } from './count-sheet.js';
import { submitCount } from './submit-count.js';

export function stockCountsRoutes(context: AppContext) {
  const router = createSecureRouter('/api/stock-counts');
  const siteOfThisFridge = siteOfFridge(fromParam('fridgeId'));

  router.get('/due', fridgeReaders, async (req, res) => {
    const user = req.user!;
    const states = await fridgeCountStates(context.sequelize, { siteIds: user.allSites ? null : user.siteIds });
    res.json({ items: states.filter((s) => s.due) });
  });

  router.get('/fridges/:fridgeId/sheet', { ...fridgeReaders, siteOf: siteOfThisFridge }, async (req, res) => {
    res.json(await countSheet(context.sequelize, idFrom(req.params.fridgeId)));
  });

  router.post('/fridges/:fridgeId', { ...fridgeWriters, siteOf: siteOfThisFridge }, async (req, res) => {
    const input = parseInput(stockCountSchema, req.body, 'count');
    res.status(201).json(await submitCount(context, req.user!.id, idFrom(req.params.fridgeId), input));
  });

  return router;
}
