// Recalls across sites, and the notifications (in-app and e-mail) when holds open and are decided.
import { expect } from 'chai';
import { Hold, Notification, Recall } from '../../../database/models/index.js';
import { resetDatabase } from '../../support/test-database.js';
import { createSite, signInAs, testApp, testContext, testPassword } from '../../support/test-app.js';
import { caughtMail, clearCaughtMail } from '../../support/mail-catcher.js';
import { createFridge, createLogger } from '../../support/fridge-fixtures.js';
import { createPresentation, createProduct, createSiteFridge, stockLot } from '../../support/flock-fixtures.js';
import { lotIn, MIN, productWithRange, T0, uploadTemps } from './hold-test-setup.js';

describe('recalls', () => {
  before(() => testApp());
  beforeEach(resetDatabase);

  it('holds every lot of that number on every site (any letter case), as one event in the queue', async () => {
    const north = await createSite('NOR');
    const south = await createSite('SOU', 'America/Denver');
    const product = await createProduct();
    const a = await stockLot(await createSiteFridge(north), await createPresentation(product, 1000), 4, '2030-01-31', { lotNumber: 'ab-123' });
    const b = await stockLot(await createSiteFridge(south), await createPresentation(product, 500), 6, '2030-01-31', { lotNumber: 'AB-123' });
    const other = await stockLot(await createSiteFridge(south), await createPresentation(product, 500), 6, '2030-01-31', { lotNumber: 'AB-124' });
    const vet = await signInAs(['veterinarian']);
    const placed = await vet.agent.post('/api/holds/recalls').set('X-XSRF-TOKEN', vet.csrf).send({ lotNumber: 'Ab-123', reason: 'Manufacturer notice of low potency' });
    expect(placed.status).to.equal(201);
    expect(placed.body.lots.map((l: { lotId: number }) => l.lotId).sort()).to.deep.equal([a.id, b.id].sort());
    expect(await Hold.count({ where: { lotId: other.id } })).to.equal(0);
    const queue = (await vet.agent.get('/api/holds/queue').expect(200)).body.items;
    expect(queue).to.have.length(1);
    expect(queue[0]).to.include({ cause: 'recall', title: 'Recall of lot Ab-123', vials: 10, doses: 7000 });
    expect(queue[0].recall).to.include({ reason: 'Manufacturer notice of low potency', placedBy: vet.user.name });
    // Lots on two sites zones apart: no one site's clock (the page shows the reader's own).
    expect(queue[0].timeZone).to.equal(null);
    // A veterinarian of one site sees only that site's lot of the recall.
    const northVet = await signInAs(['veterinarian'], [north]);
    const seen = (await northVet.agent.get('/api/holds/queue').expect(200)).body.items;
    expect(seen[0].lots.map((l: { lotId: number }) => l.lotId)).to.deep.equal([a.id]);
    expect(seen[0].timeZone, 'its one site’s clock').to.equal(north.timeZone);
  });

  it('may be limited to one product; a number with no lot is a 422 naming lotNumber; only veterinarians recall', async () => {
    const site = await createSite('ONE');
    const first = await createProduct();
    const second = await createProduct();
    const fridge = await createSiteFridge(site);
    const mine = await stockLot(fridge, await createPresentation(first, 1000), 4, '2030-01-31', { lotNumber: 'X1' });
    await stockLot(fridge, await createPresentation(second, 1000), 4, '2030-01-31', { lotNumber: 'X1' });
    const vet = await signInAs(['veterinarian']);
    const placed = await vet.agent.post('/api/holds/recalls').set('X-XSRF-TOKEN', vet.csrf).send({ lotNumber: 'x1', productId: first.id, reason: 'Notice' }).expect(201);
    expect(placed.body.lots.map((l: { lotId: number }) => l.lotId)).to.deep.equal([mine.id]);
    const none = await vet.agent.post('/api/holds/recalls').set('X-XSRF-TOKEN', vet.csrf).send({ lotNumber: 'NOPE-9', reason: 'Notice' });
    expect(none.status).to.equal(422);
    expect(none.body.error.fields[0].field).to.equal('lotNumber');
    const blank = await vet.agent.post('/api/holds/recalls').set('X-XSRF-TOKEN', vet.csrf).send({ lotNumber: 'X1', reason: ' ' });
    expect(blank.status).to.equal(400);
    expect(blank.body.error.fields[0].field).to.equal('reason');
    const storage = await signInAs(['storage']);
    await storage.agent.post('/api/holds/recalls').set('X-XSRF-TOKEN', storage.csrf).send({ lotNumber: 'X1', reason: 'Notice' }).expect(403);
    expect(await Recall.count()).to.equal(1);
  });
});

