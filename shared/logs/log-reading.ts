// One temperature reading as taken from a logger file.

export interface LogReading {
  /** Epoch milliseconds (UTC). */
  readonly at: number;
  readonly tempC: number;
  /** 1-based line of the file it came from. */
  readonly line: number;
}
