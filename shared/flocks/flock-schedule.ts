// A flock's schedule: every step of its programme and every vaccination, each with its state on the site's today,
// so a step whose day passed with nothing recorded stands out instead of vanishing.
import { daysBetween, type IsoDate } from '../planning/iso-date.js';
import type { ProductRoute } from '../catalogue/product-kinds.js';
import type { AgeUnit } from './age-units.js';
import type { ScheduleState } from './schedule-states.js';
import { stepAgeDays, stepDate } from './step-age.js';
import type { VaccinationStatus } from './vaccination-statuses.js';

export interface ScheduleStep {
  readonly id: number;
  readonly position: number;
  readonly productId: number;
  readonly productName: string;
  readonly ageValue: number;
  readonly ageUnit: AgeUnit;
  readonly route: ProductRoute;
}

export interface ScheduleVaccination {
  readonly id: number;
  readonly programmeStepId: number | null;
  readonly productName: string;
  readonly route: ProductRoute;
  readonly plannedDate: IsoDate;
  readonly status: VaccinationStatus;
}

export interface ScheduleInput<V extends ScheduleVaccination> {
  readonly hatchDate: IsoDate;
  readonly placementDate: IsoDate;
  /** The day the flock leaves (recorded depletion, else the planned one): steps on or after it are not planned. */
  readonly lastDay: IsoDate | null;
  /** The flock was depleted: what is still open then was missed, and can no longer be planned. */
  readonly depleted: boolean;
  readonly today: IsoDate;
  /** The steps of the programme the flock follows (none without one). */
  readonly steps: readonly ScheduleStep[];
  readonly vaccinations: readonly V[];
}

export interface ScheduleStepRef {
  id: number;
  position: number;
  /** "Day 14", "Week 4": the age the programme gives. */
  label: string;
  /** Hatch date + the step's age; the vaccination may have been moved from it. */
  programmeDate: IsoDate;
}

export interface ScheduleEntry<V> {
  /** `v<id>` for a vaccination, `s<id>` for a step nothing was generated from. */
  key: string;
  state: ScheduleState;
  /** The vaccination's planned date, or the programme's date for a step without one. */
  date: IsoDate;
  /** The flock's age on that date. */
  ageDays: number;
  /** Whole days since `date` for an overdue or missed entry, else 0. */
  daysLate: number;
  /** The programme step, when the entry comes from the flock's programme. */
  step: ScheduleStepRef | null;
  /** The vaccination's product and route, or the step's when nothing was generated from it. */
  productName: string;
  route: ProductRoute;
  /** The vaccination to act on; null for a step nothing was generated from. */
  vaccination: V | null;
}

export function stepLabel(step: { ageValue: number; ageUnit: AgeUnit }): string {
  return `${step.ageUnit === 'weeks' ? 'Week' : 'Day'} ${step.ageValue}`;
}

function vaccinationState(vaccination: ScheduleVaccination, input: ScheduleInput<ScheduleVaccination>): ScheduleState {
  if (vaccination.status === 'done' || vaccination.status === 'cancelled') return vaccination.status;
  if (vaccination.plannedDate < input.today) return input.depleted ? 'missed' : 'overdue';
  return vaccination.status;
}

/** A step nothing was generated from: outside the flock's life, or (a depleted flock's, or not yet reconciled) open. */
function stepState(date: IsoDate, input: ScheduleInput<ScheduleVaccination>): ScheduleState {
  if (date < input.placementDate) return 'before_placement';
  if (input.lastDay !== null && date >= input.lastDay) return 'after_depletion';
  if (input.depleted) return 'missed';
  return date < input.today ? 'overdue' : 'planned';
}

/** Entries in date order; on one day, in the programme's order, then vaccinations added by hand. */
export function flockSchedule<V extends ScheduleVaccination>(input: ScheduleInput<V>): ScheduleEntry<V>[] {
  const stepsById = new Map(input.steps.map((step) => [step.id, step]));
  const ref = (step: ScheduleStep): ScheduleStepRef => ({ id: step.id, position: step.position, label: stepLabel(step), programmeDate: stepDate(input.hatchDate, step) });
  const late = (state: ScheduleState, date: IsoDate) => (state === 'overdue' || state === 'missed' ? daysBetween(date, input.today) : 0);

  const entries: ScheduleEntry<V>[] = input.vaccinations.map((vaccination) => {
    const step = vaccination.programmeStepId === null ? undefined : stepsById.get(vaccination.programmeStepId);
    const state = vaccinationState(vaccination, input);
    return {
      key: `v${vaccination.id}`,
      state,
      date: vaccination.plannedDate,
      ageDays: daysBetween(input.hatchDate, vaccination.plannedDate),
      daysLate: late(state, vaccination.plannedDate),
      step: step ? ref(step) : null,
      productName: vaccination.productName,
      route: vaccination.route,
      vaccination,
    };
  });
  const generated = new Set(input.vaccinations.flatMap((v) => (v.programmeStepId === null ? [] : [v.programmeStepId])));
  for (const step of input.steps) {
    if (generated.has(step.id)) continue;
    const date = stepDate(input.hatchDate, step);
    const state = stepState(date, input);
    entries.push({
      key: `s${step.id}`,
      state,
      date,
      ageDays: stepAgeDays(step),
      daysLate: late(state, date),
      step: ref(step),
      productName: step.productName,
      route: step.route,
      vaccination: null,
    });
  }
  const position = (entry: ScheduleEntry<V>) => entry.step?.position ?? Number.MAX_SAFE_INTEGER;
  return entries.sort((a, b) => (a.date < b.date ? -1 : a.date > b.date ? 1 : position(a) - position(b) || (a.vaccination?.id ?? 0) - (b.vaccination?.id ?? 0)));
}
