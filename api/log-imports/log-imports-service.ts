// The upload history of a fridge and one import with its warnings and conflicts.
import type { LogImportDetail, LogImportView } from '../../shared/fridges/log-import-view.js';
import { LogImport, Logger, User } from '../../database/models/index.js';
import { AppError } from '../http/app-error.js';
import { toLogImportDetail, toLogImportView } from './log-import-view.js';

const withLogger = [
  { model: Logger, as: 'logger' },
  { model: User, as: 'importer', attributes: ['id', 'name'] },
];

export async function listLogImports(fridgeId: number): Promise<LogImportView[]> {
  const rows = await LogImport.findAll({
    include: [{ model: Logger, as: 'logger', where: { fridgeId } }, withLogger[1]],
    order: [['importedAt', 'DESC'], ['id', 'DESC']],
    limit: 500,
  });
  return rows.map((row) => toLogImportView(row));
}

export async function getLogImport(id: number): Promise<LogImportDetail & { storedName: string }> {
  const row = await LogImport.findByPk(id, { include: withLogger });
  if (!row) throw AppError.notFound('No such log import.');
  return { ...toLogImportDetail(row), storedName: row.storedName };
}
