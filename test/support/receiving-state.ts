// Reads back what receiving stored: row counts of its tables and the photo files on disk, for "nothing stored" checks.
import { existsSync, readdirSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { ownerConnection } from './test-database.js';
import { testConfig } from './test-app.js';

const tables = ['shipments', 'shipment_lines', 'shipment_photos', 'lots', 'stock_movements', 'stock_balances', 'holds'] as const;

export type ReceivingCounts = Record<(typeof tables)[number] | 'photoFiles', number>;

export function photoFiles(): string[] {
  const folder = join(testConfig().UPLOADS_DIR, 'photos');
  return existsSync(folder) ? readdirSync(folder) : [];
}

/** Removes every stored photo file (the database reset does not reach the disk). */
export function clearPhotoFiles(): void {
  rmSync(join(testConfig().UPLOADS_DIR, 'photos'), { recursive: true, force: true });
}

export async function receivingCounts(): Promise<ReceivingCounts> {
  const counts = { photoFiles: photoFiles().length } as ReceivingCounts;
  for (const table of tables) {
    const [rows] = await ownerConnection().query(`SELECT count(*)::int AS n FROM ${table}`);
    counts[table] = (rows as { n: number }[])[0]!.n;
  }
  return counts;
}

export async function balanceOf(lotId: number, fridgeId: number): Promise<number | null> {
  const [rows] = await ownerConnection().query('SELECT vials FROM stock_balances WHERE lot_id = :lotId AND fridge_id = :fridgeId', { replacements: { lotId, fridgeId } });
  return (rows as { vials: number }[])[0]?.vials ?? null;
}

export async function movementSum(lotId: number, fridgeId: number): Promise<number> {
  const [rows] = await ownerConnection().query(
    `SELECT coalesce(sum(CASE WHEN to_fridge_id = :fridgeId THEN vials ELSE 0 END) - sum(CASE WHEN from_fridge_id = :fridgeId THEN vials ELSE 0 END), 0)::int AS n
     FROM stock_movements WHERE lot_id = :lotId`,
    { replacements: { lotId, fridgeId } },
  );
  return (rows as { n: number }[])[0]!.n;
}
