// Imports one logger file: check its layout, then in one transaction read and store it, record it, recompute excursions.
import { copyFile, mkdir } from 'node:fs/promises';
import { join } from 'node:path';
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import { compactMapping, type StoredLogMapping } from '../../shared/fridges/log-mapping-schema.js';
import type { ImportOutcome, ImportProgress } from '../../shared/fridges/log-import-view.js';
import type { LogMapping } from '../../shared/logs/log-layout.js';
import { Fridge, LogImport, Logger, Site, User } from '../../database/models/index.js';
import { recordAudit } from '../audit/record-audit.js';
import { recomputeFridgeWindow } from '../excursions/recompute-fridge-window.js';
import { AppError } from '../http/app-error.js';
import { BulkCopyReadings } from '../readings/bulk-copy-readings.js';
import { HourlyAggregate } from '../readings/hourly-aggregate.js';
import { refreshReadingHours } from '../readings/refresh-reading-hours.js';
import { storeReadings, type StoreResult } from '../readings/store-readings.js';
import { importMessage } from './import-message.js';
import { toLogImportDetail, toLogImportView } from './log-import-view.js';
import { readLogFile, sha256OfFile, sniffLogFile } from './read-log-file.js';

/** Warnings kept with an import; the count says how many there were in all. */
const KEPT_WARNINGS = 500;

export interface ImportRequest {
  loggerId: number;
  /** The file on disk (multer's upload, or the CLI's argument). */
  path: string;
  fileName: string;
  sizeBytes: number;
  /** The user's choices; undefined uses the logger's remembered mapping. Unset fields are detected. */
  mapping?: StoredLogMapping;
  actorId: number | null;
  source: 'upload' | 'cli';
  uploadsDir: string;
  progress?: (progress: ImportProgress) => void;
}

async function loadLogger(loggerId: number) {
  const logger = await Logger.findByPk(loggerId, { include: [{ model: Fridge, as: 'fridge', include: [{ model: Site, as: 'site' }] }] });
  const fridge = (logger as (Logger & { fridge?: Fridge & { site?: Site } }) | null)?.fridge;
  if (!logger || !fridge?.site) throw AppError.notFound('No such logger.');
  return { logger, fridge, site: fridge.site };
}

function repeatedOutcome(previous: LogImport, logger: Logger): ImportOutcome {
  const on = previous.importedAt.toISOString().slice(0, 10);
  return {
    repeated: true,
    import: toLogImportView(previous, logger),
    message: `Nothing changed: this file (same SHA-256) was already imported for logger ${logger.serial} on ${on}.`,
  };
}

/** The logger's oldest and newest stored instants before this file. */
async function storedSpan(sequelize: Sequelize, transaction: Transaction, loggerId: number): Promise<{ oldest: number; newest: number } | null> {
  const [row] = await sequelize.query<{ oldest: Date | null; newest: Date | null }>(
    `SELECT (SELECT at FROM readings WHERE logger_id = :id ORDER BY at LIMIT 1) AS oldest, (SELECT at FROM readings WHERE logger_id = :id ORDER BY at DESC LIMIT 1) AS newest`,
    { replacements: { id: loggerId }, type: QueryTypes.SELECT, transaction },
  );
  return row?.oldest && row.newest ? { oldest: new Date(row.oldest).getTime(), newest: new Date(row.newest).getTime() } : null;
}

