// One GTIN names one presentation: a pack GTIN may not be another presentation's vial GTIN, nor the reverse.
import { Op, type Transaction } from 'sequelize';
import { Presentation } from '../../database/models/index.js';
import { AppError } from '../http/app-error.js';

export async function assertGtinsFree(
  gtins: { packGtin: string | null; vialGtin: string | null },
  exceptId: number | null,
  transaction: Transaction,
  fieldPrefix = '',
): Promise<void> {
  for (const field of ['packGtin', 'vialGtin'] as const) {
    const gtin = gtins[field];
    if (!gtin) continue;
    const other = await Presentation.findOne({
      where: { [Op.or]: [{ packGtin: gtin }, { vialGtin: gtin }], ...(exceptId !== null && { id: { [Op.ne]: exceptId } }) },
      transaction,
    });
    if (other) {
      throw AppError.conflict(`GTIN ${gtin} already belongs to another presentation.`, [
        { field: `${fieldPrefix}${field}`, message: 'Already used by another presentation.' },
      ]);
    }
  }
}
