// One vaccination's run as the crew's page shows it: facts, plan, crew, checks and what blocks the start, vials out, progress.
import type { Transaction } from 'sequelize';
import type { ProjectedVaccination } from '../../shared/demand/projection-types.js';
import type { RunView } from '../../shared/vaccination-day/day-views.js';
import { useByInstant } from '../../shared/vaccination-day/mixing.js';
import { startBlockers } from '../../shared/vaccination-day/readiness-rules.js';
import type { AppContext } from '../app-context.js';
import { crewFor, crewMemberIds } from './crew-service.js';
import { loadChecks, loadLotsOut, loadProgress } from './run-state.js';
import { loadFacts, lotsToTake, sitePlan } from './vaccination-facts.js';

export async function loadRunView(context: AppContext, vaccinationId: number, options: { plan?: Map<number, ProjectedVaccination>; transaction?: Transaction } = {}): Promise<RunView> {
  const { transaction } = options;
  const facts = await loadFacts(vaccinationId, transaction);
  const { vaccination, site, product } = facts;
  const plan = options.plan ?? (await sitePlan(site.id));
  const planned = plan.get(vaccinationId);
  const crew = await crewFor(context, site.id, vaccination.plannedDate, transaction);
  const checks = await loadChecks(context, vaccinationId, crew && { leadId: crew.leadId, day: vaccination.plannedDate }, transaction);
  const progress = await loadProgress(context, vaccinationId, transaction);
  const lotsOut = await loadLotsOut(context, vaccinationId, transaction);
  const useBy = progress.mixedAt === null ? null : useByInstant(Date.parse(progress.mixedAt), product.useWithinMinutes);
  return {
    vaccinationId,
    status: vaccination.status,
    siteId: site.id,
    siteName: site.name,
    timeZone: site.timeZone,
    houseName: facts.house.name,
    flockId: facts.flock.id,
    flockName: facts.flock.name,
    productId: product.id,
    productName: product.name,
    route: vaccination.route,
    plannedDate: vaccination.plannedDate,
    ageDays: facts.ageDays,
    birds: facts.birds,
    dosesNeeded: planned?.dosesNeeded ?? facts.birds,
    shortfallDoses: planned?.shortfallDoses ?? 0,
    // Once vials are out the fridges no longer hold them, so the plan would count them again: the lots out speak instead.
    lotsToTake: lotsOut.length ? [] : await lotsToTake(site.id, planned),
    awaited: lotsOut.length ? [] : (planned?.allocations ?? []).flatMap((a) => (a.source === 'stock' ? [] : [{ source: a.source, label: a.label, doses: a.doses }])),
    waterMlPer1000: facts.water?.mlPer1000 ?? null,
    waterSource: facts.water?.source ?? null,
    waterMl: facts.waterMl,
    useWithinMinutes: product.useWithinMinutes,
    timeOutLimitMinutes: product.timeOutLimitMinutes ?? null,
    heatLimitF: facts.heatLimitF,
    crew: crew && { leadId: crew.leadId, leadName: crew.leadName, members: crew.members },
    checks,
    blockers: crew
      ? startBlockers(crewMemberIds(crew), checks.map((c) => ({ id: c.id, kind: c.kind, memberId: c.memberId, passed: c.passed, overridden: c.override !== null })), vaccination.route)
      : [],
    ...progress,
    useBy: useBy === null ? null : new Date(useBy).toISOString(),
    lotsOut,
  };
}
