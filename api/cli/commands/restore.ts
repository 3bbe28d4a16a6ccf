// `npm run db:restore FOLDER`: restores a backup into the configured database (which must be empty) and uploads folder.
import type { CliCommand } from '../cli-command.js';
import { restore } from '../../../database/scripts/backup.js';
import { openCliDatabase } from '../database-environment.js';
import { Sequelize } from 'sequelize';

export const command: CliCommand = {
  summary: 'restore FOLDER  (same as npm run db:restore FOLDER; the database must be empty)',
  async run(args, io) {
    const [folder] = args;
    if (!folder) {
      io.stderr.write(`usage: ${this.summary}\n`);
      return 2;
    }
    const database = await openCliDatabase({ migrate: false });
    try {
      const ownerUrl = database.config.DATABASE_OWNER_URL;
      if (!ownerUrl) {
        io.stderr.write('DATABASE_OWNER_URL is needed to restore.\n');
        return 2;
      }
      const probe = new Sequelize(ownerUrl, { logging: false });
      const [rows] = await probe.query(`SELECT count(*)::int AS n FROM pg_tables WHERE schemaname = 'public'`);
      await probe.close();
      if ((rows as { n: number }[])[0].n > 0) {
        io.stderr.write('The database already has tables: restore goes into an empty database only (create one, or drop this one first).\n');
        return 2;
      }
      restore({ folder, ownerUrl, uploadsDir: database.config.UPLOADS_DIR });
      io.stdout.write(`Restored ${folder}\n`);
      return 0;
    } catch (error) {
      io.stderr.write(`${(error as Error).message}\n`);
      return 2;
    } finally {
      database.release();
    }
  },
};
