// An unknown GTIN at the door: a proposed presentation (and, if need be, a proposed product) usable at once.
import { Presentation, Product } from '../../database/models/index.js';
import type { PresentationProposal } from '../../shared/catalogue/presentation-schemas.js';
import type { ProductView } from '../../shared/catalogue/product-schemas.js';
import { DEFAULT_STORAGE_RANGE } from '../../shared/temperature/index.js';
import type { AppContext } from '../app-context.js';
import { recordAudit } from '../audit/record-audit.js';
import { AppError } from '../http/app-error.js';
import { assertGtinsFree } from './gtin-uniqueness.js';
import { loadProductView } from './products-service.js';

export async function proposePresentation(context: AppContext, actorId: number, proposal: PresentationProposal): Promise<{ product: ProductView; presentationId: number }> {
  return context.sequelize.transaction(async (transaction) => {
    const gtins = proposal.gtinLevel === 'pack' ? { packGtin: proposal.gtin, vialGtin: null } : { packGtin: null, vialGtin: proposal.gtin };
    await assertGtinsFree(gtins, null, transaction);
    let productId = proposal.productId;
    if (productId !== null) {
      if (!(await Product.findByPk(productId, { transaction }))) {
        throw AppError.badRequest('No such product.', [{ field: 'productId', message: 'Unknown product.' }]);
      }
    } else {
      const existing = await Product.findOne({ where: { name: proposal.productName }, transaction });
      // Until purchasing reads the label into the catalogue, the common 35–45 °F range stands in for it.
      const product =
        existing ??
        (await Product.create(
          {
            name: proposal.productName,
            kind: null,
            route: null,
            storageLow: DEFAULT_STORAGE_RANGE.low,
            storageHigh: DEFAULT_STORAGE_RANGE.high,
            storageUnit: DEFAULT_STORAGE_RANGE.unit,
            useWithinMinutes: null,
            timeOutLimitMinutes: null,
            status: 'proposed',
            proposedBy: actorId,
            notes: 'Proposed at receiving from an unknown barcode: check the label.',
          },
          { transaction },
        ));
      productId = product.id;
    }
    const presentation = await Presentation.create(
      { productId, dosesPerVial: proposal.dosesPerVial, vialsPerPack: proposal.vialsPerPack, ...gtins, unitPrice: null, status: 'proposed', proposedBy: actorId, proposedAt: new Date() },
      { transaction },
    );
    const product = await loadProductView(productId, transaction);
    await recordAudit({ actorId, action: 'presentation.propose', entity: 'presentation', entityId: presentation.id, after: { proposal, productId } }, transaction);
    return { product, presentationId: presentation.id };
  });
}
