// Fridges, loggers, readings and logger files for the fridge-log tests, made directly or through the real API.
import { writeFile } from 'node:fs/promises';
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { Fridge, Logger, type Site } from '../../database/models/index.js';
import { runtimeDir } from '../../database/scripts/runtime-dir.js';
import type { SignedIn } from './test-app.js';

let fridgeCount = 0;

export async function createFridge(site: Site, options: { code?: string; alarmLow?: number; alarmHigh?: number; alarmUnit?: 'F' | 'C'; minMaxDisplay?: boolean } = {}): Promise<Fridge> {
  fridgeCount++;
  return Fridge.create({
    siteId: site.id,
    code: options.code ?? `F-${site.code}-${fridgeCount}`.slice(0, 20),
    name: `Fridge ${fridgeCount}`,
    place: 'Vaccine room',
    alarmLow: options.alarmLow ?? 35,
    alarmHigh: options.alarmHigh ?? 45,
    alarmUnit: options.alarmUnit ?? 'F',
    minMaxDisplay: options.minMaxDisplay ?? true,
  });
}

export async function createLogger(fridge: Fridge, role: 'primary' | 'backup' = 'primary', serial = `SN-${role}-${fridge.id}`): Promise<Logger> {
  return Logger.create({ fridgeId: fridge.id, serial, model: 'Test logger', role });
}

const pad = (n: number) => String(n).padStart(2, '0');

/** `YYYY-MM-DD HH:mm` of an instant, in UTC. */
export function utcStamp(ms: number): string {
  const d = new Date(ms);
  return `${d.getUTCFullYear()}-${pad(d.getUTCMonth() + 1)}-${pad(d.getUTCDate())} ${pad(d.getUTCHours())}:${pad(d.getUTCMinutes())}`;
}

/** A CSV with a `Time (UTC),Temperature (°C)` header from [epoch ms, °C] pairs, times written with a Z. */
export function celsiusCsv(rows: [number, number][]): string {
  return ['Time,Temperature (°C)', ...rows.map(([at, c]) => `${new Date(at).toISOString()},${c}`)].join('\n') + '\n';
}

/** Readings every `stepMinutes` from `start`, one °C value each. */
export function series(start: number, stepMinutes: number, temps: number[]): [number, number][] {
  return temps.map((t, i) => [start + i * stepMinutes * 60_000, t]);
}

export async function writeTempFile(name: string, body: string | Buffer): Promise<string> {
  const dir = runtimeDir('test-files');
  mkdirSync(dir, { recursive: true });
  const path = join(dir, `${process.pid}-${Date.now()}-${name}`);
  await writeFile(path, body);
  return path;
}

/** Uploads a file as the page does: multipart, with an optional mapping. */
export function uploadLog(who: SignedIn, loggerId: number, body: string | Buffer, options: { name?: string; mapping?: object; progressToken?: string } = {}) {
  const call = who.agent.post(`/api/log-imports/loggers/${loggerId}`).set('X-XSRF-TOKEN', who.csrf);
  if (options.mapping) call.field('mapping', JSON.stringify(options.mapping));
  if (options.progressToken) call.field('progressToken', options.progressToken);
  return call.attach('file', Buffer.isBuffer(body) ? body : Buffer.from(body, 'utf8'), options.name ?? 'log.csv');
}
