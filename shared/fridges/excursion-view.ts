// Stored excursions, gaps and backup fills of a fridge, as the fridge page and the later review read them.

export const excursionStatuses = ['open', 'in_review', 'decided'] as const;
export type ExcursionStatus = (typeof excursionStatuses)[number];

export interface ExcursionView {
  id: number;
  fridgeId: number;
  /** From the readings, or from a daily check that found a value out of range (length unknown). */
  source: 'readings' | 'daily_check';
  kind: 'high' | 'low';
  start: string;
  end: string;
  /** Null for a daily check: how long it lasted is not known. */
  minutes: number | null;
  peakC: number;
  degreeMinutesC: number | null;
  openEnded: boolean;
  /** Minutes of it seen by the backup logger while the primary had a gap. */
  backupMinutes: number;
  lowC: number;
  highC: number;
  status: ExcursionStatus;
  followUpOfId: number | null;
  dailyCheckId: number | null;
  actionTaken: string;
  sourceImportIds: number[];
}

export interface GapView {
  start: string;
  end: string;
  minutes: number;
}

export interface BackupFillView extends GapView {
  loggerId: number;
}

export interface FridgeEvents {
  excursions: ExcursionView[];
  gaps: GapView[];
  fills: BackupFillView[];
}
