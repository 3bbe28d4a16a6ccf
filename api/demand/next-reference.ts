// A free purchase-order number for a site and day: SITE-YYYYMMDD-n, the first n not yet used.
import { Op } from 'sequelize';
import { PurchaseOrder } from '../../database/models/index.js';

export async function nextReference(siteCode: string, today: string): Promise<string> {
  const prefix = `${siteCode}-${today.replaceAll('-', '')}-`;
  const used = new Set((await PurchaseOrder.findAll({ where: { reference: { [Op.startsWith]: prefix } }, attributes: ['reference'] })).map((o) => o.reference));
  let n = 1;
  while (used.has(`${prefix}${n}`)) n++;
  return `${prefix}${n}`;
}
