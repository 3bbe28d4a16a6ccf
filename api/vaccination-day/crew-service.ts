// Crews per site and date: assigned by an admin or veterinarian, or by the crew lead for their own day.
import { Op, QueryTypes, type Transaction } from 'sequelize';
import { Site, User, UserSite } from '../../database/models/index.js';
import type { CrewAssignmentInput } from '../../shared/vaccination-day/day-schemas.js';
import type { DayLead } from '../../shared/vaccination-day/day-views.js';
import type { AppContext } from '../app-context.js';
import { recordAudit } from '../audit/record-audit.js';
import { siteToday } from '../flocks/site-today.js';
import { canSeeSite } from '../http/access.js';
import { AppError } from '../http/app-error.js';

export interface Crew {
  assignmentId: number;
  leadId: number;
  leadName: string;
  members: { id: number; name: string }[];
}

export async function crewFor(context: AppContext, siteId: number, day: string, transaction?: Transaction): Promise<Crew | null> {
  const rows = await context.sequelize.query<{ id: number; lead_id: number; lead_name: string }>(
    `SELECT a.id, a.lead_id, u.name AS lead_name FROM crew_assignments a JOIN users u ON u.id = a.lead_id WHERE a.site_id = :siteId AND a.day = :day`,
    { replacements: { siteId, day }, type: QueryTypes.SELECT, transaction },
  );
  const row = rows[0];
  if (!row) return null;
  const members = await context.sequelize.query<{ id: number; name: string }>(
    `SELECT u.id, u.name FROM crew_assignment_members m JOIN users u ON u.id = m.user_id WHERE m.assignment_id = :id ORDER BY u.name, u.id`,
    { replacements: { id: row.id }, type: QueryTypes.SELECT, transaction },
  );
  return { assignmentId: row.id, leadId: row.lead_id, leadName: row.lead_name, members };
}

/** The lead and every member: each must pass their own checks before the start. */
export function crewMemberIds(crew: Crew): number[] {
  return [crew.leadId, ...crew.members.map((m) => m.id).filter((id) => id !== crew.leadId)];
}

async function assertCrewUser(id: number, siteId: number, field: string, transaction: Transaction): Promise<User> {
  const user = await User.findByPk(id, { transaction });
  const fail = () => AppError.unprocessable('That person cannot work this site.', [{ field, message: 'Not a crew member, admin or veterinarian of this site.' }]);
  if (!user || !user.active) throw fail();
  const onSite = user.allSites || (await UserSite.count({ where: { userId: id, siteId }, transaction })) > 0;
  if (!user.roles.some((r) => r === 'crew' || r === 'admin' || r === 'veterinarian') || !onSite) throw fail();
  return user;
}

export async function assignCrew(context: AppContext, actor: Express.User, input: CrewAssignmentInput): Promise<Crew> {
  if (!canSeeSite(actor, input.siteId) || !(await Site.findByPk(input.siteId))) throw AppError.notFound('No such site.');
  const planner = actor.roles.includes('admin') || actor.roles.includes('veterinarian');
  return context.sequelize.transaction(async (transaction) => {
    const before = await crewFor(context, input.siteId, input.day, transaction);
    // A crew member may only set up a day they lead, and not take over someone else's.
    if (!planner && (input.leadId !== actor.id || (before && before.leadId !== actor.id))) {
      throw AppError.forbidden('A crew lead assigns their own crew only; an admin or veterinarian assigns the lead.');
    }
    await assertCrewUser(input.leadId, input.siteId, 'leadId', transaction);
    for (const [i, memberId] of input.memberIds.entries()) await assertCrewUser(memberId, input.siteId, `memberIds.${i}`, transaction);
    const [rows] = (await context.sequelize.query(
      `INSERT INTO crew_assignments (site_id, day, lead_id, assigned_by) VALUES (:siteId, :day, :leadId, :actorId)
       ON CONFLICT (site_id, day) DO UPDATE SET lead_id = EXCLUDED.lead_id, assigned_by = EXCLUDED.assigned_by, assigned_at = now()
       RETURNING id`,
      { replacements: { ...input, actorId: actor.id }, transaction },
    )) as [{ id: number }[], unknown];
    const assignmentId = rows[0]!.id;
    await context.sequelize.query('DELETE FROM crew_assignment_members WHERE assignment_id = :assignmentId', { replacements: { assignmentId }, transaction });
    for (const userId of new Set(input.memberIds.filter((id) => id !== input.leadId))) {
      await context.sequelize.query('INSERT INTO crew_assignment_members (assignment_id, user_id) VALUES (:assignmentId, :userId)', { replacements: { assignmentId, userId }, transaction });
    }
    const after = (await crewFor(context, input.siteId, input.day, transaction))!;
    await recordAudit({ actorId: actor.id, action: 'crew.assign', entity: 'crew_assignment', entityId: assignmentId, before, after: { ...after, siteId: input.siteId, day: input.day } }, transaction);
    return after;
  });
}

/** The people who may work a site's vaccination day: active crew, admins and veterinarians who see the site. */
export async function crewCandidates(actor: Express.User, siteId: number): Promise<{ id: number; name: string; roles: string[] }[]> {
  if (!canSeeSite(actor, siteId) || !(await Site.findByPk(siteId))) throw AppError.notFound('No such site.');
  const limited = (await UserSite.findAll({ where: { siteId } })).map((row) => row.userId);
  const users = await User.findAll({
    where: { active: true, roles: { [Op.overlap]: ['crew', 'admin', 'veterinarian'] }, [Op.or]: [{ allSites: true }, { id: limited }] },
    order: [['name', 'ASC'], ['id', 'ASC']],
  });
  return users.map((u) => ({ id: u.id, name: u.name, roles: u.roles }));
}

/** A site's crew on a day (the site's today when none is given) and who could join it; 404 for a site the user does not see. */
export async function siteCrew(context: AppContext, actor: Express.User, siteId: number, day: string | undefined) {
  const candidates = await crewCandidates(actor, siteId);
  const chosenDay = day ?? siteToday((await Site.findByPk(siteId))!);
  return { day: chosenDay, crew: await crewFor(context, siteId, chosenDay), candidates };
}

/** The crew leads assigned on a day on the sites the viewer sees, for a planner choosing whose day sheet to read. */
export async function dayLeads(context: AppContext, viewer: Express.User, day: string): Promise<DayLead[]> {
  const rows = await context.sequelize.query<{ lead_id: number; lead_name: string; site_id: number; site_name: string }>(
    `SELECT a.lead_id, u.name AS lead_name, s.id AS site_id, s.name AS site_name FROM crew_assignments a
       JOIN users u ON u.id = a.lead_id JOIN sites s ON s.id = a.site_id
     WHERE a.day = :day ORDER BY u.name, u.id, s.name`,
    { replacements: { day }, type: QueryTypes.SELECT },
  );
  const leads = new Map<number, DayLead>();
  for (const row of rows.filter((r) => canSeeSite(viewer, r.site_id))) {
    const lead = leads.get(row.lead_id) ?? { id: row.lead_id, name: row.lead_name, siteNames: [] };
    lead.siteNames.push(row.site_name);
    leads.set(row.lead_id, lead);
  }
  return [...leads.values()];
}
