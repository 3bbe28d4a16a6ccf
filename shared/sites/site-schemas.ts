// Sites and their settings; every setting has a default so later features can add settings without migrations.
import { z } from 'zod';

export const siteSettingsSchema = z.object({
  /** Extra doses planned on top of the birds counted, in percent. */
  overagePercent: z.number({ message: 'Enter a percentage.' }).min(0, 'At least 0 %.').max(50, 'At most 50 %.').default(0),
  /** Receiving warns when a lot went into a fridge later than this after arrival. */
  storeWithinMinutes: z.number({ message: 'Enter minutes.' }).int('Whole minutes.').min(1, 'At least 1 minute.').max(24 * 60, 'At most 1,440 minutes (a day).').default(30),
  /** A fridge whose newest reading is older than this shows as "no recent data". */
  staleDataHours: z.number({ message: 'Enter hours.' }).min(1, 'At least 1 hour.').max(24 * 14, 'At most 336 hours (two weeks).').default(24),
  /** How far ahead purchasing's projection plans the site's vaccinations, in days. */
  projectionHorizonDays: z.number({ message: 'Enter days.' }).int('Whole days.').min(7, 'At least 7 days.').max(730, 'At most 730 days.').default(180),
  /** Lots on hand expiring within each of these many days are listed (ascending). */
  expiryAlertDays: z
    .array(z.number({ message: 'Enter days.' }).int('Whole days.').min(1, 'At least 1 day.').max(730, 'At most 730 days.'), { message: 'A list of day counts.' })
    .min(1, 'At least one window.')
    .max(5, 'At most five windows.')
    .refine((days) => days.every((d, i) => i === 0 || d > days[i - 1]!), 'List the windows in ascending order.')
    .default([30, 60, 90]),
  /** Days of margin taken off the order-by date on top of the supplier's lead time. */
  reorderMarginDays: z.number({ message: 'Enter days.' }).int('Whole days.').min(0, 'At least 0 days.').max(60, 'At most 60 days.').default(3),
  /** Vaccination day: above this expected temperature (°F) Vialyard advises spraying at night; null until the site sets one. */
  sprayHeatLimitF: z.number({ message: 'Enter a temperature.' }).min(32, 'At least 32 °F (0 °C).').max(130, 'At most 130 °F (54.4 °C).').nullable().default(null),
});

export type SiteSettings = z.infer<typeof siteSettingsSchema>;

function isTimeZone(zone: string): boolean {
  try {
    new Intl.DateTimeFormat('en', { timeZone: zone });
    return true;
  } catch {
    return false;
  }
}

export const siteInputSchema = z.object({
  code: z.string().trim().toUpperCase().regex(/^[A-Z0-9-]{2,16}$/, '2–16 letters, digits or dashes.'),
  name: z.string().trim().min(1, 'Enter a name.').max(120, 'At most 120 characters.'),
  timeZone: z.string().trim().refine(isTimeZone, 'Not a time zone of the IANA database (e.g. America/Chicago).'),
  settings: siteSettingsSchema.partial().default({}),
});

export type SiteInput = z.infer<typeof siteInputSchema>;

export interface SiteView {
  id: number;
  code: string;
  name: string;
  timeZone: string;
  settings: SiteSettings;
}
