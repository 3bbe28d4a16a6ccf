// Brings a flock's generated vaccinations in line with its programme and dates, leaving alone what people touched.
import type { IsoDate } from '../planning/iso-date.js';
import type { ProductRoute } from '../catalogue/product-kinds.js';
import type { AgeUnit } from './age-units.js';
import { stepDate } from './step-age.js';
import type { VaccinationStatus } from './vaccination-statuses.js';

export interface ReconcileStep {
  readonly id: number;
  readonly productId: number;
  readonly ageValue: number;
  readonly ageUnit: AgeUnit;
  readonly route: ProductRoute;
  readonly notes: string;
}

export interface ReconcileVaccination {
  readonly id: number;
  readonly stepId: number | null;
  readonly productId: number;
  readonly route: ProductRoute;
  readonly plannedDate: IsoDate;
  readonly status: VaccinationStatus;
  readonly movedByHand: boolean;
}

export interface ReconcileInput {
  readonly hatchDate: IsoDate;
  readonly placementDate: IsoDate;
  /** Steps on or after this day are not generated (no vaccinating on or after depletion). */
  readonly lastDay: IsoDate | null;
  /** The site's today: steps before it are still generated, marked overdue. */
  readonly today: IsoDate;
  /** The programme's steps, or none when the flock follows no programme. */
  readonly steps: readonly ReconcileStep[];
  readonly existing: readonly ReconcileVaccination[];
}

export interface ReconcileChanges {
  /** `overdue`: the step's day was already past today when it was generated. */
  create: { stepId: number; productId: number; route: ProductRoute; plannedDate: IsoDate; notes: string; overdue: boolean }[];
  update: { id: number; productId: number; route: ProductRoute; plannedDate: IsoDate }[];
  /** Generated, still planned and never touched by hand: derived rows, safe to remove. */
  remove: number[];
}

/** Only a planned vaccination nobody moved follows the programme; confirmed, done, cancelled or moved ones stay as they are. */
function untouched(vaccination: ReconcileVaccination): boolean {
  return vaccination.status === 'planned' && !vaccination.movedByHand;
}

/**
 * A step is generated when its date falls on or after placement (earlier steps belong to the hatchery or the
 * rearing farm) and before the last day. A step whose day already passed when the programme was applied is
 * generated too, overdue: it may have been missed, so the flock's schedule shows it until someone plans it
 * again or cancels it with a reason (leaving it out would hide a missed vaccination and its vaccine need).
 * A step that already has a vaccination of any status, cancelled included, is not generated again.
 */
export function reconcileProgramme(input: ReconcileInput): ReconcileChanges {
  const changes: ReconcileChanges = { create: [], update: [], remove: [] };
  const stepsById = new Map(input.steps.map((step) => [step.id, step]));
  const inFlockLife = (date: IsoDate) => date >= input.placementDate && (input.lastDay === null || date < input.lastDay);
  const handled = new Set<number>();

  for (const vaccination of input.existing) {
    if (vaccination.stepId === null) continue;
    const step = stepsById.get(vaccination.stepId);
    if (!step) {
      if (untouched(vaccination)) changes.remove.push(vaccination.id);
      continue;
    }
    handled.add(step.id);
    if (!untouched(vaccination)) continue;
    const plannedDate = stepDate(input.hatchDate, step);
    if (!inFlockLife(plannedDate)) {
      changes.remove.push(vaccination.id);
    } else if (plannedDate !== vaccination.plannedDate || step.productId !== vaccination.productId || step.route !== vaccination.route) {
      changes.update.push({ id: vaccination.id, productId: step.productId, route: step.route, plannedDate });
    }
  }

  for (const step of input.steps) {
    if (handled.has(step.id)) continue;
    const plannedDate = stepDate(input.hatchDate, step);
    if (inFlockLife(plannedDate)) {
      changes.create.push({ stepId: step.id, productId: step.productId, route: step.route, plannedDate, notes: step.notes, overdue: plannedDate < input.today });
    }
  }
  changes.create.sort((a, b) => (a.plannedDate < b.plannedDate ? -1 : a.plannedDate > b.plannedDate ? 1 : a.stepId - b.stepId));
  return changes;
}
