// `npm run cli -- analyze-log FILE`: reads a temperature logger CSV and prints its analysis as one JSON object.
import { readFile } from 'node:fs/promises';
import type { Readable } from 'node:stream';
import { parseArgs } from 'node:util';
import { analyzeReadings } from '../../../shared/logs/analyze-readings.js';
import { LogFileError } from '../../../shared/logs/log-file-error.js';
import type { DateOrder, LogMapping, LogNeed } from '../../../shared/logs/log-layout.js';
import { readLogText } from '../../../shared/logs/read-log-text.js';
import { DEFAULT_STORAGE_RANGE } from '../../../shared/temperature/default-storage-range.js';
import { rangeInCelsius } from '../../../shared/temperature/temperature-range.js';
import { parseTemperatureUnit, type TemperatureUnit } from '../../../shared/temperature/temperature-unit.js';
import type { CliCommand } from '../cli-command.js';

const USAGE =
  'usage: npm run cli -- analyze-log FILE [--unit F|C] [--tz ZONE] [--date-order MDY|DMY|YMD] ' +
  '[--low N --high N] [--limits-unit F|C] [--time-column NAME] [--date-column NAME] [--temp-column NAME]';

const FLAG_FOR_NEED: Partial<Record<LogNeed, string>> = {
  unit: '--unit F|C',
  dateOrder: '--date-order MDY|DMY|YMD',
  zone: '--tz ZONE',
  timeColumn: '--time-column NAME (or --date-column and --time-column)',
  tempColumn: '--temp-column NAME',
};

class UsageError extends Error {}

function unitOption(value: string | undefined, flag: string): TemperatureUnit | undefined {
  if (value === undefined) return undefined;
  const unit = parseTemperatureUnit(value);
  if (!unit) throw new UsageError(`${flag} must be F or C, got '${value}'`);
  return unit;
}

function numberOption(value: string | undefined, flag: string): number | undefined {
  if (value === undefined) return undefined;
  const n = Number(value);
  if (value.trim() === '' || !Number.isFinite(n)) throw new UsageError(`${flag} must be a number, got '${value}'`);
  return n;
}

function dateOrderOption(value: string | undefined): DateOrder | undefined {
  if (value === undefined) return undefined;
  const order = value.toUpperCase();
  if (order !== 'MDY' && order !== 'DMY' && order !== 'YMD') {
    throw new UsageError(`--date-order must be MDY, DMY or YMD, got '${value}'`);
  }
  return order;
}

async function readAll(stream: Readable): Promise<string> {
  let text = '';
  for await (const chunk of stream) text += typeof chunk === 'string' ? chunk : (chunk as Buffer).toString('utf8');
  return text;
}

async function readInput(file: string, stdin: Readable): Promise<string> {
  if (file === '-') return readAll(stdin);
  try {
    return await readFile(file, 'utf8');
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    const reason =
      code === 'ENOENT' ? 'no such file' : code === 'EISDIR' ? 'it is a directory' : (error as Error).message;
    throw new LogFileError(`cannot read it: ${reason}`);
  }
}

const round = (n: number, places = 3) => Math.round(n * 10 ** places) / 10 ** places;
const iso = (ms: number) => new Date(ms).toISOString();

export const command: CliCommand = {
  summary: 'read a temperature logger CSV and print readings, gaps, excursions, mean and MKT as JSON',
  async run(args, io) {
    let file = 'analyze-log';
    try {
      const { values, positionals } = parseArgs({
        args,
        allowPositionals: true,
        options: {
          unit: { type: 'string' },
          tz: { type: 'string' },
          'date-order': { type: 'string' },
          low: { type: 'string' },
          high: { type: 'string' },
          'limits-unit': { type: 'string' },
          'time-column': { type: 'string' },
          'date-column': { type: 'string' },
          'temp-column': { type: 'string' },
        },
      });
      if (positionals.length !== 1) throw new UsageError(`expected one FILE, got ${positionals.length}`);
      const low = numberOption(values.low, '--low');
      const high = numberOption(values.high, '--high');
      if ((low === undefined) !== (high === undefined)) throw new UsageError('--low and --high go together');
      if (low === undefined && values['limits-unit'] !== undefined) {
        throw new UsageError('--limits-unit goes with --low and --high');
      }
      const range =
        low === undefined || high === undefined
          ? DEFAULT_STORAGE_RANGE
          : { low, high, unit: unitOption(values['limits-unit'], '--limits-unit') ?? DEFAULT_STORAGE_RANGE.unit };
      if (range.low >= range.high) throw new UsageError('--low must be below --high');
      const mapping: LogMapping = {
        zone: values.tz ?? 'UTC',
        unit: unitOption(values.unit, '--unit'),
        dateOrder: dateOrderOption(values['date-order']),
        timeColumn: values['time-column'],
        dateColumn: values['date-column'],
        tempColumn: values['temp-column'],
      };

      file = positionals[0];
      const text = await readInput(file, io.stdin);
      const log = readLogText(text, mapping);
      const analysis = analyzeReadings(log.readings, rangeInCelsius(range));
      const output = {
        unit: log.layout.unit,
        readings: analysis.readings,
        skipped: log.skipped,
        first: iso(analysis.first),
        last: iso(analysis.last),
        intervalMinutes: round(analysis.intervalMinutes),
        lowC: round(analysis.lowC),
        highC: round(analysis.highC),
        minC: round(analysis.minC),
        maxC: round(analysis.maxC),
        meanC: round(analysis.meanC),
        mktC: round(analysis.mktC),
        minutesInRange: round(analysis.minutesInRange),
        minutesAbove: round(analysis.minutesAbove),
        minutesBelow: round(analysis.minutesBelow),
        gapMinutes: round(analysis.gapMinutes),
        excursions: analysis.excursions.map((e) => ({
          kind: e.kind,
          start: iso(e.start),
          end: iso(e.end),
          minutes: round(e.minutes),
          peakC: round(e.peakC),
          degreeMinutesC: round(e.degreeMinutesC),
        })),
        gaps: analysis.gaps.map((g) => ({ start: iso(g.start), end: iso(g.end), minutes: round(g.minutes) })),
        warnings: log.warnings,
      };
      io.stdout.write(`${JSON.stringify(output)}\n`);
      return 0;
    } catch (error) {
      if (error instanceof LogFileError) {
        const flags = error.needs.map((need) => FLAG_FOR_NEED[need]).filter((flag) => flag !== undefined);
        io.stderr.write(`${file}: ${error.message}${flags.length ? ` (use ${flags.join(', ')})` : ''}\n`);
        return 2;
      }
      if (error instanceof UsageError || (error as NodeJS.ErrnoException).code?.startsWith('ERR_PARSE_ARGS')) {
        io.stderr.write(`${(error as Error).message}\n${USAGE}\n`);
        return 2;
      }
      throw error;
    }
  },
};
