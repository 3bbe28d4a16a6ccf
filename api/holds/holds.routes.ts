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
import { recallSchema } from '../../shared/lots/recall-schema.js';
import { troubleshootingSchema } from '../../shared/lots/troubleshooting-schema.js';
import { exposureEventSiteId } from './exposure-event-service.js';
import { exposureEventDetail } from './exposure-event-detail.js';
import { excursionReportPdf } from './excursion-report.js';
import { placeRecall } from './recall-service.js';
import { saveTroubleshootingRecord } from './troubleshooting-service.js';

export function holdsRoutes(context: AppContext) {
  const router = createSecureRouter('/api/holds');
  const siteOf = (req: { params: Record<string, string | string[]> }) => holdSiteId(parseIdParam(req.params.holdId));

  // Storage staff fill the troubleshooting side of these events; the veterinarian decides them.
  router.get('/queue', { roles: ['veterinarian', 'storage', 'admin'] }, async (req, res) => {
    res.json({ items: await reviewQueue(context.sequelize, req.user!) });
  });

  const eventOf = (req: { params: Record<string, string | string[]> }) => exposureEventSiteId(parseIdParam(req.params.exposureEventId));
  const reviewers = { roles: ['veterinarian', 'storage', 'admin'] as const };

  router.get('/events/:exposureEventId', { roles: [...reviewers.roles], siteOf: eventOf }, async (req, res) => {
    res.json(await exposureEventDetail(context.sequelize, parseIdParam(req.params.exposureEventId)));
  });

  // Storage staff (and admins) write what they found and did; the veterinarian reads it beside the decision.
  router.put('/events/:exposureEventId/troubleshooting', { roles: ['storage', 'admin'], siteOf: eventOf }, async (req, res) => {
    const input = parseInput(troubleshootingSchema, req.body, 'troubleshooting record');
    res.json(await saveTroubleshootingRecord(context.sequelize, req.user!.id, parseIdParam(req.params.exposureEventId), input));
  });

  router.get('/events/:exposureEventId/report.pdf', { roles: [...reviewers.roles], siteOf: eventOf }, async (req, res) => {
    const report = await excursionReportPdf(context.sequelize, parseIdParam(req.params.exposureEventId), req.user!.displayUnit);
    res.type('application/pdf').attachment(report.fileName).send(report.pdf);
  });

  router.post('/recalls', { roles: ['veterinarian'] }, async (req, res) => {
    const input = parseInput(recallSchema, req.body, 'recall');
    res.status(201).json(await placeRecall(context.sequelize, req.user!.id, input));
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
