// Bench 3: the planning computation for 2,000 and 4,000 flocks over 180 days, time and peak memory, and their ratios.
import { spawnSync } from 'node:child_process';
import { join } from 'node:path';
import { projectRoot } from '../database/scripts/runtime-dir.js';

export interface PlanningFigure {
  flocks: number;
  vaccinations: number;
  lots: number;
  ms: number;
  peakRssKb: number;
  shortfalls: number;
}

function runWorker(flocks: number): PlanningFigure {
  const result = spawnSync(process.execPath, ['--import', 'tsx', join(projectRoot, 'bench', 'planning-worker.ts'), String(flocks)], { encoding: 'utf8', cwd: projectRoot });
  if (result.status !== 0) throw new Error(`planning worker failed: ${result.stderr}`);
  return JSON.parse(result.stdout.trim().split('\n').pop()!);
}

export function planningBench(log: (line: string) => void): { small: PlanningFigure; large: PlanningFigure; timeRatio: number; memoryRatio: number } {
  // The faster of three runs each, so one slow start-up does not decide the figure.
  const best = (flocks: number) => [runWorker(flocks), runWorker(flocks), runWorker(flocks)].sort((a, b) => a.ms - b.ms)[0];
  const small = best(2000);
  const large = best(4000);
  const timeRatio = large.ms / small.ms;
  const memoryRatio = large.peakRssKb / small.peakRssKb;
  for (const f of [small, large]) {
    log(`planning ${f.flocks} flocks (${f.vaccinations} vaccinations, ${f.lots} lots): ${f.ms.toFixed(1)} ms, peak RSS ${(f.peakRssKb / 1024).toFixed(1)} MB, ${f.shortfalls} short`);
  }
  log(`planning 4,000 vs 2,000 flocks: time × ${timeRatio.toFixed(2)}, peak memory × ${memoryRatio.toFixed(2)}`);
  return { small, large, timeRatio, memoryRatio };
}
