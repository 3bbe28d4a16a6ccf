// Streams a file's lines (LF, CRLF or lone CR, BOM removed; UTF-8, UTF-16 or Latin-1) a chunk at a time, with how many bytes have been read.
import { createReadStream } from 'node:fs';
import { StringDecoder } from 'node:string_decoder';
import { LogFileError } from '../../shared/logs/log-file-error.js';
import { detectFileKind, type TextEncoding } from './file-kind.js';

export interface LineBatch {
  lines: string[];
  bytesRead: number;
  /** Indexes into `lines` of lines longer than MAX_LINE_CHARS; each holds only the line's start. */
  overlong?: number[];
}

/** A logger row is well under 1 kB; a longer line is no reading, and keeping it whole would let one line fill memory. */
export const MAX_LINE_CHARS = 64 * 1024;

const stripCr = (line: string) => (line.charCodeAt(line.length - 1) === 13 ? line.slice(0, -1) : line);

/** Turns chunks into text; UTF-16 big-endian is byte-swapped to little-endian, carrying an odd byte to the next chunk. */
function textDecoder(encoding: TextEncoding): { write(chunk: Buffer): string; end(): string } {
  if (encoding !== 'utf16be') return new StringDecoder(encoding);
  const decoder = new StringDecoder('utf16le');
  let carry: Buffer | undefined;
  return {
    write(chunk) {
      const bytes = carry ? Buffer.concat([carry, chunk]) : Buffer.from(chunk);
      const even = bytes.length - (bytes.length % 2);
      carry = even < bytes.length ? bytes.subarray(even) : undefined;
      return decoder.write(bytes.subarray(0, even).swap16());
    },
    end: () => decoder.end(),
  };
}

/**
 * Yields the lines of each chunk read (an await per line would cost more than reading it); a final line
 * end does not start an empty line, as with splitLines. Throws LogFileError when the file is not text.
 */
export async function* fileLines(path: string): AsyncGenerator<LineBatch> {
  let decoder: ReturnType<typeof textDecoder> | undefined;
  let rest = '';
  let separator: '\n' | '\r' | undefined;
  let bytesRead = 0;
  let first = true;
  // Inside a line too long to keep: its start is kept in `rest`, the remainder dropped until its line end.
  let skipping = false;
  for await (const chunk of createReadStream(path, { highWaterMark: 256 * 1024 })) {
    bytesRead += (chunk as Buffer).length;
    if (!decoder) {
      const kind = detectFileKind(chunk as Buffer);
      if (!kind.text) throw new LogFileError(`it is ${kind.what}`);
      decoder = textDecoder(kind.encoding);
    }
    let text = decoder.write(chunk as Buffer);
    if (first && text.charCodeAt(0) === 0xfeff) text = text.slice(1);
    first = false;
    let overlong: number[] | undefined;
    const lines: string[] = [];
    if (skipping) {
      const end = separator === undefined ? Math.max(text.indexOf('\n'), text.indexOf('\r')) : text.indexOf(separator);
      if (end === -1) continue;
      separator ??= text.includes('\n') ? '\n' : '\r';
      overlong = [0];
      lines.push(rest);
      rest = '';
      skipping = false;
      text = text.slice(text.indexOf(separator) + 1);
    } else text = rest + text;
    // A file with no LF at all is an old lone-CR file; decided on the first chunk that has a line end.
    separator ??= text.includes('\n') ? '\n' : text.includes('\r') ? '\r' : undefined;
    const pieces = separator === undefined ? [text] : text.split(separator);
    rest = pieces.pop()!;
    for (const piece of pieces) {
      if (piece.length > MAX_LINE_CHARS) (overlong ??= []).push(lines.length);
      lines.push(piece.length > MAX_LINE_CHARS ? piece.slice(0, MAX_LINE_CHARS) : stripCr(piece));
    }
    if (rest.length > MAX_LINE_CHARS) {
      rest = rest.slice(0, MAX_LINE_CHARS);
      skipping = true;
    }
    if (lines.length) yield { lines, bytesRead, ...(overlong && { overlong }) };
  }
  if (!decoder) return;
  if (!skipping) rest += decoder.end();
  if (skipping || rest.length > MAX_LINE_CHARS) yield { lines: [rest.slice(0, MAX_LINE_CHARS)], bytesRead, overlong: [0] };
  else if (rest !== '') yield { lines: [stripCr(rest)], bytesRead };
}
