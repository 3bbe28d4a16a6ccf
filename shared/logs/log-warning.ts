// A problem with one part of a logger file that did not stop the rest from being read.

export interface LogWarning {
  /** 1-based, counting every line of the file, metadata and header included. */
  readonly line: number;
  readonly message: string;
}
