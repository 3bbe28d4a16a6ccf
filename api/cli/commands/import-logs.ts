// `npm run cli -- import-logs --fridge CODE [--logger SERIAL] FILE...`: imports logger files as the upload page does.
import { stat } from 'node:fs/promises';
import { basename } from 'node:path';
import { parseArgs } from 'node:util';
import type { StoredLogMapping } from '../../../shared/fridges/log-mapping-schema.js';
import type { ImportProgress } from '../../../shared/fridges/log-import-view.js';
import { LogFileError } from '../../../shared/logs/log-file-error.js';
import { parseTemperatureUnit } from '../../../shared/temperature/temperature-unit.js';
import { connectDatabase, Fridge, Logger } from '../../../database/models/index.js';
import { importLogFile } from '../../log-imports/import-log-file.js';
import type { CliCommand, CliIo } from '../cli-command.js';
import { openCliDatabase } from '../database-environment.js';

const USAGE =
  'usage: npm run cli -- import-logs --fridge CODE [--logger SERIAL] [--unit F|C] [--tz ZONE] [--date-order MDY|DMY|YMD] ' +
  '[--time-column NAME] [--date-column NAME] [--temp-column NAME] FILE...';

class UsageError extends Error {}

function mappingFrom(values: Record<string, string | undefined>): StoredLogMapping | undefined {
  const unit = values.unit === undefined ? undefined : parseTemperatureUnit(values.unit);
  if (values.unit !== undefined && !unit) throw new UsageError(`--unit must be F or C, got '${values.unit}'`);
  const order = values['date-order']?.toUpperCase();
  if (order !== undefined && order !== 'MDY' && order !== 'DMY' && order !== 'YMD') throw new UsageError(`--date-order must be MDY, DMY or YMD, got '${values['date-order']}'`);
  const mapping: StoredLogMapping = {
    ...(unit && { unit }),
    ...(values.tz && { zone: values.tz }),
    ...(order && { dateOrder: order }),
    ...(values['time-column'] && { timeColumn: values['time-column'] }),
    ...(values['date-column'] && { dateColumn: values['date-column'] }),
    ...(values['temp-column'] && { tempColumn: values['temp-column'] }),
  };
  // No flags: the logger's remembered mapping applies, as on the page.
  return Object.keys(mapping).length ? mapping : undefined;
}

function progressLine(io: CliIo, file: string): (p: ImportProgress) => void {
  let lastPhase = '';
  let lastTenth = -1;
  return (p) => {
    const tenth = p.total ? Math.floor((p.done / p.total) * 10) : 0;
    if (p.phase === lastPhase && (p.phase !== 'reading' || tenth === lastTenth)) return;
    [lastPhase, lastTenth] = [p.phase, tenth];
    io.stderr.write(`${file}: ${p.phase}${p.phase === 'reading' ? ` ${tenth * 10}%` : ''}\n`);
  };
}

export const command: CliCommand = {
  summary: 'import temperature logger CSV files into a fridge (its primary logger unless --logger is given)',
  async run(args, io) {
    let values: Record<string, string | undefined>;
    let files: string[];
    try {
      const parsed = parseArgs({
        args,
        allowPositionals: true,
        options: {
          fridge: { type: 'string' }, logger: { type: 'string' }, unit: { type: 'string' }, tz: { type: 'string' }, 'date-order': { type: 'string' },
          'time-column': { type: 'string' }, 'date-column': { type: 'string' }, 'temp-column': { type: 'string' },
        },
      });
      values = parsed.values;
      files = parsed.positionals;
      if (!values.fridge) throw new UsageError('--fridge CODE is required');
      if (!files.length) throw new UsageError('give at least one FILE');
      mappingFrom(values);
    } catch (error) {
      io.stderr.write(`${(error as Error).message}\n${USAGE}\n`);
      return 2;
    }
    const database = await openCliDatabase();
    const sequelize = connectDatabase(database.config.DATABASE_URL, { poolMax: 2 });
    try {
      const fridge = await Fridge.findOne({ where: { code: values.fridge!.trim().toUpperCase() } });
      if (!fridge) {
        io.stderr.write(`no fridge with code '${values.fridge}'\n`);
        return 2;
      }
      const where = values.logger ? { fridgeId: fridge.id, serial: values.logger } : { fridgeId: fridge.id, role: 'primary' as const, removedOn: null };
      const logger = await Logger.findOne({ where });
      if (!logger) {
        io.stderr.write(values.logger ? `fridge ${fridge.code} has no logger '${values.logger}'\n` : `fridge ${fridge.code} has no primary logger in service; give --logger SERIAL\n`);
        return 2;
      }
      let status = 0;
      for (const file of files) {
        let size: number;
        try {
          size = (await stat(file)).size;
        } catch {
          io.stderr.write(`${file}: cannot read it: no such file\n`);
          status = 2;
          continue;
        }
        try {
          const outcome = await importLogFile(sequelize, {
            loggerId: logger.id, path: file, fileName: basename(file), sizeBytes: size, mapping: mappingFrom(values),
            actorId: null, source: 'cli', uploadsDir: database.config.UPLOADS_DIR, progress: progressLine(io, file),
          });
          io.stdout.write(`${file}: ${outcome.message}\n`);
        } catch (error) {
          if (!(error instanceof LogFileError)) throw error;
          io.stderr.write(`${file}: cannot be imported: ${error.message}; nothing stored\n`);
          status = 2;
        }
      }
      return status;
    } finally {
      await sequelize.close();
      database.release();
    }
  },
};
