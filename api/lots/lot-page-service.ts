// Assembles one lot's page: product, status with its holds and decisions, locations, movement history, exposure, flocks.
import { QueryTypes, type Sequelize } from 'sequelize';
import { Fridge, Hold, HoldDecision, Lot, Presentation, Product, Site, StockBalance, StockMovement, User } from '../../database/models/index.js';
import type { LotPage, LotPageFlock, LotPagePlace } from '../../shared/lots/lot-page.js';
import { computeLotExposure } from '../exposure/lot-exposure-service.js';
import { toDecisionView } from '../holds/hold-decisions-service.js';
import { canSeeSite } from '../http/access.js';
import { AppError } from '../http/app-error.js';
import { lotStatuses } from './lot-statuses.js';

export async function lotPage(sequelize: Sequelize, user: Express.User, lotId: number): Promise<LotPage> {
  const lot = await Lot.findByPk(lotId, { include: [{ model: Presentation, as: 'presentation', include: [{ model: Product, as: 'product' }] }] });
  const presentation = lot?.presentation;
  const product = presentation?.product;
  if (!lot || !presentation || !product) throw AppError.notFound('No such lot.');

  const movements = await StockMovement.findAll({ where: { lotId }, order: [['at', 'ASC'], ['id', 'ASC']] });
  const balances = await StockBalance.findAll({ where: { lotId } });
  const fridgeIds = [...new Set([...movements.flatMap((m) => [m.fromFridgeId, m.toFridgeId]), ...balances.map((b) => b.fridgeId)].filter((id): id is number => id !== null))];
  const fridges = new Map((await Fridge.findAll({ where: { id: fridgeIds } })).map((f) => [f.id, f]));
  const sites = new Map((await Site.findAll({ where: { id: [...new Set([...fridges.values()].map((f) => f.siteId))] } })).map((s) => [s.id, s]));
  const place = (fridgeId: number | null): LotPagePlace | null => {
    if (fridgeId === null) return null;
    const fridge = fridges.get(fridgeId)!;
    if (!canSeeSite(user, fridge.siteId)) return { fridgeId: null, fridgeCode: '', siteId: null, siteName: 'Another site', timeZone: null };
    const site = sites.get(fridge.siteId);
    return { fridgeId, fridgeCode: fridge.code, siteId: fridge.siteId, siteName: site?.name ?? '', timeZone: site?.timeZone ?? null };
  };
  // Movements come in the order they happened: the first site the user sees is where the lot first reached them.
  const siteOrder = movements.flatMap((m) => [m.fromFridgeId, m.toFridgeId]).filter((id): id is number => id !== null).map((id) => fridges.get(id)!.siteId);
  const lotSiteId = siteOrder.find((id) => canSeeSite(user, id)) ?? siteOrder[0];
  const timeZone = (lotSiteId !== undefined && sites.get(lotSiteId)?.timeZone) || 'UTC';
  const recorders = new Map((await User.findAll({ where: { id: [...new Set(movements.map((m) => m.recordedBy).filter((id): id is number => id !== null))] }, attributes: ['id', 'name'] })).map((u) => [u.id, u.name]));

  const holds = await Hold.findAll({ where: { lotId }, order: [['openedAt', 'ASC'], ['id', 'ASC']] });
  const decisions = await HoldDecision.findAll({ where: { holdId: holds.map((h) => h.id) }, order: [['signedAt', 'ASC'], ['id', 'ASC']] });
  const superseded = new Set(decisions.map((d) => d.supersedesId).filter((id): id is number => id !== null));
  const openers = new Map((await User.findAll({ where: { id: [...new Set(holds.map((h) => h.openedBy).filter((id): id is number => id !== null))] }, attributes: ['id', 'name'] })).map((u) => [u.id, u.name]));
  const state = (await lotStatuses([lotId])).get(lotId)!;
  const standing = new Set(state.holds.map((h) => h.id));

  const computed = await computeLotExposure(sequelize, lotId);
  const exposure: LotPage['exposure'] = { ...computed, limits: { lowC: computed.limits.lowC, highC: computed.limits.highC } };

  return {
    id: lot.id,
    lotNumber: lot.lotNumber,
    expiry: lot.expiry,
    expiryDayGiven: lot.expiryDayGiven,
    product: {
      id: product.id, name: product.name, storageLow: Number(product.storageLow), storageHigh: Number(product.storageHigh), storageUnit: product.storageUnit,
      freezeSensitive: product.freezeSensitive, timeOutLimitMinutes: product.timeOutLimitMinutes ?? null,
    },
    presentation: { id: presentation.id, dosesPerVial: presentation.dosesPerVial, vialsPerPack: presentation.vialsPerPack },
    status: state.status,
    vialsOnHand: state.vialsOnHand,
    holds: holds.map((hold) => ({
      id: hold.id, cause: hold.cause, reason: hold.reason, openedAt: hold.openedAt.toISOString(),
      openedBy: hold.openedBy === null ? null : (openers.get(hold.openedBy) ?? null),
      standing: standing.has(hold.id),
      decisions: decisions.filter((d) => d.holdId === hold.id).map((d) => {
        const { signatureMeaning: _meaning, holdId: _hold, ...view } = toDecisionView(d, superseded);
        return view;
      }),
    })),
    locations: mergeElsewhere(balances.filter((b) => b.vials > 0).map((b) => ({ ...place(b.fridgeId)!, vials: b.vials }))),
    history: movements.map((m) => ({
      id: Number(m.id), kind: m.kind, vials: m.vials, from: place(m.fromFridgeId), to: place(m.toFridgeId),
      leftAt: m.leftAt?.toISOString() ?? null, at: m.at.toISOString(), sourceKind: m.sourceKind, sourceId: m.sourceId, reason: m.reason,
      recordedBy: m.recordedBy === null ? null : (recorders.get(m.recordedBy) ?? null),
    })).reverse(),
    flocks: await flocksThatReceived(sequelize, user, lotId),
    plannedTransfers: await openPlannedTransfers(sequelize, user, lotId),
    timeZone,
    exposure,
  };
}

