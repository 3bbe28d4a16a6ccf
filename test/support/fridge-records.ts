// Fridge-log records on a given site for the role matrix: fridges, loggers, certificates, imports and excursions.
import { createHash } from 'node:crypto';
import { mkdir, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { Excursion, LogImport, LoggerCertificate } from '../../database/models/index.js';
import { Site } from '../../database/models/index.js';
import { createFridge, createLogger } from './fridge-fixtures.js';
import { testConfig } from './test-app.js';

type RecordMaker = (siteId: number) => Promise<number>;

/** The certificate and import makers attach to the logger made just before them on the same path. */
let lastLoggerId = 0;

async function storeFile(folder: string, name: string, body: string): Promise<{ storedName: string; sha256: string }> {
  const sha256 = createHash('sha256').update(body).digest('hex');
  await mkdir(join(testConfig().UPLOADS_DIR, folder), { recursive: true });
  const storedName = join(folder, name.replace('SHA', sha256));
  await writeFile(join(testConfig().UPLOADS_DIR, storedName), body);
  return { storedName, sha256 };
}

async function makeFridge(siteId: number): Promise<number> {
  return (await createFridge((await Site.findByPk(siteId))!)).id;
}

async function makeLogger(siteId: number): Promise<number> {
  const fridge = await createFridge((await Site.findByPk(siteId))!);
  lastLoggerId = (await createLogger(fridge)).id;
  return lastLoggerId;
}

async function makeCertificate(siteId: number): Promise<number> {
  const loggerId = lastLoggerId || (await makeLogger(siteId));
  const { storedName, sha256 } = await storeFile('certificates', 'SHA.pdf', `%PDF-1.4 certificate ${siteId} ${Date.now()}`);
  const certificate = await LoggerCertificate.create({ loggerId, calibratedOn: '2026-01-10', dueOn: '2028-01-10', fileName: 'cert.pdf', contentType: 'application/pdf', storedName, sizeBytes: 30, sha256, uploadedBy: null });
  lastLoggerId = 0;
  return certificate.id;
}

async function makeImport(siteId: number): Promise<number> {
  const loggerId = await makeLogger(siteId);
  const body = `Time,Temp °C\n2026-03-01T08:00:00Z,4\n2026-03-01T08:10:00Z,5\n`;
  const { storedName, sha256 } = await storeFile('log-files', 'SHA.csv', `${body}${siteId}`);
  const row = await LogImport.create({
    loggerId, fileName: 'log.csv', sha256, sizeBytes: body.length, storedName, source: 'upload', importedBy: null, rowsRead: 2, readingsStored: 2, duplicates: 0, conflicts: 0, skipped: 0,
    firstAt: new Date('2026-03-01T08:00:00Z'), lastAt: new Date('2026-03-01T08:10:00Z'),
    layout: { delimiter: ',', headerLine: 1, decimalComma: false, timeColumn: 0, tempColumn: 1, unit: 'C', dateOrder: 'YMD', zone: 'UTC' },
    warningCount: 0, warnings: [], conflictSamples: [],
  });
  return row.id;
}

async function makeExcursion(siteId: number): Promise<number> {
  const fridgeId = await makeFridge(siteId);
  const row = await Excursion.create({
    fridgeId, source: 'readings', kind: 'high', startsAt: new Date('2026-03-01T08:00:00Z'), endsAt: new Date('2026-03-01T08:30:00Z'),
    minutes: 30, peakC: 9, degreeMinutesC: 40, lowC: 1.667, highC: 7.222, followUpOfId: null, dailyCheckId: null,
  });
  return row.id;
}

export const fridgeRecordMakers: Record<string, RecordMaker> = {
  fridgeId: makeFridge,
  loggerId: makeLogger,
  certificateId: makeCertificate,
  importId: makeImport,
  excursionId: makeExcursion,
};
