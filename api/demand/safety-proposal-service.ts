// Proposes a product's safety stock at a site from its recorded use (issues less returns) by the textbook rule, for a chosen service level.
import { QueryTypes } from 'sequelize';
import { Product, ProductStockSetting, Site, Supplier } from '../../database/models/index.js';
import { MIN_HISTORY_WEEKS, proposeFromWeeklyUse, type SafetyStockProposalView } from '../../shared/demand/safety-stock-proposal.js';
import { weeklyDemand } from '../../shared/demand/weekly-demand.js';
import { siteToday } from '../flocks/site-today.js';
import { AppError } from '../http/app-error.js';
import { loadProjectionInput } from './projection-inputs.js';

/** Doses used per site-local day: vials issued from the site's fridges less vials returned to them, times doses per vial. */
async function dailyUse(siteId: number, productId: number, timeZone: string): Promise<{ date: string; doses: number }[]> {
  return Product.sequelize!.query<{ date: string; doses: number }>(
    `SELECT to_char((m.at AT TIME ZONE :timeZone)::date, 'YYYY-MM-DD') AS date,
            SUM(CASE m.kind WHEN 'issue' THEN m.vials ELSE -m.vials END * p.doses_per_vial)::integer AS doses
       FROM stock_movements m
       JOIN lots l ON l.id = m.lot_id
       JOIN presentations p ON p.id = l.presentation_id
       JOIN fridges f ON f.id = COALESCE(m.from_fridge_id, m.to_fridge_id)
      WHERE f.site_id = :siteId AND p.product_id = :productId AND m.kind IN ('issue', 'return')
      GROUP BY 1`,
    { replacements: { siteId, productId, timeZone }, type: QueryTypes.SELECT },
  );
}

export async function proposeSafetyStockFor(siteId: number, productId: number, serviceLevel: number, now = new Date()): Promise<SafetyStockProposalView> {
  const site = await Site.findByPk(siteId);
  if (!site) throw AppError.notFound('No such site.');
  const product = await Product.findByPk(productId);
  if (!product) throw AppError.notFound('No such product.');
  const setting = await ProductStockSetting.findOne({ where: { siteId, productId } });
  const supplier = setting?.supplierId
    ? await Supplier.findByPk(setting.supplierId)
    : (await loadProjectionInput(siteId, now)).input.products.find((p) => p.productId === productId)?.supplier;
  if (!supplier) {
    throw AppError.unprocessable('The proposal needs the supplier’s lead time: choose a supplier for this product first.', [
      { field: 'supplierId', message: 'Choose a supplier.' },
    ]);
  }
  const history = weeklyDemand(await dailyUse(siteId, productId, site.timeZone), siteToday(site, now));
  const proposal = proposeFromWeeklyUse(history, serviceLevel, supplier.leadTimeDays);
  if (!proposal) {
    throw AppError.unprocessable(
      `Not enough recorded use of ${product.name} at this site to propose a safety stock: ${history.length} of ${MIN_HISTORY_WEEKS} weeks needed. Enter it by hand.`,
      [{ field: 'serviceLevel', message: 'Not enough history.' }],
    );
  }
  return proposal;
}
