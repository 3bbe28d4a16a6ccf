// Shapes planned transfers for the API with lot, product and site names.
import { Op } from 'sequelize';
import { Lot, PlannedTransfer, Presentation, Product, Site } from '../../database/models/index.js';
import type { PlannedTransferView } from '../../shared/demand/demand-schemas.js';

export async function loadTransferViews(where: { siteId?: number; id?: number }): Promise<PlannedTransferView[]> {
  const transfers = await PlannedTransfer.findAll({
    where: where.id !== undefined ? { id: where.id } : { status: 'planned', [Op.or]: [{ fromSiteId: where.siteId }, { toSiteId: where.siteId }] },
    order: [['plannedOn', 'ASC'], ['id', 'ASC']],
  });
  const lots = new Map(
    (await Lot.findAll({ where: { id: transfers.map((t) => t.lotId) }, include: [{ model: Presentation, as: 'presentation', include: [{ model: Product, as: 'product' }] }] })).map((l) => [l.id, l]),
  );
  const sites = new Map((await Site.findAll({ where: { id: transfers.flatMap((t) => [t.fromSiteId, t.toSiteId]) } })).map((s) => [s.id, s]));
  return transfers.map((t) => {
    const lot = lots.get(t.lotId)!;
    return {
      id: t.id,
      lotId: t.lotId,
      lotNumber: lot.lotNumber,
      productId: lot.presentation!.productId,
      productName: lot.presentation!.product!.name,
      fromSiteId: t.fromSiteId,
      fromSiteName: sites.get(t.fromSiteId)?.name ?? '',
      toSiteId: t.toSiteId,
      toSiteName: sites.get(t.toSiteId)?.name ?? '',
      vials: t.vials,
      plannedOn: t.plannedOn,
      status: t.status,
      notes: t.notes,
    };
  });
}
