// The demo's review: a second excursion already decided and signed, a troubleshooting record partly filled on the
// open one, and stock counts that leave one fridge due. Runs after the fridge logs, through the pages' own services.
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { DateTime } from 'luxon';
import type { Sequelize } from 'sequelize';
import type { AppContext } from '../../api/app-context.js';
import { PasswordHasher } from '../../api/auth/password-hasher.js';
import { decideHold } from '../../api/holds/hold-decisions-service.js';
import { saveTroubleshootingRecord } from '../../api/holds/troubleshooting-service.js';
import { importLogFile } from '../../api/log-imports/import-log-file.js';
import { addCertificate } from '../../api/loggers/loggers-service.js';
import { countSheet } from '../../api/stock-counts/count-sheet.js';
import { submitCount } from '../../api/stock-counts/submit-count.js';
import { celsiusToFahrenheit } from '../../shared/temperature/convert-temperature.js';
import { ExposureEvent, Fridge, Hold, Lot, Logger, User } from '../models/index.js';
import { projectRoot } from '../scripts/runtime-dir.js';
import { demoAccounts } from './demo-scenario.js';
import { siteTime } from './demo-clock.js';
import { openHoldsAtSpellStart, readingsAsStored } from './demo-excursion-holds.js';
import { READINGS_SINCE_DAYS, certificatePdf, fahrenheitFile, readings, wobble } from './demo-fridge-logs.js';

const MINUTE = 60_000;
const HOUR = 60 * MINUTE;
const DAY = 24 * HOUR;

/** The decision and count services take the app's context; a seeder needs only its database and password check. */
function seedingContext(sequelize: Sequelize): AppContext {
  return { sequelize, hasher: new PasswordHasher(4) } as Pick<AppContext, 'sequelize' | 'hasher'> as AppContext;
}

const account = (email: string) => demoAccounts.find((a) => a.email === email)!;

async function userId(email: string): Promise<number> {
  return (await User.findOne({ where: { email }, attributes: ['id'] }))!.id;
}

/**
 * Fennel Creek's shop fridge gets a logger and its readings since the lots came in, with a short warm spell four days ago
 * in the morning: its holds open at the spell's start (demo-excursion-holds.ts), the import's recompute takes the event
 * over as in production, and the veterinarian has already signed a decision on each.
 */
async function decidedShopFridgeExcursion(sequelize: Sequelize, context: AppContext, now: number, uploadsDir: string, dir: string): Promise<void> {
  const shop = (await Fridge.findOne({ where: { code: 'FCP-F2' } }))!;
  const logger = await Logger.create({ fridgeId: shop.id, serial: 'FC2-5120', model: 'Probe logger', role: 'primary', installedOn: '2025-08-18' });
  const noise = wobble(5120);
  const warmStart = siteTime('America/Denver', -4, '10:15').getTime();
  const warm = { start: warmStart, end: warmStart + 1.5 * HOUR };
  const rows = readings({
    start: now - READINGS_SINCE_DAYS * DAY,
    end: now - 3 * HOUR,
    stepMinutes: 15,
    temp: (at) => (at >= warm.start && at <= warm.end ? 7.9 + 0.9 * Math.sin(((at - warm.start) / (warm.end - warm.start)) * Math.PI) : 4.4 + noise() * 0.5),
  });
  const body = fahrenheitFile('FC2-5120', 'America/Denver', rows);
  const path = join(dir, 'FC2-5120.csv');
  await writeFile(path, body);
  const storageId = await userId('storage@larkmoor.example');
  const calibratedOn = DateTime.now().minus({ months: 4 }).toISODate()!;
  const certificate = await certificatePdf(logger.serial, calibratedOn);
  const certificatePath = join(dir, `${logger.serial}.pdf`);
  await writeFile(certificatePath, certificate);
  await addCertificate(sequelize, storageId, logger.id, { calibratedOn, dueOn: DateTime.now().plus({ months: 20 }).toISODate()! }, { path: certificatePath, originalName: `${logger.serial}-calibration.pdf`, size: certificate.length }, uploadsDir);
  await openHoldsAtSpellStart(sequelize, 'FCP-F2', readingsAsStored(rows, 'F'), storageId);
  await importLogFile(sequelize, { loggerId: logger.id, path, fileName: 'FC2-5120.csv', sizeBytes: Buffer.byteLength(body), actorId: storageId, source: 'upload', uploadsDir });

  const event = await ExposureEvent.findOne({ where: { fridgeId: shop.id, cause: 'excursion' }, order: [['id', 'ASC']] });
  if (!event) throw new Error('The demo shop fridge excursion opened no exposure event.');
  await saveTroubleshootingRecord(sequelize, storageId, event.id, {
    unit: 'F', foundAt: new Date(warm.start + 50 * MINUTE).toISOString(), unitTemp: 48.6, unitMin: 38.9, unitMax: 49.1, roomTemp: 68,
    foundBy: 'Greta Lindqvist', whatHappened: 'The fridge door was left ajar after the feed delivery; the seal had caught on a box flap.',
    minutesSinceInRange: 50, backInStorageAt: new Date(warm.end).toISOString(), contacted: 'Dr. Imani Castell, by phone.',
    preventiveAction: 'Boxes no longer stored against the door; door alarm checked.',
  });
  // The decision's notes quote the event's own figures, so they agree with the holds' reasons.
  const figures = `${Math.round(event.minutes ?? 0)} minutes just above the label range, peak ${celsiusToFahrenheit(event.peakC).toFixed(1)} °F`;
  const vet = account('vet@larkmoor.example');
  const vetId = await userId(vet.email);
  const holds = await Hold.findAll({ where: { sourceKind: 'exposure_event', sourceId: event.id } });
  const expiries = new Map((await Lot.findAll({ where: { id: holds.map((h) => h.lotId) }, attributes: ['id', 'expiry'] })).map((l) => [l.id, l.expiry]));
  holds.sort((a, b) => String(expiries.get(a.lotId)).localeCompare(String(expiries.get(b.lotId))));
  for (const [index, hold] of holds.entries()) {
    // The earlier-expiring lot is released on condition that it is used first; the other is released.
    const first = index === 0;
    await decideHold(context, vetId, hold.id, {
      decision: first ? 'release_with_condition' : 'release',
      condition: first ? 'Use first, at the next wing-web vaccination' : '',
      notes: `${figures}; the label allows use (demo decision).`,
      password: vet.password,
      supersedesId: null,
    });
  }
}

