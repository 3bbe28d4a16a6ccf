// The contract every `npm run cli` command implements; streams are passed in so tests can capture them.
import type { Readable, Writable } from 'node:stream';

export interface CliIo {
  stdout: Writable;
  stderr: Writable;
  stdin: Readable;
}

export interface CliCommand {
  /** One line shown in the usage text. */
  summary: string;
  /** Returns the exit status: 0 success, 2 bad input, 1 anything else. */
  run(args: string[], io: CliIo): Promise<number>;
}
