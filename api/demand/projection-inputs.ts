// Reads what one site's projection needs from the database: stock per lot, holds, planned transfers, open orders, vaccinations, settings.
import { Op } from 'sequelize';
import {
  BirdCount,
  Flock,
  Fridge,
  House,
  Lot,
  PlannedTransfer,
  Presentation,
  Product,
  ProductStockSetting,
  PurchaseOrder,
  PurchaseOrderLine,
  Site,
  StockBalance,
  StockMovement,
  Supplier,
  Vaccination,
} from '../../database/models/index.js';
import { presentationLabel } from '../../shared/catalogue/presentation-label.js';
import type { ProductPlanning, ProjectionInput, ProjectionLot, ProjectionVaccination } from '../../shared/demand/projection-types.js';
import { currentBirds } from '../../shared/flocks/current-birds.js';
import { siteSettingsSchema } from '../../shared/sites/site-schemas.js';
import { siteToday } from '../flocks/site-today.js';
import { AppError } from '../http/app-error.js';
import { undecidedHoldsByLot } from '../lots/holds.js';

async function vaccinationsWithVialsOut(vaccinationIds: number[]): Promise<Set<number>> {
  if (!vaccinationIds.length) return new Set();
  const issued = await StockMovement.findAll({
    where: { kind: 'issue', sourceKind: 'vaccination', sourceId: vaccinationIds },
    attributes: ['sourceId'],
  });
  return new Set(issued.map((m) => m.sourceId!));
}

/** Stock on order has no lot and so no expiry yet; it sorts after every real lot. */
export const UNKNOWN_EXPIRY = '9999-12-31';

export interface SiteStockLot {
  lot: Lot;
  vials: number;
  onHold: boolean;
}

export interface LoadedProjection {
  site: Site;
  input: ProjectionInput;
  /** The site's own lots with the vials in its fridges (before planned transfers). */
  stock: SiteStockLot[];
  settings: Map<number, ProductStockSetting>;
}

async function stockAtSite(siteId: number): Promise<SiteStockLot[]> {
  const fridges = await Fridge.findAll({ where: { siteId }, attributes: ['id'] });
  const balances = fridges.length ? await StockBalance.findAll({ where: { fridgeId: fridges.map((f) => f.id), vials: { [Op.gt]: 0 } } }) : [];
  const vials = new Map<number, number>();
  for (const balance of balances) vials.set(balance.lotId, (vials.get(balance.lotId) ?? 0) + balance.vials);
  const lots = await Lot.findAll({ where: { id: [...vials.keys()] }, include: [{ model: Presentation, as: 'presentation', include: [{ model: Product, as: 'product' }] }] });
  const holds = await undecidedHoldsByLot(lots.map((lot) => lot.id));
  return lots.map((lot) => ({ lot, vials: vials.get(lot.id)!, onHold: (holds.get(lot.id)?.length ?? 0) > 0 }));
}

/** The supplier each product was last ordered from (any site): the fallback when purchasing has set none. */
async function lastSuppliers(productIds: number[]): Promise<Map<number, Supplier>> {
  if (!productIds.length) return new Map();
  const orders = await PurchaseOrder.findAll({
    where: { status: { [Op.ne]: 'cancelled' } },
    include: [
      { model: Supplier, as: 'supplier' },
      {
        model: PurchaseOrderLine,
        as: 'lines',
        required: true,
        include: [{ model: Presentation, as: 'presentation', where: { productId: productIds }, attributes: ['id', 'productId'] }],
      },
    ],
    order: [['id', 'DESC']],
  });
  const found = new Map<number, Supplier>();
  for (const order of orders) {
    for (const line of order.lines ?? []) if (!found.has(line.presentation!.productId)) found.set(line.presentation!.productId, order.supplier!);
  }
  return found;
}

