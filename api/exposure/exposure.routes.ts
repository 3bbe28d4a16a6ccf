// A lot's temperature exposure, readable by everyone who may see the lot's site.
import type { AppContext } from '../app-context.js';
import { createSecureRouter } from '../http/secure-router.js';
import { parseIdParam } from '../http/params.js';
import { computeLotExposure, lotSiteId } from './lot-exposure-service.js';

export function exposureRoutes(context: AppContext) {
  const router = createSecureRouter('/api/exposure');

  router.get('/lots/:lotId', { roles: 'signed-in', siteOf: (req) => lotSiteId(parseIdParam(req.params.lotId)) }, async (req, res) => {
    res.json(await computeLotExposure(context.sequelize, parseIdParam(req.params.lotId)));
  });

  return router;
}
