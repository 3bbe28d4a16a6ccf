// Reads a password from the terminal without echo, or the first line of piped stdin.
import type { Readable, Writable } from 'node:stream';
import { createInterface } from 'node:readline';

export async function readSecret(prompt: string, stdin: Readable & { isTTY?: boolean; setRawMode?: (raw: boolean) => void }, stderr: Writable): Promise<string> {
  if (!stdin.isTTY) {
    const lines = createInterface({ input: stdin });
    for await (const line of lines) {
      lines.close();
      return line;
    }
    return '';
  }
  stderr.write(prompt);
  stdin.setRawMode?.(true);
  return new Promise((resolve) => {
    let value = '';
    const onData = (chunk: Buffer) => {
      for (const char of chunk.toString('utf8')) {
        if (char === '\r' || char === '\n') {
          stdin.setRawMode?.(false);
          stdin.off('data', onData);
          stdin.pause();
          stderr.write('\n');
          return resolve(value);
        }
        if (char === '\u0003') process.exit(130);
        value = char === '\u007f' ? value.slice(0, -1) : value + char;
      }
    };
    stdin.on('data', onData);
    stdin.resume();
  });
}
