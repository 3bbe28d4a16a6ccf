// User administration: list with search, sort and paging; create; update roles, sites, status or password.
import { Op, type Transaction, type WhereOptions } from 'sequelize';
import type { CreateUserInput, UpdateUserInput, UserSummary } from '../../shared/users/user-schemas.js';
import { Site, User, UserSite } from '../../database/models/index.js';
import type { AppContext } from '../app-context.js';
import { recordAudit } from '../audit/record-audit.js';
import { assertAcceptablePassword } from '../auth/password-rules.js';
import { AppError } from '../http/app-error.js';
import { toUserSummary } from './user-view.js';

export interface UserListQuery {
  search?: string;
  sort: 'name' | 'email' | 'createdAt';
  direction: 'asc' | 'desc';
  page: number;
  pageSize: number;
}

const withSites = { model: Site, as: 'sites', attributes: ['id'], through: { attributes: [] } };

export async function listUsers(query: UserListQuery): Promise<{ items: UserSummary[]; total: number }> {
  const where: WhereOptions<User> = query.search
    ? { [Op.or]: [{ name: { [Op.iLike]: `%${query.search}%` } }, { email: { [Op.iLike]: `%${query.search}%` } }] }
    : {};
  const total = await User.count({ where });
  const rows = await User.findAll({
    where,
    include: [withSites],
    order: [[query.sort, query.direction.toUpperCase()], ['id', 'ASC']],
    limit: query.pageSize,
    offset: query.page * query.pageSize,
  });
  return { items: rows.map(toUserSummary), total };
}

async function assertSitesExist(siteIds: number[], transaction: Transaction): Promise<void> {
  if (!siteIds.length) return;
  const found = await Site.count({ where: { id: siteIds }, transaction });
  if (found !== new Set(siteIds).size) {
    throw AppError.badRequest('One of the chosen sites does not exist.', [{ field: 'siteIds', message: 'Unknown site.' }]);
  }
}

function assertSiteChoice(allSites: boolean, siteIds: number[]): void {
  if (!allSites && siteIds.length === 0) {
    throw AppError.badRequest('Choose at least one site, or allow all sites.', [{ field: 'siteIds', message: 'Choose at least one site.' }]);
  }
}

async function loadSummary(id: number, transaction?: Transaction): Promise<UserSummary> {
  const user = await User.findByPk(id, { include: [withSites], transaction });
  if (!user) throw AppError.notFound('No such user.');
  return toUserSummary(user);
}

export async function createUser(context: AppContext, actorId: number | null, input: CreateUserInput): Promise<UserSummary> {
  assertAcceptablePassword(input.password, { email: input.email, name: input.name });
  assertSiteChoice(input.allSites, input.siteIds);
  const passwordHash = await context.hasher.hash(input.password);
  return context.sequelize.transaction(async (transaction) => {
    if (await User.count({ where: { email: input.email }, transaction })) {
      throw AppError.conflict('A user with this e-mail already exists.', [{ field: 'email', message: 'Already in use.' }]);
    }
    await assertSitesExist(input.siteIds, transaction);
    const user = await User.create(
      { email: input.email, name: input.name, roles: input.roles, allSites: input.allSites, passwordHash },
      { transaction },
    );
    if (!input.allSites) {
      await UserSite.bulkCreate(input.siteIds.map((siteId) => ({ userId: user.id, siteId })), { transaction });
    }
    const summary = await loadSummary(user.id, transaction);
    await recordAudit({ actorId, action: 'user.create', entity: 'user', entityId: user.id, after: summary }, transaction);
    return summary;
  });
}

export async function updateUser(context: AppContext, actorId: number, id: number, input: UpdateUserInput): Promise<UserSummary> {
  const passwordHash = input.password === undefined ? undefined : await (async () => {
    const existing = await User.findByPk(id);
    if (!existing) throw AppError.notFound('No such user.');
    assertAcceptablePassword(input.password!, { email: existing.email, name: input.name ?? existing.name });
    return context.hasher.hash(input.password!);
  })();
  return context.sequelize.transaction(async (transaction) => {
    // Lock the row alone: PostgreSQL cannot lock the nullable side of the sites join.
    const user = await User.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
    if (!user) throw AppError.notFound('No such user.');
    const before = await loadSummary(id, transaction);
    const allSites = input.allSites ?? user.allSites;
    const siteIds = input.siteIds ?? before.siteIds;
    assertSiteChoice(allSites, siteIds);
    if (id === actorId && (input.active === false || (input.roles && !input.roles.includes('admin')))) {
      throw AppError.badRequest('You cannot remove your own administrator role or deactivate yourself.', [
        { field: input.active === false ? 'active' : 'roles', message: 'Not for your own account.' },
      ]);
    }
    await assertSitesExist(siteIds, transaction);
    await user.update(
      {
        ...(input.name !== undefined && { name: input.name }),
        ...(input.roles !== undefined && { roles: input.roles }),
        ...(input.active !== undefined && { active: input.active }),
        ...(passwordHash !== undefined && { passwordHash, passwordChangedAt: new Date() }),
        allSites,
      },
      { transaction },
    );
    await UserSite.destroy({ where: { userId: id }, transaction });
    if (!allSites) await UserSite.bulkCreate(siteIds.map((siteId) => ({ userId: id, siteId })), { transaction });
    const after = await loadSummary(id, transaction);
    await recordAudit({ actorId, action: passwordHash ? 'user.update+password' : 'user.update', entity: 'user', entityId: id, before, after }, transaction);
    return after;
  });
}
