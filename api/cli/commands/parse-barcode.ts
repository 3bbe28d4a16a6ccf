// `npm run cli -- parse-barcode "<data>"`: prints what Vialyard reads from a barcode, for checking labels and scanners.
import type { Readable } from 'node:stream';
import { BarcodeError, parseBarcode } from '../../../shared/barcode/index.js';
import type { CliCommand } from '../cli-command.js';

const USAGE = 'usage: npm run cli -- parse-barcode [--now=YYYY-MM-DD] <data | ->';

async function readAll(stream: Readable): Promise<string> {
  let text = '';
  for await (const chunk of stream) text += typeof chunk === 'string' ? chunk : (chunk as Buffer).toString('utf8');
  return text;
}

// A fixed reference date makes the century rule reproducible when checking an old label or in scripts.
function parseNow(option: string): Date {
  const value = option.slice('--now='.length);
  const date = new Date(`${value}T00:00:00Z`);
  if (Number.isNaN(date.getTime()) || date.toISOString().slice(0, 10) !== value) {
    throw new BarcodeError(`--now must be a date YYYY-MM-DD, got ${JSON.stringify(value)}`);
  }
  return date;
}

export const command: CliCommand = {
  summary: 'parse GS1 barcode data (bracketed, raw scan, Digital Link or bare GTIN) and print it as JSON; "-" reads stdin',
  async run(args, io) {
    try {
      const options = args.filter((arg) => arg.startsWith('--'));
      const positional = args.filter((arg) => !arg.startsWith('--'));
      const unknown = options.find((option) => !option.startsWith('--now='));
      if (unknown !== undefined) throw new BarcodeError(`unknown option ${unknown}\n${USAGE}`);
      if (positional.length !== 1) {
        throw new BarcodeError(`expected exactly one barcode argument, got ${positional.length}\n${USAGE}`);
      }
      const nowOption = options.at(-1);
      const now = nowOption === undefined ? new Date() : parseNow(nowOption);
      // Shell arguments cannot easily carry ASCII 29, so piped scanner output is read from stdin.
      const data = positional[0] === '-' ? await readAll(io.stdin) : (positional[0] ?? '');
      io.stdout.write(`${JSON.stringify(parseBarcode(data, now))}\n`);
      return 0;
    } catch (error) {
      if (!(error instanceof BarcodeError)) throw error;
      io.stderr.write(`invalid barcode: ${error.message}\n`);
      return 2;
    }
  },
};
