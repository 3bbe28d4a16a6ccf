// The monthly fridge record for inspectors: daily minimum and maximum, checks with initials, excursions and what was done.
import { expect } from 'chai';
import type { Test } from 'supertest';
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Excursion } from '../../../database/models/index.js';
import { resetDatabase } from '../../support/test-database.js';
import { createSite, signInAs, testApp, type SignedIn } from '../../support/test-app.js';
import { celsiusCsv, createFridge, createLogger, series, uploadLog } from '../../support/fridge-fixtures.js';

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
    expect(lines[0]).to.equal('date,min °F,max °F,readings,checks (time initials current min max)');
    expect(lines).to.have.length(1 + 31 + 1 + 1 + 2 + 1); // header, 31 days, blank, excursion header, two excursions (readings, check), end
    // Hand-computed: 3.5 °C = 38.3 °F and 9.5 °C = 49.1 °F (NIST SP 811); the check at 08:05 in Chicago.
    expect(lines[2]).to.equal('2026-03-02,38.3,49.1,7,08:05 GL 40.0 38.5 49.1');
    expect(lines[3]).to.equal('2026-03-03,,,0,08:10 RO 39.2 37.4 41.0');
    expect(lines[1]).to.equal('2026-03-01,,,0,');
    expect(lines.find((l) => l.startsWith('high,2026-03-02 01:00'))).to.equal('high,2026-03-02 01:00,2026-03-02 02:00,1 h 0 min,49.1,open,"Door closed; vaccine kept in place, marked do not use"');
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
      expect(text).to.match(/2026-03-02\s+38\.3\s+49\.1\s+7\s+08:05 GL\s+40\.0 \/ 38\.5 \/ 49\.1/);
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
