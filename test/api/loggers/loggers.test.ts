// Loggers: one primary in service per fridge, backups beside it, calibration certificates as PDF or image.
import { expect } from 'chai';
import { AuditEntry } from '../../../database/models/index.js';
import { resetDatabase } from '../../support/test-database.js';
import { createSite, signInAs, testApp, type SignedIn } from '../../support/test-app.js';
import { createFridge } from '../../support/fridge-fixtures.js';

const PDF = Buffer.from('%PDF-1.4\n1 0 obj << /Type /Catalog >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n');

function addLogger(who: SignedIn, body: object) {
  return who.agent.post('/api/loggers').set('X-XSRF-TOKEN', who.csrf).send(body);
}

describe('loggers', () => {
  let storage: SignedIn;
  before(() => testApp());
  beforeEach(async () => {
    await resetDatabase();
    storage = await signInAs(['storage']);
  });

  it('adds a primary and a backup, and refuses a second primary in service', async () => {
    const fridge = await createFridge(await createSite('LKN'));
    const primary = await addLogger(storage, { fridgeId: fridge.id, serial: 'A-100', model: 'Probe logger', role: 'primary' });
    expect(primary.status, JSON.stringify(primary.body)).to.equal(201);
    expect(primary.body).to.include({ serial: 'A-100', role: 'primary', calibration: 'none', removedOn: null });
    await addLogger(storage, { fridgeId: fridge.id, serial: 'B-200', role: 'backup' }).expect(201);
    const second = await addLogger(storage, { fridgeId: fridge.id, serial: 'C-300', role: 'primary' });
    expect(second.status).to.equal(409);
    expect(second.body.error.fields).to.deep.equal([{ field: 'role', message: 'Already a primary in service.' }]);
    const sameSerial = await addLogger(storage, { fridgeId: fridge.id, serial: 'B-200', role: 'backup' });
    expect(sameSerial.body.error.fields).to.deep.equal([{ field: 'serial', message: 'Already in this fridge.' }]);
    // Once the first primary is retired, a new one may come in.
    await storage.agent.patch(`/api/loggers/${primary.body.id}`).set('X-XSRF-TOKEN', storage.csrf).send({ removedOn: new Date().toISOString().slice(0, 10) }).expect(200);
    await addLogger(storage, { fridgeId: fridge.id, serial: 'C-300', role: 'primary' }).expect(201);
    const detail = await storage.agent.get(`/api/fridges/${fridge.id}`).expect(200);
    expect(detail.body.loggers.map((l: { serial: string }) => l.serial)).to.have.members(['A-100', 'B-200', 'C-300']);
  });

  it('keeps a calibration certificate (PDF) with its dates and serves it back', async () => {
    const fridge = await createFridge(await createSite('LKN'));
    const logger = (await addLogger(storage, { fridgeId: fridge.id, serial: 'A-100', role: 'primary' })).body;
    const upload = await storage.agent.post(`/api/loggers/${logger.id}/certificates`).set('X-XSRF-TOKEN', storage.csrf)
      .field('calibratedOn', '2025-06-01').field('dueOn', '2027-06-01').attach('file', PDF, 'calibration.pdf');
    expect(upload.status, JSON.stringify(upload.body)).to.equal(201);
    expect(upload.body).to.include({ calibratedOn: '2025-06-01', dueOn: '2027-06-01', contentType: 'application/pdf', fileName: 'calibration.pdf' });
    const file = await storage.agent.get(`/api/loggers/${logger.id}/certificates/${upload.body.id}`).buffer(true).parse((res, done) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => done(null, Buffer.concat(chunks)));
    });
    expect(file.status).to.equal(200);
    expect(file.headers['content-type']).to.match(/application\/pdf/);
    expect(Buffer.compare(file.body as Buffer, PDF)).to.equal(0);
    expect(await AuditEntry.count({ where: { action: 'logger.certificate' } })).to.equal(1);
  });

  it('refuses a certificate that is not a PDF or an image, and a due date before the calibration', async () => {
    const fridge = await createFridge(await createSite('LKN'));
    const logger = (await addLogger(storage, { fridgeId: fridge.id, serial: 'A-100', role: 'primary' })).body;
    const text = await storage.agent.post(`/api/loggers/${logger.id}/certificates`).set('X-XSRF-TOKEN', storage.csrf)
      .field('calibratedOn', '2025-06-01').field('dueOn', '2027-06-01').attach('file', Buffer.from('not a pdf'), 'calibration.pdf');
    expect(text.status).to.equal(422);
    expect(text.body.error.fields).to.deep.equal([{ field: 'file', message: 'Not a PDF, PNG or JPEG.' }]);
    const dates = await storage.agent.post(`/api/loggers/${logger.id}/certificates`).set('X-XSRF-TOKEN', storage.csrf)
      .field('calibratedOn', '2025-06-01').field('dueOn', '2025-01-01').attach('file', PDF, 'calibration.pdf');
    expect(dates.status).to.equal(400);
    expect(dates.body.error.fields).to.deep.equal([{ field: 'dueOn', message: 'The due date must be after the calibration date.' }]);
  });
});
