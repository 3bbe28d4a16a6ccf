// Projections for the sites a user sees: each site planned on its own stock, then offered other sites' spare lots where it falls short.
import { Op } from 'sequelize';
import { Site } from '../../database/models/index.js';
import type { ProductStockSettingsView } from '../../shared/demand/demand-schemas.js';
import { projectSite } from '../../shared/demand/project-site.js';
import type { SiteProjection } from '../../shared/demand/projection-types.js';
import type { SiteProjectionView } from '../../shared/demand/projection-view.js';
import { transferCandidates, type SpareLot } from '../../shared/demand/transfer-candidates.js';
import { dataVersion } from '../cache/data-versions.js';
import { VersionedCache } from '../cache/versioned-cache.js';
import { siteToday } from '../flocks/site-today.js';
import { AppError } from '../http/app-error.js';
import { listPurchaseOrders } from '../purchase-orders/purchase-orders-service.js';
import { nextReference } from './next-reference.js';
import { withSendings } from './order-sendings.js';
import { loadProjectionInput, type LoadedProjection } from './projection-inputs.js';
import { loadTransferViews } from './transfer-view.js';

interface Projected {
  loaded: LoadedProjection;
  projection: SiteProjection;
}

function spareLots(site: Site, { loaded, projection }: Projected): SpareLot[] {
  const left = new Map(projection.lotsLeft.map((entry) => [entry.id, entry.vials]));
  return loaded.input.lots.flatMap((lot) => {
    const vials = left.get(lot.id) ?? 0;
    if (lot.source !== 'stock' || lot.status !== 'usable' || vials === 0 || lot.expiry < projection.today) return [];
    return [{ siteId: site.id, siteName: site.name, lotId: lot.lotId!, lotNumber: lot.label, productId: lot.productId, dosesPerVial: lot.dosesPerVial, expiry: lot.expiry, spareVials: vials }];
  });
}

function settingsViews(siteId: number, { loaded, projection }: Projected): ProductStockSettingsView[] {
  return projection.products.map((product) => {
    const saved = loaded.settings.get(product.productId);
    return {
      siteId,
      productId: product.productId,
      productName: product.productName,
      safetyStockKind: saved?.safetyStockKind ?? 'doses',
      safetyStockValue: saved?.safetyStockValue ?? 0,
      supplierId: saved?.supplierId ?? null,
      presentationId: saved?.presentationId ?? null,
      serviceLevel: saved?.serviceLevel ?? null,
      saved: saved !== undefined,
    };
  });
}

/** The planner refuses vial sizes too close to coprime to plan exactly (e.g. 1,000 and 1,001 doses): say so, never a 500. */
function planOrExplain(site: Site, loaded: LoadedProjection): SiteProjection {
  try {
    return projectSite(loaded.input);
  } catch (error) {
    if (error instanceof RangeError) throw AppError.unprocessable(`${site.name} cannot be planned exactly: ${error.message}. Check the packs' doses per vial in the catalogue.`);
    throw error;
  }
}

/**
 * Every visible site's view. It depends on the user only through the set of sites they see (each may lend to
 * another), so it is cached per site set, data version and each site's today.
 */
const cachedViews = new VersionedCache<SiteProjectionView[]>();

/** Projections of `wanted` sites; every site the user sees is planned, since each may lend to another. */
export async function projectSites(user: Express.User, wanted: number[] | 'all', now = new Date()): Promise<SiteProjectionView[]> {
  const version = await dataVersion('projection');
  const sites = await Site.findAll({ where: user.allSites ? {} : { id: { [Op.in]: user.siteIds } }, order: [['name', 'ASC']] });
  const key = sites.map((site) => `${site.id}:${siteToday(site, now)}`).join(',');
  const all = version === null ? await viewsOfSites(user, sites, now) : await cachedViews.get(version, key, () => viewsOfSites(user, sites, now));
  // 'all' hands back the cached array itself, so what is derived from it can be kept beside it (see cachedJson).
  return wanted === 'all' ? all : all.filter((view) => wanted.includes(view.siteId));
}

/** Forgets every cached body (tests that compare a cold computation with a cached one). */
export function clearProjectionCache(): void {
  cachedViews.clear();
}

async function viewsOfSites(user: Express.User, sites: Site[], now: Date): Promise<SiteProjectionView[]> {
  const projected = new Map<number, Projected>();
  for (const site of sites) {
    const loaded = await loadProjectionInput(site.id, now);
    projected.set(site.id, { loaded, projection: planOrExplain(site, loaded) });
  }
  const spare = new Map(sites.map((site) => [site.id, spareLots(site, projected.get(site.id)!)]));
  const views: SiteProjectionView[] = [];
  for (const site of sites) {
    const own = projected.get(site.id)!;
    const othersSpare = sites.filter((other) => other.id !== site.id).flatMap((other) => spare.get(other.id)!);
    const borrowing = own.projection.products
      .filter((product) => product.firstShortfallDate !== null)
      .map((product) => ({
        productId: product.productId,
        productName: product.productName,
        candidates: transferCandidates({ productId: product.productId, firstShortfallDate: product.firstShortfallDate!, shortfallDoses: product.shortfallDoses }, othersSpare),
      }))
      .filter((entry) => entry.candidates.length > 0);
    views.push({
      ...own.projection,
      siteId: site.id,
      siteName: site.name,
      siteCode: site.code,
      horizonDays: own.loaded.input.horizonDays,
      transfers: await loadTransferViews({ siteId: site.id }),
      borrowing,
      settings: settingsViews(site.id, own),
      nextReference: await nextReference(site.code, own.projection.today),
      openOrders: await withSendings(await listPurchaseOrders(user, { status: 'open', siteId: site.id })),
    });
  }
  return views;
}
