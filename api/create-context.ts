// Opens the database handles and logger the app needs, from a validated configuration.
import pg from 'pg';
import { pino } from 'pino';
import { connectDatabase } from '../database/models/index.js';
import type { AppContext } from './app-context.js';
import { PasswordHasher } from './auth/password-hasher.js';
import type { Config } from './config.js';
import { Mailer } from './mail/mailer.js';

export function createContext(config: Config): AppContext {
  const logger = pino({ level: config.LOG_LEVEL, base: { app: 'vialyard' } });
  const pool = new pg.Pool({ connectionString: config.DATABASE_URL, max: 5, connectionTimeoutMillis: 5000 });
  // An idle client dropped by a database restart must not crash the process; the next query reconnects.
  pool.on('error', (error) => logger.warn({ err: error }, 'idle database connection lost'));
  return {
    config,
    logger,
    pool,
    sequelize: connectDatabase(config.DATABASE_URL),
    hasher: new PasswordHasher(config.BCRYPT_COST),
    mailer: new Mailer({ host: config.SMTP_HOST, port: config.SMTP_PORT, from: config.MAIL_FROM }, logger),
  };
}

export async function closeContext(context: AppContext): Promise<void> {
  context.mailer.close();
  await Promise.allSettled([context.sequelize.close(), context.pool.end()]);
}