describe('notifications', () => {
  let storage: Awaited<ReturnType<typeof signInAs>>;
  before(() => testApp());
  beforeEach(async () => {
    await resetDatabase();
    clearCaughtMail();
    storage = await signInAs(['storage']);
  });

  it('tells the site\'s veterinarians and storage staff once per event (not per lot), in the app and by mail', async () => {
    const site = await createSite('NOT');
    const elsewhere = await createSite('ELS');
    const fridge = await createFridge(site);
    const logger = await createLogger(fridge);
    const vet = await signInAs(['veterinarian'], [site]);
    const farVet = await signInAs(['veterinarian'], [elsewhere]);
    const purchasing = await signInAs(['purchasing']);
    const product = await productWithRange(35, 45, 'F', false);
    const first = await lotIn(fridge, product, T0 - 60 * MIN);
    const second = await lotIn(fridge, product, T0 - 60 * MIN);
    await uploadTemps(storage, logger.id, T0, [4, 9, 9, 4]);

    const list = (await vet.agent.get('/api/notifications').expect(200)).body;
    expect(list.unread).to.equal(1);
    expect(list.items[0].title).to.equal('Lots held "do not use": excursion');
    expect(list.items[0].body.split('\n')).to.have.length(2);
    expect(list.items[0].body).to.include(`Lot ${first.lotNumber}`).and.include(`Lot ${second.lotNumber}`);
    expect((await farVet.agent.get('/api/notifications').expect(200)).body.unread, 'another site\'s veterinarian').to.equal(0);
    expect((await purchasing.agent.get('/api/notifications').expect(200)).body.unread, 'purchasing is not told').to.equal(0);
    expect((await storage.agent.get('/api/notifications').expect(200)).body.unread).to.equal(1);

    const mail = await caughtMail();
    expect(mail).to.have.length(1);
    expect(mail[0].subject).to.equal('Lots held "do not use": excursion');
    const to = (Array.isArray(mail[0].to) ? mail[0].to : [mail[0].to]).flatMap((a) => a!.value.map((v) => v.address));
    expect(to.sort()).to.deep.equal([vet.user.email, storage.user.email].sort());
    expect(mail[0].text).to.include(`Lot ${first.lotNumber}`);

    // The decision notifies too, and mails.
    clearCaughtMail();
    const [hold] = await Hold.findAll({ where: { lotId: first.id } });
    await vet.agent.post(`/api/holds/${hold.id}/decisions`).set('X-XSRF-TOKEN', vet.csrf).send({ decision: 'release', password: testPassword }).expect(201);
    const after = (await vet.agent.get('/api/notifications').expect(200)).body;
    expect(after.unread).to.equal(2);
    expect(after.items[0].title).to.equal(`Lot ${first.lotNumber}: release`);
    expect(after.items[0].body).to.include(`signed by ${vet.user.name}`);
    const decidedMail = await caughtMail();
    expect(decidedMail.map((m) => m.subject)).to.deep.equal([`Lot ${first.lotNumber}: release`]);

    // Marking read: one, then all; another user's notification is not found.
    const one = await vet.agent.post(`/api/notifications/${after.items[0].id}/read`).set('X-XSRF-TOKEN', vet.csrf).expect(200);
    expect(one.body.unread).to.equal(1);
    await storage.agent.post(`/api/notifications/${after.items[1].id}/read`).set('X-XSRF-TOKEN', storage.csrf).expect(404);
    await vet.agent.post('/api/notifications/read-all').set('X-XSRF-TOKEN', vet.csrf).expect(200);
    expect((await vet.agent.get('/api/notifications').expect(200)).body.unread).to.equal(0);
  });

  it('a mail server that fails does not undo the hold or its in-app notification', async () => {
    const site = await createSite('FAI');
    const fridge = await createFridge(site);
    const logger = await createLogger(fridge);
    const lot = await lotIn(fridge, await productWithRange(35, 45, 'F', false), T0 - 60 * MIN);
    const mailer = testContext().mailer;
    const send = mailer.send;
    mailer.send = async () => {
      throw new Error('mail server down');
    };
    try {
      await uploadTemps(storage, logger.id, T0, [4, 9, 9, 4]);
    } finally {
      mailer.send = send;
    }
    expect(await Hold.count({ where: { lotId: lot.id } })).to.equal(1);
    expect(await Notification.count({ where: { userId: storage.user.id } })).to.equal(1);
    expect((await Notification.findOne({ where: { userId: storage.user.id } }))!.mailState, 'kept as failed, to send again').to.equal('failed');
    expect(await caughtMail()).to.have.length(0);
  });
});
