// Runs the umzug migrations (TypeScript files in database/migrations) as the database's owner role.
import { Sequelize } from 'sequelize';
import { SequelizeStorage, Umzug } from 'umzug';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

export interface MigrationContext {
  sequelize: Sequelize;
  /** The application's login role, which migrations grant privileges to. */
  appRole: string;
}

export type Migration = (params: { context: MigrationContext }) => Promise<void>;

const migrationsGlob = join(dirname(fileURLToPath(import.meta.url)), 'migrations', '*.ts');

export function createMigrator(sequelize: Sequelize, appRole: string): Umzug<MigrationContext> {
  return new Umzug<MigrationContext>({
    migrations: {
      glob: migrationsGlob,
      resolve: ({ name, path, context }) => ({
        name,
        up: async () => (await import(path!)).up({ context }),
        down: async () => (await import(path!)).down({ context }),
      }),
    },
    context: { sequelize, appRole },
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: undefined,
  });
}

/** Connects as the owner, applies every pending migration, and disconnects. */
export async function migrateUp(ownerUrl: string, appRole: string): Promise<string[]> {
  const sequelize = new Sequelize(ownerUrl, { logging: false });
  try {
    const applied = await createMigrator(sequelize, appRole).up();
    return applied.map((m) => m.name);
  } finally {
    await sequelize.close();
  }
}
