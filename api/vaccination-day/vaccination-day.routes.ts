// Vaccination day: crews, the day sheet, readiness checks, sprayer trial, vials out and back, mixing sheet, the signed record, flock history.
import {
  checkOverrideSchema,
  crewAssignmentSchema,
  crewQuerySchema,
  daySheetQuerySchema,
  issueSchema,
  memberCheckSchema,
  recordSchema,
  returnSchema,
  sprayerTrialSchema,
  vaccinationCheckSchema,
  waterVolumeSchema,
} from '../../shared/vaccination-day/day-schemas.js';
import type { AppContext } from '../app-context.js';
import { siteOfFlock } from '../flocks/flocks-service.js';
import { AppError } from '../http/app-error.js';
import { createSecureRouter } from '../http/secure-router.js';
import { parseIdParam } from '../http/params.js';
import { parseInput } from '../http/validate.js';
import { photoUpload, uploadedPhotos } from '../photos/photo-upload.js';
import { processPhotos } from '../photos/process-photo.js';
import { siteOfVaccination } from '../vaccinations/vaccinations-service.js';
import { assignCrew, dayLeads, siteCrew } from './crew-service.js';
import { daySheet } from './day-sheet-service.js';
import { crewAssigners, dayPlanners, dayWorkers, historyReaders, waterVolumeKeepers } from './day-roles.js';
import { flockHistoryCsv, flockHistoryPdf } from './flock-history.js';
import { mixingSheetPdf } from './mixing-sheet-pdf.js';
import { overrideCheck, recordMemberCheck, recordVaccinationCheck, startVaccination } from './readiness-service.js';
import { recordMixing, recordTrial, signRecord } from './record-service.js';
import { loadRunView } from './run-view.js';
import { addTrialPhotos, trialPhoto, trialPhotoPath } from './trial-photos.js';
import { issueVials, returnVials } from './vials-service.js';
import { addWaterVolume, listWaterVolumes } from './water-volumes-service.js';

type Params = { params: Record<string, string | string[]> };

