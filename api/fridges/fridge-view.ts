// Turns a Fridge row (with its site) into the shape the API sends.
import type { FridgeView } from '../../shared/fridges/fridge-schemas.js';
import { rangeInCelsius, type CelsiusLimits } from '../../shared/temperature/temperature-range.js';
import type { Fridge, Site } from '../../database/models/index.js';

export type FridgeWithSite = Fridge & { site?: Site };

export function toFridgeView(fridge: FridgeWithSite): FridgeView {
  const site = fridge.site;
  if (!site) throw new Error('fridge loaded without its site');
  return {
    id: fridge.id,
    siteId: fridge.siteId,
    siteCode: site.code,
    siteName: site.name,
    timeZone: site.timeZone,
    code: fridge.code,
    name: fridge.name,
    place: fridge.place,
    alarm: { low: fridge.alarmLow, high: fridge.alarmHigh, unit: fridge.alarmUnit },
    minMaxDisplay: fridge.minMaxDisplay,
  };
}

export function fridgeLimits(fridge: Fridge): CelsiusLimits {
  return rangeInCelsius({ low: fridge.alarmLow, high: fridge.alarmHigh, unit: fridge.alarmUnit });
}
