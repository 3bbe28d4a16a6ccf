// A calendar date field (YYYY-MM-DD) for the flock and vaccination forms, with the message the forms show.
import { z } from 'zod';
import { isIsoDate } from '../planning/iso-date.js';

export function isoDateField(message = 'Enter a date (YYYY-MM-DD).') {
  return z.string({ message }).refine(isIsoDate, message);
}