export async function loadProjectionInput(siteId: number, now = new Date()): Promise<LoadedProjection> {
  const site = await Site.findByPk(siteId);
  if (!site) throw AppError.notFound('No such site.');
  const settings = siteSettingsSchema.parse(site.settings ?? {});
  const today = siteToday(site, now);
  const stock = await stockAtSite(siteId);

  const transfers = await PlannedTransfer.findAll({ where: { status: 'planned', [Op.or]: [{ fromSiteId: siteId }, { toSiteId: siteId }] } });
  const outgoing = new Map<number, number>();
  for (const t of transfers.filter((t) => t.fromSiteId === siteId)) outgoing.set(t.lotId, (outgoing.get(t.lotId) ?? 0) + t.vials);
  const incoming = transfers.filter((t) => t.toSiteId === siteId);
  const incomingLots = await Lot.findAll({ where: { id: incoming.map((t) => t.lotId) }, include: [{ model: Presentation, as: 'presentation' }] });
  const incomingHolds = await undecidedHoldsByLot(incomingLots.map((lot) => lot.id));
  const lotById = new Map(incomingLots.map((lot) => [lot.id, lot]));

  const orders = await PurchaseOrder.findAll({
    where: { siteId, status: 'open' },
    include: [{ model: PurchaseOrderLine, as: 'lines', include: [{ model: Presentation, as: 'presentation' }] }],
  });

  const lots: ProjectionLot[] = [
    ...stock.map(({ lot, vials, onHold }) => ({
      id: lot.id,
      lotId: lot.id,
      label: lot.lotNumber,
      source: 'stock' as const,
      productId: lot.presentation!.productId,
      presentationId: lot.presentationId,
      dosesPerVial: lot.presentation!.dosesPerVial,
      // Vials promised to another site by a planned transfer are not this site's to plan with.
      vials: Math.max(0, vials - (outgoing.get(lot.id) ?? 0)),
      expiry: lot.expiry,
      status: onHold ? ('hold' as const) : ('usable' as const),
      availableFrom: null,
    })),
    ...incoming.flatMap((t) => {
      const lot = lotById.get(t.lotId);
      if (!lot) return [];
      return [{
        id: `transfer-${t.id}`,
        lotId: lot.id,
        label: lot.lotNumber,
        source: 'transfer' as const,
        productId: lot.presentation!.productId,
        presentationId: lot.presentationId,
        dosesPerVial: lot.presentation!.dosesPerVial,
        vials: t.vials,
        expiry: lot.expiry,
        status: (incomingHolds.get(lot.id)?.length ?? 0) > 0 ? ('hold' as const) : ('usable' as const),
        availableFrom: t.plannedOn > today ? t.plannedOn : null,
      }];
    }),
    ...orders.flatMap((order) =>
      (order.lines ?? []).map((line) => ({
        id: `order-${line.id}`,
        lotId: null,
        label: order.reference,
        source: 'order' as const,
        productId: line.presentation!.productId,
        presentationId: line.presentationId,
        dosesPerVial: line.presentation!.dosesPerVial,
        vials: line.packs * line.presentation!.vialsPerPack,
        expiry: UNKNOWN_EXPIRY,
        status: 'usable' as const,
        // An overdue order is counted as arriving today: it is on its way, not lost.
        availableFrom: order.expectedDate > today ? order.expectedDate : null,
      })),
    ),
  ];

  const houses = await House.findAll({ where: { siteId }, attributes: ['id', 'name'] });
  const houseNames = new Map(houses.map((h) => [h.id, h.name]));
  const flocks = await Flock.findAll({ where: { houseId: houses.map((h) => h.id), depletedOn: null }, include: [{ model: BirdCount, as: 'birdCounts' }] });
  const flockById = new Map(flocks.map((f) => [f.id, f]));
  const open = await Vaccination.findAll({ where: { flockId: flocks.map((f) => f.id), status: ['planned', 'confirmed'] } });
  // Once vials left the fridge for a vaccination its need is met by them (unused ones come back as returns):
  // planning it again from what is left would count those vials twice.
  const underway = await vaccinationsWithVialsOut(open.map((v) => v.id));
  const vaccinations: ProjectionVaccination[] = open.filter((v) => !underway.has(v.id)).map((v) => {
    const flock = flockById.get(v.flockId)!;
    return {
      id: v.id,
      flockId: flock.id,
      flockName: flock.name,
      houseName: houseNames.get(flock.houseId) ?? '',
      productId: v.productId,
      plannedDate: v.plannedDate,
      birds: currentBirds(flock.birdsPlaced, flock.birdCounts ?? []),
    };
  });

  const stockSettings = await ProductStockSetting.findAll({ where: { siteId } });
  const settingsByProduct = new Map(stockSettings.map((s) => [s.productId, s]));
  const productIds = [...new Set([...lots.map((l) => l.productId), ...vaccinations.map((v) => v.productId), ...settingsByProduct.keys()])];
  const products = await Product.findAll({ where: { id: productIds }, include: [{ model: Presentation, as: 'presentations' }] });
  const suppliers = new Map((await Supplier.findAll({ where: { id: stockSettings.flatMap((s) => (s.supplierId ? [s.supplierId] : [])) } })).map((s) => [s.id, s]));
  const fallbackSuppliers = await lastSuppliers(productIds);

  const planning: ProductPlanning[] = products.map((product) => {
    const setting = settingsByProduct.get(product.id);
    const supplier = (setting?.supplierId ? suppliers.get(setting.supplierId) : undefined) ?? fallbackSuppliers.get(product.id) ?? null;
    return {
      productId: product.id,
      productName: product.name,
      safetyStock:
        setting?.safetyStockKind === 'days' ? { kind: 'days', days: setting.safetyStockValue } : { kind: 'doses', doses: setting?.safetyStockValue ?? 0 },
      supplier: supplier && { id: supplier.id, name: supplier.name, leadTimeDays: supplier.leadTimeDays },
      presentationId: setting?.presentationId ?? null,
    };
  });

  return {
    site,
    stock,
    settings: settingsByProduct,
    input: {
      today,
      horizonDays: settings.projectionHorizonDays,
      overagePercent: settings.overagePercent,
      expiryAlertDays: settings.expiryAlertDays,
      reorderMarginDays: settings.reorderMarginDays,
      lots,
      vaccinations,
      // Only confirmed packs are ordered: a proposed one from an unknown barcode is not yet checked against the label.
      presentations: products.flatMap((product) =>
        (product.presentations ?? [])
          .filter((p) => p.status === 'confirmed')
          .map((p) => ({ id: p.id, productId: product.id, label: presentationLabel(product.name, p), dosesPerVial: p.dosesPerVial, vialsPerPack: p.vialsPerPack, unitPrice: p.unitPrice })),
      ),
      products: planning,
    },
  };
}
