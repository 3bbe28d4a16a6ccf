// Houses: read by everyone working with flocks on the site; added and changed by admins, purchasing and veterinarians.
import { houseInputSchema } from '../../shared/flocks/house-schemas.js';
import type { AppContext } from '../app-context.js';
import { flockKeepers, flockReaders } from '../flocks/flock-roles.js';
import { createSecureRouter } from '../http/secure-router.js';
import { parseIdParam } from '../http/params.js';
import { parseInput } from '../http/validate.js';
import { createHouse, listHouses, siteOfHouse, updateHouse } from './houses-service.js';

type Params = { params: Record<string, string | string[]> };

export function housesRoutes(context: AppContext) {
  const router = createSecureRouter('/api/houses');
  const siteOfParam = async (req: Params) => parseIdParam(req.params.siteId);
  const siteOfRecord = async (req: Params) => siteOfHouse(parseIdParam(req.params.houseId));

  router.get('/sites/:siteId', { roles: flockReaders, siteOf: siteOfParam }, async (req, res) => {
    res.json({ items: await listHouses(parseIdParam(req.params.siteId)) });
  });

  router.post('/sites/:siteId', { roles: flockKeepers, siteOf: siteOfParam }, async (req, res) => {
    const input = parseInput(houseInputSchema, req.body, 'house');
    res.status(201).json(await createHouse(context, req.user!.id, parseIdParam(req.params.siteId), input));
  });

  router.put('/:houseId', { roles: flockKeepers, siteOf: siteOfRecord }, async (req, res) => {
    const input = parseInput(houseInputSchema, req.body, 'house');
    res.json(await updateHouse(context, req.user!.id, parseIdParam(req.params.houseId), input));
  });

  return router;
}
