// Photos of the sprayer trial's water-sensitive paper, through the shared photo pipeline: files first, rows in one transaction.
import { existsSync } from 'node:fs';
import { QueryTypes } from 'sequelize';
import type { RunView } from '../../shared/vaccination-day/day-views.js';
import type { AppContext } from '../app-context.js';
import { recordAudit } from '../audit/record-audit.js';
import { AppError } from '../http/app-error.js';
import { PhotoStore } from '../photos/photo-store.js';
import type { ProcessedPhoto } from '../photos/process-photo.js';
import { loadRunView } from './run-view.js';

export const maxPhotosPerTrial = 3;

export async function addTrialPhotos(context: AppContext, actorId: number, vaccinationId: number, photos: ProcessedPhoto[]): Promise<RunView> {
  if (!photos.length) throw AppError.badRequest('Choose a photo of the paper.', [{ field: 'photos', message: 'No photo sent.' }]);
  const store = new PhotoStore(context.config.UPLOADS_DIR);
  await store.withFiles(photos, (stored) =>
    context.sequelize.transaction(async (transaction) => {
      // Trials are append-only (no row lock without UPDATE rights): uploads for one vaccination queue here.
      await context.sequelize.query('SELECT pg_advisory_xact_lock(hashtext(:key))', { replacements: { key: `trial-photos:${vaccinationId}` }, transaction });
      const [trial] = await context.sequelize.query<{ id: number; photos: string }>(
        `SELECT t.id, (SELECT count(*) FROM sprayer_trial_photos p WHERE p.trial_id = t.id) AS photos
         FROM sprayer_trials t WHERE t.vaccination_id = :vaccinationId ORDER BY t.recorded_at DESC, t.id DESC LIMIT 1`,
        { replacements: { vaccinationId }, type: QueryTypes.SELECT, transaction },
      );
      if (!trial) throw AppError.conflict('Record the sprayer trial first, then add its photo.', [{ field: 'photos', message: 'No trial yet.' }]);
      if (Number(trial.photos) + stored.length > maxPhotosPerTrial) {
        throw new AppError(413, 'too_large', `A trial keeps at most ${maxPhotosPerTrial} photos.`, [{ field: 'photos', message: 'Too many photos for this trial.' }]);
      }
      for (const photo of stored) {
        await context.sequelize.query(
          'INSERT INTO sprayer_trial_photos (trial_id, file_key, width, height, bytes, uploaded_by) VALUES (:trialId, :fileKey, :width, :height, :bytes, :actorId)',
          { replacements: { trialId: trial.id, fileKey: photo.fileKey, width: photo.width, height: photo.height, bytes: photo.display.length, actorId }, transaction },
        );
      }
      await recordAudit({ actorId, action: 'vaccination.trial_photos', entity: 'vaccination', entityId: vaccinationId, after: { trialId: trial.id, photos: stored.map((p) => p.fileKey) } }, transaction);
    }),
  );
  return loadRunView(context, vaccinationId);
}

export async function trialPhoto(context: AppContext, photoId: number): Promise<{ fileKey: string; siteId: number } | null> {
  const [row] = await context.sequelize.query<{ file_key: string; site_id: number }>(
    `SELECT p.file_key, h.site_id FROM sprayer_trial_photos p JOIN sprayer_trials t ON t.id = p.trial_id JOIN vaccinations v ON v.id = t.vaccination_id
       JOIN flocks f ON f.id = v.flock_id JOIN houses h ON h.id = f.house_id WHERE p.id = :photoId`,
    { replacements: { photoId }, type: QueryTypes.SELECT },
  );
  return row ? { fileKey: row.file_key, siteId: row.site_id } : null;
}

/** The display file of a trial photo; 404 when the row or its file is missing. */
export async function trialPhotoPath(context: AppContext, photoId: number): Promise<string> {
  const photo = await trialPhoto(context, photoId);
  if (!photo) throw AppError.notFound('No such photo.');
  const path = new PhotoStore(context.config.UPLOADS_DIR).pathOf(photo.fileKey, 'display');
  if (!existsSync(path)) throw AppError.notFound('The photo file is missing.');
  return path;
}
