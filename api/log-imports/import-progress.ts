// How far an upload has been read, kept in the database so any API process can answer the page's polling.
import type pg from 'pg';
import type { ImportProgress } from '../../shared/fridges/log-import-view.js';

export const progressTokenPattern = /^[A-Za-z0-9_-]{8,64}$/;

/** Writes at most every quarter second (and always on a phase change); failures here never stop the import. */
export function progressReporter(pool: pg.Pool, token: string, userId: number): (progress: ImportProgress) => void {
  let last = 0;
  let lastPhase = '';
  return (progress) => {
    const now = Date.now();
    if (progress.phase === lastPhase && now - last < 250) return;
    last = now;
    lastPhase = progress.phase;
    pool
      .query(
        `INSERT INTO log_import_progress (token, user_id, phase, done, total, updated_at) VALUES ($1, $2, $3, $4, $5, now())
         ON CONFLICT (token) DO UPDATE SET phase = EXCLUDED.phase, done = EXCLUDED.done, total = EXCLUDED.total, updated_at = now()
         WHERE log_import_progress.user_id = EXCLUDED.user_id`,
        [token, userId, progress.phase, progress.done, progress.total],
      )
      .catch(() => undefined);
  };
}

export async function readProgress(pool: pg.Pool, token: string, userId: number): Promise<ImportProgress | null> {
  // Old entries go as new ones are read; an hour is far longer than any import.
  await pool.query(`DELETE FROM log_import_progress WHERE updated_at < now() - interval '1 hour'`);
  const { rows } = await pool.query<{ phase: ImportProgress['phase']; done: string; total: string }>(
    'SELECT phase, done, total FROM log_import_progress WHERE token = $1 AND user_id = $2',
    [token, userId],
  );
  return rows[0] ? { phase: rows[0].phase, done: Number(rows[0].done), total: Number(rows[0].total) } : null;
}
