// The troubleshooting record of an exposure event: storage staff fill it in until the event's holds are all decided;
// every change is audited, and nothing removes it.
import type { Sequelize } from 'sequelize';
import type { TroubleshootingView } from '../../shared/lots/exposure-event-view.js';
import type { TroubleshootingInput } from '../../shared/lots/troubleshooting-schema.js';
import { toCelsius } from '../../shared/temperature/convert-temperature.js';
import { ExposureEvent, TroubleshootingRecord, User } from '../../database/models/index.js';
import { recordAudit } from '../audit/record-audit.js';
import { AppError } from '../http/app-error.js';
import { exposureEventDecided } from './exposure-event-service.js';

export function toTroubleshootingView(row: TroubleshootingRecord, updatedBy: string): TroubleshootingView {
  return {
    exposureEventId: row.exposureEventId,
    foundAt: row.foundAt?.toISOString() ?? null,
    unitTempC: row.unitTempC,
    unitMinC: row.unitMinC,
    unitMaxC: row.unitMaxC,
    roomTempC: row.roomTempC,
    enteredUnit: row.enteredUnit,
    foundBy: row.foundBy,
    whatHappened: row.whatHappened,
    minutesSinceInRange: row.minutesSinceInRange,
    backInStorageAt: row.backInStorageAt?.toISOString() ?? null,
    contacted: row.contacted,
    preventiveAction: row.preventiveAction,
    updatedBy,
    updatedAt: row.updatedAt.toISOString(),
  };
}

export async function troubleshootingRecord(exposureEventId: number): Promise<TroubleshootingView | null> {
  const row = await TroubleshootingRecord.findOne({ where: { exposureEventId } });
  if (!row) return null;
  const user = await User.findByPk(row.updatedBy, { attributes: ['name'] });
  return toTroubleshootingView(row, user?.name ?? '');
}

export async function saveTroubleshootingRecord(sequelize: Sequelize, actorId: number, exposureEventId: number, input: TroubleshootingInput): Promise<TroubleshootingView> {
  const c = (value: number | null) => (value === null ? null : toCelsius(value, input.unit));
  await sequelize.transaction(async (transaction) => {
    // The event row's lock queues two saves of one record; decisions are checked inside the same transaction.
    const event = await ExposureEvent.findByPk(exposureEventId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!event) throw AppError.notFound('No such exposure event.');
    if (await exposureEventDecided(sequelize, exposureEventId, transaction)) {
      throw AppError.conflict('Every hold of this event is decided, so its troubleshooting record is closed.');
    }
    const values = {
      foundAt: input.foundAt ? new Date(input.foundAt) : null,
      unitTempC: c(input.unitTemp),
      unitMinC: c(input.unitMin),
      unitMaxC: c(input.unitMax),
      roomTempC: c(input.roomTemp),
      enteredUnit: input.unit,
      foundBy: input.foundBy,
      whatHappened: input.whatHappened,
      minutesSinceInRange: input.minutesSinceInRange,
      backInStorageAt: input.backInStorageAt ? new Date(input.backInStorageAt) : null,
      contacted: input.contacted,
      preventiveAction: input.preventiveAction,
      updatedBy: actorId,
    };
    const existing = await TroubleshootingRecord.findOne({ where: { exposureEventId }, transaction });
    if (existing) {
      const before = existing.toJSON();
      await existing.update(values, { transaction });
      await recordAudit({ actorId, action: 'troubleshooting.update', entity: 'exposure_event', entityId: exposureEventId, before, after: existing.toJSON() }, transaction);
    } else {
      const row = await TroubleshootingRecord.create({ exposureEventId, ...values }, { transaction });
      await recordAudit({ actorId, action: 'troubleshooting.create', entity: 'exposure_event', entityId: exposureEventId, after: row.toJSON() }, transaction);
    }
  });
  return (await troubleshootingRecord(exposureEventId))!;
}
