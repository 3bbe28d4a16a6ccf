// The veterinarian's signed decisions: password re-entered, veterinarians only, never changed, superseded by a correction.
import { expect } from 'chai';
import { AuditEntry, Hold, HoldDecision, StockBalance, StockMovement } from '../../../database/models/index.js';
import { undecidedHoldsByLot } from '../../../api/lots/holds.js';
import { resetDatabase, testEnv } from '../../support/test-database.js';
import { createSite, signInAs, testApp, testPassword } from '../../support/test-app.js';
import { createPresentation, createProduct, createSiteFridge, stockLot } from '../../support/flock-fixtures.js';
import { Sequelize } from 'sequelize';
import { firstPagePng, inkShare, pdfText } from '../../support/pdf-pages.js';

async function heldLot(vials = 10) {
  const site = await createSite('VET');
  const lot = await stockLot(await createSiteFridge(site), await createPresentation(await createProduct(), 1000), vials, '2030-01-31');
  const first = await Hold.create({ lotId: lot.id, cause: 'arrival', sourceKind: 'test', sourceId: 1, reason: 'warm arrival', openedBy: null });
  const second = await Hold.create({ lotId: lot.id, cause: 'excursion', sourceKind: 'test', sourceId: 2, reason: 'fridge excursion', openedBy: null });
  return { site, lot, first, second };
}

