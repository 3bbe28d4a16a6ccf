// What the review queue adds to each group of holds: a title, the exposure event with its troubleshooting record, the recall.
import type { Sequelize } from 'sequelize';
import { holdCauseLabels, holdCauses, type HoldCause } from '../../shared/lots/hold-causes.js';
import type { QueueEvent } from '../../shared/lots/review-queue.js';
import { ExposureEvent, Fridge, Recall, Site, User } from '../../database/models/index.js';
import { exposureEventDecided, toExposureEventView } from './exposure-event-service.js';
import { exposureSourceKind } from './exposure-holds.js';
import { troubleshootingRecord } from './troubleshooting-service.js';

const label = (cause: string) => (holdCauses.includes(cause as HoldCause) ? holdCauseLabels[cause as HoldCause] : cause);

export async function addEventDetails(sequelize: Sequelize, event: QueueEvent): Promise<QueueEvent> {
  event.severe = event.cause === 'freeze';
  event.title = `${label(event.cause)}: ${event.lots.length === 1 ? `lot ${event.lots[0].lotNumber}` : `${event.lots.length} lots`}`;
  if (event.sourceKind === exposureSourceKind && event.sourceId !== null) {
    const row = await ExposureEvent.findByPk(event.sourceId);
    const fridge = row && (await Fridge.findByPk(row.fridgeId));
    if (row && fridge) {
      event.exposureEvent = toExposureEventView(row, fridge, await exposureEventDecided(sequelize, row.id));
      event.title = event.exposureEvent.title;
      event.troubleshooting = await troubleshootingRecord(row.id);
      // The readings were taken at the fridge: its site's clock, wherever the lots went since.
      event.timeZone = (await Site.findByPk(fridge.siteId, { attributes: ['timeZone'] }))?.timeZone ?? event.timeZone;
    }
  }
  if (event.sourceKind === 'recall' && event.sourceId !== null) {
    const recall = await Recall.findByPk(event.sourceId);
    if (recall) {
      const placer = await User.findByPk(recall.placedBy, { attributes: ['name'] });
      event.recall = { id: recall.id, lotNumber: recall.lotNumber, reason: recall.reason, placedBy: placer?.name ?? '', placedAt: recall.placedAt.toISOString() };
      event.title = `Recall of lot ${recall.lotNumber}`;
    }
  }
  return event;
}
