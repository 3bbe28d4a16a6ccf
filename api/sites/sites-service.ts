// Sites: what a user may see, and the admin's changes to them.
import { siteSettingsSchema, type SiteInput, type SiteView } from '../../shared/sites/site-schemas.js';
import { Site } from '../../database/models/index.js';
import type { AppContext } from '../app-context.js';
import { recordAudit } from '../audit/record-audit.js';
import { AppError } from '../http/app-error.js';

export function toSiteView(site: Site): SiteView {
  return {
    id: site.id,
    code: site.code,
    name: site.name,
    timeZone: site.timeZone,
    settings: siteSettingsSchema.parse(site.settings ?? {}),
  };
}

export async function listVisibleSites(user: Express.User): Promise<SiteView[]> {
  const where = user.allSites ? {} : { id: user.siteIds };
  return (await Site.findAll({ where, order: [['name', 'ASC']] })).map(toSiteView);
}

export async function getSite(id: number): Promise<SiteView> {
  const site = await Site.findByPk(id);
  if (!site) throw AppError.notFound('No such site.');
  return toSiteView(site);
}

export async function saveSite(context: AppContext, actorId: number, id: number | null, input: SiteInput): Promise<SiteView> {
  return context.sequelize.transaction(async (transaction) => {
    const clash = await Site.findOne({ where: { code: input.code }, transaction });
    if (clash && clash.id !== id) {
      throw AppError.conflict('Another site has this code.', [{ field: 'code', message: 'Already in use.' }]);
    }
    if (id === null) {
      const site = await Site.create({ ...input, settings: siteSettingsSchema.parse(input.settings) }, { transaction });
      await recordAudit({ actorId, action: 'site.create', entity: 'site', entityId: site.id, after: toSiteView(site) }, transaction);
      return toSiteView(site);
    }
    const site = await Site.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
    if (!site) throw AppError.notFound('No such site.');
    const before = toSiteView(site);
    const settings = siteSettingsSchema.parse({ ...before.settings, ...input.settings });
    await site.update({ code: input.code, name: input.name, timeZone: input.timeZone, settings }, { transaction });
    await recordAudit({ actorId, action: 'site.update', entity: 'site', entityId: id, before, after: toSiteView(site) }, transaction);
    return toSiteView(site);
  });
}
