// Loggers of a fridge and their calibration certificates: add, change, retire, and keep each certificate's file.
import { createHash } from 'node:crypto';
import { copyFile, mkdir, readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { QueryTypes, type Sequelize, UniqueConstraintError } from 'sequelize';
import type { CertificateInput, CertificateView, LoggerInput, LoggerUpdate, LoggerView } from '../../shared/fridges/logger-schemas.js';
import { siteDate } from '../../shared/fridges/site-date.js';
import { Fridge, Logger, LoggerCertificate, Site } from '../../database/models/index.js';
import { recordAudit } from '../audit/record-audit.js';
import { recomputeFridgeWindow } from '../excursions/recompute-fridge-window.js';
import { AppError } from '../http/app-error.js';
import { toCertificateView, toLoggerView } from './logger-view.js';

async function viewOf(loggerId: number): Promise<LoggerView> {
  const logger = await Logger.findByPk(loggerId, { include: [{ model: LoggerCertificate, as: 'certificates' }] });
  if (!logger) throw AppError.notFound('No such logger.');
  const fridge = await Fridge.findByPk(logger.fridgeId, { include: [{ model: Site, as: 'site' }] });
  const site = (fridge as Fridge & { site?: Site }).site!;
  const [newest] = await Logger.sequelize!.query<{ at: Date | null }>('SELECT max(at) AS at FROM readings WHERE logger_id = :id', { replacements: { id: loggerId }, type: QueryTypes.SELECT });
  return toLoggerView(logger, siteDate(Date.now(), site.timeZone), newest?.at ? new Date(newest.at) : null);
}

function primaryClash(error: unknown): never {
  if (error instanceof UniqueConstraintError) {
    const onSerial = error.errors.some((e) => e.path === 'serial');
    throw onSerial
      ? AppError.conflict('This fridge already has a logger with this serial number.', [{ field: 'serial', message: 'Already in this fridge.' }])
      : AppError.conflict('This fridge already has a primary logger in service: retire it first or add this one as a backup.', [{ field: 'role', message: 'Already a primary in service.' }]);
  }
  throw error;
}

export async function createLogger(sequelize: Sequelize, actorId: number, input: LoggerInput): Promise<LoggerView> {
  if (!(await Fridge.findByPk(input.fridgeId))) throw AppError.badRequest('No such fridge.', [{ field: 'fridgeId', message: 'Unknown fridge.' }]);
  const id = await sequelize
    .transaction(async (transaction) => {
      const logger = await Logger.create({ fridgeId: input.fridgeId, serial: input.serial, model: input.model, role: input.role, ...(input.installedOn && { installedOn: input.installedOn }) }, { transaction });
      await recordAudit({ actorId, action: 'logger.create', entity: 'logger', entityId: logger.id, after: logger.toJSON() }, transaction);
      return logger.id;
    })
    .catch(primaryClash);
  return viewOf(id);
}

/** A role change alters which readings make up the fridge's series, so its excursions are recomputed over all time. */
export async function updateLogger(sequelize: Sequelize, actorId: number, id: number, input: LoggerUpdate): Promise<LoggerView> {
  await sequelize
    .transaction(async (transaction) => {
      const logger = await Logger.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
      if (!logger) throw AppError.notFound('No such logger.');
      await Fridge.findByPk(logger.fridgeId, { transaction, lock: transaction.LOCK.UPDATE });
      const before = logger.toJSON();
      if (input.removedOn && input.removedOn < logger.installedOn) {
        throw AppError.badRequest('A logger cannot be retired before it was installed.', [{ field: 'removedOn', message: 'Before the installation date.' }]);
      }
      await logger.update(
        {
          ...(input.model !== undefined && { model: input.model }),
          ...(input.role !== undefined && { role: input.role }),
          ...(input.removedOn !== undefined && { removedOn: input.removedOn }),
          ...(input.mapping !== undefined && { mapping: input.mapping }),
        },
        { transaction },
      );
      await recordAudit({ actorId, action: 'logger.update', entity: 'logger', entityId: id, before, after: logger.toJSON() }, transaction);
      if (input.role !== undefined && input.role !== before.role) {
        const [span] = await sequelize.query<{ first: Date | null; last: Date | null }>('SELECT min(at) AS first, max(at) AS last FROM readings WHERE logger_id = :id', { replacements: { id }, type: QueryTypes.SELECT, transaction });
        if (span?.first && span.last) await recomputeFridgeWindow(sequelize, transaction, logger.fridgeId, { start: new Date(span.first).getTime(), end: new Date(span.last).getTime() }, { actorId });
      }
    })
    .catch(primaryClash);
  return viewOf(id);
}

/** What the file's first bytes say it is; the browser's claim about the type is not trusted. */
function sniffCertificateType(head: Buffer): string | undefined {
  if (head.subarray(0, 5).toString('latin1') === '%PDF-') return 'application/pdf';
  if (head.subarray(0, 8).equals(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]))) return 'image/png';
  if (head[0] === 0xff && head[1] === 0xd8 && head[2] === 0xff) return 'image/jpeg';
  return undefined;
}

const extensions: Record<string, string> = { 'application/pdf': 'pdf', 'image/png': 'png', 'image/jpeg': 'jpg' };

export async function addCertificate(
  sequelize: Sequelize,
  actorId: number,
  loggerId: number,
  input: CertificateInput,
  file: { path: string; originalName: string; size: number },
  uploadsDir: string,
): Promise<CertificateView> {
  const bytes = await readFile(file.path);
  const contentType = sniffCertificateType(bytes);
  if (!contentType) throw AppError.unprocessable('A calibration certificate must be a PDF, PNG or JPEG file.', [{ field: 'file', message: 'Not a PDF, PNG or JPEG.' }]);
  const sha256 = createHash('sha256').update(bytes).digest('hex');
  const storedName = join('certificates', `${sha256}.${extensions[contentType]}`);
  return sequelize.transaction(async (transaction) => {
    const logger = await Logger.findByPk(loggerId, { transaction });
    if (!logger) throw AppError.notFound('No such logger.');
    const certificate = await LoggerCertificate.create(
      { loggerId, calibratedOn: input.calibratedOn, dueOn: input.dueOn, fileName: file.originalName.slice(0, 255) || 'certificate', contentType, storedName, sizeBytes: file.size, sha256, uploadedBy: actorId },
      { transaction },
    );
    await recordAudit({ actorId, action: 'logger.certificate', entity: 'logger_certificate', entityId: certificate.id, after: certificate.toJSON() }, transaction);
    await mkdir(join(uploadsDir, 'certificates'), { recursive: true });
    await copyFile(file.path, join(uploadsDir, storedName));
    return toCertificateView(certificate);
  });
}

export async function getCertificate(loggerId: number, certificateId: number): Promise<LoggerCertificate> {
  const certificate = await LoggerCertificate.findOne({ where: { id: certificateId, loggerId } });
  if (!certificate) throw AppError.notFound('No such certificate.');
  return certificate;
}
