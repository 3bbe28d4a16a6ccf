// Streams a file's lines (LF, CRLF or lone CR, BOM removed) a chunk at a time, with how many bytes have been read.
import { createReadStream } from 'node:fs';
import { StringDecoder } from 'node:string_decoder';

export interface LineBatch {
  lines: string[];
  bytesRead: number;
}

const stripCr = (line: string) => (line.charCodeAt(line.length - 1) === 13 ? line.slice(0, -1) : line);

/**
 * Yields the lines of each chunk read (an await per line would cost more than reading it); a final line
 * end does not start an empty line, as with splitLines.
 */
export async function* fileLines(path: string): AsyncGenerator<LineBatch> {
  const decoder = new StringDecoder('utf8');
  let rest = '';
  let separator: '\n' | '\r' | undefined;
  let bytesRead = 0;
  let first = true;
  for await (const chunk of createReadStream(path, { highWaterMark: 256 * 1024 })) {
    bytesRead += (chunk as Buffer).length;
    let text = rest + decoder.write(chunk as Buffer);
    if (first && text.charCodeAt(0) === 0xfeff) text = text.slice(1);
    first = false;
    // A file with no LF at all is an old lone-CR file; decided on the first chunk that has a line end.
    separator ??= text.includes('\n') ? '\n' : text.includes('\r') ? '\r' : undefined;
    if (separator === undefined) {
      rest = text;
      continue;
    }
    const lines = text.split(separator);
    rest = lines.pop()!;
    for (let i = 0; i < lines.length; i++) lines[i] = stripCr(lines[i]);
    yield { lines, bytesRead };
  }
  rest += decoder.end();
  if (rest !== '') yield { lines: [stripCr(rest)], bytesRead };
}
