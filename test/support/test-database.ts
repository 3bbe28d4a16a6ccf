// The test suites' database: migrated once per run, wiped between tests with the owner role (never the demo data).
import { Sequelize } from 'sequelize';
import { createMigrator } from '../../database/migrator.js';

export function testEnv(name: string): string {
  const value = process.env[name];
  if (!value) throw new Error(`${name} is not set: run the database suites through \`npm test\`, which starts a throwaway cluster.`);
  return value;
}

export function appRoleName(): string {
  return decodeURIComponent(new URL(testEnv('DATABASE_URL')).username);
}

let owner: Sequelize | undefined;

/** A connection as the tables' owner, for set-up and clean-up that the application role may not do. */
export function ownerConnection(): Sequelize {
  owner ??= new Sequelize(testEnv('DATABASE_OWNER_URL'), { logging: false, pool: { max: 2 } });
  return owner;
}

export async function migrateTestDatabase(): Promise<void> {
  await createMigrator(ownerConnection(), appRoleName()).up();
}

/** Empties every table but the migrations record, restarting ids. */
export async function resetDatabase(): Promise<void> {
  const [rows] = await ownerConnection().query(
    `SELECT tablename FROM pg_tables WHERE schemaname = 'public' AND tablename <> 'schema_migrations'`,
  );
  const tables = (rows as { tablename: string }[]).map((row) => `"${row.tablename}"`);
  if (tables.length) await ownerConnection().query(`TRUNCATE ${tables.join(', ')} RESTART IDENTITY CASCADE`);
}

export async function closeOwnerConnection(): Promise<void> {
  await owner?.close();
  owner = undefined;
}
