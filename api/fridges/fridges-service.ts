// Fridges: the visible list with each one's status, one fridge with its loggers, and the changes admins and storage make.
import { QueryTypes, type Sequelize } from 'sequelize';
import type { FridgeDetail, FridgeInput, FridgeStatus, FridgeView } from '../../shared/fridges/fridge-schemas.js';
import type { LoggerView } from '../../shared/fridges/logger-schemas.js';
import { siteDate } from '../../shared/fridges/site-date.js';
import { Fridge, Logger, LoggerCertificate, Site } from '../../database/models/index.js';
import { recordAudit } from '../audit/record-audit.js';
import { recomputeFridgeWindow } from '../excursions/recompute-fridge-window.js';
import { AppError } from '../http/app-error.js';
import { toLoggerView } from '../loggers/logger-view.js';
import { fridgeStatuses } from './fridge-statuses.js';
import { toFridgeView, type FridgeWithSite } from './fridge-view.js';

export function visibleSiteIds(user: Express.User): number[] | undefined {
  return user.allSites ? undefined : user.siteIds;
}

export async function listFridges(sequelize: Sequelize, user: Express.User, siteId?: number): Promise<FridgeStatus[]> {
  const visible = visibleSiteIds(user);
  const ids = siteId === undefined ? visible : visible === undefined || visible.includes(siteId) ? [siteId] : [];
  return fridgeStatuses(sequelize, ids);
}

async function loadFridge(id: number): Promise<FridgeWithSite> {
  const fridge: FridgeWithSite | null = await Fridge.findByPk(id, { include: [{ model: Site, as: 'site' }] });
  if (!fridge) throw AppError.notFound('No such fridge.');
  return fridge;
}

export async function fridgeLoggers(sequelize: Sequelize, fridge: FridgeWithSite): Promise<LoggerView[]> {
  const loggers = await Logger.findAll({ where: { fridgeId: fridge.id }, include: [{ model: LoggerCertificate, as: 'certificates' }], order: [['removedOn', 'DESC NULLS FIRST'], ['role', 'DESC'], ['id', 'ASC']] });
  const newest = loggers.length
    ? await sequelize.query<{ id: number; newest: Date | null }>(
        `SELECT l.id, (SELECT max(at) FROM readings r WHERE r.logger_id = l.id) AS newest FROM loggers l WHERE l.id IN (:ids)`,
        { replacements: { ids: loggers.map((l) => l.id) }, type: QueryTypes.SELECT },
      )
    : [];
  const today = siteDate(Date.now(), fridge.site!.timeZone);
  return loggers.map((l) => toLoggerView(l, today, newest.find((n) => n.id === l.id)?.newest ?? null));
}

export async function getFridge(sequelize: Sequelize, id: number): Promise<FridgeDetail> {
  const fridge = await loadFridge(id);
  const [status] = await fridgeStatuses(sequelize, [fridge.siteId]).then((all) => all.filter((f) => f.id === id));
  return { ...status, loggers: await fridgeLoggers(sequelize, fridge) };
}

async function assertCodeFree(code: string, exceptId: number | null): Promise<void> {
  const clash = await Fridge.findOne({ where: { code } });
  if (clash && clash.id !== exceptId) throw AppError.conflict('Another fridge has this code.', [{ field: 'code', message: 'Already in use.' }]);
}

export async function createFridge(sequelize: Sequelize, actorId: number, input: FridgeInput): Promise<FridgeView> {
  if (!(await Site.findByPk(input.siteId))) throw AppError.badRequest('No such site.', [{ field: 'siteId', message: 'Unknown site.' }]);
  return sequelize.transaction(async (transaction) => {
    await assertCodeFree(input.code, null);
    const fridge = await Fridge.create(input, { transaction });
    const view = toFridgeView(Object.assign(fridge, { site: await Site.findByPk(input.siteId, { transaction }) }) as FridgeWithSite);
    await recordAudit({ actorId, action: 'fridge.create', entity: 'fridge', entityId: fridge.id, after: view }, transaction);
    return view;
  });
}

/** A changed alarm range re-judges every undecided excursion of the fridge against the new limits. */
export async function updateFridge(sequelize: Sequelize, actorId: number, id: number, input: FridgeInput): Promise<FridgeView> {
  return sequelize.transaction(async (transaction) => {
    const fridge: FridgeWithSite | null = await Fridge.findByPk(id, { include: [{ model: Site, as: 'site' }], transaction, lock: { level: transaction.LOCK.UPDATE, of: Fridge } });
    if (!fridge) throw AppError.notFound('No such fridge.');
    if (input.siteId !== fridge.siteId) throw AppError.badRequest('A fridge stays on its site; create a new one on the other site.', [{ field: 'siteId', message: 'Cannot change.' }]);
    await assertCodeFree(input.code, id);
    const before = toFridgeView(fridge);
    const limitsChanged = before.alarm.low !== input.alarmLow || before.alarm.high !== input.alarmHigh || before.alarm.unit !== input.alarmUnit;
    await fridge.update({ code: input.code, name: input.name, place: input.place, alarmLow: input.alarmLow, alarmHigh: input.alarmHigh, alarmUnit: input.alarmUnit, minMaxDisplay: input.minMaxDisplay }, { transaction });
    const after = toFridgeView(fridge);
    await recordAudit({ actorId, action: 'fridge.update', entity: 'fridge', entityId: id, before, after }, transaction);
    if (limitsChanged) {
      const [span] = await sequelize.query<{ first: Date | null; last: Date | null }>(
        'SELECT min(r.at) AS first, max(r.at) AS last FROM readings r JOIN loggers l ON l.id = r.logger_id WHERE l.fridge_id = :id',
        { replacements: { id }, type: QueryTypes.SELECT, transaction },
      );
      if (span?.first && span.last) {
        await recomputeFridgeWindow(sequelize, transaction, id, { start: new Date(span.first).getTime(), end: new Date(span.last).getTime() }, { actorId });
      }
    }
    return after;
  });
}
