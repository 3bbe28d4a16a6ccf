// Turns a Logger row (with its certificates) into the shape the API sends.
import { calibrationStatus } from '../../shared/fridges/calibration-status.js';
import type { CertificateView, LoggerView } from '../../shared/fridges/logger-schemas.js';
import type { Logger, LoggerCertificate } from '../../database/models/index.js';

export function toCertificateView(c: LoggerCertificate): CertificateView {
  return { id: c.id, calibratedOn: c.calibratedOn, dueOn: c.dueOn, fileName: c.fileName, contentType: c.contentType, uploadedAt: c.createdAt.toISOString() };
}

/** `today` is the date at the fridge's site. */
export function toLoggerView(logger: Logger, today: string, newestReadingAt: Date | null): LoggerView {
  const certificates = [...(logger.certificates ?? [])].sort((a, b) => b.dueOn.localeCompare(a.dueOn) || b.id - a.id).map(toCertificateView);
  return {
    id: logger.id,
    fridgeId: logger.fridgeId,
    serial: logger.serial,
    model: logger.model,
    role: logger.role,
    installedOn: logger.installedOn,
    removedOn: logger.removedOn ?? null,
    mapping: logger.mapping ?? {},
    certificates,
    calibration: calibrationStatus(certificates[0]?.dueOn ?? null, today),
    newestReadingAt: newestReadingAt?.toISOString() ?? null,
  };
}
