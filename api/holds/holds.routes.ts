// Holds: their signed decisions, read by everyone who sees the lot's site and made by veterinarians only.
import { decisionSchema } from '../../shared/lots/decision-schema.js';
import type { AppContext } from '../app-context.js';
import { createSecureRouter } from '../http/secure-router.js';
import { parseIdParam } from '../http/params.js';
import { parseInput } from '../http/validate.js';
import { decideHold, holdDecisions, holdSiteId } from './hold-decisions-service.js';
import { reviewQueue } from './review-queue.js';
import { doNotUseTag } from './do-not-use-tag.js';
import { lotSiteId } from '../exposure/lot-exposure-service.js';

export function holdsRoutes(context: AppContext) {
  const router = createSecureRouter('/api/holds');
  const siteOf = (req: { params: Record<string, string | string[]> }) => holdSiteId(parseIdParam(req.params.holdId));

  // Storage staff fill the troubleshooting side of these events; the veterinarian decides them.
  router.get('/queue', { roles: ['veterinarian', 'storage', 'admin'] }, async (req, res) => {
    res.json({ items: await reviewQueue(context.sequelize, req.user!) });
  });

  router.get('/lots/:lotId/tag', { roles: 'signed-in', siteOf: (req) => lotSiteId(parseIdParam(req.params.lotId)) }, async (req, res) => {
    const tag = await doNotUseTag(parseIdParam(req.params.lotId));
    res.type('application/pdf').attachment(tag.fileName).send(tag.pdf);
  });

  router.get('/:holdId/decisions', { roles: 'signed-in', siteOf }, async (req, res) => {
    res.json({ items: await holdDecisions(parseIdParam(req.params.holdId)) });
  });

  router.post('/:holdId/decisions', { roles: ['veterinarian'], siteOf }, async (req, res) => {
    const input = parseInput(decisionSchema, req.body, 'decision');
    res.status(201).json(await decideHold(context, req.user!.id, parseIdParam(req.params.holdId), input));
  });

  return router;
}
