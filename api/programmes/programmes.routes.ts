// Programmes are shared by every site: read by everyone working with flocks, kept by admins, purchasing and veterinarians.
import { programmeInputSchema } from '../../shared/flocks/programme-schemas.js';
import type { AppContext } from '../app-context.js';
import { flockKeepers, flockReaders } from '../flocks/flock-roles.js';
import { createSecureRouter } from '../http/secure-router.js';
import { parseIdParam } from '../http/params.js';
import { parseInput } from '../http/validate.js';
import { getProgramme, listProgrammes, saveProgramme } from './programmes-service.js';

export function programmesRoutes(context: AppContext) {
  const router = createSecureRouter('/api/programmes');

  router.get('/', { roles: flockReaders }, async (_req, res) => {
    res.json({ items: await listProgrammes() });
  });

  router.get('/:programmeId', { roles: flockReaders }, async (req, res) => {
    res.json(await getProgramme(parseIdParam(req.params.programmeId)));
  });

  router.post('/', { roles: flockKeepers }, async (req, res) => {
    res.status(201).json(await saveProgramme(context, req.user!.id, null, parseInput(programmeInputSchema, req.body, 'programme')));
  });

  router.put('/:programmeId', { roles: flockKeepers }, async (req, res) => {
    const input = parseInput(programmeInputSchema, req.body, 'programme');
    res.json(await saveProgramme(context, req.user!.id, parseIdParam(req.params.programmeId), input));
  });

  return router;
}
