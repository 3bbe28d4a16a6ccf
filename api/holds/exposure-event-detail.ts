// One exposure event in full, for its page in the review and its report: figures, troubleshooting record, and every
// lot it held (decided or not) with vials and doses at risk, the lot's exposure and the signed decisions.
import { QueryTypes, type Sequelize } from 'sequelize';
import type { ExposureEventView, TroubleshootingView } from '../../shared/lots/exposure-event-view.js';
import type { HoldCause } from '../../shared/lots/hold-causes.js';
import { computeLotExposure, type LotExposureView } from '../exposure/lot-exposure-service.js';
import { holdDecisions, type DecisionView } from './hold-decisions-service.js';
import { exposureEventView } from './exposure-event-service.js';
import { exposureSourceKind } from './exposure-holds.js';
import { troubleshootingRecord } from './troubleshooting-service.js';

export interface EventLot {
  holdId: number;
  cause: HoldCause;
  reason: string;
  openedAt: string;
  lotId: number;
  lotNumber: string;
  expiry: string;
  product: string;
  dosesPerVial: number;
  vials: number;
  doses: number;
  exposure: Pick<LotExposureView, 'minutesAbove' | 'minutesBelow' | 'minutesUnknown' | 'froze' | 'mktStorageC' | 'minC' | 'maxC' | 'limits'>;
  decisions: DecisionView[];
}

export interface ExposureEventDetail {
  event: ExposureEventView;
  troubleshooting: TroubleshootingView | null;
  lots: EventLot[];
}

export async function exposureEventDetail(sequelize: Sequelize, id: number): Promise<ExposureEventDetail> {
  const event = await exposureEventView(sequelize, id);
  const rows = await sequelize.query<{ hold_id: number; cause: HoldCause; reason: string; opened_at: Date; lot_id: number; lot_number: string; expiry: string; product: string; doses_per_vial: number; vials: number }>(
    `SELECT h.id AS hold_id, h.cause, h.reason, h.opened_at, l.id AS lot_id, l.lot_number, l.expiry::text AS expiry, pr.name AS product, p.doses_per_vial,
            coalesce((SELECT sum(b.vials) FROM stock_balances b WHERE b.lot_id = l.id), 0)::int AS vials
       FROM holds h JOIN lots l ON l.id = h.lot_id JOIN presentations p ON p.id = l.presentation_id JOIN products pr ON pr.id = p.product_id
      WHERE h.source_kind = :kind AND h.source_id = :id ORDER BY l.lot_number, h.id`,
    { replacements: { kind: exposureSourceKind, id }, type: QueryTypes.SELECT },
  );
  const lots: EventLot[] = [];
  for (const row of rows) {
    const exposure = await computeLotExposure(sequelize, row.lot_id);
    lots.push({
      holdId: row.hold_id, cause: row.cause, reason: row.reason, openedAt: new Date(row.opened_at).toISOString(), lotId: row.lot_id, lotNumber: row.lot_number,
      expiry: row.expiry, product: row.product, dosesPerVial: row.doses_per_vial, vials: row.vials, doses: row.vials * row.doses_per_vial,
      exposure: {
        minutesAbove: exposure.minutesAbove, minutesBelow: exposure.minutesBelow, minutesUnknown: exposure.minutesUnknown, froze: exposure.froze,
        mktStorageC: exposure.mktStorageC, minC: exposure.minC, maxC: exposure.maxC, limits: exposure.limits,
      },
      decisions: await holdDecisions(row.hold_id),
    });
  }
  return { event, troubleshooting: await troubleshootingRecord(id), lots };
}
