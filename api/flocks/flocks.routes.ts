// Flocks: read by everyone working with flocks on the site; placed, changed, counted and depleted by admins, purchasing and veterinarians.
import { birdCountInputSchema } from '../../shared/flocks/bird-count-schemas.js';
import { flockDepletionSchema, flockInputSchema, flockListQuerySchema } from '../../shared/flocks/flock-schemas.js';
import type { AppContext } from '../app-context.js';
import { siteOfHouse } from '../houses/houses-service.js';
import { createSecureRouter } from '../http/secure-router.js';
import { parseIdParam } from '../http/params.js';
import { parseInput } from '../http/validate.js';
import { addBirdCount } from './bird-counts-service.js';
import { flockKeepers, flockReaders } from './flock-roles.js';
import { createFlock, depleteFlock, getFlock, listFlocks, siteOfFlock, updateFlock } from './flocks-service.js';

type Params = { params: Record<string, string | string[]> };

export function flocksRoutes(context: AppContext) {
  const router = createSecureRouter('/api/flocks');
  const siteOfRecord = async (req: Params) => siteOfFlock(parseIdParam(req.params.flockId));
  const siteOfHouseParam = async (req: Params) => siteOfHouse(parseIdParam(req.params.houseId));

  router.get('/', { roles: flockReaders }, async (req, res) => {
    res.json({ items: await listFlocks(req.user!, parseInput(flockListQuerySchema, req.query, 'query')) });
  });

  router.post('/houses/:houseId', { roles: flockKeepers, siteOf: siteOfHouseParam }, async (req, res) => {
    const input = parseInput(flockInputSchema, req.body, 'flock');
    res.status(201).json(await createFlock(context, req.user!.id, parseIdParam(req.params.houseId), input));
  });

  router.get('/:flockId', { roles: flockReaders, siteOf: siteOfRecord }, async (req, res) => {
    res.json(await getFlock(parseIdParam(req.params.flockId)));
  });

  router.put('/:flockId', { roles: flockKeepers, siteOf: siteOfRecord }, async (req, res) => {
    const input = parseInput(flockInputSchema, req.body, 'flock');
    res.json(await updateFlock(context, req.user!.id, parseIdParam(req.params.flockId), input));
  });

  router.post('/:flockId/bird-counts', { roles: flockKeepers, siteOf: siteOfRecord }, async (req, res) => {
    const input = parseInput(birdCountInputSchema, req.body, 'bird count');
    res.status(201).json(await addBirdCount(context, req.user!.id, parseIdParam(req.params.flockId), input));
  });

  router.post('/:flockId/depletion', { roles: flockKeepers, siteOf: siteOfRecord }, async (req, res) => {
    const { depletedOn } = parseInput(flockDepletionSchema, req.body, 'depletion');
    res.json(await depleteFlock(context, req.user!.id, parseIdParam(req.params.flockId), depletedOn));
  });

  return router;
}
