// The limits of each site setting as shared/sites/site-schemas.ts accepts them, kept zod-free for the client's forms
// (zod probes `new Function` on load, which the strict CSP reports); test/e2e/sites-settings.test.ts checks they agree.

export interface SettingLimit {
  min: number;
  max: number;
  /** Whole numbers only. */
  integer: boolean;
  /** The unit in words, as the form shows it. */
  unit: string;
}

export const settingLimits = {
  storeWithinMinutes: { min: 1, max: 24 * 60, integer: true, unit: 'minutes' },
  staleDataHours: { min: 1, max: 24 * 14, integer: false, unit: 'hours' },
  overagePercent: { min: 0, max: 50, integer: false, unit: '%' },
  projectionHorizonDays: { min: 7, max: 730, integer: true, unit: 'days' },
  reorderMarginDays: { min: 0, max: 60, integer: true, unit: 'days' },
} satisfies Record<string, SettingLimit>;

export type NumericSetting = keyof typeof settingLimits;

/** Each expiry alert window, in days, and how many windows a site may list. */
export const expiryWindowLimits = { min: 1, max: 730, most: 5 };

/** The spray heat limit, stored in °F. */
export const heatLimitF = { min: 32, max: 130 };

/** The site's code and name, as the schema's regex and lengths say. */
export const siteCodePattern = /^[A-Za-z0-9-]{2,16}$/;
export const siteNameMaxLength = 120;

/** A new site's settings, the schema's defaults (no heat limit until the site sets one). */
export const settingDefaults = {
  overagePercent: 0,
  storeWithinMinutes: 30,
  staleDataHours: 24,
  projectionHorizonDays: 180,
  expiryAlertDays: [30, 60, 90],
  reorderMarginDays: 3,
  sprayHeatLimitF: null as number | null,
};
