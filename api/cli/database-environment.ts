// For CLI commands that need the database: DATABASE_URL when set, else the local demo cluster (started if needed).
import { readConfig, type Config } from '../config.js';
import { prepareLocalEnvironment } from '../../database/scripts/local-environment.js';

export interface CliDatabase {
  config: Config;
  /** Stops the local cluster again when this command started it. */
  release(): void;
}

export async function openCliDatabase(options: { migrate?: boolean } = {}): Promise<CliDatabase> {
  if (process.env.DATABASE_URL && process.env.SESSION_SECRET) {
    return { config: readConfig(), release: () => {} };
  }
  const local = await prepareLocalEnvironment({ name: 'demo', port: Number(process.env.VIALYARD_PG_PORT ?? 5544), database: 'vialyard', migrate: options.migrate });
  return {
    config: readConfig({ ...process.env, ...local.env }),
    release: () => {
      if (local.cluster.startedByUs) local.cluster.stop();
    },
  };
}
