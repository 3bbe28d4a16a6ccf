// Brings up a local cluster and database and returns the environment the server and the CLI run with.
import { randomBytes } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { migrateUp } from '../migrator.js';
import { LocalCluster, databaseUrl, type DatabaseCredentials } from './local-cluster.js';
import { runtimeDir } from './runtime-dir.js';

export interface LocalEnvironment {
  cluster: LocalCluster;
  credentials: DatabaseCredentials;
  env: Record<string, string>;
}

function sessionSecret(name: string): string {
  const file = join(runtimeDir('credentials'), `${name}-session-secret`);
  if (!existsSync(file)) writeFileSync(file, randomBytes(32).toString('base64url'), { mode: 0o600 });
  return readFileSync(file, 'utf8').trim();
}

export async function prepareLocalEnvironment(options: {
  name: string;
  port: number;
  database: string;
  throwaway?: boolean;
  /** False for a restore, which needs the database empty. */
  migrate?: boolean;
  log?: (line: string) => void;
}): Promise<LocalEnvironment> {
  const cluster = new LocalCluster({ name: options.name, port: options.port, throwaway: options.throwaway, log: options.log });
  cluster.start();
  const credentials = await cluster.ensureDatabase(options.database);
  const applied = options.migrate === false ? [] : await migrateUp(databaseUrl(credentials, 'owner'), credentials.appUser);
  if (applied.length) options.log?.(`Applied ${applied.length} migration(s).`);
  return {
    cluster,
    credentials,
    env: {
      DATABASE_URL: databaseUrl(credentials, 'app'),
      DATABASE_OWNER_URL: databaseUrl(credentials, 'owner'),
      SESSION_SECRET: sessionSecret(options.name),
    },
  };
}
