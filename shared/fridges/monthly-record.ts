// The monthly fridge record for inspectors: one row per day, the checks, and the excursions with what was done.

export interface MonthlyRecordDay {
  /** Local date at the site, YYYY-MM-DD. */
  date: string;
  minC: number | null;
  maxC: number | null;
  /** Readings of the fridge's series that day: the primary's, and the backup's where they filled a primary gap. */
  readings: number;
  /** Of `readings`, those from the backup logger. */
  backupReadings: number;
  /** Minutes without readings that day; null for a day wholly before `countedFrom` (not counted). */
  minutesWithoutReadings: number | null;
  checks: { time: string; currentC: number; minC: number | null; maxC: number | null; initials: string }[];
}

export interface MonthlyRecord {
  fridge: { code: string; name: string; place: string; siteName: string; timeZone: string };
  month: string;
  /** The last day listed: the month's last day, or the site's today while the month is still running. */
  through: string;
  inProgress: boolean;
  alarm: { low: number; high: number; unit: 'F' | 'C' };
  days: MonthlyRecordDay[];
  excursions: { kind: 'high' | 'low'; start: string; end: string; minutes: number | null; peakC: number; status: string; actionTaken: string; source: string }[];
  /** Where time without readings starts to count: the month's start, or the fridge's first reading if later; null when none is stored yet. */
  countedFrom: string | null;
  /** The fridge's first reading when it falls inside the month (its loggers started mid-month), else null. */
  readingsStart: string | null;
  /** The fridge's last reading, when nothing follows it before the record's end (the logger stopped, or its next file is not in yet). */
  lastReading: string | null;
  /** Minutes without readings from `countedFrom` to the record's end: the days' figures added up. */
  gapMinutes: number;
  /** The part of `gapMinutes` after `lastReading`. */
  minutesAfterLastReading: number;
  generatedAt: string;
}
