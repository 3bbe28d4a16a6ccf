// The monthly fridge record for inspectors: one row per day, the checks, and the excursions with what was done.

export interface MonthlyRecordDay {
  /** Local date at the site, YYYY-MM-DD. */
  date: string;
  minC: number | null;
  maxC: number | null;
  readings: number;
  checks: { time: string; currentC: number; minC: number | null; maxC: number | null; initials: string }[];
}

export interface MonthlyRecord {
  fridge: { code: string; name: string; place: string; siteName: string; timeZone: string };
  month: string;
  alarm: { low: number; high: number; unit: 'F' | 'C' };
  days: MonthlyRecordDay[];
  excursions: { kind: 'high' | 'low'; start: string; end: string; minutes: number | null; peakC: number; status: string; actionTaken: string; source: string }[];
  gapMinutes: number;
  generatedAt: string;
}
