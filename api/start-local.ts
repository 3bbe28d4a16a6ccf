// `npm start`: local PostgreSQL, migrations, demo data, client build, fake mail server, then API and client on one port.
import { readConfig } from './config.js';
import { startServer } from './server.js';
import { startFakeSmtp } from './mail/fake-smtp-server.js';
import { PasswordHasher } from './auth/password-hasher.js';
import { connectDatabase } from '../database/models/index.js';
import { seedDemoScenario, demoAccounts } from '../database/seeders/demo-scenario.js';
import { prepareLocalEnvironment } from '../database/scripts/local-environment.js';
import { ensureClientBuilt } from '../database/scripts/client-build.js';
import { MissingPostgresError } from '../database/scripts/postgres-binaries.js';

const log = (line: string) => process.stdout.write(`[vialyard] ${line}\n`);

async function main(): Promise<void> {
  const pgPort = Number(process.env.VIALYARD_PG_PORT ?? 5544);
  const local = await prepareLocalEnvironment({ name: 'demo', port: pgPort, database: 'vialyard', log });
  let stopping = false;
  const stopDatabase = () => {
    if (local.cluster.startedByUs) {
      log('Stopping PostgreSQL...');
      local.cluster.stop();
    }
  };
  try {
    const config = readConfig({ ...process.env, ...local.env, ...pickDefined(process.env, ['DATABASE_URL', 'SESSION_SECRET']) });
    const seeding = connectDatabase(config.DATABASE_URL, { poolMax: 2 });
    const hasher = new PasswordHasher(config.BCRYPT_COST);
    if (await seedDemoScenario(seeding, (password) => hasher.hash(password))) log('Seeded the demo scenario.');
    await seeding.close();

    if (process.env.VIALYARD_SKIP_CLIENT_BUILD !== "1") ensureClientBuilt(log);
    const mail = await startFakeSmtp(config.MAIL_CAPTURE_DIR, config.SMTP_PORT, config.SMTP_HOST);
    log(`Fake mail server on ${config.SMTP_HOST}:${mail.port}; messages kept in ${config.MAIL_CAPTURE_DIR} (admins: Outbox page)`);
    const server = await startServer(config);

    log(`Vialyard is running at ${server.url}`);
    log('Demo sign-ins (demo only, never use these passwords for real):');
    for (const account of demoAccounts) log(`  ${account.roles.join(',').padEnd(13)} ${account.email.padEnd(30)} ${account.password}`);
    log('Press Ctrl-C to stop.');

    const shutdown = async () => {
      if (stopping) return;
      stopping = true;
      log('Shutting down...');
      await server.close();
      await mail.close();
      stopDatabase();
      process.exit(0);
    };
    process.once('SIGINT', shutdown);
    process.once('SIGTERM', shutdown);
  } catch (error) {
    stopDatabase();
    throw error;
  }
}

function pickDefined(env: NodeJS.ProcessEnv, keys: string[]): Record<string, string> {
  return Object.fromEntries(keys.filter((key) => env[key]).map((key) => [key, env[key]!]));
}

main().catch((error: unknown) => {
  process.stderr.write(`${error instanceof Error ? error.message : String(error)}\n`);
  process.exit(error instanceof MissingPostgresError ? 3 : 1);
});
