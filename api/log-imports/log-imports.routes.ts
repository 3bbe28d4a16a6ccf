// Log imports: upload a logger file (with its mapping), follow its progress, read the history and the original files.
import { rm } from 'node:fs/promises';
import { join } from 'node:path';
import { z } from 'zod';
import { logMappingSchema } from '../../shared/fridges/log-mapping-schema.js';
import { LogFileError } from '../../shared/logs/log-file-error.js';
import type { AppContext } from '../app-context.js';
import { fridgeReaders, fridgeWriters, fromParam, idFrom, siteOfFridge, siteOfLogImport, siteOfLogger } from '../fridges/fridge-access.js';
import { AppError } from '../http/app-error.js';
import { createSecureRouter } from '../http/secure-router.js';
import { parseInput } from '../http/validate.js';
import { importLogFile } from './import-log-file.js';
import { progressReporter, progressTokenPattern, readProgress } from './import-progress.js';
import { fileUpload, LOG_FILE_MAX_BYTES } from './log-file-upload.js';
import { getLogImport, listLogImports } from './log-imports-service.js';

const uploadFieldsSchema = z.object({
  mapping: z.string().max(10_000).optional(),
  progressToken: z.string().regex(progressTokenPattern, '8–64 letters, digits, - or _.').optional(),
});

function parseMapping(text: string | undefined) {
  if (text === undefined || text === '') return undefined;
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch {
    throw AppError.badRequest('The mapping is not valid JSON.', [{ field: 'mapping', message: 'Not valid JSON.' }]);
  }
  return parseInput(logMappingSchema, json, 'mapping');
}

export function logImportsRoutes(context: AppContext) {
  const router = createSecureRouter('/api/log-imports');
  const uploadsDir = context.config.UPLOADS_DIR;

  router.get('/fridges/:fridgeId', { ...fridgeReaders, siteOf: siteOfFridge(fromParam('fridgeId')) }, async (req, res) => {
    res.json({ items: await listLogImports(idFrom(req.params.fridgeId)) });
  });

  router.post(
    '/loggers/:loggerId',
    { ...fridgeWriters, siteOf: siteOfLogger(fromParam('loggerId')) },
    fileUpload(uploadsDir, LOG_FILE_MAX_BYTES, 'logger file'),
    async (req, res) => {
      const file = req.file;
      try {
        if (!file) throw AppError.badRequest('Choose a logger file to upload.', [{ field: 'file', message: 'Required.' }]);
        if (file.size === 0) throw AppError.unprocessable('The file cannot be imported: it is empty.', [{ field: 'file', message: 'Empty file.' }]);
        const fields = parseInput(uploadFieldsSchema, req.body, 'upload');
        const user = req.user!;
        const outcome = await importLogFile(context.sequelize, {
          loggerId: idFrom(req.params.loggerId),
          path: file.path,
          // Control characters (a NUL above all) cannot be stored in a text column and mean nothing in a name.
          fileName: Buffer.from(file.originalname, 'latin1').toString('utf8').replace(/[\u0000-\u001f\u007f]/g, ''),
          sizeBytes: file.size,
          mapping: parseMapping(fields.mapping),
          actorId: user.id,
          source: 'upload',
          uploadsDir,
          progress: fields.progressToken ? progressReporter(context.pool, fields.progressToken, user.id) : undefined,
        });
        res.status(outcome.repeated ? 200 : 201).json(outcome);
      } catch (error) {
        if (error instanceof LogFileError) {
          const fields = error.needs.map((need) => ({ field: need, message: 'Choose this in the mapping.' }));
          throw AppError.unprocessable(`The file cannot be imported: ${error.message}.`, fields);
        }
        throw error;
      } finally {
        if (file) await rm(file.path, { force: true });
      }
    },
  );

  router.get('/progress/:token', fridgeWriters, async (req, res) => {
    const token = String(req.params.token);
    if (!progressTokenPattern.test(token)) throw AppError.notFound();
    const progress = await readProgress(context.pool, token, req.user!.id);
    if (!progress) throw AppError.notFound('No upload with this token is being read.');
    res.json(progress);
  });

  router.get('/:importId', { ...fridgeReaders, siteOf: siteOfLogImport(fromParam('importId')) }, async (req, res) => {
    const { storedName: _storedName, ...detail } = await getLogImport(idFrom(req.params.importId));
    res.json(detail);
  });

  router.get('/:importId/file', { ...fridgeReaders, siteOf: siteOfLogImport(fromParam('importId')) }, async (req, res) => {
    const detail = await getLogImport(idFrom(req.params.importId));
    res.type('text/csv').attachment(detail.fileName);
    // The stored name is our own (a hash); the uploads folder itself may sit under a dot-folder.
    res.sendFile(join(uploadsDir, detail.storedName), { dotfiles: 'allow' }, (error) => {
      if (error && !res.headersSent) res.status(404).json({ error: { code: 'not_found', message: 'The stored file is missing.' } });
    });
  });

  return router;
}
