// The benchmark's own throwaway PostgreSQL cluster and database, migrated, never the demo's or the tests'.
import { Sequelize } from 'sequelize';
import { migrateUp } from '../database/migrator.js';
import { LocalCluster, databaseUrl, type DatabaseCredentials } from '../database/scripts/local-cluster.js';

export interface BenchDatabase {
  cluster: LocalCluster;
  credentials: DatabaseCredentials;
  appUrl: string;
  ownerUrl: string;
}

export async function startBenchDatabase(port: number, log: (line: string) => void): Promise<BenchDatabase> {
  // Durable settings (fsync on), like a real server: the comparison with psql is fair either way.
  const cluster = new LocalCluster({ name: 'bench', port, log });
  cluster.destroy();
  cluster.start();
  const credentials = await cluster.ensureDatabase('vialyard_bench');
  await migrateUp(databaseUrl(credentials, 'owner'), credentials.appUser);
  return { cluster, credentials, appUrl: databaseUrl(credentials, 'app'), ownerUrl: databaseUrl(credentials, 'owner') };
}

export function ownerSequelize(bench: BenchDatabase): Sequelize {
  return new Sequelize(bench.ownerUrl, { logging: false, pool: { max: 2 } });
}
