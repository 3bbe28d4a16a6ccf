// Reads the preview lines with the layout the sniffer found, so the page can show what the import will make of them.
import { LogFileError, LogReader, requireLayout, type LogReading, type LogSniff } from '@shared/logs/index.js';

export interface PreviewResult {
  readings: LogReading[];
  problem: string | null;
}

export function previewReadings(sniff: LogSniff, lines: readonly string[], limit = 8): PreviewResult {
  try {
    const reader = new LogReader(requireLayout(sniff));
    const readings: LogReading[] = [];
    for (const line of lines) {
      const reading = reader.pushLine(line);
      if (reading && readings.length < limit) readings.push(reading);
    }
    return { readings, problem: null };
  } catch (error) {
    return { readings: [], problem: error instanceof LogFileError ? error.message : String(error) };
  }
}
