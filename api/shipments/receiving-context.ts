// What the receiving form needs for one site: its fridges and how soon lots should be in one.
import { Fridge, Site } from '../../database/models/index.js';
import type { ReceivingContext } from '../../shared/receiving/shipment-view.js';
import { siteSettingsSchema } from '../../shared/sites/site-schemas.js';
import { AppError } from '../http/app-error.js';

export async function receivingContext(siteId: number): Promise<ReceivingContext> {
  const site = await Site.findByPk(siteId);
  if (!site) throw AppError.notFound('No such site.');
  const fridges = await Fridge.findAll({ where: { siteId }, order: [['code', 'ASC']], attributes: ['id', 'code', 'name'] });
  return {
    siteId,
    siteName: site.name,
    timeZone: site.timeZone,
    storeWithinMinutes: siteSettingsSchema.parse(site.settings ?? {}).storeWithinMinutes,
    fridges: fridges.map((f) => ({ id: f.id, code: f.code, name: f.name })),
  };
}
