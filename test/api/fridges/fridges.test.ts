// Fridges: administration, and the status each shows (no recent data, checks today, calibrations due).
import { expect } from 'chai';
import { QueryTypes } from 'sequelize';
import { AuditEntry, LoggerCertificate, Site } from '../../../database/models/index.js';
import { fridgeStatuses } from '../../../api/fridges/fridge-statuses.js';
import { storageOverview } from '../../../api/fridges/storage-overview.js';
import { resetDatabase } from '../../support/test-database.js';
import { createSite, signInAs, testApp, testContext } from '../../support/test-app.js';
import { createFridge, createLogger } from '../../support/fridge-fixtures.js';

const HOUR = 3_600_000;

async function addReading(loggerId: number, at: number, tempC = 4): Promise<void> {
  await testContext().sequelize.query('INSERT INTO readings (at, logger_id, temp_c) VALUES (:at, :loggerId, :tempC)', { replacements: { at: new Date(at).toISOString(), loggerId, tempC }, type: QueryTypes.INSERT });
}

describe('fridges', () => {
  before(() => testApp());
  beforeEach(resetDatabase);

  it('creates a fridge with the 35–45 °F range (common practice) kept as entered, and audits it', async () => {
    const site = await createSite('LKN');
    const storage = await signInAs(['storage']);
    const response = await storage.agent.post('/api/fridges').set('X-XSRF-TOKEN', storage.csrf)
      .send({ siteId: site.id, code: 'lkn-f9', name: 'Vaccine room', alarmLow: 35, alarmHigh: 45, alarmUnit: 'F' });
    expect(response.status, JSON.stringify(response.body)).to.equal(201);
    expect(response.body).to.deep.include({ code: 'LKN-F9', alarm: { low: 35, high: 45, unit: 'F' }, minMaxDisplay: true, timeZone: 'America/Chicago' });
    expect(await AuditEntry.count({ where: { action: 'fridge.create' } })).to.equal(1);
    const list = await storage.agent.get('/api/fridges').expect(200);
    expect(list.body.items.map((f: { code: string }) => f.code)).to.deep.equal(['LKN-F9']);
  });

  it('refuses bad input naming each field, and a code already in use', async () => {
    const site = await createSite('LKN');
    await createFridge(site, { code: 'TAKEN' });
    const admin = await signInAs(['admin']);
    const bad = await admin.agent.post('/api/fridges').set('X-XSRF-TOKEN', admin.csrf).send({ siteId: site.id, code: 'x', name: '', alarmLow: 45, alarmHigh: 35, alarmUnit: 'K' });
    expect(bad.status).to.equal(400);
    expect(bad.body.error.fields.map((f: { field: string }) => f.field)).to.include.members(['code', 'name', 'alarmUnit']);
    const inverted = await admin.agent.post('/api/fridges').set('X-XSRF-TOKEN', admin.csrf).send({ siteId: site.id, code: 'NEW', name: 'N', alarmLow: 45, alarmHigh: 35, alarmUnit: 'F' });
    expect(inverted.body.error.fields).to.deep.equal([{ field: 'alarmHigh', message: 'The high limit must be above the low limit.' }]);
    const clash = await admin.agent.post('/api/fridges').set('X-XSRF-TOKEN', admin.csrf).send({ siteId: site.id, code: 'taken', name: 'N', alarmLow: 35, alarmHigh: 45, alarmUnit: 'F' });
    expect(clash.status).to.equal(409);
    expect(clash.body.error.fields).to.deep.equal([{ field: 'code', message: 'Already in use.' }]);
  });

  it('lets a veterinarian read fridges but not change them, and hides other sites’ fridges', async () => {
    const mine = await createSite('MINE');
    const theirs = await createSite('THEIRS', 'America/Denver');
    const fridge = await createFridge(mine);
    await createFridge(theirs);
    const vet = await signInAs(['veterinarian'], [mine]);
    expect((await vet.agent.get('/api/fridges').expect(200)).body.items.map((f: { id: number }) => f.id)).to.deep.equal([fridge.id]);
    await vet.agent.get(`/api/fridges/${fridge.id}`).expect(200);
    const put = await vet.agent.put(`/api/fridges/${fridge.id}`).set('X-XSRF-TOKEN', vet.csrf).send({});
    expect(put.status).to.equal(403);
  });

  it('shows "no recent data" when the newest reading is older than the site’s setting (default 24 h)', async () => {
    const site = await createSite('LKN');
    const [recent, stale, empty] = [await createFridge(site), await createFridge(site), await createFridge(site)];
    const now = Date.UTC(2026, 2, 10, 12);
    await addReading((await createLogger(recent)).id, now - 2 * HOUR);
    await addReading((await createLogger(stale)).id, now - 30 * HOUR);
    const statuses = await fridgeStatuses(testContext().sequelize, undefined, new Date(now));
    const byId = (id: number) => statuses.find((s) => s.id === id)!;
    expect([byId(recent.id).noRecentData, byId(stale.id).noRecentData, byId(empty.id).noRecentData]).to.deep.equal([false, true, true]);
    expect(byId(stale.id).newestReadingAt).to.equal(new Date(now - 30 * HOUR).toISOString());
    await Site.update({ settings: { staleDataHours: 48 } }, { where: { id: site.id } });
    const relaxed = await fridgeStatuses(testContext().sequelize, undefined, new Date(now));
    expect(relaxed.find((s) => s.id === stale.id)!).to.include({ noRecentData: false, staleDataHours: 48 });
  });

  it('lists on the storage card the fridges not checked today, open excursions, stale data and calibrations due', async () => {
    const site = await createSite('LKN');
    const checked = await createFridge(site, { code: 'CHECKED' });
    const twice = await createFridge(site, { code: 'TWICE', minMaxDisplay: false });
    const now = new Date(Date.UTC(2026, 2, 10, 18)); // 12:00 in Chicago
    const storage = await signInAs(['storage']);
    await storage.agent.post('/api/daily-checks').set('X-XSRF-TOKEN', storage.csrf)
      .send({ fridgeId: checked.id, unit: 'F', current: 40, min: 38, max: 42, initials: 'gl', checkedAt: new Date(now.getTime() - 3 * HOUR).toISOString() }).expect(201);
    await storage.agent.post('/api/daily-checks').set('X-XSRF-TOKEN', storage.csrf)
      .send({ fridgeId: twice.id, unit: 'F', current: 40, initials: 'gl', checkedAt: new Date(now.getTime() - 2 * HOUR).toISOString() }).expect(201);
    const soon = await createLogger(checked);
    const fine = await createLogger(twice);
    await LoggerCertificate.create({ loggerId: soon.id, calibratedOn: '2024-04-01', dueOn: '2026-04-20', fileName: 'c.pdf', contentType: 'application/pdf', storedName: 'x', sizeBytes: 1, sha256: 'a'.repeat(64), uploadedBy: null });
    await LoggerCertificate.create({ loggerId: fine.id, calibratedOn: '2025-04-01', dueOn: '2027-04-01', fileName: 'c.pdf', contentType: 'application/pdf', storedName: 'x', sizeBytes: 1, sha256: 'b'.repeat(64), uploadedBy: null });
    const overview = await storageOverview(testContext().sequelize, undefined, now);
    const status = (code: string) => overview.fridges.find((f) => f.code === code)!;
    expect(status('CHECKED')).to.include({ checksToday: 1, checksNeeded: 1, calibrationsDue: 1, noRecentData: true });
    expect(status('TWICE')).to.include({ checksToday: 1, checksNeeded: 2, calibrationsDue: 0 });
    expect(overview.calibrations).to.deep.equal([{ loggerId: soon.id, serial: soon.serial, fridgeId: checked.id, fridgeCode: 'CHECKED', dueOn: '2026-04-20', status: 'due-soon' }]);
    const card = await storage.agent.get('/api/fridges/overview').expect(200);
    expect(card.body.fridges).to.have.length(2);
  });
});
