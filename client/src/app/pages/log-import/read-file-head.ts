// Reads the first lines of a chosen file in the browser, enough for the sniffer and the preview, never the whole file.
import { splitLines } from '@shared/logs/index.js';

const HEAD_BYTES = 256 * 1024;

export async function readFileHead(file: File): Promise<string[]> {
  const text = await file.slice(0, HEAD_BYTES).text();
  const lines = splitLines(text);
  // The last line is cut short when the file goes on past what was read.
  if (file.size > HEAD_BYTES && lines.length > 1) lines.pop();
  return lines;
}
