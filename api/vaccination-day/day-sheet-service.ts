// The day sheet for a crew lead and a date: every confirmed (or done) vaccination on their sites, in visit order.
import { QueryTypes } from 'sequelize';
import { User } from '../../database/models/index.js';
import type { DaySheet, DaySheetEntry, RunView } from '../../shared/vaccination-day/day-views.js';
import { visitOrder } from '../../shared/vaccination-day/visit-order.js';
import type { AppContext } from '../app-context.js';
import { canSeeSite } from '../http/access.js';
import { AppError } from '../http/app-error.js';
import { loadRunView } from './run-view.js';
import { sitePlan } from './vaccination-facts.js';

export async function daySheet(context: AppContext, viewer: Express.User, day: string, leadId: number): Promise<DaySheet> {
  const lead = await User.findByPk(leadId, { attributes: ['id', 'name'] });
  if (!lead) throw AppError.notFound('No such crew lead.');
  const rows = await context.sequelize.query<{ id: number; site_id: number }>(
    `SELECT v.id, h.site_id FROM crew_assignments a
       JOIN houses h ON h.site_id = a.site_id JOIN flocks f ON f.house_id = h.id JOIN vaccinations v ON v.flock_id = f.id
     WHERE a.lead_id = :leadId AND a.day = :day AND v.planned_date = :day AND v.status IN ('confirmed', 'done')`,
    { replacements: { leadId, day }, type: QueryTypes.SELECT },
  );
  const visible = rows.filter((r) => canSeeSite(viewer, r.site_id));
  const plans = new Map<number, Awaited<ReturnType<typeof sitePlan>>>();
  for (const siteId of new Set(visible.map((r) => r.site_id))) plans.set(siteId, await sitePlan(siteId));
  const runs: RunView[] = [];
  for (const row of visible) runs.push(await loadRunView(context, row.id, { plan: plans.get(row.site_id) }));
  const ordered = visitOrder(runs.map((run) => ({ id: run.vaccinationId, siteId: run.siteId, houseName: run.houseName, flockAgeDays: run.ageDays, run })));
  const entries: DaySheetEntry[] = ordered.map(({ run }, index) => ({
    visit: index + 1,
    vaccinationId: run.vaccinationId,
    siteId: run.siteId,
    siteName: run.siteName,
    houseName: run.houseName,
    flockName: run.flockName,
    productName: run.productName,
    route: run.route,
    ageDays: run.ageDays,
    birds: run.birds,
    dosesNeeded: run.dosesNeeded,
    shortfallDoses: run.shortfallDoses,
    lotsToTake: run.lotsToTake,
    awaited: run.awaited,
    waterMl: run.waterMl,
    status: run.status,
    blockers: run.blockers.length,
    vialsOut: run.status === 'done' ? 0 : run.lotsOut.reduce((sum, l) => sum + l.out, 0),
  }));
  return { day, leadId: lead.id, leadName: lead.name, entries };
}
