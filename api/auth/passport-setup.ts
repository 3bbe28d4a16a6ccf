// Passport with the local strategy: e-mail and password, the session holding only the user's id.
import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import { Site, User } from '../../database/models/index.js';
import { toSessionUser } from '../users/user-view.js';
import type { PasswordHasher } from './password-hasher.js';

export async function findUserForSession(id: number): Promise<User | null> {
  return User.findOne({ where: { id, active: true }, include: [{ model: Site, as: 'sites', attributes: ['id'] }] });
}

export type PassportInstance = InstanceType<typeof passport.Passport>;

export function configurePassport(hasher: PasswordHasher): PassportInstance {
  const instance = new passport.Passport();
  instance.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, async (email, password, done) => {
      try {
        const user = await User.findOne({
          where: { email: email.trim().toLowerCase() },
          include: [{ model: Site, as: 'sites', attributes: ['id'] }],
        });
        // Compare even when the account is unknown, so response time does not tell who has an account.
        const matches = await hasher.verify(password, user?.passwordHash ?? hasher.decoy);
        done(null, user && user.active && matches ? toSessionUser(user) : false);
      } catch (error) {
        done(error);
      }
    }),
  );
  instance.serializeUser((user, done) => done(null, user.id));
  instance.deserializeUser(async (id: number, done) => {
    try {
      const user = await findUserForSession(id);
      // A deactivated or deleted user is simply signed out.
      done(null, user ? toSessionUser(user) : false);
    } catch (error) {
      done(error);
    }
  });
  return instance;
}
