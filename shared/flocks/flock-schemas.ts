// Flocks: a group of birds placed in a house, its dates and bird numbers, and the programme it follows.
import { z } from 'zod';
import { isoDateField } from './iso-date-field.js';
import type { BirdCountView } from './bird-count-schemas.js';
import type { ScheduleEntry } from './flock-schedule.js';
import type { FlockStatus } from './flock-status.js';
import type { VaccinationView } from './vaccination-schemas.js';

const birds = z.number({ message: 'Enter the number of birds.' }).int('Whole birds.').min(1, 'At least 1 bird.').max(10_000_000, 'At most 10,000,000 birds.');

export const flockInputSchema = z
  .object({
    name: z.string().trim().min(1, 'Enter a name.').max(60, 'At most 60 characters.'),
    hatchDate: isoDateField(),
    placementDate: isoDateField(),
    birdsPlaced: birds,
    /** Planned depletion or slaughter; vaccinations too close to it are flagged (withdrawal). */
    plannedDepletionDate: isoDateField().nullable().default(null),
    programmeId: z.number().int().positive().nullable().default(null),
    notes: z.string().trim().max(2000, 'At most 2000 characters.').default(''),
  })
  .refine((f) => f.hatchDate <= f.placementDate, { path: ['placementDate'], message: 'Placement cannot come before the hatch date.' })
  .refine((f) => f.plannedDepletionDate === null || f.plannedDepletionDate > f.placementDate, {
    path: ['plannedDepletionDate'],
    message: 'Depletion must come after placement.',
  });

export type FlockInput = z.infer<typeof flockInputSchema>;

export const flockDepletionSchema = z.object({ depletedOn: isoDateField() });

export const flockListQuerySchema = z.object({
  siteId: z.coerce.number().int().positive().optional(),
  /** Depleted flocks are left out unless asked for. */
  includeDepleted: z.enum(['true', 'false']).default('false'),
});

export interface FlockSummary {
  id: number;
  name: string;
  siteId: number;
  siteName: string;
  houseId: number;
  houseName: string;
  hatchDate: string;
  placementDate: string;
  plannedDepletionDate: string | null;
  depletedOn: string | null;
  birdsPlaced: number;
  currentBirds: number;
  /** Age in days today on the site's calendar (negative before hatch). */
  ageDays: number;
  status: FlockStatus;
  programmeId: number | null;
  programmeName: string | null;
  /** The first open vaccination on or after today. */
  nextVaccination: { id: number; plannedDate: string; productName: string } | null;
  /** Open vaccinations whose day passed with nothing recorded (none once the flock is depleted: those were missed). */
  overdueVaccinations: number;
}

export interface FlockView extends FlockSummary {
  /** Today on the site's calendar, which the states of the schedule are read against. */
  today: string;
  houseCapacity: number | null;
  notes: string;
  birdCounts: BirdCountView[];
  vaccinations: VaccinationView[];
  /** Every step of the programme and every vaccination, with its state (see shared/flocks/flock-schedule.ts). */
  schedule: ScheduleEntry<VaccinationView>[];
}
