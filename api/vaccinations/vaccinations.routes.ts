// Vaccinations: read by everyone working with flocks; planned, moved, confirmed and cancelled by admins, purchasing and
// veterinarians; the withdrawal override by veterinarians alone.
import {
  vaccinationCancelSchema,
  vaccinationChangeSchema,
  vaccinationInputSchema,
  vaccinationListQuerySchema,
  withdrawalOverrideSchema,
} from '../../shared/flocks/vaccination-schemas.js';
import type { AppContext } from '../app-context.js';
import { flockKeepers, flockReaders } from '../flocks/flock-roles.js';
import { siteOfFlock } from '../flocks/flocks-service.js';
import { createSecureRouter } from '../http/secure-router.js';
import { parseIdParam } from '../http/params.js';
import { parseInput } from '../http/validate.js';
import {
  addVaccination,
  cancelVaccination,
  changeVaccination,
  confirmVaccination,
  listVaccinations,
  overrideWithdrawal,
  siteOfVaccination,
} from './vaccinations-service.js';

type Params = { params: Record<string, string | string[]> };

export function vaccinationsRoutes(context: AppContext) {
  const router = createSecureRouter('/api/vaccinations');
  const siteOfRecord = async (req: Params) => siteOfVaccination(parseIdParam(req.params.vaccinationId));
  const siteOfFlockParam = async (req: Params) => siteOfFlock(parseIdParam(req.params.flockId));
  const id = (req: Params) => parseIdParam(req.params.vaccinationId);

  router.get('/', { roles: flockReaders }, async (req, res) => {
    res.json({ items: await listVaccinations(req.user!, parseInput(vaccinationListQuerySchema, req.query, 'query')) });
  });

  router.post('/flocks/:flockId', { roles: flockKeepers, siteOf: siteOfFlockParam }, async (req, res) => {
    const input = parseInput(vaccinationInputSchema, req.body, 'vaccination');
    res.status(201).json(await addVaccination(context, req.user!.id, parseIdParam(req.params.flockId), input));
  });

  router.patch('/:vaccinationId', { roles: flockKeepers, siteOf: siteOfRecord }, async (req, res) => {
    res.json(await changeVaccination(context, req.user!.id, id(req), parseInput(vaccinationChangeSchema, req.body, 'vaccination')));
  });

  router.post('/:vaccinationId/confirm', { roles: flockKeepers, siteOf: siteOfRecord }, async (req, res) => {
    res.json(await confirmVaccination(context, req.user!.id, id(req)));
  });

  router.post('/:vaccinationId/cancel', { roles: flockKeepers, siteOf: siteOfRecord }, async (req, res) => {
    const { reason } = parseInput(vaccinationCancelSchema, req.body, 'cancellation');
    res.json(await cancelVaccination(context, req.user!.id, id(req), reason));
  });

  router.post('/:vaccinationId/withdrawal-override', { roles: ['veterinarian'], siteOf: siteOfRecord }, async (req, res) => {
    const { reason } = parseInput(withdrawalOverrideSchema, req.body, 'override');
    res.status(201).json(await overrideWithdrawal(context, req.user!.id, id(req), reason));
  });

  return router;
}
