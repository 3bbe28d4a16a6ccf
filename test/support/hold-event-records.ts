// Exposure events on a given site for the role matrix: a fridge excursion on the site's fridge that held a lot there.
import { ExposureEvent, Hold, Site } from '../../database/models/index.js';
import { createPresentation, createProduct, createSiteFridge, stockLot } from './flock-fixtures.js';

type RecordMaker = (siteId: number) => Promise<number>;

async function makeExposureEvent(siteId: number): Promise<number> {
  const fridge = await createSiteFridge((await Site.findByPk(siteId))!);
  const lot = await stockLot(fridge, await createPresentation(await createProduct(), 1000), 5, '2030-01-31');
  const at = Date.now() - 3_600_000;
  const event = await ExposureEvent.create({
    fridgeId: fridge.id, cause: 'excursion', source: 'readings', kind: 'high', startsAt: new Date(at), endsAt: new Date(at + 1_800_000), minutes: 30,
    peakC: 9, degreeMinutesC: 50, mkt24hC: 5, lowC: 1.667, highC: 7.222, fridgeLowC: 1.667, fridgeHighC: 7.222, excursionId: null, dailyCheckId: null, followUpOfId: null,
  });
  await Hold.create({ lotId: lot.id, cause: 'excursion', sourceKind: 'exposure_event', sourceId: event.id, reason: 'test excursion', openedBy: null });
  return event.id;
}

export const holdEventRecordMakers: Record<string, RecordMaker> = {
  exposureEventId: makeExposureEvent,
};