describe('hold decisions', () => {
  // The models are bound when the app is built; building it first lets this file run on its own.
  before(() => testApp());
  beforeEach(resetDatabase);

  it('a lot with two holds stays held until both are released; the signature keeps name, time and meaning', async () => {
    const { lot, first, second } = await heldLot();
    const vet = await signInAs(['veterinarian']);
    const released = await vet.agent.post(`/api/holds/${first.id}/decisions`).set('X-XSRF-TOKEN', vet.csrf).send({ decision: 'release', password: testPassword });
    expect(released.status).to.equal(201);
    expect(released.body).to.include({ decision: 'release', signerName: vet.user.name });
    expect(released.body.signatureMeaning).to.match(/reviewed this lot's exposure/);
    expect((await undecidedHoldsByLot([lot.id])).get(lot.id)?.map((h) => h.id)).to.deep.equal([second.id]);
    await vet.agent.post(`/api/holds/${second.id}/decisions`).set('X-XSRF-TOKEN', vet.csrf)
      .send({ decision: 'release_with_condition', condition: 'Use first, within two weeks', password: testPassword }).expect(201);
    expect((await undecidedHoldsByLot([lot.id])).get(lot.id)).to.equal(undefined);
    expect(await AuditEntry.count({ where: { action: 'hold.decide' } })).to.equal(2);
  });

  it('refuses a wrong password (nothing signed), and any role but veterinarian (403)', async () => {
    const { first } = await heldLot();
    const vet = await signInAs(['veterinarian']);
    const wrong = await vet.agent.post(`/api/holds/${first.id}/decisions`).set('X-XSRF-TOKEN', vet.csrf).send({ decision: 'release', password: 'not my password at all' });
    expect(wrong.status).to.equal(400);
    expect(wrong.body.error.fields[0].field).to.equal('password');
    const storage = await signInAs(['storage', 'admin']);
    const forbidden = await storage.agent.post(`/api/holds/${first.id}/decisions`).set('X-XSRF-TOKEN', storage.csrf).send({ decision: 'release', password: testPassword });
    expect(forbidden.status).to.equal(403);
    expect(await HoldDecision.count()).to.equal(0);
  });

  it('a release with condition needs the condition', async () => {
    const { first } = await heldLot();
    const vet = await signInAs(['veterinarian']);
    const response = await vet.agent.post(`/api/holds/${first.id}/decisions`).set('X-XSRF-TOKEN', vet.csrf).send({ decision: 'release_with_condition', password: testPassword });
    expect(response.status).to.equal(400);
    expect(response.body.error.fields[0].field).to.equal('condition');
  });

  it('a correction must supersede the current decision; both are kept and the new one is current', async () => {
    const { first } = await heldLot();
    const vet = await signInAs(['veterinarian']);
    const original = await vet.agent.post(`/api/holds/${first.id}/decisions`).set('X-XSRF-TOKEN', vet.csrf).send({ decision: 'release', password: testPassword });
    const unlinked = await vet.agent.post(`/api/holds/${first.id}/decisions`).set('X-XSRF-TOKEN', vet.csrf).send({ decision: 'discard', password: testPassword });
    expect(unlinked.status).to.equal(409);
    expect(unlinked.body.error.fields[0].field).to.equal('supersedesId');
    const correction = await vet.agent.post(`/api/holds/${first.id}/decisions`).set('X-XSRF-TOKEN', vet.csrf)
      .send({ decision: 'release_with_condition', condition: 'Use within 7 days', password: testPassword, supersedesId: original.body.id });
    expect(correction.status).to.equal(201);
    const list = await vet.agent.get(`/api/holds/${first.id}/decisions`).expect(200);
    expect(list.body.items.map((d: { decision: string; current: boolean }) => [d.decision, d.current])).to.deep.equal([['release', false], ['release_with_condition', true]]);
  });

  it('signed decisions cannot be changed or removed by the application role (SQLSTATE 42501)', async () => {
    const { first } = await heldLot();
    const vet = await signInAs(['veterinarian']);
    await vet.agent.post(`/api/holds/${first.id}/decisions`).set('X-XSRF-TOKEN', vet.csrf).send({ decision: 'release', password: testPassword }).expect(201);
    const asApp = new Sequelize(testEnv('DATABASE_URL'), { logging: false, pool: { max: 1 } });
    try {
      const codes: (string | undefined)[] = [];
      for (const sql of [`UPDATE hold_decisions SET decision = 'discard'`, 'DELETE FROM hold_decisions']) {
        try {
          await asApp.query(sql);
          codes.push(undefined);
        } catch (error) {
          codes.push((error as { parent?: { code?: string } }).parent?.code);
        }
      }
      expect(codes).to.deep.equal(['42501', '42501']);
    } finally {
      await asApp.close();
    }
  });

  it('a discard decision posts the discard movement for every vial left, in the same transaction', async () => {
    const { lot, first } = await heldLot(12);
    const vet = await signInAs(['veterinarian']);
    await vet.agent.post(`/api/holds/${first.id}/decisions`).set('X-XSRF-TOKEN', vet.csrf).send({ decision: 'discard', password: testPassword }).expect(201);
    const discard = await StockMovement.findOne({ where: { lotId: lot.id, kind: 'discard' } });
    expect(discard?.vials).to.equal(12);
    expect(discard?.reason).to.equal('decided by the veterinarian');
    expect((await StockBalance.findAll({ where: { lotId: lot.id } })).map((b) => b.vials)).to.deep.equal([0]);
  });
});

describe('the review queue', () => {
  beforeEach(resetDatabase);

  it('groups undecided holds by the event behind them, with vials and doses at risk, and drops decided ones', async () => {
    const { lot, first, second } = await heldLot(4);
    const vet = await signInAs(['veterinarian']);
    const before = await vet.agent.get('/api/holds/queue').expect(200);
    expect(before.body.items.map((e: { cause: string }) => e.cause)).to.deep.equal(['arrival', 'excursion']);
    expect(before.body.items[0].lots[0]).to.include({ lotId: lot.id, vials: 4, doses: 4000 });
    await vet.agent.post(`/api/holds/${first.id}/decisions`).set('X-XSRF-TOKEN', vet.csrf).send({ decision: 'release', password: testPassword }).expect(201);
    const after = await vet.agent.get('/api/holds/queue').expect(200);
    expect(after.body.items.map((e: { lots: { holdId: number }[] }) => e.lots[0].holdId)).to.deep.equal([second.id]);
  });

  it('shows a user limited to another site none of this site\'s holds', async () => {
    await heldLot();
    const elsewhere = await createSite('ELSE');
    const vet = await signInAs(['veterinarian'], [elsewhere]);
    expect((await vet.agent.get('/api/holds/queue').expect(200)).body.items).to.deep.equal([]);
  });
});

describe('the do-not-use tag', () => {
  beforeEach(resetDatabase);

  it('prints the lot, product, causes, since when and the veterinarian to ask, on a page that is not blank', async () => {
    const { lot } = await heldLot();
    const vet = await signInAs(['veterinarian']);
    await vet.user.update({ name: 'Dr. Tag Reader' });
    const storage = await signInAs(['storage']);
    const response = await storage.agent.get(`/api/holds/lots/${lot.id}/tag`).buffer(true).parse((res, done) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => done(null, Buffer.concat(chunks)));
    });
    expect(response.status).to.equal(200);
    expect(response.headers['content-type']).to.match(/application\/pdf/);
    const text = pdfText(response.body as Buffer);
    expect(text).to.match(/DO NOT USE/);
    expect(text).to.contain(`Lot ${lot.lotNumber}`);
    expect(text).to.match(/arrived outside its range: warm arrival/);
    expect(text).to.match(/fridge excursion: fridge excursion/);
    expect(text).to.contain('Dr. Tag Reader');
    expect(text).to.match(/Do not discard them unless the veterinarian directs it/);
    expect(await inkShare(firstPagePng(response.body as Buffer))).to.be.greaterThan(0.01);
  });

  it('dates the hold on the site’s clock with the zone’s name, and ends with the one footer wording', async () => {
    const site = await createSite('TAG', 'America/Denver');
    const lot = await stockLot(await createSiteFridge(site), await createPresentation(await createProduct(), 1000), 5, '2030-01-31');
    await Hold.create({ lotId: lot.id, cause: 'excursion', sourceKind: 'test', sourceId: 3, reason: 'fridge excursion', openedBy: null, openedAt: new Date('2026-12-04T18:58:00Z') });
    const storage = await signInAs(['storage']);
    const response = await storage.agent.get(`/api/holds/lots/${lot.id}/tag`).buffer(true).parse((res, done) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => done(null, Buffer.concat(chunks)));
    }).expect(200);
    const text = pdfText(response.body as Buffer);
    // 18:58 UTC is 11:58 in Denver, on MST (UTC−7) in December (hand-converted).
    expect(text).to.contain('On hold since 2026-12-04 11:58 MST');
    expect(text).to.not.match(/UTC/);
    expect(text).to.match(new RegExp(`Do-not-use tag · lot ${lot.lotNumber} · Made by Vialyard on \\d{4}-\\d\\d-\\d\\d \\d\\d:\\d\\d M[SD]T`));
  });

  it('is refused for a lot with every hold released (409)', async () => {
    const { lot, first, second } = await heldLot();
    const vet = await signInAs(['veterinarian']);
    for (const hold of [first, second]) {
      await vet.agent.post(`/api/holds/${hold.id}/decisions`).set('X-XSRF-TOKEN', vet.csrf).send({ decision: 'release', password: testPassword }).expect(201);
    }
    expect((await vet.agent.get(`/api/holds/lots/${lot.id}/tag`)).status).to.equal(409);
  });
});
