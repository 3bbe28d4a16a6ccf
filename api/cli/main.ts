// The single command-line entry: `npm run cli -- <command> [args]`.
import type { CliCommand } from './cli-command.js';

const commands: Record<string, () => Promise<{ command: CliCommand }>> = {
  'create-user': () => import('./commands/create-user.js'),
  'parse-barcode': () => import('./commands/parse-barcode.js'),
  'analyze-log': () => import('./commands/analyze-log.js'),
  'import-logs': () => import('./commands/import-logs.js'),
  plan: () => import('./commands/plan.js'),
  backup: () => import('./commands/backup.js'),
  restore: () => import('./commands/restore.js'),
};

async function main(argv: string[]): Promise<number> {
  const [name, ...args] = argv;
  const load = name ? commands[name] : undefined;
  if (!load) {
    process.stderr.write(
      `usage: npm run cli -- <command> [args]\ncommands: ${Object.keys(commands).sort().join(', ')}\n`,
    );
    return name ? 2 : 0;
  }
  const { command } = await load();
  return command.run(args, { stdout: process.stdout, stderr: process.stderr, stdin: process.stdin });
}

main(process.argv.slice(2)).then(
  (code) => {
    process.exitCode = code;
  },
  (error: unknown) => {
    process.stderr.write(`${error instanceof Error ? error.message : String(error)}\n`);
    process.exitCode = 1;
  },
);
