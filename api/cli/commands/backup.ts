// `npm run db:backup`: dumps the database and archives uploads/ into a timestamped folder under the runtime folder.
import type { CliCommand } from '../cli-command.js';
import { backup } from '../../../database/scripts/backup.js';
import { runtimeDir } from '../../../database/scripts/runtime-dir.js';
import { openCliDatabase } from '../database-environment.js';

export const command: CliCommand = {
  summary: 'backup  (same as npm run db:backup)',
  async run(_args, io) {
    const database = await openCliDatabase();
    try {
      const ownerUrl = database.config.DATABASE_OWNER_URL;
      if (!ownerUrl) {
        io.stderr.write('DATABASE_OWNER_URL is needed to dump every table.\n');
        return 2;
      }
      const result = backup({ ownerUrl, uploadsDir: database.config.UPLOADS_DIR, backupsDir: runtimeDir('backups') });
      io.stdout.write(`Backup written to ${result.folder}\n  ${result.databaseFile}\n  ${result.uploadsFile}\n`);
      return 0;
    } finally {
      database.release();
    }
  },
};
