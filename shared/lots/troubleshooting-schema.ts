// The troubleshooting record storage staff fill in for an exposure event (fields as the CDC Vaccine Storage and
// Handling Toolkit's troubleshooting record lists them). Temperatures are entered in the unit given.
import { z } from 'zod';

const temperature = z.number().min(-80, 'At least −80.').max(150, 'At most 150.').nullable().default(null);
const instant = z.iso.datetime({ offset: true, message: 'A date and time.' }).nullable().default(null);
const text = (max: number) => z.string().trim().max(max, `At most ${max.toLocaleString('en-US')} characters.`).default('');

export const troubleshootingSchema = z
  .object({
    unit: z.enum(['F', 'C']),
    foundAt: instant,
    unitTemp: temperature,
    unitMin: temperature,
    unitMax: temperature,
    roomTemp: temperature,
    foundBy: text(200),
    whatHappened: text(4000),
    minutesSinceInRange: z.number().int('Whole minutes.').min(0, 'Not negative.').max(525_600, 'At most a year.').nullable().default(null),
    backInStorageAt: instant,
    contacted: text(2000),
    preventiveAction: text(4000),
  })
  .refine((v) => v.unitMin === null || v.unitMax === null || v.unitMin <= v.unitMax, { path: ['unitMin'], message: 'The minimum is above the maximum.' })
  .refine((v) => v.foundAt === null || v.backInStorageAt === null || new Date(v.backInStorageAt) >= new Date(v.foundAt), {
    path: ['backInStorageAt'],
    message: 'Before the time it was found.',
  });

export type TroubleshootingInput = z.infer<typeof troubleshootingSchema>;
