// The demo's fridge logs: loggers, invented readings since the demo's lots came in (one excursion, one gap), and daily checks.
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { DateTime } from 'luxon';
import type { Sequelize } from 'sequelize';
import { recordDailyCheck } from '../../api/daily-checks/daily-checks-service.js';
import { importLogFile } from '../../api/log-imports/import-log-file.js';
import { addCertificate } from '../../api/loggers/loggers-service.js';
import { createPdf, pdfFonts, pdfToBuffer } from '../../api/pdf/pdf-document.js';
import { celsiusToFahrenheit } from '../../shared/temperature/convert-temperature.js';
import { Fridge, Logger, User } from '../models/index.js';
import { projectRoot } from '../scripts/runtime-dir.js';
import { siteTime } from './demo-clock.js';
import { openHoldsAtSpellStart, readingsAsStored } from './demo-excursion-holds.js';

const HOUR = 3_600_000;
const DAY = 24 * HOUR;
/**
 * How far back every demo fridge's readings go: past the opening count thirteen weeks ago (demo-flocks.ts), the
 * oldest time a demo lot came into a fridge, so a lot's exposure knows the temperature for all its time in storage.
 */
export const READINGS_SINCE_DAYS = 13 * 7 + 1;

/** A small deterministic wobble, so the demo looks the same on every machine. */
export function wobble(seed: number): () => number {
  let state = seed;
  return () => {
    state = (state * 1_103_515_245 + 12_345) % 2_147_483_648;
    return state / 2_147_483_648 - 0.5;
  };
}

export interface Plan {
  start: number;
  end: number;
  stepMinutes: number;
  /** °C at an instant, or null to leave the reading out. */
  temp: (at: number) => number | null;
}

export function readings(plan: Plan): [number, number][] {
  const out: [number, number][] = [];
  for (let at = plan.start; at <= plan.end; at += plan.stepMinutes * 60_000) {
    const t = plan.temp(at);
    if (t !== null) out.push([at, t]);
  }
  return out;
}

/** A °F export with metadata lines and local times, the way many loggers write it. */
export function fahrenheitFile(serial: string, zone: string, rows: [number, number][]): string {
  const lines = [`Logger serial,${serial}`, `Exported,${DateTime.now().setZone(zone).toFormat('yyyy-MM-dd HH:mm')}`, '', 'Date/Time,Temperature (°F),Battery (%)'];
  for (const [at, c] of rows) lines.push(`${DateTime.fromMillis(at, { zone }).toFormat('yyyy-MM-dd HH:mm')},${celsiusToFahrenheit(c).toFixed(1)},87`);
  return `${lines.join('\r\n')}\r\n`;
}

/** A °C export with `;`, decimal commas and day-first dates. */
function celsiusFile(zone: string, rows: [number, number][]): string {
  const lines = ['Datum;Uhrzeit;Temperatur [°C]'];
  for (const [at, c] of rows) {
    const local = DateTime.fromMillis(at, { zone });
    lines.push(`${local.toFormat('dd.MM.yyyy')};${local.toFormat('HH:mm')};${c.toFixed(1).replace('.', ',')}`);
  }
  return `${lines.join('\n')}\n`;
}

export async function certificatePdf(serial: string, calibrated: string): Promise<Buffer> {
  const doc = createPdf({ title: `Calibration certificate ${serial} (demo)` });
  doc.font(pdfFonts.bold).fontSize(18).text('Calibration certificate (demo)');
  doc.font(pdfFonts.regular).fontSize(11).moveDown().text(`Logger serial: ${serial}`).text(`Calibrated on: ${calibrated}`).text('Result: within ±0.5 °C at 2, 5 and 8 °C (invented for the demo).');
  return pdfToBuffer(doc);
}

