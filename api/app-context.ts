// What the Express app needs from outside: configuration, database handles, logger. Built once by the server or a test.
import type pg from 'pg';
import type { Logger } from 'pino';
import type { Sequelize } from 'sequelize';
import type { Config } from './config.js';
import type { PasswordHasher } from './auth/password-hasher.js';
import type { Mailer } from './mail/mailer.js';

export interface AppContext {
  config: Config;
  sequelize: Sequelize;
  /** A small pg pool for the session store and the sign-in throttle. */
  pool: pg.Pool;
  logger: Logger;
  hasher: PasswordHasher;
  mailer: Mailer;
}
