// When a programme step falls for a flock: the hatch date plus the step's age (weeks are 7 days).
import { addDays, type IsoDate } from '../planning/iso-date.js';
import type { AgeUnit } from './age-units.js';

export function stepAgeDays(step: { ageValue: number; ageUnit: AgeUnit }): number {
  return step.ageUnit === 'weeks' ? step.ageValue * 7 : step.ageValue;
}

export function stepDate(hatchDate: IsoDate, step: { ageValue: number; ageUnit: AgeUnit }): IsoDate {
  return addDays(hatchDate, stepAgeDays(step));
}
