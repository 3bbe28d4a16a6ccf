// The committed data versions the caches are keyed on: 'projection' covers every table the planning projection and the
// lots list read (migration projection-data-version), 'storage' every table the fridge chart and the storage overview
// read (migration storage-data-version).
import { QueryTypes } from 'sequelize';
import { Site } from '../../database/models/index.js';

const tables = { projection: 'projection_data_version', storage: 'storage_data_version' } as const;

/**
 * The version, or null when the counter row is missing (an emptied database before its first write): then nothing is
 * cached. Read it BEFORE the data: a write committing in between makes the body newer than its version, never older,
 * and the next request sees the new version.
 */
export async function dataVersion(kind: keyof typeof tables): Promise<string | null> {
  const rows = await Site.sequelize!.query<{ version: string }>(`SELECT version::text AS version FROM ${tables[kind]} WHERE id = 1`, {
    type: QueryTypes.SELECT,
  });
  return rows[0]?.version ?? null;
}

/** A key part that changes once a minute, for bodies that say something about "now" (today's checks, no recent data). */
export const currentMinute = (now = new Date()) => String(Math.floor(now.getTime() / 60_000));
