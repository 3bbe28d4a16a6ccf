// The server's configuration, read once from the environment and validated at start-up.
import { z } from 'zod';
import { join } from 'node:path';
import { projectRoot } from '../database/scripts/runtime-dir.js';

const runtimeRoot = process.env.VIALYARD_RUNTIME_DIR ?? join(projectRoot, '.runtime');

const boolean = z.enum(['true', 'false', '1', '0']).transform((v) => v === 'true' || v === '1');

const schema = z.object({
  VIALYARD_HOST: z.string().default('127.0.0.1'),
  VIALYARD_PORT: z.coerce.number().int().min(0).max(65535).default(4300),
  DATABASE_URL: z.string().url({ message: 'DATABASE_URL must be a postgres:// URL for the application role' }),
  DATABASE_OWNER_URL: z.string().url().optional(),
  SESSION_SECRET: z.string().min(32, 'SESSION_SECRET must be at least 32 characters'),
  COOKIE_SECURE: boolean.default(false),
  BCRYPT_COST: z.coerce.number().int().min(4).max(15).default(12),
  SIGN_IN_ACCOUNT_LIMIT: z.coerce.number().int().min(1).default(5),
  SIGN_IN_ADDRESS_LIMIT: z.coerce.number().int().min(1).default(30),
  SIGN_IN_WINDOW_SECONDS: z.coerce.number().int().min(1).default(15 * 60),
  SMTP_HOST: z.string().default('127.0.0.1'),
  SMTP_PORT: z.coerce.number().int().min(1).max(65535).default(2525),
  MAIL_FROM: z.string().default('Vialyard <no-reply@vialyard.invalid>'),
  /** Where the fake mail server keeps what it caught (read by the admins' outbox page). */
  MAIL_CAPTURE_DIR: z.string().default(join(runtimeRoot, 'mail')),
  UPLOADS_DIR: z.string().default(join(projectRoot, 'uploads')),
  CLIENT_DIST_DIR: z.string().default(join(projectRoot, 'dist', 'client', 'browser')),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
});

export type Config = z.infer<typeof schema>;

/** Parses the environment; throws one message listing every bad variable. */
export function readConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const parsed = schema.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((issue) => `  ${issue.path.join('.')}: ${issue.message}`);
    throw new Error(`Vialyard configuration is invalid:\n${lines.join('\n')}`);
  }
  return parsed.data;
}
