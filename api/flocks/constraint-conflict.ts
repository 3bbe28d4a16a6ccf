// Turns the database's uniqueness and no-overlap refusals into a 409 on the field they concern (the last guard against races).
import { AppError } from '../http/app-error.js';

interface PgError {
  original?: { code?: string; constraint?: string };
  parent?: { code?: string; constraint?: string };
}

/** Runs `write`; a violation of one of `constraints` becomes the given conflict, anything else is rethrown. */
export async function withConstraintConflicts<T>(
  write: () => Promise<T>,
  constraints: Record<string, { field: string; message: string }>,
): Promise<T> {
  try {
    return await write();
  } catch (error) {
    const pg = (error as PgError)?.original ?? (error as PgError)?.parent;
    const known = pg?.constraint ? constraints[pg.constraint] : undefined;
    if (known && (pg?.code === '23505' || pg?.code === '23P01')) throw AppError.conflict(known.message, [known]);
    throw error;
  }
}
