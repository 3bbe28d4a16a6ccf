// Lots: the list, one lot's page, and the movements storage staff record on it (transfers and discards).
import type { Role } from '../../shared/auth/roles.js';
import { lotListQuerySchema, type LotListPage } from '../../shared/lots/lot-list.js';
import { discardSchema, transferSchema } from '../../shared/lots/movement-schemas.js';
import type { AppContext } from '../app-context.js';
import { currentMinute, dataVersion } from '../cache/data-versions.js';
import { sendCachedJson, VersionedCache } from '../cache/versioned-cache.js';
import { createSecureRouter } from '../http/secure-router.js';
import { parseIdParam } from '../http/params.js';
import { parseInput } from '../http/validate.js';
import { discardVials } from './discard-service.js';
import { lotFilterOptions, listLots } from './lot-list.js';
import { lotPage } from './lot-page-service.js';
import { lotSiteForUser } from './lot-sites.js';
import { transferVials } from './transfer-service.js';

export const lotReaders = { roles: ['admin', 'storage', 'purchasing', 'veterinarian', 'receiving'] as readonly Role[] };
export const stockMovers = { roles: ['admin', 'storage'] as readonly Role[] };

/**
 * Pages of the list per site set and query, kept for the minute (a lot turns "expired" at its site's midnight) and until
 * a write to what the list reads advances the projection data version, which covers every table the list reads.
 */
const pages = new VersionedCache<LotListPage>(64);

export function lotsRoutes(context: AppContext) {
  const router = createSecureRouter('/api/lots');

  router.get('/', lotReaders, async (req, res) => {
    const user = req.user!;
    const query = parseInput(lotListQuerySchema, req.query, 'query');
    const compute = () => listLots(context.sequelize, user, query);
    const version = await dataVersion('projection');
    const key = `${user.allSites ? 'all' : user.siteIds.join(',')}|${JSON.stringify(query)}|${currentMinute()}`;
    sendCachedJson(res, version === null ? await compute() : await pages.get(version, key, compute));
  });

  // Before '/:lotId', which would otherwise take the word for an id.
  router.get('/filters', lotReaders, async (req, res) => {
    res.json(await lotFilterOptions(context.sequelize, req.user!));
  });

  router.get('/:lotId', { ...lotReaders, siteOf: lotSiteForUser }, async (req, res) => {
    res.json(await lotPage(context.sequelize, req.user!, parseIdParam(req.params.lotId)));
  });

  router.post('/:lotId/transfers', { ...stockMovers, siteOf: lotSiteForUser }, async (req, res) => {
    const input = parseInput(transferSchema, req.body, 'transfer');
    res.status(201).json(await transferVials(context, req.user!, parseIdParam(req.params.lotId), input));
  });

  router.post('/:lotId/discards', { ...stockMovers, siteOf: lotSiteForUser }, async (req, res) => {
    const input = parseInput(discardSchema, req.body, 'discard');
    res.status(201).json(await discardVials(context, req.user!, parseIdParam(req.params.lotId), input));
  });

  return router;
}