export function vaccinationDayRoutes(context: AppContext) {
  const router = createSecureRouter('/api/vaccination-day');
  const id = (req: Params) => parseIdParam(req.params.vaccinationId);
  const run = { roles: dayWorkers, siteOf: async (req: Params) => siteOfVaccination(id(req)) };

  router.get('/sheet', { roles: dayWorkers }, async (req, res) => {
    const query = parseInput(daySheetQuerySchema, req.query, 'query');
    const planner = req.user!.roles.some((role) => (dayPlanners as readonly string[]).includes(role));
    // A crew lead reads their own sheet; admins and veterinarians read anyone's.
    if (query.leadId !== undefined && query.leadId !== req.user!.id && !planner) throw AppError.forbidden('A crew lead reads their own day sheet only.');
    res.json(await daySheet(context, req.user!, query.day, query.leadId ?? req.user!.id));
  });

  router.get('/leads', { roles: dayPlanners }, async (req, res) => {
    const { day } = parseInput(crewQuerySchema.required(), req.query, 'query');
    res.json({ items: await dayLeads(context, req.user!, day) });
  });

  router.post('/crews', { roles: crewAssigners }, async (req, res) => {
    res.json(await assignCrew(context, req.user!, parseInput(crewAssignmentSchema, req.body, 'crew')));
  });

  router.get('/sites/:siteId/crew', { roles: crewAssigners, siteOf: async (req: Params) => parseIdParam(req.params.siteId) }, async (req, res) => {
    const { day } = parseInput(crewQuerySchema, req.query, 'query');
    res.json(await siteCrew(context, req.user!, parseIdParam(req.params.siteId), day));
  });

  router.get('/water-volumes', { roles: dayWorkers }, async (req, res) => {
    const productId = Number(req.query.productId);
    res.json({ items: await listWaterVolumes(context, Number.isInteger(productId) && productId > 0 ? productId : undefined) });
  });

  router.post('/water-volumes', { roles: waterVolumeKeepers }, async (req, res) => {
    res.status(201).json(await addWaterVolume(context, req.user!.id, parseInput(waterVolumeSchema, req.body, 'water volume')));
  });

  router.get('/vaccinations/:vaccinationId', run, async (req, res) => {
    res.json(await loadRunView(context, id(req)));
  });

  router.post('/vaccinations/:vaccinationId/member-checks', run, async (req, res) => {
    res.status(201).json(await recordMemberCheck(context, req.user!.id, id(req), parseInput(memberCheckSchema, req.body, 'check')));
  });

  router.post('/vaccinations/:vaccinationId/checks', run, async (req, res) => {
    res.status(201).json(await recordVaccinationCheck(context, req.user!.id, id(req), parseInput(vaccinationCheckSchema, req.body, 'check')));
  });

  router.post('/vaccinations/:vaccinationId/checks/:checkId/override', { roles: ['veterinarian'], siteOf: run.siteOf }, async (req, res) => {
    const { reason } = parseInput(checkOverrideSchema, req.body, 'override');
    res.status(201).json(await overrideCheck(context, req.user!.id, id(req), parseIdParam(req.params.checkId), reason));
  });

  router.post('/vaccinations/:vaccinationId/trial', run, async (req, res) => {
    res.status(201).json(await recordTrial(context, req.user!.id, id(req), parseInput(sprayerTrialSchema, req.body, 'trial')));
  });

  router.post('/vaccinations/:vaccinationId/trial/photos', run, photoUpload, async (req, res) => {
    res.status(201).json(await addTrialPhotos(context, req.user!.id, id(req), await processPhotos(uploadedPhotos(req))));
  });

  const photoAccess = { roles: dayWorkers, siteOf: async (req: Params) => (await trialPhoto(context, parseIdParam(req.params.trialPhotoId)))?.siteId };
  router.get('/trial-photos/:trialPhotoId', photoAccess, async (req, res, next) => {
    const path = await trialPhotoPath(context, parseIdParam(req.params.trialPhotoId));
    // The path is our own (UPLOADS_DIR may sit under a dot-folder such as .runtime).
    res.sendFile(path, { dotfiles: 'allow', headers: { 'Content-Type': 'image/jpeg', 'Cache-Control': 'private, max-age=86400' } }, (error) => {
      if (error && !res.headersSent) next(AppError.notFound('The photo file could not be read.'));
    });
  });

  router.post('/vaccinations/:vaccinationId/start', run, async (req, res) => {
    res.json(await startVaccination(context, req.user!.id, id(req)));
  });

  router.post('/vaccinations/:vaccinationId/issues', run, async (req, res) => {
    res.status(201).json(await issueVials(context, req.user!.id, id(req), parseInput(issueSchema, req.body, 'issue')));
  });

  router.post('/vaccinations/:vaccinationId/mixings', run, async (req, res) => {
    res.status(201).json(await recordMixing(context, req.user!.id, id(req)));
  });

  router.get('/vaccinations/:vaccinationId/mixing-sheet.pdf', run, async (req, res) => {
    const view = await loadRunView(context, id(req));
    res.type('application/pdf').setHeader('Content-Disposition', `inline; filename="mixing-sheet-${view.vaccinationId}.pdf"`);
    res.send(await mixingSheetPdf(view));
  });

  router.post('/vaccinations/:vaccinationId/returns', run, async (req, res) => {
    res.status(201).json(await returnVials(context, req.user!.id, id(req), parseInput(returnSchema, req.body, 'return')));
  });

  router.post('/vaccinations/:vaccinationId/record', run, async (req, res) => {
    res.status(201).json(await signRecord(context, req.user!.id, id(req), parseInput(recordSchema, req.body, 'record')));
  });

  const flockSite = { roles: historyReaders, siteOf: async (req: Params) => siteOfFlock(parseIdParam(req.params.flockId)) };

  router.get('/flocks/:flockId/history.csv', flockSite, async (req, res) => {
    const { fileName, csv } = await flockHistoryCsv(context, parseIdParam(req.params.flockId));
    res.type('text/csv').setHeader('Content-Disposition', `attachment; filename="${fileName}"`);
    res.send(csv);
  });

  router.get('/flocks/:flockId/history.pdf', flockSite, async (req, res) => {
    const { fileName, pdf } = await flockHistoryPdf(context, parseIdParam(req.params.flockId));
    res.type('application/pdf').setHeader('Content-Disposition', `inline; filename="${fileName}"`);
    res.send(pdf);
  });

  return router;
}