/** Balances on sites the user cannot see become one "another site" line. */
function mergeElsewhere(locations: LotPage['locations']): LotPage['locations'] {
  const visible = locations.filter((l) => l.fridgeId !== null).sort((a, b) => a.siteName.localeCompare(b.siteName) || a.fridgeCode.localeCompare(b.fridgeCode));
  const elsewhere = locations.filter((l) => l.fridgeId === null).reduce((sum, l) => sum + l.vials, 0);
  return elsewhere ? [...visible, { fridgeId: null, fridgeCode: '', siteId: null, siteName: 'Another site', timeZone: null, vials: elsewhere }] : visible;
}

async function openPlannedTransfers(sequelize: Sequelize, user: Express.User, lotId: number): Promise<LotPage['plannedTransfers']> {
  const rows = await sequelize.query<LotPage['plannedTransfers'][number]>(
    `SELECT t.id, t.from_site_id AS "fromSiteId", fs.name AS "fromSiteName", t.to_site_id AS "toSiteId", ts.name AS "toSiteName",
            t.vials, t.planned_on::text AS "plannedOn"
       FROM planned_transfers t JOIN sites fs ON fs.id = t.from_site_id JOIN sites ts ON ts.id = t.to_site_id
      WHERE t.lot_id = :lotId AND t.status = 'planned' ORDER BY t.planned_on, t.id`,
    { replacements: { lotId }, type: QueryTypes.SELECT },
  );
  return rows.filter((row) => canSeeSite(user, row.fromSiteId) && canSeeSite(user, row.toSiteId));
}

/** Vaccinations the lot was issued to (vaccination-day issue and return movements name the vaccination). */
async function flocksThatReceived(sequelize: Sequelize, user: Express.User, lotId: number): Promise<LotPageFlock[]> {
  const rows = await sequelize.query<LotPageFlock & { siteId: number }>(
    `SELECT v.id AS "vaccinationId", v.planned_date::text AS "plannedDate", v.status, fl.id AS "flockId", fl.name AS "flockName",
            h.name AS "houseName", s.id AS "siteId", s.name AS "siteName",
            coalesce(sum(m.vials) FILTER (WHERE m.kind = 'issue'), 0)::int AS "vialsIssued",
            coalesce(sum(m.vials) FILTER (WHERE m.kind = 'return'), 0)::int AS "vialsReturned"
       FROM stock_movements m JOIN vaccinations v ON v.id = m.source_id JOIN flocks fl ON fl.id = v.flock_id
       JOIN houses h ON h.id = fl.house_id JOIN sites s ON s.id = h.site_id
      WHERE m.lot_id = :lotId AND m.source_kind = 'vaccination' AND m.kind IN ('issue', 'return')
      GROUP BY v.id, fl.id, h.id, s.id
      ORDER BY v.planned_date DESC, v.id`,
    { replacements: { lotId }, type: QueryTypes.SELECT },
  );
  return rows.filter((row) => canSeeSite(user, row.siteId)).map(({ siteId: _site, ...row }) => row);
}