export async function importLogFile(sequelize: Sequelize, request: ImportRequest): Promise<ImportOutcome> {
  const { logger, fridge, site } = await loadLogger(request.loggerId);
  const progress = (phase: ImportProgress['phase'], done: number) => request.progress?.({ phase, done, total: request.sizeBytes });
  progress('reading', 0);
  const sha256 = await sha256OfFile(request.path);
  const previous = await LogImport.findOne({ where: { loggerId: logger.id, sha256 } });
  if (previous) return repeatedOutcome(previous, logger);

  const given: LogMapping = compactMapping(request.mapping ?? logger.mapping ?? {});
  // A fatal layout is found before any transaction is opened.
  const layout = await sniffLogFile(request.path, { ...given, zone: given.zone ?? site.timeZone });
  const storedName = join('log-files', `${sha256}.csv`);
  try {
    return await sequelize.transaction(async (transaction) => {
      // One import or recompute per fridge at a time: excursions are worked out over the fridge's whole series.
      await Fridge.findByPk(fridge.id, { transaction, lock: transaction.LOCK.UPDATE });
      const again = await LogImport.findOne({ where: { loggerId: logger.id, sha256 }, transaction });
      if (again) return repeatedOutcome(again, logger);
      const before = await storedSpan(sequelize, transaction, logger.id);

      // Readings stream into the table while the file is read; hours are summed on the way.
      const bulk = await BulkCopyReadings.start(transaction, logger.id);
      const hours = new HourlyAggregate();
      const file = await readLogFile(request.path, layout, {
        onBytes: (bytes) => progress('reading', bytes),
        onReadings: async (batch) => {
          for (const r of batch) hours.add(r.at, r.tempC);
          await bulk.add(batch);
        },
      }).catch(async (error: unknown) => {
        await bulk.abandon();
        throw error;
      });
      progress('storing', request.sizeBytes);
      const readings = file.readings;
      const first = readings[0].at;
      const last = readings[readings.length - 1].at;
      let stored: StoreResult;
      if (await bulk.finish()) {
        stored = { stored: readings.length, duplicates: 0, conflicts: 0, conflictSamples: [], overlappedStored: false };
        await hours.addTo(transaction, logger.id);
      } else {
        stored = await storeReadings(transaction, logger.id, readings);
        if (stored.stored > 0) await refreshReadingHours(sequelize, transaction, logger.id, first, last);
      }
      const row = await LogImport.create(
        {
          loggerId: logger.id,
          fileName: request.fileName.slice(0, 255) || 'logger file',
          sha256,
          sizeBytes: request.sizeBytes,
          storedName,
          source: request.source,
          importedBy: request.actorId,
          rowsRead: file.rowsRead,
          readingsStored: stored.stored,
          duplicates: stored.duplicates,
          conflicts: stored.conflicts,
          skipped: file.skipped,
          firstAt: new Date(first),
          lastAt: new Date(last),
          layout: file.layout,
          warningCount: file.warningCount,
          warnings: file.warnings.slice(0, KEPT_WARNINGS),
          conflictSamples: stored.conflictSamples,
        },
        { transaction },
      );
      if (request.mapping !== undefined) await logger.update({ mapping: request.mapping }, { transaction });
      progress('analysing', request.sizeBytes);
      // Where the logger held nothing inside the file's span, what is stored there is the file: no need to read it back.
      const untouched = !before || before.newest < first || before.oldest > last;
      const known = untouched ? { loggerId: logger.id, from: first, to: last, readings } : undefined;
      const applied = await recomputeFridgeWindow(sequelize, transaction, fridge.id, { start: first, end: last }, { actorId: request.actorId, known });
      await recordAudit(
        { actorId: request.actorId, action: 'log-import.create', entity: 'log_import', entityId: row.id, after: { ...toLogImportView(row, logger), excursionsOpened: applied.opened } },
        transaction,
      );
      // Kept under its hash, so a copy left by a transaction that then failed is simply overwritten next time.
      await mkdir(join(request.uploadsDir, 'log-files'), { recursive: true });
      await copyFile(request.path, join(request.uploadsDir, storedName));
      const importer = request.actorId === null ? null : await User.findByPk(request.actorId, { transaction });
      const detail = toLogImportDetail(Object.assign(row, { importer }), logger);
      progress('done', request.sizeBytes);
      return { repeated: false, import: detail, excursionsOpened: applied.opened.length, message: importMessage(detail, applied.opened.length) };
    });
  } catch (error) {
    progress('failed', request.sizeBytes);
    // The row may have been committed by a concurrent upload of the same file; anything else leaves no trace.
    if ((error as { name?: string }).name === 'SequelizeUniqueConstraintError') {
      const raced = await LogImport.findOne({ where: { loggerId: logger.id, sha256 } });
      if (raced) return repeatedOutcome(raced, logger);
    }
    throw error;
  }
}
