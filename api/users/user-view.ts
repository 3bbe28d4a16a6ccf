// Turns a User row (with its sites) into the shapes the API sends.
import type { SessionUser, UserSummary } from '../../shared/users/user-schemas.js';
import type { User } from '../../database/models/index.js';

export function toSessionUser(user: User): SessionUser {
  return {
    id: user.id,
    email: user.email,
    name: user.name,
    roles: user.roles,
    allSites: user.allSites,
    siteIds: user.allSites ? [] : (user.sites ?? []).map((site) => site.id).sort((a, b) => a - b),
    displayUnit: user.displayUnit,
  };
}

export function toUserSummary(user: User): UserSummary {
  return { ...toSessionUser(user), active: user.active, createdAt: user.createdAt.toISOString() };
}
