// The form a veterinarian signs to decide a hold (used by the API and the review page).
import { z } from 'zod';

export const decisionSchema = z
  .object({
    decision: z.enum(['release', 'release_with_condition', 'discard']),
    condition: z.string().trim().max(2000, 'At most 2,000 characters.').default(''),
    notes: z.string().trim().max(4000, 'At most 4,000 characters.').default(''),
    password: z.string().min(1, 'Re-enter your password to sign.').max(1024),
    supersedesId: z.number().int().positive().nullable().default(null),
  })
  .refine((value) => value.decision !== 'release_with_condition' || value.condition.length > 0, {
    path: ['condition'],
    message: 'Say the condition (for example: use first, within a week).',
  });
