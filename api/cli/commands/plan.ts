// `npm run cli -- plan FILE.json`: allocates vaccine vials to planned vaccinations and prints the plan as JSON.
import { readFile } from 'node:fs/promises';
import type { Readable } from 'node:stream';
import { parsePlanInput } from '../../../shared/planning/plan-input-schema.js';
import type { Plan } from '../../../shared/planning/plan-types.js';
import { planVaccinations } from '../../../shared/planning/plan-vaccinations.js';
import type { CliCommand } from '../cli-command.js';

const USAGE = 'usage: npm run cli -- plan FILE.json   (FILE "-" reads standard input)\n';

export const command: CliCommand = {
  summary: 'plan FILE.json — allocate vaccine vials to planned vaccinations, print the plan as JSON',
  async run(args, io) {
    if (args.length !== 1 || args[0] === '') {
      io.stderr.write(USAGE);
      return 2;
    }
    const file = args[0]!;
    let text: string;
    try {
      text = file === '-' ? await readAll(io.stdin) : await readFile(file, 'utf8');
    } catch (error) {
      io.stderr.write(`${file}: cannot read file: ${reason(error)}\n`);
      return 2;
    }
    let raw: unknown;
    try {
      raw = JSON.parse(text);
    } catch (error) {
      io.stderr.write(`${file}: not valid JSON: ${reason(error)}\n`);
      return 2;
    }
    const parsed = parsePlanInput(raw);
    if (!parsed.ok) {
      io.stderr.write(parsed.errors.map((line) => `${file}: ${line}\n`).join(''));
      return 2;
    }
    let plan: Plan;
    try {
      plan = planVaccinations(parsed.input);
    } catch (error) {
      // The file passed the schema, so a failure here is a planning limit (table size), not a malformed file.
      io.stderr.write(`${file}: cannot plan: ${reason(error)}\n`);
      return 1;
    }
    io.stdout.write(`${JSON.stringify(plan, null, 2)}\n`);
    return 0;
  },
};

async function readAll(stream: Readable): Promise<string> {
  const chunks: Buffer[] = [];
  for await (const chunk of stream) chunks.push(typeof chunk === 'string' ? Buffer.from(chunk) : (chunk as Buffer));
  return Buffer.concat(chunks).toString('utf8');
}

function reason(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}
