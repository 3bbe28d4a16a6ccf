// Vaccination-day records on a given site for the role matrix: a photo of a sprayer trial.
import { randomUUID } from 'node:crypto';
import { Site, User } from '../../database/models/index.js';
import { PhotoStore } from '../../api/photos/photo-store.js';
import { processPhoto } from '../../api/photos/process-photo.js';
import { createFlock, createHouse, createProduct, createVaccination, siteDay } from './flock-fixtures.js';
import { makeJpeg } from './receiving-fixtures.js';
import { testConfig } from './test-app.js';

async function makeTrialPhoto(siteId: number): Promise<number> {
  const site = (await Site.findByPk(siteId))!;
  const vaccination = await createVaccination(await createFlock(await createHouse(site)), await createProduct(), siteDay(site, 0), 'confirmed');
  const user = await User.create({ email: `trial-${randomUUID().slice(0, 6)}@test.example`, name: 'Trial maker', roles: ['crew'], passwordHash: 'x' });
  const sequelize = Site.sequelize!;
  const [[trial]] = (await sequelize.query(
    `INSERT INTO sprayer_trials (vaccination_id, result, nozzle_height_cm, walking_pace_m_per_min, recorded_by) VALUES (:id, 'acceptable', 90, 20, :userId) RETURNING id`,
    { replacements: { id: vaccination.id, userId: user.id } },
  )) as [{ id: number }[], unknown];
  const [stored] = await new PhotoStore(testConfig().UPLOADS_DIR).write([await processPhoto({ buffer: await makeJpeg(64, 48), originalname: 'paper.jpg' }, 0)]);
  const [[photo]] = (await sequelize.query(
    'INSERT INTO sprayer_trial_photos (trial_id, file_key, width, height, bytes, uploaded_by) VALUES (:trialId, :fileKey, :width, :height, :bytes, :userId) RETURNING id',
    { replacements: { trialId: trial!.id, fileKey: stored!.fileKey, width: stored!.width, height: stored!.height, bytes: stored!.display.length, userId: user.id } },
  )) as [{ id: number }[], unknown];
  return photo!.id;
}

export const vaccinationDayRecordMakers: Record<string, (siteId: number) => Promise<number>> = {
  trialPhotoId: makeTrialPhoto,
};
