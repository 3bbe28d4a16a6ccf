// Loggers and their calibration certificates, as the API sends them and the forms that change them.
import { z } from 'zod';
import { logMappingSchema, type StoredLogMapping } from './log-mapping-schema.js';

const isoDate = z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'A date as YYYY-MM-DD.').refine((d) => !Number.isNaN(Date.parse(`${d}T00:00:00Z`)), 'Not a calendar date.');

export const loggerRoles = ['primary', 'backup'] as const;
export type LoggerRole = (typeof loggerRoles)[number];

export const loggerInputSchema = z.object({
  fridgeId: z.number().int().positive(),
  serial: z.string().trim().min(1, 'Enter the serial number.').max(60, 'At most 60 characters.'),
  model: z.string().trim().max(120, 'At most 120 characters.').default(''),
  role: z.enum(loggerRoles),
  installedOn: isoDate.optional(),
});

export const loggerUpdateSchema = z.object({
  model: z.string().trim().max(120, 'At most 120 characters.').optional(),
  role: z.enum(loggerRoles).optional(),
  removedOn: isoDate.nullable().optional(),
  mapping: logMappingSchema.optional(),
});

export const certificateInputSchema = z
  .object({ calibratedOn: isoDate, dueOn: isoDate })
  .refine((c) => c.dueOn > c.calibratedOn, { path: ['dueOn'], message: 'The due date must be after the calibration date.' });

export type LoggerInput = z.infer<typeof loggerInputSchema>;
export type LoggerUpdate = z.infer<typeof loggerUpdateSchema>;
export type CertificateInput = z.infer<typeof certificateInputSchema>;

export interface CertificateView {
  id: number;
  calibratedOn: string;
  dueOn: string;
  fileName: string;
  contentType: string;
  uploadedAt: string;
}

export interface LoggerView {
  id: number;
  fridgeId: number;
  serial: string;
  model: string;
  role: LoggerRole;
  installedOn: string;
  removedOn: string | null;
  /** The column mapping chosen for this logger's last file, offered again for the next. */
  mapping: StoredLogMapping;
  certificates: CertificateView[];
  /** Due within the reminder window, overdue, or never calibrated. */
  calibration: 'ok' | 'due-soon' | 'overdue' | 'none';
  newestReadingAt: string | null;
}
