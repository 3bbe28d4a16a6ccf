// Partial uploads a killed process left in UPLOADS_DIR/incoming (multer writes there before the handler runs; a SIGKILL
// mid-upload skips its clean-up). Removed at start, so they never pile up.
import { readdir, rm, stat } from 'node:fs/promises';
import { join } from 'node:path';

/**
 * Another API process sharing the folder may be receiving a slow upload right now: only files not written to for this
 * long before our start are taken as left over.
 */
export const UPLOAD_GRACE_MS = 2 * 60_000;

/** Removes files in `<uploadsDir>/incoming` last written before `startedAt − graceMs`; returns how many. */
export async function removeStaleUploads(uploadsDir: string, startedAt: Date, graceMs = UPLOAD_GRACE_MS): Promise<number> {
  const dir = join(uploadsDir, 'incoming');
  let names: string[];
  try {
    names = await readdir(dir);
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === 'ENOENT') return 0;
    throw error;
  }
  let removed = 0;
  for (const name of names) {
    const path = join(dir, name);
    try {
      const info = await stat(path);
      if (!info.isFile() || info.mtimeMs >= startedAt.getTime() - graceMs) continue;
      await rm(path, { force: true });
      removed++;
    } catch (error) {
      // Gone meanwhile (its own request finished): nothing to do.
      if ((error as NodeJS.ErrnoException).code !== 'ENOENT') throw error;
    }
  }
  return removed;
}
