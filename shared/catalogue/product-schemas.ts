// Products as their labels describe them: kind, route, storage range kept as entered, freeze sensitivity, withdrawal.
import { z } from 'zod';
import { productKinds, productRoutes, type ProductKind, type ProductRoute } from './product-kinds.js';
import type { PresentationView } from './presentation-schemas.js';
import type { TemperatureUnit } from '../temperature/index.js';

/** Plausible for either scale; the label's own figures are kept as entered. */
const limit = z.number({ message: 'Enter a temperature.' }).min(-100, 'Too low to be a storage limit.').max(100, 'Too high to be a storage limit.');

export const productInputSchema = z
  .object({
    name: z.string().trim().min(1, 'Enter a name.').max(120, 'At most 120 characters.'),
    maker: z.string().trim().max(120, 'At most 120 characters.').default(''),
    kind: z.enum(productKinds, { message: 'Choose live or inactivated.' }),
    route: z.enum(productRoutes, { message: 'Choose a route.' }),
    storageLow: limit,
    storageHigh: limit,
    storageUnit: z.enum(['F', 'C'], { message: 'Choose °F or °C.' }),
    freezeSensitive: z.boolean().default(true),
    useWithinMinutes: z.number().int('Whole minutes.').min(1, 'At least 1 minute.').max(48 * 60, 'At most 48 hours.').nullable().default(null),
    /** Time out of a fridge (transfer, vaccination day) beyond which a hold goes to the veterinarian; null: no limit known. */
    timeOutLimitMinutes: z.number().int('Whole minutes.').min(0, 'Not negative.').max(48 * 60, 'At most 48 hours.').nullable().default(null),
    /** Slaughter withdrawal from the label; 21 days when the label is silent is the usual default. */
    withdrawalDays: z.number().int('Whole days.').min(0, 'Not negative.').max(365, 'At most 365 days.').default(21),
    notes: z.string().trim().max(2000, 'At most 2000 characters.').default(''),
  })
  .refine((p) => p.storageLow < p.storageHigh, { path: ['storageHigh'], message: 'The upper limit must be above the lower one.' });

export type ProductInput = z.infer<typeof productInputSchema>;

export type CatalogueStatus = 'confirmed' | 'proposed';

export interface ProductView {
  id: number;
  name: string;
  maker: string;
  kind: ProductKind | null;
  route: ProductRoute | null;
  storageLow: number;
  storageHigh: number;
  storageUnit: TemperatureUnit;
  freezeSensitive: boolean;
  useWithinMinutes: number | null;
  timeOutLimitMinutes: number | null;
  withdrawalDays: number;
  notes: string;
  status: CatalogueStatus;
  presentations: PresentationView[];
}
