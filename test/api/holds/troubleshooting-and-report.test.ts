// The troubleshooting record of an excursion (storage fills it, every change audited, closed once decided) and the
// excursion report PDF with its figures, chart and signed decisions.
import { expect } from 'chai';
import { AuditEntry, Hold } from '../../../database/models/index.js';
import { resetDatabase, testEnv } from '../../support/test-database.js';
import { Sequelize } from 'sequelize';
import { createSite, signInAs, testApp, testPassword } from '../../support/test-app.js';
import { createFridge, createLogger } from '../../support/fridge-fixtures.js';
import { firstPagePng, inkShare, pdfText } from '../../support/pdf-pages.js';
import { writeFileSync, mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { runtimeDir } from '../../../database/scripts/runtime-dir.js';
import { holdsOf, lotIn, MIN, productWithRange, T0, uploadTemps } from './hold-test-setup.js';

const record = {
  unit: 'F',
  foundAt: new Date(T0 + 70 * MIN).toISOString(),
  unitTemp: 48.2,
  unitMin: 38,
  unitMax: 48.2,
  roomTemp: 72,
  foundBy: 'R. Alvarez',
  whatHappened: 'Door left ajar after the morning delivery.',
  minutesSinceInRange: 40,
  backInStorageAt: new Date(T0 + 80 * MIN).toISOString(),
  contacted: 'Flock veterinarian by phone',
  preventiveAction: 'Door alarm checked; staff reminded to close the door.',
};

describe('troubleshooting record and excursion report', () => {
  let storage: Awaited<ReturnType<typeof signInAs>>;
  before(() => testApp());
  beforeEach(async () => {
    await resetDatabase();
    storage = await signInAs(['storage']);
  });

  async function excursion() {
    const fridge = await createFridge(await createSite('TRB'));
    const logger = await createLogger(fridge);
    const lot = await lotIn(fridge, await productWithRange(35, 45, 'F'), T0 - 60 * MIN, 12);
    // 23 h 50 min at 4 °C from T0 − 23 h, then 9 °C for 40 min (T0+40 to T0+80), limit 7.222 °C: 4 × (9 − 7.222) × 10 = 71.1 °C·min (hand-computed).
    await uploadTemps(storage, logger.id, T0 - 23 * 60 * MIN, [...Array(140).fill(4), 4, 4, 9, 9, 9, 9, 4, 4, 4]);
    const [hold] = await holdsOf(lot);
    return { lot, hold, eventId: hold.sourceId! };
  }

  it('storage fills it in (°F kept as °C), every change audited; the veterinarian reads but may not write; closed once decided', async () => {
    const { hold, eventId } = await excursion();
    const saved = await storage.agent.put(`/api/holds/events/${eventId}/troubleshooting`).set('X-XSRF-TOKEN', storage.csrf).send(record);
    expect(saved.status).to.equal(200);
    // (48.2 − 32) / 1.8 = 9 °C; (72 − 32) / 1.8 = 22.2 °C (NIST SP 811 conversion).
    expect(saved.body.unitTempC).to.be.closeTo(9, 1e-9);
    expect(saved.body.roomTempC).to.be.closeTo(22.222, 1e-3);
    expect(saved.body).to.include({ foundBy: 'R. Alvarez', minutesSinceInRange: 40, updatedBy: storage.user.name });
    await storage.agent.put(`/api/holds/events/${eventId}/troubleshooting`).set('X-XSRF-TOKEN', storage.csrf).send({ ...record, contacted: 'Vet and manager' }).expect(200);
    expect((await AuditEntry.findAll({ where: { entity: 'exposure_event', entityId: String(eventId) } })).map((a) => a.action).filter((a) => a.startsWith('troubleshooting')))
      .to.deep.equal(['troubleshooting.create', 'troubleshooting.update']);
    const bad = await storage.agent.put(`/api/holds/events/${eventId}/troubleshooting`).set('X-XSRF-TOKEN', storage.csrf).send({ ...record, unitMin: 50 });
    expect(bad.status).to.equal(400);
    expect(bad.body.error.fields[0].field).to.equal('unitMin');

    const vet = await signInAs(['veterinarian']);
    await vet.agent.put(`/api/holds/events/${eventId}/troubleshooting`).set('X-XSRF-TOKEN', vet.csrf).send(record).expect(403);
    const [queued] = (await vet.agent.get('/api/holds/queue').expect(200)).body.items;
    expect(queued.troubleshooting).to.include({ contacted: 'Vet and manager' });

    await vet.agent.post(`/api/holds/${hold.id}/decisions`).set('X-XSRF-TOKEN', vet.csrf).send({ decision: 'release', password: testPassword }).expect(201);
    const closed = await storage.agent.put(`/api/holds/events/${eventId}/troubleshooting`).set('X-XSRF-TOKEN', storage.csrf).send(record);
    expect(closed.status).to.equal(409);
  });

  it('events, troubleshooting records and recalls cannot be deleted by the application role (kept ≥ 3 years, CDC toolkit)', async () => {
    const { eventId } = await excursion();
    await storage.agent.put(`/api/holds/events/${eventId}/troubleshooting`).set('X-XSRF-TOKEN', storage.csrf).send(record).expect(200);
    const asApp = new Sequelize(testEnv('DATABASE_URL'), { logging: false, pool: { max: 1 } });
    try {
      const codes: (string | undefined)[] = [];
      for (const table of ['exposure_events', 'troubleshooting_records', 'recalls']) {
        try {
          await asApp.query(`DELETE FROM ${table}`);
          codes.push(undefined);
        } catch (error) {
          codes.push((error as { parent?: { code?: string } }).parent?.code);
        }
      }
      expect(codes).to.deep.equal(['42501', '42501', '42501']);
    } finally {
      await asApp.close();
    }
  });

  it('the report PDF holds the figures, the lots at risk, the record and the signed decision, on pages that are not blank', async () => {
    const { lot, hold, eventId } = await excursion();
    await storage.agent.put(`/api/holds/events/${eventId}/troubleshooting`).set('X-XSRF-TOKEN', storage.csrf).send(record).expect(200);
    const vet = await signInAs(['veterinarian']);
    await vet.user.update({ name: 'Dr. Report Signer' });
    await vet.agent.post(`/api/holds/${hold.id}/decisions`).set('X-XSRF-TOKEN', vet.csrf)
      .send({ decision: 'release_with_condition', condition: 'Use first, within a week', password: testPassword }).expect(201);
    const response = await vet.agent.get(`/api/holds/events/${eventId}/report.pdf`).buffer(true).parse((res, done) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => done(null, Buffer.concat(chunks)));
    });
    expect(response.status).to.equal(200);
    expect(response.headers['content-type']).to.match(/application\/pdf/);
    const pdf = response.body as Buffer;
    const text = pdfText(pdf);
    expect(text).to.include('Excursion report');
    expect(text).to.match(/Minutes outside: 40/);
    // The veterinarian reads °F (the default): °F first, °C in brackets. 9 °C = 48.2 °F (NIST SP 811).
    expect(text).to.match(/Peak \(highest\): 48\.2 °F \(9\.0 °C\)/);
    // A temperature difference: 71.1 °C·min × 1.8 = 128.0 °F·min, no 32 added (hand-computed, NIST SP 811 §4.2.1.1).
    expect(text).to.match(/Degree-minutes: 128\.0 °F·min \(71\.1 °C·min\)/);
    // 24 h ending at T0+80 min: 23 h 20 min at 4 °C and 40 min at 9 °C; MKT ≈ 4.19 °C = 39.54 °F (hand-computed with ΔH/R = 10,000 K, USP ⟨1160⟩).
    expect(text).to.match(/MKT, 24 h ending at the end: 39\.5 °F \(4\.2 °C\)/);
    // The chart's axis in the reader's unit: 34 to 50 °F in steps of 2 (the data 39.2–48.2 °F, the limits 35 and 45 °F).
    expect(text).to.match(/^\s*50 °F\s*$/m);
    // On the site's clock (Chicago, CST): T0 = 08:00 UTC = 02:00 CST; the warm readings from T0+40 min, ending at T0+80 min (hand-converted).
    expect(text).to.match(/Start: 2026-03-01 02:40 CST/);
    expect(text).to.match(/End: 2026-03-01 03:20 CST/);
    expect(text).to.match(/Excursion report \d+ · Fridge \d+ · Made by Vialyard on \d{4}-\d\d-\d\d \d\d:\d\d C[SD]T/);
    expect(text).to.not.match(/UTC/);
    expect(text).to.include(lot.lotNumber);
    expect(text).to.match(/1 lot; at risk: 12 vials, 12,000 doses/);
    expect(text).to.include('Door left ajar after the morning delivery.');
    expect(text).to.include('Dr. Report Signer');
    expect(text).to.include('Release with condition (Use first, within a week)');
    expect(text).to.match(/reviewed this lot's exposure/);
    const png = firstPagePng(pdf);
    expect(await inkShare(png)).to.be.greaterThan(0.02);
    const dir = join(runtimeDir('artifacts'), 'pdf');
    mkdirSync(dir, { recursive: true });
    writeFileSync(join(dir, 'excursion-report-page-1.png'), firstPagePng(pdf, 80));
    writeFileSync(join(dir, 'excursion-report.pdf'), pdf);
    expect(await Hold.count()).to.equal(1);

    // A reader on °C gets °C first, °F in brackets.
    await vet.user.update({ displayUnit: 'C' });
    const inCelsius = await vet.agent.get(`/api/holds/events/${eventId}/report.pdf`).buffer(true).parse((res, done) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => done(null, Buffer.concat(chunks)));
    }).expect(200);
    const celsiusText = pdfText(inCelsius.body as Buffer);
    expect(celsiusText).to.match(/Degree-minutes: 71\.1 °C·min \(128\.0 °F·min\)/);
    expect(celsiusText).to.match(/Peak \(highest\): 9\.0 °C \(48\.2 °F\)/);
    expect(celsiusText).to.match(/^\s*10 °C\s*$/m);
  });
});
