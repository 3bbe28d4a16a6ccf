// Bench 4: the built client's initial JavaScript (gzip) against the 250 kB target, and the largest lazy chunk.
import { readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';

export interface ClientSize {
  initialGzipKb: number;
  initialFiles: string[];
  largestLazy: { file: string; gzipKb: number } | null;
  targetKb: number;
}

const gzipKb = (file: string) => gzipSync(readFileSync(file), { level: 9 }).length / 1024;

/** Initial = the scripts index.html loads or preloads; everything else in the build is a lazy chunk. */
export function clientSize(distDir: string, log: (line: string) => void): ClientSize {
  const html = readFileSync(join(distDir, 'index.html'), 'utf8');
  const initialFiles = [...html.matchAll(/(?:src|href)="([^"]+\.js)"/g)].map((m) => m[1]);
  const initialGzipKb = initialFiles.reduce((sum, file) => sum + gzipKb(join(distDir, file)), 0);
  const lazy = readdirSync(distDir)
    .filter((file) => file.endsWith('.js') && !initialFiles.includes(file))
    .map((file) => ({ file, gzipKb: gzipKb(join(distDir, file)) }))
    .sort((a, b) => b.gzipKb - a.gzipKb);
  const result = { initialGzipKb, initialFiles, largestLazy: lazy[0] ?? null, targetKb: 250 };
  log(`client initial JS ${initialGzipKb.toFixed(1)} kB gzip (${initialFiles.length} files; target ≤ 250 kB: ${initialGzipKb <= 250 ? 'met' : 'MISSED'})`);
  if (result.largestLazy) log(`largest lazy chunk ${result.largestLazy.file}: ${result.largestLazy.gzipKb.toFixed(1)} kB gzip`);
  return result;
}
