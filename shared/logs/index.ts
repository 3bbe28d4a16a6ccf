// Public surface of temperature-log reading and analysis, shared by the API, the CLI and the upload preview.
export { LogFileError } from './log-file-error.js';
export type { DateOrder, LogDelimiter, LogLayout, LogMapping, LogNeed } from './log-layout.js';
export type { LogReading } from './log-reading.js';
export type { LogWarning } from './log-warning.js';
export { splitLines } from './split-lines.js';
export { sniffLog, type LogSniff, type PreviewLine } from './sniff-log.js';
export type { SniffedColumn } from './sniffed-column.js';
export type { CellKind } from './cell-kind.js';
export { requireLayout } from './require-layout.js';
export { LogReader, type LogReadResult } from './log-reader.js';
export { readLogText } from './read-log-text.js';
export { orderReadings, type OrderedReadings } from './order-readings.js';
export { LocalTimeResolver } from './local-time-resolver.js';
export { parseTimestamp, TimestampParser } from './parse-timestamp.js';
export { analyzeReadings } from './analyze-readings.js';
export type { AnalysisResult } from './analysis-result.js';
export type { Excursion } from './excursion.js';
export type { LogGap } from './log-gap.js';
export { readingDurations, type ReadingDurations, type TimedReading } from './reading-durations.js';
export { nominalIntervalMs } from './nominal-interval.js';
export { findExcursions } from './find-excursions.js';
export { excursionsAndGaps } from './excursions-and-gaps.js';
export { mergeBackupReadings, type MergedReading, type MergedSeries, type SeriesReading } from './merge-backup-readings.js';
export { weightedMean } from './weighted-mean.js';
export {
  meanKineticTemperatureC,
  GAS_CONSTANT_J_PER_MOL_K,
  MKT_ACTIVATION_ENERGY_J_PER_MOL,
  MKT_ACTIVATION_OVER_R_K,
} from './mean-kinetic-temperature.js';
