// `create-user --email E --name N --roles admin,... [--sites CODE,...]`: the password comes from a prompt or stdin.
import { parseArgs } from 'node:util';
import { createUserSchema } from '../../../shared/users/user-schemas.js';
import { Site } from '../../../database/models/index.js';
import type { CliCommand } from '../cli-command.js';
import { closeContext, createContext } from '../../create-context.js';
import { AppError } from '../../http/app-error.js';
import { createUser } from '../../users/users-service.js';
import { openCliDatabase } from '../database-environment.js';
import { readSecret } from '../read-secret.js';

export const command: CliCommand = {
  summary: 'create-user --email E --name N --roles admin,storage [--sites CODE,...]  (password from prompt or stdin)',
  async run(args, io) {
    let values;
    try {
      ({ values } = parseArgs({
        args,
        options: { email: { type: 'string' }, name: { type: 'string' }, roles: { type: 'string' }, sites: { type: 'string' } },
      }));
    } catch (error) {
      io.stderr.write(`${(error as Error).message}\nusage: ${this.summary}\n`);
      return 2;
    }
    const password = await readSecret('Password: ', io.stdin as never, io.stderr);
    const siteCodes = values.sites ? values.sites.split(',').map((code) => code.trim().toUpperCase()) : [];
    const parsed = createUserSchema.safeParse({
      email: values.email,
      name: values.name,
      roles: (values.roles ?? '').split(',').map((role) => role.trim()).filter(Boolean),
      allSites: siteCodes.length === 0,
      password,
    });
    if (!parsed.success) {
      for (const issue of parsed.error.issues) io.stderr.write(`--${issue.path.join('.') || 'input'}: ${issue.message}\n`);
      return 2;
    }
    const database = await openCliDatabase();
    const context = createContext({ ...database.config, LOG_LEVEL: 'silent' });
    try {
      const sites = siteCodes.length ? await Site.findAll({ where: { code: siteCodes } }) : [];
      const unknown = siteCodes.filter((code) => !sites.some((site) => site.code === code));
      if (unknown.length) {
        io.stderr.write(`--sites: unknown site code(s): ${unknown.join(', ')}\n`);
        return 2;
      }
      const user = await createUser(context, null, { ...parsed.data, siteIds: sites.map((site) => site.id) });
      io.stdout.write(`${JSON.stringify(user)}\n`);
      return 0;
    } catch (error) {
      if (error instanceof AppError && error.status < 500) {
        io.stderr.write(`${error.message}\n`);
        return 2;
      }
      throw error;
    } finally {
      await closeContext(context);
      database.release();
    }
  },
};
