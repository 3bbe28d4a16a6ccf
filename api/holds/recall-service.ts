// A recall: a veterinarian names a lot number (any letter case, optionally one product) and every matching lot on
// every site is held, as one event in the review queue.
import { QueryTypes, type Sequelize } from 'sequelize';
import type { RecallInput } from '../../shared/lots/recall-schema.js';
import { Product, Recall } from '../../database/models/index.js';
import { recordAudit } from '../audit/record-audit.js';
import { AppError } from '../http/app-error.js';
import { openHold } from '../lots/holds.js';

export interface RecallView {
  id: number;
  lotNumber: string;
  productId: number | null;
  reason: string;
  placedAt: string;
  lots: { lotId: number; lotNumber: string; product: string; holdId: number | null }[];
}

export async function placeRecall(sequelize: Sequelize, actorId: number, input: RecallInput): Promise<RecallView> {
  if (input.productId !== null && !(await Product.findByPk(input.productId, { attributes: ['id'] }))) {
    throw AppError.badRequest('No such product.', [{ field: 'productId', message: 'Unknown product.' }]);
  }
  return sequelize.transaction(async (transaction) => {
    const lots = await sequelize.query<{ id: number; lot_number: string; product: string }>(
      `SELECT l.id, l.lot_number, pr.name AS product FROM lots l JOIN presentations p ON p.id = l.presentation_id JOIN products pr ON pr.id = p.product_id
        WHERE lower(l.lot_number) = lower(:lotNumber) AND (:productId::int IS NULL OR pr.id = :productId::int) ORDER BY l.id`,
      { replacements: { lotNumber: input.lotNumber, productId: input.productId }, type: QueryTypes.SELECT, transaction },
    );
    if (!lots.length) {
      throw AppError.unprocessable(`No lot numbered ${input.lotNumber}${input.productId ? ' of that product' : ''} was ever received, so nothing was recalled.`, [
        { field: 'lotNumber', message: 'No lot with this number.' },
      ]);
    }
    const recall = await Recall.create({ lotNumber: input.lotNumber, productId: input.productId, reason: input.reason, placedBy: actorId }, { transaction });
    const held: RecallView['lots'] = [];
    for (const lot of lots) {
      const holdId = await openHold({ lotId: lot.id, cause: 'recall', sourceKind: 'recall', sourceId: recall.id, reason: input.reason, openedBy: actorId }, transaction);
      held.push({ lotId: lot.id, lotNumber: lot.lot_number, product: lot.product, holdId });
    }
    const view: RecallView = { id: recall.id, lotNumber: recall.lotNumber, productId: recall.productId, reason: recall.reason, placedAt: recall.placedAt.toISOString(), lots: held };
    await recordAudit({ actorId, action: 'recall.place', entity: 'recall', entityId: recall.id, after: view }, transaction);
    return view;
  });
}
