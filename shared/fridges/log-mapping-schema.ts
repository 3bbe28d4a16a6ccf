// A user's column mapping for a logger file, validated at the edge and remembered per logger.
import { z } from 'zod';
import type { LogMapping } from '../logs/log-layout.js';

const column = z.union([z.string().trim().min(1).max(200), z.number().int().min(0).max(500)]);

export const logMappingSchema = z
  .object({
    delimiter: z.enum([',', ';', '\t']).optional(),
    headerLine: z.number().int().min(1).max(10_000).optional(),
    decimalComma: z.boolean().optional(),
    timeColumn: column.optional(),
    dateColumn: column.optional(),
    tempColumn: column.optional(),
    unit: z.enum(['F', 'C']).optional(),
    dateOrder: z.enum(['MDY', 'DMY', 'YMD']).optional(),
    zone: z.string().trim().min(1).max(64).optional(),
  })
  .strict();

export type StoredLogMapping = z.infer<typeof logMappingSchema>;

/** Drops empty entries so a remembered mapping never overrides detection with nothing. */
export function compactMapping(mapping: StoredLogMapping): LogMapping {
  return Object.fromEntries(Object.entries(mapping).filter(([, v]) => v !== undefined && v !== '')) as LogMapping;
}
