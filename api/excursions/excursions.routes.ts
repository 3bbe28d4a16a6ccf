// Excursions of a fridge (with its gaps and backup fills), one excursion, and what storage staff did about it.
import { z } from 'zod';
import type { AppContext } from '../app-context.js';
import { fridgeReaders, fridgeWriters, fromParam, idFrom, siteOfExcursion, siteOfFridge } from '../fridges/fridge-access.js';
import { createSecureRouter } from '../http/secure-router.js';
import { parseInput } from '../http/validate.js';
import { fridgeEvents } from './excursion-view.js';
import { getExcursion, recordActionTaken } from './excursions-service.js';

const eventsQuerySchema = z.object({
  from: z.iso.datetime({ offset: true }).optional(),
  to: z.iso.datetime({ offset: true }).optional(),
});

const actionSchema = z.object({
  actionTaken: z.string().trim().max(2000, 'At most 2,000 characters.'),
});

export function excursionsRoutes(context: AppContext) {
  const router = createSecureRouter('/api/excursions');

  router.get('/fridges/:fridgeId', { ...fridgeReaders, siteOf: siteOfFridge(fromParam('fridgeId')) }, async (req, res) => {
    const query = parseInput(eventsQuerySchema, req.query, 'query');
    const range = { from: query.from ? new Date(query.from) : undefined, to: query.to ? new Date(query.to) : undefined };
    res.json(await fridgeEvents(context.sequelize, idFrom(req.params.fridgeId), range));
  });

  router.get('/:excursionId', { ...fridgeReaders, siteOf: siteOfExcursion(fromParam('excursionId')) }, async (req, res) => {
    res.json(await getExcursion(context.sequelize, idFrom(req.params.excursionId)));
  });

  router.patch('/:excursionId', { ...fridgeWriters, siteOf: siteOfExcursion(fromParam('excursionId')) }, async (req, res) => {
    const input = parseInput(actionSchema, req.body, 'excursion');
    res.json(await recordActionTaken(context.sequelize, req.user!.id, idFrom(req.params.excursionId), input.actionTaken));
  });

  return router;
}
