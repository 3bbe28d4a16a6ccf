// Times storage staff enter for a movement: not in the future (a few minutes' clock drift allowed), not absurdly old.
import { AppError } from '../http/app-error.js';

const minute = 60_000;
export const clockDriftMinutes = 5;
/** How far back a movement may be entered: a forgotten entry, not a rewrite of history. */
export const maxAgeDays = 60;

export function checkMovementTimes(times: { leftAt?: Date; at: Date }, now: Date): void {
  const fields = [];
  if (times.at.getTime() > now.getTime() + clockDriftMinutes * minute) fields.push({ field: 'at', message: 'Not in the future.' });
  for (const [field, value] of Object.entries(times) as [string, Date | undefined][]) {
    if (value && value.getTime() < now.getTime() - maxAgeDays * 1440 * minute) fields.push({ field, message: `Not more than ${maxAgeDays} days ago.` });
  }
  if (fields.length) throw AppError.badRequest(`Check the times: ${fields.map((f) => `${f.field}: ${f.message}`).join('; ')}`, fields);
}
