// Sites: everyone reads the sites they belong to; admins create and change them.
import { siteInputSchema } from '../../shared/sites/site-schemas.js';
import type { AppContext } from '../app-context.js';
import { createSecureRouter } from '../http/secure-router.js';
import { parseIdParam } from '../http/params.js';
import { parseInput } from '../http/validate.js';
import { getSite, listVisibleSites, saveSite } from './sites-service.js';

export function sitesRoutes(context: AppContext) {
  const router = createSecureRouter('/api/sites');
  const siteOf = async (req: { params: Record<string, string | string[]> }) => parseIdParam(req.params.siteId);

  router.get('/', { roles: 'signed-in' }, async (req, res) => {
    res.json({ items: await listVisibleSites(req.user!) });
  });

  router.get('/:siteId', { roles: 'signed-in', siteOf }, async (req, res) => {
    res.json(await getSite(parseIdParam(req.params.siteId)));
  });

  router.post('/', { roles: ['admin'] }, async (req, res) => {
    res.status(201).json(await saveSite(context, req.user!.id, null, parseInput(siteInputSchema, req.body, 'site')));
  });

  router.put('/:siteId', { roles: ['admin'], siteOf }, async (req, res) => {
    const input = parseInput(siteInputSchema, req.body, 'site');
    res.json(await saveSite(context, req.user!.id, parseIdParam(req.params.siteId), input));
  });

  return router;
}
