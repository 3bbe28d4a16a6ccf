// The monthly fridge record for inspectors: daily minimum and maximum, checks with initials, excursions and what was done.
import { expect } from 'chai';
import type { Test } from 'supertest';
import { execFileSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, readFileSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { DateTime } from 'luxon';
import { Excursion } from '../../../database/models/index.js';
import { runtimeDir } from '../../../database/scripts/runtime-dir.js';
import { monthlyRecord } from '../../../api/fridges/monthly-record.js';
import { monthlyRecordCsv } from '../../../api/fridges/monthly-record-csv.js';
import { monthlyRecordPdf } from '../../../api/fridges/monthly-record-pdf.js';
import { resetDatabase } from '../../support/test-database.js';
import { createSite, signInAs, testApp, testContext, type SignedIn } from '../../support/test-app.js';
import { celsiusCsv, createFridge, createLogger, series, uploadLog } from '../../support/fridge-fixtures.js';
import { pdfText } from '../../support/pdf-pages.js';

/** Collects a binary body (supertest buffers only text by default). */
const binary = ((res: NodeJS.ReadableStream, done: (error: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => done(null, Buffer.concat(chunks)));
}) as unknown as Parameters<Test['parse']>[0];

describe('monthly fridge record', () => {
  let storage: SignedIn;
  let fridgeId: number;
  before(async () => {
    testApp();
    await resetDatabase();
    storage = await signInAs(['storage']);
    const fridge = await createFridge(await createSite('LKN'), { code: 'LKN-F1' });
    fridgeId = fridge.id;
    const logger = await createLogger(fridge);
    // 2 March 2026, 06:00–09:00 UTC (00:00–03:00 in Chicago), readings every 30 min; one warm hour.
    const start = Date.UTC(2026, 2, 2, 6);
    await uploadLog(storage, logger.id, celsiusCsv(series(start, 30, [4, 4.5, 9, 9.5, 5, 3.5, 4]))).expect(201);
    await Excursion.update({ actionTaken: 'Door closed; vaccine kept in place, marked do not use' }, { where: {} });
    for (const [at, current, min, max, initials] of [['2026-03-02T14:05:00Z', 40, 38.5, 49.1, 'GL'], ['2026-03-03T14:10:00Z', 39.2, 37.4, 41, 'RO']] as const) {
      await storage.agent.post('/api/daily-checks').set('X-XSRF-TOKEN', storage.csrf).send({ fridgeId, unit: 'F', current, min, max, initials, checkedAt: at }).expect(201);
    }
  });

  it('writes a CSV with a row per day and the excursions below, in the user’s unit', async () => {
    const response = await storage.agent.get(`/api/fridges/${fridgeId}/record`).query({ month: '2026-03', format: 'csv' }).expect(200);
    expect(response.headers['content-disposition']).to.match(/fridge-record-LKN-F1-2026-03\.csv/);
    const lines = response.text.replace(/^\ufeff/, '').split('\r\n');
    expect(lines[0]).to.equal('date,min °F,max °F,readings,of which backup,without readings,checks (time initials current min max)');
    // header, 31 days, blank, excursion header, two excursions (readings, check), blank, two lines on the readings, end
    expect(lines).to.have.length(1 + 31 + 1 + 1 + 2 + 1 + 2 + 1);
    // Hand-computed: 3.5 °C = 38.3 °F and 9.5 °C = 49.1 °F (NIST SP 811); the check at 08:05 in Chicago.
    // The last reading (03:00 CST) stands for one 30-minute interval, so the day is without readings from 03:30 to midnight: 20 h 30 min.
    expect(lines[2]).to.equal('2026-03-02,38.3,49.1,7,0,20 h 30 min,08:05 GL 40.0 38.5 49.1');
    expect(lines[3]).to.equal('2026-03-03,,,0,0,24 h 0 min,08:10 RO 39.2 37.4 41.0');
    // 1 March is before the fridge's first reading: not counted, left blank.
    expect(lines[1]).to.equal('2026-03-01,,,,,,');
    // 8 March, the clock goes forward in Chicago: a 23-hour day.
    expect(lines[8]).to.equal('2026-03-08,,,0,0,23 h 0 min,');
    expect(lines.find((l) => l.startsWith('too warm,'))).to.equal('too warm,2026-03-02 01:00 CST,2026-03-02 02:00 CST,1 h 0 min,49.1,open,"Door closed; vaccine kept in place, marked do not use"');
    expect(lines.some((l) => /^(high|low),/.test(l)), 'the app’s words, not the stored kind').to.equal(false);
    // Hand-computed: 03:30 CST on 2 March (09:30 UTC) to 00:00 CDT on 1 April (05:00 UTC) is 30 days less 4 h 30 min = 715 h 30 min.
    expect(lines.slice(-3, -1)).to.deep.equal([
      'Readings start 2026-03-02 00:00 CST; the days before are not counted as time without readings.',
      '"Time without readings this month: 715 h 30 min, all of it since the last stored reading (2026-03-02 03:00 CST)."',
    ]);
  });

  it('writes a PDF whose text holds the figures and whose pages render, not blank', async function () {
    this.timeout(30_000);
    const response = await storage.agent.get(`/api/fridges/${fridgeId}/record`).query({ month: '2026-03', format: 'pdf' }).buffer(true).parse(binary).expect(200);
    expect(response.headers['content-type']).to.match(/application\/pdf/);
    const dir = mkdtempSync(join(tmpdir(), 'record-'));
    try {
      const pdf = join(dir, 'record.pdf');
      writeFileSync(pdf, response.body as Buffer);
      const text = execFileSync('pdftotext', ['-layout', pdf, '-'], { encoding: 'utf8' });
      expect(text).to.match(/Monthly fridge record · 2026-03/);
      expect(text).to.match(/LKN-F1/);
      expect(text).to.match(/2026-03-02\s+38\.3\s+49\.1\s+7\s+20 h 30 min\s+08:05 GL\s+40\.0 \/ 38\.5 \/ 49\.1/);
      expect(text).to.match(/2026-03-01\s+—\s+—\s+—\s+—\s+no check recorded/);
      expect(text).to.match(/too warm\s+2026-03-02 01:00 CST\s+2026-03-02 02:00 CST\s+1 h 0 min/);
      expect(text).to.match(/Time without readings this month: 715 h 30 min/);
      expect(text).to.match(/times on the site's clock, America\/Chicago \(CST\/CDT\)/);
      // One footer wording in every PDF, on the site's clock.
      expect(text).to.match(/Monthly fridge record · LKN-F1 · 2026-03 · Made by Vialyard on \d{4}-\d\d-\d\d \d\d:\d\d C[SD]T/);
      expect(text).to.not.match(/UTC/);
      expect(text).to.match(/Door closed; vaccine kept in place/);
      expect(text).to.match(/not discarded unless directed/);
      expect(text).to.match(/at least 3 years/);
      execFileSync('pdftoppm', ['-png', '-r', '40', pdf, join(dir, 'page')]);
      const pages = readdirSync(dir).filter((f) => f.endsWith('.png'));
      expect(pages.length).to.be.at.least(1);
      for (const page of pages) expect(readFileSync(join(dir, page)).length, page).to.be.above(3000);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it('refuses a month that is not YYYY-MM', async () => {
    const response = await storage.agent.get(`/api/fridges/${fridgeId}/record`).query({ month: '2026-3' });
    expect(response.status).to.equal(400);
    expect(response.body.error.fields[0].field).to.equal('month');
  });
});

describe('monthly fridge record: loggers started mid-month, a backup filling part of an outage, a month still running', () => {
  let storage: SignedIn;
  let fridgeId: number;
  const MIN = 60_000;
  // Chicago is on CST (UTC−6) from 1 November 2026.
  const cst = (date: string, time: string) => DateTime.fromISO(`${date}T${time}`, { zone: 'America/Chicago' }).toMillis();
  const outage = { start: cst('2026-11-25', '13:00'), end: cst('2026-11-25', '21:00') };
  const warm = { start: cst('2026-11-20', '10:00'), end: cst('2026-11-20', '11:00') };

  before(async function () {
    this.timeout(60_000);
    testApp();
    await resetDatabase();
    storage = await signInAs(['storage']);
    const fridge = await createFridge(await createSite('LKN'), { code: 'LKN-F1' });
    fridgeId = fridge.id;
    const primary = await createLogger(fridge, 'primary');
    const backup = await createLogger(fridge, 'backup');
    // The primary every 10 min from 13 November 09:00 CST to 1 December 02:00 CST, silent for the 8 h outage on
    // 25 November; 4.5 °C, and 9 °C for an hour on 20 November.
    const rows: [number, number][] = [];
    for (let at = cst('2026-11-13', '09:00'); at <= cst('2026-12-01', '02:00'); at += 10 * MIN) {
      if (at >= outage.start && at < outage.end) continue;
      rows.push([at, at >= warm.start && at < warm.end ? 9 : 4.5]);
    }
    await uploadLog(storage, primary.id, celsiusCsv(rows), { name: 'primary.csv' }).expect(201);
    // The backup every 30 min from 13:00 to 18:00 CST, at 5 °C: 11 readings filling the outage's first 5 h 30 min.
    await uploadLog(storage, backup.id, celsiusCsv(series(outage.start, 30, Array(11).fill(5))), { name: 'backup.csv' }).expect(201);
  });

  it('says where readings start, counts the outage left after the backup, and agrees between PDF and CSV', async function () {
    this.timeout(30_000);
    const csv = (await storage.agent.get(`/api/fridges/${fridgeId}/record`).query({ month: '2026-11', format: 'csv' }).expect(200)).text.replace(/^\ufeff/, '').split('\r\n');
    const day = (date: string) => csv.find((l) => l.startsWith(`${date},`));
    // Hand-computed figures (4.5 °C = 40.1 °F, 5 °C = 41.0 °F, 9 °C = 48.2 °F):
    // before the first reading: nothing counted;
    expect(day('2026-11-12')).to.equal('2026-11-12,,,,,,');
    // 13 November from 09:00: 15 h × 6 = 90 readings, none missing;
    expect(day('2026-11-13')).to.equal('2026-11-13,40.1,40.1,90,0,0 min,');
    expect(day('2026-11-20')).to.equal('2026-11-20,40.1,48.2,144,0,0 min,');
    // 25 November: 144 − 48 = 96 primary readings + 11 backup = 107; the backup's last reading (18:00) stands for
    // its 30-minute interval, so 18:30 to 21:00 is without readings: 2 h 30 min.
    expect(day('2026-11-25')).to.equal('2026-11-25,40.1,41.0,107,11,2 h 30 min,');
    expect(day('2026-11-30')).to.equal('2026-11-30,40.1,40.1,144,0,0 min,');
    expect(csv).to.include('too warm,2026-11-20 10:00 CST,2026-11-20 11:00 CST,1 h 0 min,48.2,open,');
    expect(csv).to.include('Readings start 2026-11-13 09:00 CST; the days before are not counted as time without readings.');
    // The month's figure is the days' added up: only the 2 h 30 min of 25 November.
    expect(csv).to.include('Time without readings this month: 2 h 30 min.');

    const pdf = await storage.agent.get(`/api/fridges/${fridgeId}/record`).query({ month: '2026-11', format: 'pdf' }).buffer(true).parse(binary).expect(200);
    const text = pdfText(pdf.body as Buffer);
    const artifacts = join(runtimeDir('artifacts'), 'pdf');
    mkdirSync(artifacts, { recursive: true });
    writeFileSync(join(artifacts, 'monthly-record-mid-month.pdf'), pdf.body as Buffer);
    expect(text).to.match(/Readings start 2026-11-13 09:00 CST/);
    expect(text).to.match(/Time without readings this month: 2 h 30 min\./);
    expect(text).to.match(/2026-11-12\s+—\s+—\s+—\s+—\s+no check recorded/);
    expect(text).to.match(/2026-11-13\s+40\.1\s+40\.1\s+90\s+0 min/);
    expect(text).to.match(/2026-11-25\s+40\.1\s+41\.0\s+107 \(11 backup\)\s+2 h 30 min/);
    expect(text).to.match(/too warm\s+2026-11-20 10:00 CST\s+2026-11-20 11:00 CST\s+1 h 0 min\s+48\.2/);
  });

  it('stops a month still running at today, says "to <date>", and counts the time since the last reading', async function () {
    this.timeout(30_000);
    // Seen at 08:00 CST on 1 December: the primary's last reading was 02:00 and stands for 10 min, so 02:10 to 08:00.
    const record = await monthlyRecord(testContext().sequelize, fridgeId, '2026-12', new Date(cst('2026-12-01', '08:00')));
    expect(record.days.map((d) => d.date)).to.deep.equal(['2026-12-01']);
    expect(record).to.include({ through: '2026-12-01', inProgress: true });
    // Hand-computed: 00:00 to 02:00 every 10 min = 13 readings; 5 h 50 min without.
    expect(record.days[0]).to.include({ readings: 13, backupReadings: 0, minutesWithoutReadings: 350 });
    const csv = monthlyRecordCsv(record, 'F').replace(/^\ufeff/, '').split('\r\n');
    expect(csv[1]).to.equal('2026-12-01,40.1,40.1,13,0,5 h 50 min,');
    expect(csv).to.include('"Time without readings from 2026-12-01 to 2026-12-01 08:00 CST: 5 h 50 min, all of it since the last stored reading (2026-12-01 02:00 CST); the logger\'s next file may fill that time."');
    const text = pdfText(await monthlyRecordPdf(record, 'F'));
    expect(text).to.match(/Monthly fridge record · 2026-12, to 2026-12-01/);
    expect(text).to.match(/2026-12-01\s+40\.1\s+40\.1\s+13\s+5 h 50 min/);
    expect(text).to.not.match(/2026-12-02/);
    expect(text).to.match(/No excursion this month so far\./);
    expect(text).to.match(/Made by Vialyard on 2026-12-01 08:00 CST/);

    // Seen at noon CST on 20 November: 20 days listed, the warm hour in, nothing counted past now.
    const earlier = await monthlyRecord(testContext().sequelize, fridgeId, '2026-11', new Date(cst('2026-11-20', '12:00')));
    expect(earlier.days).to.have.length(20);
    // 00:00 to 11:50 CST: 72 readings (hand-computed); the readings after noon exist but are not yet part of the record.
    expect(earlier.days[19]).to.include({ date: '2026-11-20', readings: 72, minutesWithoutReadings: 0 });
    expect(earlier).to.include({ gapMinutes: 0, lastReading: null });
    expect(earlier.excursions.map((e) => e.kind)).to.deep.equal(['high']);
  });

  it('lists the current month only to today, through the route', async function () {
    this.timeout(30_000);
    const today = DateTime.now().setZone('America/Chicago');
    const csv = (await storage.agent.get(`/api/fridges/${fridgeId}/record`).query({ format: 'csv' }).expect(200)).text.replace(/^\ufeff/, '').split('\r\n');
    const dates = csv.filter((l) => /^\d{4}-\d\d-\d\d,/.test(l)).map((l) => l.slice(0, 10));
    expect(dates).to.have.length(today.day);
    expect(dates[dates.length - 1]).to.equal(today.toISODate());
    const text = pdfText((await storage.agent.get(`/api/fridges/${fridgeId}/record`).query({ format: 'pdf' }).buffer(true).parse(binary).expect(200)).body as Buffer);
    expect(text).to.contain(`Monthly fridge record · ${today.toFormat('yyyy-MM')}, to ${today.toISODate()}`);
  });

  it('refuses a month that has not begun at the site, naming the field', async () => {
    const next = DateTime.now().setZone('America/Chicago').plus({ months: 1 }).toFormat('yyyy-MM');
    const response = await storage.agent.get(`/api/fridges/${fridgeId}/record`).query({ month: next, format: 'pdf' });
    expect(response.status).to.equal(400);
    expect(response.body.error.fields[0].field).to.equal('month');
  });
});
