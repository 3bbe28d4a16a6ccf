// Purchasing's per-site settings for a product: safety stock in doses or days of cover, preferred supplier and pack.
import { Presentation, Product, ProductStockSetting, Site, Supplier } from '../../database/models/index.js';
import type { ProductStockSettingsInput, ProductStockSettingsView } from '../../shared/demand/demand-schemas.js';
import type { AppContext } from '../app-context.js';
import { recordAudit } from '../audit/record-audit.js';
import { AppError } from '../http/app-error.js';

function toView(setting: ProductStockSetting, productName: string): ProductStockSettingsView {
  return {
    siteId: setting.siteId,
    productId: setting.productId,
    productName,
    safetyStockKind: setting.safetyStockKind,
    safetyStockValue: setting.safetyStockValue,
    supplierId: setting.supplierId,
    presentationId: setting.presentationId,
    serviceLevel: setting.serviceLevel,
    saved: true,
  };
}

export async function saveStockSettings(
  context: AppContext,
  actorId: number,
  siteId: number,
  productId: number,
  input: ProductStockSettingsInput,
): Promise<ProductStockSettingsView> {
  return context.sequelize.transaction(async (transaction) => {
    if (!(await Site.findByPk(siteId, { transaction }))) throw AppError.notFound('No such site.');
    const product = await Product.findByPk(productId, { transaction });
    if (!product) throw AppError.notFound('No such product.');
    if (input.supplierId !== null && !(await Supplier.findByPk(input.supplierId, { transaction }))) {
      throw AppError.badRequest('No such supplier.', [{ field: 'supplierId', message: 'Unknown supplier.' }]);
    }
    if (input.presentationId !== null) {
      const presentation = await Presentation.findByPk(input.presentationId, { transaction });
      if (!presentation || presentation.productId !== productId) {
        throw AppError.badRequest('That pack is not one of this product’s.', [{ field: 'presentationId', message: 'Choose a pack of this product.' }]);
      }
      if (presentation.status !== 'confirmed') throw AppError.conflict('That pack is still a proposal.', [{ field: 'presentationId', message: 'Confirm it in the catalogue first.' }]);
    }
    const existing = await ProductStockSetting.findOne({ where: { siteId, productId }, transaction, lock: transaction.LOCK.UPDATE });
    const before = existing ? toView(existing, product.name) : null;
    const fields = { ...input, siteId, productId, updatedBy: actorId, updatedAt: new Date() };
    const setting = existing ? await existing.update(fields, { transaction }) : await ProductStockSetting.create(fields, { transaction });
    const after = toView(setting, product.name);
    await recordAudit({ actorId, action: 'stock_settings.save', entity: 'product_stock_settings', entityId: `${siteId}:${productId}`, before, after }, transaction);
    return after;
  });
}
