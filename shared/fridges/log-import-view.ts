// A log import as the upload history and the import result show it.
import type { LogWarning } from '../logs/log-warning.js';

/** A row whose instant was already stored with another value: reported, never overwritten. */
export interface ReadingConflict {
  line: number;
  at: string;
  fileC: number;
  storedC: number;
}

export interface LogImportView {
  id: number;
  loggerId: number;
  loggerSerial: string;
  fridgeId: number;
  fileName: string;
  sha256: string;
  sizeBytes: number;
  source: 'upload' | 'cli';
  importedAt: string;
  importedBy: string | null;
  /** Data rows read (readable or not). */
  rowsRead: number;
  readingsStored: number;
  /** Instants already stored with the same value. */
  duplicates: number;
  conflicts: number;
  skipped: number;
  firstAt: string;
  lastAt: string;
  unit: 'F' | 'C';
  zone: string;
  warningCount: number;
}

export interface LogImportDetail extends LogImportView {
  /** The first warnings (all of them up to a cap). */
  warnings: LogWarning[];
  conflictSamples: ReadingConflict[];
}

/** The answer to an upload: a new import, or the same file seen before. */
export type ImportOutcome =
  | { repeated: false; import: LogImportDetail; excursionsOpened: number; message: string }
  | { repeated: true; import: LogImportView; message: string };

export interface ImportProgress {
  phase: 'reading' | 'storing' | 'analysing' | 'done' | 'failed';
  /** Bytes of the file read so far, and its size. */
  done: number;
  total: number;
}
