// Shapes vaccinations for the API: the flock's age on the day, the withdrawal flag and the veterinarian's overrides.
import type { Transaction, WhereOptions } from 'sequelize';
import { Flock, House, Product, Site, User, Vaccination, WithdrawalOverride } from '../../database/models/index.js';
import { ageInDays } from '../../shared/flocks/flock-age.js';
import type { VaccinationView } from '../../shared/flocks/vaccination-schemas.js';
import { overrideApplies, withdrawalStatus } from '../../shared/flocks/withdrawal-status.js';

export const vaccinationIncludes = [
  { model: Flock, as: 'flock', include: [{ model: House, as: 'house', include: [{ model: Site, as: 'site' }] }] },
  { model: Product, as: 'product' },
  { model: WithdrawalOverride, as: 'overrides', include: [{ model: User, as: 'decider', attributes: ['id', 'name'] }] },
];

/** The day the flock leaves: recorded depletion, else the planned one. */
export function depletionDateOf(flock: Flock): string | null {
  return flock.depletedOn ?? flock.plannedDepletionDate;
}

/** `vaccination` must be loaded with vaccinationIncludes. */
export function toVaccinationView(vaccination: Vaccination, userNames: ReadonlyMap<number, string> = new Map()): VaccinationView {
  const flock = vaccination.flock!;
  const house = flock.house!;
  const product = vaccination.product!;
  const depletionDate = depletionDateOf(flock);
  const overrides = [...(vaccination.overrides ?? [])].sort((a, b) => a.decidedAt.getTime() - b.decidedAt.getTime());
  const facts = overrides.map((o) => ({ vaccinationDate: o.vaccinationDate, depletionDate: o.depletionDate, withdrawalDays: o.withdrawalDays }));
  const withdrawal = withdrawalStatus({ plannedDate: vaccination.plannedDate, depletionDate, withdrawalDays: product.withdrawalDays, overrides: facts });
  const current = depletionDate === null ? null : { vaccinationDate: vaccination.plannedDate, depletionDate, withdrawalDays: product.withdrawalDays };
  return {
    id: vaccination.id,
    flockId: flock.id,
    flockName: flock.name,
    siteId: house.siteId,
    houseName: house.name,
    productId: product.id,
    productName: product.name,
    route: vaccination.route,
    plannedDate: vaccination.plannedDate,
    ageDays: ageInDays(flock.hatchDate, vaccination.plannedDate),
    status: vaccination.status,
    programmeStepId: vaccination.programmeStepId,
    fromProgramme: vaccination.programmeStepId !== null,
    movedByHand: vaccination.movedByHand,
    notes: vaccination.notes,
    confirmedBy: vaccination.confirmedBy === null ? null : (userNames.get(vaccination.confirmedBy) ?? null),
    confirmedAt: vaccination.confirmedAt?.toISOString() ?? null,
    cancelReason: vaccination.cancelReason ?? null,
    withdrawal: {
      flagged: withdrawal.flagged,
      withdrawalDays: withdrawal.withdrawalDays,
      daysBeforeDepletion: withdrawal.daysBeforeDepletion,
      overridden: withdrawal.overridden,
      blocksConfirmation: withdrawal.blocksConfirmation,
    },
    overrides: overrides.map((o) => ({
      id: o.id,
      reason: o.reason,
      decidedBy: o.decider?.name ?? '',
      decidedAt: o.decidedAt.toISOString(),
      vaccinationDate: o.vaccinationDate,
      depletionDate: o.depletionDate,
      withdrawalDays: o.withdrawalDays,
      applies: current !== null && overrideApplies(o, current),
    })),
  };
}

/** Names of the users who confirmed these vaccinations. */
export async function confirmerNames(vaccinations: Vaccination[], transaction?: Transaction): Promise<Map<number, string>> {
  const ids = [...new Set(vaccinations.map((v) => v.confirmedBy).filter((id): id is number => id !== null))];
  if (!ids.length) return new Map();
  return new Map((await User.findAll({ where: { id: ids }, attributes: ['id', 'name'], transaction })).map((u) => [u.id, u.name]));
}

export async function loadVaccinationViews(where: WhereOptions<Vaccination>, transaction?: Transaction): Promise<VaccinationView[]> {
  const rows = await Vaccination.findAll({ where, include: vaccinationIncludes, order: [['plannedDate', 'ASC'], ['id', 'ASC']], transaction });
  const names = await confirmerNames(rows, transaction);
  return rows.map((row) => toVaccinationView(row, names));
}

export async function loadVaccinationView(id: number, transaction?: Transaction): Promise<VaccinationView> {
  const [view] = await loadVaccinationViews({ id }, transaction);
  if (!view) throw new Error(`vaccination ${id} vanished`);
  return view;
}
