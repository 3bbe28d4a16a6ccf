// Writes one year of one-minute readings (525,600 rows) as a logger CSV, with one warm spell, for the import benchmark.
import { createWriteStream } from 'node:fs';
import { once } from 'node:events';

export const MINUTES_PER_YEAR = 365 * 24 * 60;

const pad = (n: number) => (n < 10 ? `0${n}` : String(n));

/** UTC times in `YYYY-MM-DD HH:mm` (a common shape), °F with one decimal; returns the file's row count. */
export async function writeYearOfReadings(path: string, startMs: number): Promise<number> {
  const out = createWriteStream(path);
  // One header line, so psql's HEADER option skips exactly it and both sides read the same file.
  out.write('Time,Temperature (°F)\n');
  let chunk = '';
  for (let i = 0; i < MINUTES_PER_YEAR; i++) {
    const d = new Date(startMs + i * 60_000);
    // A daily swing, a little wobble, and one afternoon in June above 45 °F for 90 minutes.
    const warm = i >= 230_000 && i < 230_090 ? 9 : 0;
    const f = 40.5 + 1.5 * Math.sin((i / 1440) * 2 * Math.PI) + ((i * 7919) % 10) / 20 + warm;
    chunk += `${d.getUTCFullYear()}-${pad(d.getUTCMonth() + 1)}-${pad(d.getUTCDate())} ${pad(d.getUTCHours())}:${pad(d.getUTCMinutes())},${f.toFixed(1)}\n`;
    if (chunk.length > 1 << 16) {
      if (!out.write(chunk)) await once(out, 'drain');
      chunk = '';
    }
  }
  out.end(chunk);
  await once(out, 'finish');
  return MINUTES_PER_YEAR;
}