/** Runs after the demo's other records exist; goes through the same services as the pages. */
export async function seedDemoFridgeLogs(sequelize: Sequelize): Promise<void> {
  const uploadsDir = process.env.UPLOADS_DIR ?? join(projectRoot, 'uploads');
  const storage = await User.findOne({ where: { email: 'storage@larkmoor.example' } });
  const byCode = async (code: string) => (await Fridge.findOne({ where: { code } }))!;
  const now = Math.floor(Date.now() / (10 * 60_000)) * 10 * 60_000;
  const dir = await mkdtemp(join(tmpdir(), 'vialyard-demo-'));
  const put = async (logger: Logger, name: string, body: string) => {
    const path = join(dir, name);
    await writeFile(path, body);
    await importLogFile(sequelize, { loggerId: logger.id, path, fileName: name, sizeBytes: Buffer.byteLength(body), actorId: storage?.id ?? null, source: 'upload', uploadsDir });
  };
  try {
    // Larkmoor North's vaccine room fridge: an export of the weeks before, then three weekly files; a warm spell six days
    // ago in the morning, while the delivery that arrived at 07:40 was put away; a logger outage nine days ago, overnight.
    const chicago = 'America/Chicago';
    const f1 = await byCode('LKN-F1');
    const primary = await Logger.create({ fridgeId: f1.id, serial: 'LK1-0417', model: 'Probe logger in glycol bottle', role: 'primary', installedOn: '2025-02-03' });
    const backup = await Logger.create({ fridgeId: f1.id, serial: 'LK1-B220', model: 'Min/max display logger', role: 'backup', installedOn: '2025-02-03' });
    const noise = wobble(417);
    const warmStart = siteTime(chicago, -6, '09:10').getTime();
    const warm = { start: warmStart, end: warmStart + 1.8 * HOUR };
    const outageStart = siteTime(chicago, -9, '01:00').getTime();
    const outage = { start: outageStart, end: outageStart + 8 * HOUR };
    const base = (at: number) => 4.6 + 0.5 * Math.sin((at / DAY) * 2 * Math.PI) + noise() * 0.3;
    const primaryTemp = (at: number) => {
      if (at >= outage.start && at < outage.end) return null;
      if (at >= warm.start && at <= warm.end) return 8.1 + 1.1 * Math.sin(((at - warm.start) / (warm.end - warm.start)) * Math.PI);
      return base(at);
    };
    // Each file ends just before the next begins, as a logger read out weekly gives them.
    const primaryFiles = [
      { name: 'LK1-0417-earlier.csv', rows: readings({ start: now - READINGS_SINCE_DAYS * DAY, end: now - 21 * DAY - 10 * 60_000, stepMinutes: 10, temp: primaryTemp }) },
      ...[3, 2, 1].map((week) => ({
        name: `LK1-0417-week-${4 - week}.csv`,
        rows: readings({ start: now - week * 7 * DAY, end: now - (week - 1) * 7 * DAY - (week === 1 ? HOUR : 10 * 60_000), stepMinutes: 10, temp: primaryTemp }),
      })),
    ];
    // The warm spell's holds date from its first warm reading, as a logger sending as it reads would have them.
    await openHoldsAtSpellStart(sequelize, 'LKN-F1', readingsAsStored(primaryFiles.flatMap((file) => file.rows), 'F'), storage?.id ?? null);
    for (const file of primaryFiles) await put(primary, file.name, fahrenheitFile('LK1-0417', chicago, file.rows));
    // The backup covered the first five hours of the outage.
    const backupRows = readings({ start: outage.start - 2 * HOUR, end: outage.start + 5 * HOUR, stepMinutes: 30, temp: (at) => base(at) + 0.2 });
    await put(backup, 'LK1-B220-outage.csv', fahrenheitFile('LK1-B220', chicago, backupRows));
    // Certificates: the primary's recalibration falls due in 45 days, inside the 60-day reminder.
    const certify = async (logger: Logger, dueInDays: number) => {
      const calibrated = DateTime.now().minus({ years: 2 }).plus({ days: dueInDays }).toISODate()!;
      const path = join(dir, `${logger.serial}.pdf`);
      const pdf = await certificatePdf(logger.serial, calibrated);
      await writeFile(path, pdf);
      const due = DateTime.now().plus({ days: dueInDays }).toISODate()!;
      await addCertificate(sequelize, storage!.id, logger.id, { calibratedOn: calibrated, dueOn: due }, { path, originalName: `${logger.serial}-calibration.pdf`, size: pdf.length }, uploadsDir);
    };
    await certify(primary, 45);
    await certify(backup, 400);

    // The office fridge's logger stopped sending three days ago: "no recent data".
    const f2 = await byCode('LKN-F2');
    const office = await Logger.create({ fridgeId: f2.id, serial: 'LK2-0912', model: 'Probe logger', role: 'primary', installedOn: '2025-05-12' });
    const officeNoise = wobble(912);
    await certify(office, 520);
    await put(office, 'LK2-0912.csv', fahrenheitFile('LK2-0912', chicago, readings({ start: now - READINGS_SINCE_DAYS * DAY, end: now - 3 * DAY, stepMinutes: 15, temp: () => 4.2 + officeNoise() * 0.6 })));

    // Fennel Creek's brooder office fridge exports °C with decimal commas.
    const f3 = await byCode('FCP-F1');
    const brooder = await Logger.create({ fridgeId: f3.id, serial: 'FC1-3301', model: 'Probe logger', role: 'primary', installedOn: '2024-09-01' });
    const brooderNoise = wobble(3301);
    await certify(brooder, 300);
    await put(brooder, 'FC1-3301.csv', celsiusFile('America/Denver', readings({ start: now - READINGS_SINCE_DAYS * DAY, end: now - 2 * HOUR, stepMinutes: 15, temp: () => 5 + brooderNoise() * 0.8 })));

    // Morning checks at both sites, none yet today at Larkmoor North; storage staff record them (Greta Lindqvist, GL).
    for (let day = 13; day >= 0; day--) {
      const check = async (fridge: Fridge, zone: string, hour: number, current: number, note = '') => {
        const at = DateTime.now().setZone(zone).startOf('day').minus({ days: day }).plus({ hours: hour, minutes: 5 });
        if (at.toMillis() > Date.now()) return;
        await recordDailyCheck(sequelize, storage!.id, { fridgeId: fridge.id, unit: 'F', current, min: current - 1.8, max: current + 2.1, initials: 'GL', note, checkedAt: at.toISO()! });
      };
      // The morning after the warm spell, the min/max shows only the time since it was reset once the fridge was back in range.
      const afterSpell = day === 5 ? 'Min/max reset yesterday after the warm spell, once the fridge was back in range.' : '';
      if (day > 0) await check(f1, chicago, 7, 40.1 + (day % 4) * 0.3, afterSpell);
      await check(f3, 'America/Denver', 7, 40.8 - (day % 3) * 0.4);
    }
  } finally {
    await rm(dir, { recursive: true, force: true });
  }
}
