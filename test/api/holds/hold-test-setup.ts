// Shared set-up for the automatic-hold tests: lots placed in fridges at chosen times, logger files, the queue.
import { QueryTypes } from 'sequelize';
import { Hold, Product, StockMovement, type Fridge, type Lot } from '../../../database/models/index.js';
import { ownerConnection } from '../../support/test-database.js';
import { createPresentation, createProduct, stockLot } from '../../support/flock-fixtures.js';
import { celsiusCsv, series, uploadLog } from '../../support/fridge-fixtures.js';
import type { SignedIn } from '../../support/test-app.js';

export const T0 = Date.UTC(2026, 2, 1, 8, 0);
export const MIN = 60_000;

export async function productWithRange(low: number, high: number, unit: 'F' | 'C', freezeSensitive = true): Promise<Product> {
  const product = await createProduct();
  await product.update({ storageLow: low, storageHigh: high, storageUnit: unit, freezeSensitive });
  return product;
}

/** A lot of the product received into the fridge at `at` (epoch ms). */
export async function lotIn(fridge: Fridge, product: Product, at: number, vials = 10): Promise<Lot> {
  const lot = await stockLot(fridge, await createPresentation(product, 1000), vials, '2030-01-31');
  await ownerConnection().query(`UPDATE stock_movements SET at = to_timestamp(${at / 1000}) WHERE lot_id = ${lot.id}`, { type: QueryTypes.UPDATE });
  return lot;
}

export async function transfer(lot: Lot, from: Fridge, to: Fridge, leftAt: number, arrivedAt: number, vials = 10): Promise<void> {
  await StockMovement.create({ lotId: lot.id, kind: 'transfer', vials, fromFridgeId: from.id, toFridgeId: to.id, leftAt: new Date(leftAt), at: new Date(arrivedAt), sourceKind: 'test', sourceId: null, recordedBy: null });
}

/** Uploads readings every 10 min from `start` (°C) to the logger, as storage staff would. */
export function uploadTemps(who: SignedIn, loggerId: number, start: number, temps: number[], name = `log-${start}-${temps.length}.csv`) {
  return uploadLog(who, loggerId, celsiusCsv(series(start, 10, temps)), { name }).expect(201);
}

export async function holdsOf(lot: Lot): Promise<Hold[]> {
  return Hold.findAll({ where: { lotId: lot.id }, order: [['id', 'ASC']] });
}
