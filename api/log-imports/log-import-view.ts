// Turns a LogImport row into the shapes the upload history and the import result show.
import type { LogImportDetail, LogImportView } from '../../shared/fridges/log-import-view.js';
import type { LogImport, Logger, User } from '../../database/models/index.js';

export type LogImportRow = LogImport & { logger?: Logger; importer?: User | null };

export function toLogImportView(row: LogImportRow, logger: Logger | undefined = row.logger): LogImportView {
  if (!logger) throw new Error('log import loaded without its logger');
  return {
    id: row.id,
    loggerId: row.loggerId,
    loggerSerial: logger.serial,
    fridgeId: logger.fridgeId,
    fileName: row.fileName,
    sha256: row.sha256,
    sizeBytes: row.sizeBytes,
    source: row.source,
    importedAt: row.importedAt.toISOString(),
    importedBy: row.importer?.name ?? null,
    rowsRead: row.rowsRead,
    readingsStored: row.readingsStored,
    duplicates: row.duplicates,
    conflicts: row.conflicts,
    skipped: row.skipped,
    firstAt: row.firstAt.toISOString(),
    lastAt: row.lastAt.toISOString(),
    unit: row.layout.unit,
    zone: row.layout.zone,
    warningCount: row.warningCount,
  };
}

export function toLogImportDetail(row: LogImportRow, logger?: Logger): LogImportDetail {
  return { ...toLogImportView(row, logger), warnings: row.warnings, conflictSamples: row.conflictSamples };
}
