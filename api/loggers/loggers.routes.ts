// Loggers: add one to a fridge, change or retire it, upload and read its calibration certificates.
import { rm } from 'node:fs/promises';
import { join } from 'node:path';
import { certificateInputSchema, loggerInputSchema, loggerUpdateSchema } from '../../shared/fridges/logger-schemas.js';
import type { AppContext } from '../app-context.js';
import { fridgeReaders, fridgeWriters, fromBody, fromParam, idFrom, siteOfFridge, siteOfLogger } from '../fridges/fridge-access.js';
import { AppError } from '../http/app-error.js';
import { parseIdParam } from '../http/params.js';
import { createSecureRouter } from '../http/secure-router.js';
import { parseInput } from '../http/validate.js';
import { CERTIFICATE_MAX_BYTES, fileUpload } from '../log-imports/log-file-upload.js';
import { addCertificate, createLogger, getCertificate, updateLogger } from './loggers-service.js';

export function loggersRoutes(context: AppContext) {
  const router = createSecureRouter('/api/loggers');
  const uploadsDir = context.config.UPLOADS_DIR;
  const siteOfThisLogger = siteOfLogger(fromParam('loggerId'));

  router.post('/', { ...fridgeWriters, siteOf: siteOfFridge(fromBody('fridgeId')) }, async (req, res) => {
    res.status(201).json(await createLogger(context.sequelize, req.user!.id, parseInput(loggerInputSchema, req.body, 'logger')));
  });

  router.patch('/:loggerId', { ...fridgeWriters, siteOf: siteOfThisLogger }, async (req, res) => {
    res.json(await updateLogger(context.sequelize, req.user!.id, idFrom(req.params.loggerId), parseInput(loggerUpdateSchema, req.body, 'logger')));
  });

  router.post(
    '/:loggerId/certificates',
    { ...fridgeWriters, siteOf: siteOfThisLogger },
    fileUpload(uploadsDir, CERTIFICATE_MAX_BYTES, 'certificate'),
    async (req, res) => {
      const file = req.file;
      try {
        if (!file) throw AppError.badRequest('Choose the certificate file (PDF or image).', [{ field: 'file', message: 'Required.' }]);
        const input = parseInput(certificateInputSchema, req.body, 'certificate');
        const original = { path: file.path, originalName: Buffer.from(file.originalname, 'latin1').toString('utf8'), size: file.size };
        res.status(201).json(await addCertificate(context.sequelize, req.user!.id, idFrom(req.params.loggerId), input, original, uploadsDir));
      } finally {
        if (file) await rm(file.path, { force: true });
      }
    },
  );

  router.get('/:loggerId/certificates/:certificateId', { ...fridgeReaders, siteOf: siteOfThisLogger }, async (req, res) => {
    const certificate = await getCertificate(idFrom(req.params.loggerId), parseIdParam(req.params.certificateId));
    res.type(certificate.contentType);
    // The stored name is our own (a hash); the uploads folder itself may sit under a dot-folder.
    res.setHeader('Content-Disposition', `inline; filename="${certificate.fileName.replace(/[^\w. -]/g, '_')}"`);
    res.sendFile(join(uploadsDir, certificate.storedName), { dotfiles: 'allow' }, (error) => {
      if (error && !res.headersSent) res.status(404).json({ error: { code: 'not_found', message: 'The stored file is missing.' } });
    });
  });

  return router;
}
