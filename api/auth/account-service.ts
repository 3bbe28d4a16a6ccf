// A user's own account: changing the password (current one required) and the display unit.
import type { SessionUser } from '../../shared/users/user-schemas.js';
import { User } from '../../database/models/index.js';
import type { AppContext } from '../app-context.js';
import { recordAudit } from '../audit/record-audit.js';
import { AppError } from '../http/app-error.js';
import { toSessionUser } from '../users/user-view.js';
import { findUserForSession } from './passport-setup.js';
import { assertAcceptablePassword } from './password-rules.js';

export async function changeOwnPassword(context: AppContext, userId: number, current: string, next: string): Promise<void> {
  const user = await User.findByPk(userId);
  if (!user) throw AppError.unauthorized();
  if (!(await context.hasher.verify(current, user.passwordHash))) {
    throw AppError.badRequest('The current password is not right.', [{ field: 'currentPassword', message: 'Not right.' }]);
  }
  assertAcceptablePassword(next, { email: user.email, name: user.name }, 'newPassword');
  const passwordHash = await context.hasher.hash(next);
  await context.sequelize.transaction(async (transaction) => {
    await user.update({ passwordHash, passwordChangedAt: new Date() }, { transaction });
    await recordAudit({ actorId: userId, action: 'password.change', entity: 'user', entityId: userId }, transaction);
  });
}

export async function updatePreferences(context: AppContext, userId: number, displayUnit: 'F' | 'C'): Promise<SessionUser> {
  await context.sequelize.transaction(async (transaction) => {
    const user = await User.findByPk(userId, { transaction, lock: true });
    if (!user) throw AppError.unauthorized();
    const before = { displayUnit: user.displayUnit };
    await user.update({ displayUnit }, { transaction });
    await recordAudit({ actorId: userId, action: 'preferences.update', entity: 'user', entityId: userId, before, after: { displayUnit } }, transaction);
  });
  const fresh = await findUserForSession(userId);
  if (!fresh) throw AppError.unauthorized();
  return toSessionUser(fresh);
}
