// The lot for a presentation and lot number: created on first receipt, the same lot on every later one.
import { QueryTypes, type Transaction } from 'sequelize';
import { Lot } from '../../database/models/index.js';
import { AppError } from '../http/app-error.js';

export interface LotKey {
  presentationId: number;
  lotNumber: string;
  expiry: string;
  expiryDayGiven: boolean;
}

/**
 * Safe under concurrent receipts of the same new lot: ON CONFLICT waits for the other transaction and then
 * finds its row. A lot already known with another expiry is an error the clerk resolves against the label.
 */
export async function findOrCreateLot(key: LotKey, actorId: number | null, transaction: Transaction, field = 'expiry'): Promise<Lot> {
  const sequelize = Lot.sequelize!;
  await sequelize.query(
    `INSERT INTO lots (presentation_id, lot_number, expiry, expiry_day_given, created_by)
     VALUES (:presentationId, :lotNumber, :expiry, :expiryDayGiven, :actorId)
     ON CONFLICT (presentation_id, upper(lot_number)) DO NOTHING`,
    { replacements: { ...key, actorId }, type: QueryTypes.INSERT, transaction },
  );
  const [row] = await sequelize.query<{ id: number }>(
    'SELECT id FROM lots WHERE presentation_id = :presentationId AND upper(lot_number) = upper(:lotNumber)',
    { replacements: { ...key }, type: QueryTypes.SELECT, transaction },
  );
  const lot = row ? await Lot.findByPk(row.id, { transaction }) : null;
  if (!lot) throw new Error(`lot ${key.lotNumber} vanished after insert`);
  if (lot.expiry !== key.expiry) {
    throw AppError.conflict(`Lot ${lot.lotNumber} is already recorded with expiry ${lot.expiry}, not ${key.expiry}: check the label.`, [
      { field, message: `Recorded before with expiry ${lot.expiry}.` },
    ]);
  }
  return lot;
}
