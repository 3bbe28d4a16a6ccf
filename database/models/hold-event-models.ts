// The models behind automatic holds, recalls, troubleshooting records and notifications, initialised in one place.
import type { Sequelize } from 'sequelize';
import { ExposureEvent } from './exposure-event.js';
import { Notification } from './notification.js';
import { Recall } from './recall.js';
import { TroubleshootingRecord } from './troubleshooting-record.js';

export { ExposureEvent, Notification, Recall, TroubleshootingRecord };

export function initHoldEventModels(sequelize: Sequelize): void {
  for (const model of [ExposureEvent, Recall, TroubleshootingRecord, Notification]) model.initModel(sequelize);
}
