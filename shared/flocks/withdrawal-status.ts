// The withdrawal flag on a vaccination and whether a veterinarian's override still covers it.
import { daysBetween, type IsoDate } from '../planning/iso-date.js';
import { DEFAULT_WITHDRAWAL_DAYS, isInWithdrawalWindow } from '../planning/withdrawal-window.js';

export interface OverrideFacts {
  readonly vaccinationDate: IsoDate;
  readonly depletionDate: IsoDate;
  readonly withdrawalDays: number;
}

/**
 * An override answers one question: this date, this depletion, this label. When any of them changes, the
 * veterinarian has not ruled on the new situation, so the override no longer applies.
 */
export function overrideApplies(override: OverrideFacts, current: OverrideFacts): boolean {
  return (
    override.vaccinationDate === current.vaccinationDate &&
    override.depletionDate === current.depletionDate &&
    override.withdrawalDays === current.withdrawalDays
  );
}

export function withdrawalStatus(input: {
  plannedDate: IsoDate;
  depletionDate: IsoDate | null;
  withdrawalDays?: number;
  overrides?: readonly OverrideFacts[];
}): { flagged: boolean; withdrawalDays: number; daysBeforeDepletion: number | null; overridden: boolean; blocksConfirmation: boolean } {
  const withdrawalDays = input.withdrawalDays ?? DEFAULT_WITHDRAWAL_DAYS;
  if (input.depletionDate === null) {
    return { flagged: false, withdrawalDays, daysBeforeDepletion: null, overridden: false, blocksConfirmation: false };
  }
  const flagged = isInWithdrawalWindow(input.plannedDate, input.depletionDate, withdrawalDays);
  const current = { vaccinationDate: input.plannedDate, depletionDate: input.depletionDate, withdrawalDays };
  const overridden = flagged && (input.overrides ?? []).some((override) => overrideApplies(override, current));
  return {
    flagged,
    withdrawalDays,
    daysBeforeDepletion: daysBetween(input.plannedDate, input.depletionDate),
    overridden,
    blocksConfirmation: flagged && !overridden,
  };
}
