// A logger file that cannot be read at all; the message is meant for the person who uploaded it.
import type { LogNeed } from './log-layout.js';

export class LogFileError extends Error {
  /** What the user could supply to get past this error, when that would help. */
  readonly needs: readonly LogNeed[];

  constructor(message: string, needs: readonly LogNeed[] = []) {
    super(message);
    this.name = 'LogFileError';
    this.needs = needs;
  }
}
