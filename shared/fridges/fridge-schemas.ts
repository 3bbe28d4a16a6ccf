// Fridges as the API sends them and the form that creates or changes one (the client's form uses the same rules).
import { z } from 'zod';
import type { TemperatureRange } from '../temperature/temperature-range.js';
import type { LoggerView } from './logger-schemas.js';

const limit = z.number({ message: 'Enter a temperature.' }).min(-100, 'At least −100.').max(200, 'At most 200.');

export const fridgeInputSchema = z
  .object({
    siteId: z.number().int().positive(),
    code: z.string().trim().toUpperCase().regex(/^[A-Z0-9-]{2,20}$/, '2–20 letters, digits or dashes.'),
    name: z.string().trim().min(1, 'Enter a name.').max(80, 'At most 80 characters.'),
    place: z.string().trim().max(120, 'At most 120 characters.').default(''),
    alarmLow: limit,
    alarmHigh: limit,
    alarmUnit: z.enum(['F', 'C']),
    /** A display of the minimum and maximum since reset: one daily check is enough, else two. */
    minMaxDisplay: z.boolean().default(true),
  })
  .refine((f) => f.alarmLow < f.alarmHigh, { path: ['alarmHigh'], message: 'The high limit must be above the low limit.' });

export type FridgeInput = z.infer<typeof fridgeInputSchema>;

export interface FridgeView {
  id: number;
  siteId: number;
  siteCode: string;
  siteName: string;
  timeZone: string;
  code: string;
  name: string;
  place: string;
  /** As entered. */
  alarm: TemperatureRange;
  minMaxDisplay: boolean;
}

/** A fridge with what the lists and the storage home card need to know about it now. */
export interface FridgeStatus extends FridgeView {
  newestReadingAt: string | null;
  /** Newest reading older than the site's setting (or none at all). */
  noRecentData: boolean;
  staleDataHours: number;
  openExcursions: number;
  checksToday: number;
  checksNeeded: number;
  loggerCount: number;
  calibrationsDue: number;
}

/** One fridge's page: its status and every logger it has had. */
export interface FridgeDetail extends FridgeStatus {
  loggers: LoggerView[];
}
