// Sites and their settings; every setting has a default so later features can add settings without migrations.
import { z } from 'zod';

export const siteSettingsSchema = z.object({
  /** Extra doses planned on top of the birds counted, in percent. */
  overagePercent: z.number().min(0).max(50).default(0),
  /** Receiving warns when a lot went into a fridge later than this after arrival. */
  storeWithinMinutes: z.number().int().min(1).max(24 * 60).default(30),
  /** A fridge whose newest reading is older than this shows as "no recent data". */
  staleDataHours: z.number().min(1).max(24 * 14).default(24),
  /** How far ahead purchasing's projection plans the site's vaccinations, in days. */
  projectionHorizonDays: z.number().int().min(7).max(730).default(180),
  /** Lots on hand expiring within each of these many days are listed (ascending). */
  expiryAlertDays: z
    .array(z.number().int().min(1).max(730))
    .min(1)
    .max(5)
    .refine((days) => days.every((d, i) => i === 0 || d > days[i - 1]!), 'List the windows in ascending order.')
    .default([30, 60, 90]),
  /** Days of margin taken off the order-by date on top of the supplier's lead time. */
  reorderMarginDays: z.number().int().min(0).max(60).default(3),
  /** Vaccination day: above this expected temperature (°F) Vialyard advises spraying at night; null until the site sets one. */
  sprayHeatLimitF: z.number().min(32).max(130).nullable().default(null),
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
