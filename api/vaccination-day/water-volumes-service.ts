// Water for the mix per product and age, entered from the label or by the veterinarian (Vialyard never invents it); the newest entry counts.
import { QueryTypes } from 'sequelize';
import { Product } from '../../database/models/index.js';
import type { WaterVolumeInput } from '../../shared/vaccination-day/day-schemas.js';
import type { WaterVolumeView } from '../../shared/vaccination-day/day-views.js';
import type { AppContext } from '../app-context.js';
import { recordAudit } from '../audit/record-audit.js';
import { AppError } from '../http/app-error.js';

export async function listWaterVolumes(context: AppContext, productId?: number): Promise<WaterVolumeView[]> {
  const rows = await context.sequelize.query<Record<string, unknown>>(
    `SELECT w.*, p.name AS product_name, u.name AS entered_by_name FROM water_volumes w JOIN products p ON p.id = w.product_id JOIN users u ON u.id = w.entered_by
     ${productId ? 'WHERE w.product_id = :productId' : ''} ORDER BY p.name, w.age_from_days, w.entered_at DESC`,
    { replacements: { productId: productId ?? null }, type: QueryTypes.SELECT },
  );
  return rows.map((r) => ({
    id: r.id as number,
    productId: r.product_id as number,
    productName: r.product_name as string,
    ageFromDays: r.age_from_days as number,
    ageToDays: r.age_to_days as number,
    mlPer1000Birds: Number(r.ml_per_1000_birds),
    source: r.source as 'label' | 'veterinarian',
    note: r.note as string,
    enteredBy: r.entered_by_name as string,
    enteredAt: (r.entered_at as Date).toISOString(),
  }));
}

export async function addWaterVolume(context: AppContext, actorId: number, input: WaterVolumeInput): Promise<WaterVolumeView> {
  if (!(await Product.findByPk(input.productId))) throw AppError.unprocessable('No such product.', [{ field: 'productId', message: 'Unknown product.' }]);
  const id = await context.sequelize.transaction(async (transaction) => {
    const [rows] = (await context.sequelize.query(
      `INSERT INTO water_volumes (product_id, age_from_days, age_to_days, ml_per_1000_birds, source, note, entered_by)
       VALUES (:productId, :ageFromDays, :ageToDays, :mlPer1000Birds, :source, :note, :actorId) RETURNING id`,
      { replacements: { ...input, actorId }, transaction },
    )) as [{ id: number }[], unknown];
    await recordAudit({ actorId, action: 'water_volume.add', entity: 'water_volume', entityId: rows[0]!.id, after: input }, transaction);
    return rows[0]!.id;
  });
  return (await listWaterVolumes(context, input.productId)).find((w) => w.id === id)!;
}
