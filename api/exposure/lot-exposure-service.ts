// A lot's exposure from the database: its ledger gives the stays, each fridge's loggers give the readings it lived through.
import type { Sequelize } from 'sequelize';
import { fridgeExposureReadings, lotExposure, movementHistory, staysFromBalanceChanges, type FridgeReading, type LotExposure } from '../../shared/exposure/index.js';
import { rangeInCelsius } from '../../shared/temperature/temperature-range.js';
import { Fridge, Logger, Lot, Presentation, Product, StockMovement } from '../../database/models/index.js';
import { AppError } from '../http/app-error.js';
import { loadFridgeReadings } from '../readings/load-fridge-readings.js';

export interface LotExposureView extends LotExposure {
  lotId: number;
  asOf: number;
  limits: { lowC: number; highC: number; low: number; high: number; unit: 'F' | 'C' };
}

const hour = 3_600_000;

/** The site a lot belongs to for access: where it was first received. Null when it has no movement yet. */
export async function lotSiteId(lotId: number): Promise<number | null> {
  const first = await StockMovement.findOne({ where: { lotId }, order: [['at', 'ASC'], ['id', 'ASC']] });
  const fridgeId = first?.toFridgeId ?? first?.fromFridgeId;
  if (!fridgeId) return null;
  return (await Fridge.findByPk(fridgeId, { attributes: ['siteId'] }))?.siteId ?? null;
}

export async function computeLotExposure(sequelize: Sequelize, lotId: number, asOf = Date.now()): Promise<LotExposureView> {
  const lot = await Lot.findByPk(lotId, { include: [{ model: Presentation, as: 'presentation', include: [{ model: Product, as: 'product' }] }] });
  const product = lot?.presentation?.product;
  if (!lot || !product) throw AppError.notFound('No such lot.');
  const movements = await StockMovement.findAll({ where: { lotId }, order: [['at', 'ASC'], ['id', 'ASC']] });
  const history = movementHistory(
    movements.map((m) => ({
      kind: m.kind,
      vials: m.vials,
      fromFridgeId: m.fromFridgeId,
      toFridgeId: m.toFridgeId,
      leftAt: m.leftAt ? m.leftAt.getTime() : null,
      at: m.at.getTime(),
      sourceKind: m.sourceKind,
      sourceId: m.sourceId,
    })),
  );
  const stays = staysFromBalanceChanges(history.changes);
  const readings = new Map<number, FridgeReading[]>();
  await sequelize.transaction({ readOnly: true }, async (transaction) => {
    for (const fridgeId of new Set(stays.map((s) => s.fridgeId))) {
      const fridgeStays = stays.filter((s) => s.fridgeId === fridgeId);
      // A reading an hour either side lets the first and last stretch be judged by the reading that covers them.
      const from = Math.min(...fridgeStays.map((s) => s.from)) - hour;
      const to = Math.max(...fridgeStays.map((s) => s.to ?? asOf)) + hour;
      const loggers = await Logger.findAll({ where: { fridgeId }, attributes: ['id', 'role'], transaction });
      const loaded = await loadFridgeReadings(transaction, loggers.map((l) => ({ id: l.id, role: l.role })), from, to);
      readings.set(fridgeId, fridgeExposureReadings(loaded.primary, loaded.backup));
    }
  });
  const range = { low: Number(product.storageLow), high: Number(product.storageHigh), unit: product.storageUnit };
  const limits = rangeInCelsius(range);
  const exposure = lotExposure({
    stays,
    timeOut: history.timeOut,
    readings,
    limits,
    freezeSensitive: product.freezeSensitive,
    // The product's own limit; none recorded means every time out goes to the veterinarian as not known to be fine.
    timeOutLimitMinutes: product.timeOutLimitMinutes ?? null,
    asOf,
  });
  return { ...exposure, lotId, asOf, limits: { ...limits, ...range } };
}