/** The open excursion at Larkmoor North's vaccine room fridge: storage staff have started its troubleshooting record. */
async function startedTroubleshooting(sequelize: Sequelize): Promise<void> {
  const room = (await Fridge.findOne({ where: { code: 'LKN-F1' } }))!;
  const event = await ExposureEvent.findOne({ where: { fridgeId: room.id, cause: 'excursion' }, order: [['id', 'ASC']] });
  if (!event) return;
  await saveTroubleshootingRecord(sequelize, await userId('storage@larkmoor.example'), event.id, {
    unit: 'F', foundAt: new Date(event.startsAt.getTime() + 40 * MINUTE).toISOString(), unitTemp: 47.8, unitMin: null, unitMax: 48.9, roomTemp: 72,
    foundBy: 'Ravi Okafor', whatHappened: 'Found warm during the morning restock; the compressor was cycling slowly.',
    minutesSinceInRange: null, backInStorageAt: null, contacted: '', preventiveAction: '',
  });
}

/** Counts every fridge except the vaccine room fridge, whose delivery six days ago leaves its count due. */
async function countsLeavingOneDue(sequelize: Sequelize, context: AppContext): Promise<void> {
  const storageId = await userId('storage@larkmoor.example');
  for (const code of ['LKN-F2', 'FCP-F1', 'FCP-F2']) {
    const fridge = (await Fridge.findOne({ where: { code } }))!;
    const sheet = await countSheet(sequelize, fridge.id);
    const lines = sheet.lines.map((line) => ({ lotId: line.lotId, expected: line.expected, counted: line.expected, reason: '' }));
    await submitCount(context, storageId, fridge.id, { lines, notes: 'Monthly count (demo).' });
  }
}

export async function seedDemoReview(sequelize: Sequelize): Promise<void> {
  const uploadsDir = process.env.UPLOADS_DIR ?? join(projectRoot, 'uploads');
  const context = seedingContext(sequelize);
  const now = Math.floor(Date.now() / (15 * MINUTE)) * 15 * MINUTE;
  const dir = await mkdtemp(join(tmpdir(), 'vialyard-demo-review-'));
  try {
    await decidedShopFridgeExcursion(sequelize, context, now, uploadsDir, dir);
    await startedTroubleshooting(sequelize);
    await countsLeavingOneDue(sequelize, context);
  } finally {
    await rm(dir, { recursive: true, force: true });
  }
}
