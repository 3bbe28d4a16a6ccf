// Excursion and freeze holds opened automatically when a fridge's readings are imported, judged by each lot's own
// product range. Readings every 10 min, each standing for 10 min; every figure below is hand-computed.
import { expect } from 'chai';
import { Excursion, ExposureEvent, Hold } from '../../../database/models/index.js';
import { undecidedHoldsByLot } from '../../../api/lots/holds.js';
import { resetDatabase } from '../../support/test-database.js';
import { createSite, signInAs, testApp, testPassword } from '../../support/test-app.js';
import { createFridge, createLogger } from '../../support/fridge-fixtures.js';
import { holdsOf, lotIn, MIN, productWithRange, T0, transfer, uploadTemps } from './hold-test-setup.js';

describe('automatic excursion and freeze holds', () => {
  let storage: Awaited<ReturnType<typeof signInAs>>;
  before(() => testApp());
  beforeEach(async () => {
    await resetDatabase();
    storage = await signInAs(['storage']);
  });

  // Fridge alarm range 35–45 °F = 1.667–7.222 °C (NIST SP 811 conversion).
  async function fridgeOnSite(code = 'AUT') {
    const fridge = await createFridge(await createSite(code));
    return { fridge, logger: await createLogger(fridge) };
  }

  it('holds a lot whose product range (2–6 °C) is narrower than the fridge\'s, though the fridge raised nothing', async () => {
    const { fridge, logger } = await fridgeOnSite();
    const narrow = await lotIn(fridge, await productWithRange(2, 6, 'C'), T0 - 60 * MIN);
    const usual = await lotIn(fridge, await productWithRange(35, 45, 'F'), T0 - 60 * MIN);
    await uploadTemps(storage, logger.id, T0, [4, 4, 6.5, 6.5, 4, 4]);
    expect(await Excursion.count(), 'the fridge alarm range saw nothing').to.equal(0);
    const [hold] = await holdsOf(narrow);
    expect(hold).to.include({ cause: 'excursion', sourceKind: 'exposure_event', openedBy: null });
    expect(hold.reason).to.match(/above the product's range 2–6 °C for 20 min/);
    const event = (await ExposureEvent.findByPk(hold.sourceId!))!;
    // Two readings of 6.5 °C from T0+20 min, each standing for 10 min: 20 min, peak 6.5, 2 × 0.5 × 10 = 10 °C·min.
    expect(event).to.include({ cause: 'excursion', kind: 'high', minutes: 20, peakC: 6.5 });
    expect(event.degreeMinutesC).to.be.closeTo(10, 1e-6);
    expect([event.startsAt.getTime(), event.endsAt.getTime()]).to.deep.equal([T0 + 20 * MIN, T0 + 40 * MIN]);
    expect(await holdsOf(usual), 'a 35–45 °F product was inside its range').to.deep.equal([]);

    const vet = await signInAs(['veterinarian']);
    const queue = (await vet.agent.get('/api/holds/queue').expect(200)).body.items;
    expect(queue).to.have.length(1);
    expect(queue[0].title).to.match(/above product range 2–6 °C \/ 35\.6–42\.8 °F \(inside the fridge's alarm range: product range only\)/);
    expect(queue[0].exposureEvent).to.include({ minutes: 20, fridgeAlarmed: false });
    // Its times are shown on the clock of the fridge's site (createSite's default zone).
    expect(queue[0].timeZone).to.equal('America/Chicago');
  });

  it('holds a freeze-sensitive lot for freezing (severe) at 0 °C, but not a lot whose product does not mind freezing', async () => {
    const { fridge, logger } = await fridgeOnSite();
    const sensitive = await lotIn(fridge, await productWithRange(35, 45, 'F', true), T0 - 60 * MIN);
    const hardy = await lotIn(fridge, await productWithRange(-2, 8, 'C', false), T0 - 60 * MIN);
    await uploadTemps(storage, logger.id, T0, [4, 0, 4, 4, 4]);
    expect((await holdsOf(sensitive)).map((h) => h.cause).sort()).to.deep.equal(['excursion', 'freeze']);
    expect(await holdsOf(hardy), 'range −2–8 °C, not freeze-sensitive: 0 °C is fine').to.deep.equal([]);
    const freeze = (await ExposureEvent.findOne({ where: { cause: 'freeze' } }))!;
    expect(freeze).to.include({ minutes: 10, peakC: 0, kind: 'low' });

    const vet = await signInAs(['veterinarian']);
    const queue = (await vet.agent.get('/api/holds/queue').expect(200)).body.items as { cause: string; severe: boolean }[];
    expect(queue.map((e) => [e.cause, e.severe])).to.deep.include.members([['freeze', true], ['excursion', false]]);
  });

  it('counts only the fridge a lot was in: moved out before the excursion, no hold; moved in during it, held', async () => {
    const site = await createSite('TWO');
    const a = await createFridge(site);
    const b = await createFridge(site);
    const logger = await createLogger(a);
    const product = await productWithRange(35, 45, 'F');
    const leftBefore = await lotIn(a, product, T0 - 60 * MIN);
    await transfer(leftBefore, a, b, T0 + 5 * MIN, T0 + 10 * MIN);
    const cameDuring = await lotIn(b, product, T0 - 60 * MIN);
    await transfer(cameDuring, b, a, T0 + 30 * MIN, T0 + 35 * MIN);
    const stayed = await lotIn(a, product, T0 - 60 * MIN);
    // 9 °C from T0+20 to T0+60 min in fridge A.
    await uploadTemps(storage, logger.id, T0, [4, 4, 9, 9, 9, 9, 4, 4]);
    expect(await holdsOf(leftBefore)).to.deep.equal([]);
    expect((await holdsOf(cameDuring)).map((h) => h.cause)).to.deep.equal(['excursion']);
    expect((await holdsOf(stayed)).map((h) => h.cause)).to.deep.equal(['excursion']);
    const [one] = await holdsOf(cameDuring);
    const [two] = await holdsOf(stayed);
    expect(one.sourceId, 'one event for both lots').to.equal(two.sourceId);
  });

  it('keeps the holds, grouped with their figures, when a recompute removes the fridge\'s excursion record', async () => {
    const { fridge, logger } = await fridgeOnSite();
    const lot = await lotIn(fridge, await productWithRange(35, 45, 'F'), T0 - 60 * MIN);
    await uploadTemps(storage, logger.id, T0, [4, 4, 9, 9], 'a.csv');
    await uploadTemps(storage, logger.id, T0 + 40 * MIN, [9, 9, 4, 4], 'b.csv');
    const [hold] = await holdsOf(lot);
    expect((await ExposureEvent.findByPk(hold.sourceId!))!.minutes, 'the undecided event followed the data').to.equal(40);
    expect(await Excursion.count()).to.equal(1);
    // Widening the alarm range to 35–50 °F re-judges the fridge's history: 9 °C is inside it, so its record goes.
    const admin = await signInAs(['admin']);
    await admin.agent.put(`/api/fridges/${fridge.id}`).set('X-XSRF-TOKEN', admin.csrf)
      .send({ siteId: fridge.siteId, code: fridge.code, name: fridge.name, place: fridge.place, alarmLow: 35, alarmHigh: 50, alarmUnit: 'F' }).expect(200);
    expect(await Excursion.count()).to.equal(0);
    expect((await holdsOf(lot)).map((h) => h.id)).to.deep.equal([hold.id]);
    const vet = await signInAs(['veterinarian']);
    const [event] = (await vet.agent.get('/api/holds/queue').expect(200)).body.items;
    expect(event.lots.map((l: { holdId: number }) => l.holdId)).to.deep.equal([hold.id]);
    expect(event.exposureEvent).to.include({ id: hold.sourceId, minutes: 40, peakC: 9 });
  });

  it('opens a follow-up event with new holds when new data extends an excursion already decided', async () => {
    const { fridge, logger } = await fridgeOnSite();
    const lot = await lotIn(fridge, await productWithRange(35, 45, 'F'), T0 - 60 * MIN);
    await uploadTemps(storage, logger.id, T0, [4, 4, 9, 9], 'a.csv');
    const [first] = await holdsOf(lot);
    const vet = await signInAs(['veterinarian']);
    await vet.agent.post(`/api/holds/${first.id}/decisions`).set('X-XSRF-TOKEN', vet.csrf).send({ decision: 'release', password: testPassword }).expect(201);
    expect((await undecidedHoldsByLot([lot.id])).get(lot.id)).to.equal(undefined);
    await uploadTemps(storage, logger.id, T0 + 40 * MIN, [9, 9, 4, 4], 'b.csv');
    const holds = await holdsOf(lot);
    expect(holds).to.have.length(2);
    const followUp = (await ExposureEvent.findByPk(holds[1].sourceId!))!;
    expect(followUp).to.include({ followUpOfId: first.sourceId, minutes: 40 });
    expect((await ExposureEvent.findByPk(first.sourceId!))!.minutes, 'the decided event keeps what was decided').to.equal(20);
    expect((await undecidedHoldsByLot([lot.id])).get(lot.id)?.map((h) => h.id)).to.deep.equal([holds[1].id]);
    // The same data again adds nothing.
    await uploadTemps(storage, logger.id, T0 + 80 * MIN, [4, 4], 'c.csv');
    expect(await Hold.count()).to.equal(2);
  });

  it('holds a lot when a daily check reads outside its product range (no duration known)', async () => {
    const { fridge } = await fridgeOnSite();
    const lot = await lotIn(fridge, await productWithRange(2, 6, 'C'), Date.now() - 3_600_000);
    await storage.agent.post('/api/daily-checks').set('X-XSRF-TOKEN', storage.csrf)
      .send({ fridgeId: fridge.id, unit: 'C', current: 6.5, initials: 'AB' }).expect(201);
    const [hold] = await holdsOf(lot);
    expect(hold.reason).to.match(/seen at a daily check/);
    expect((await ExposureEvent.findByPk(hold.sourceId!))!).to.include({ source: 'daily_check', minutes: null, peakC: 6.5 });
  });

  it('a lot with an excursion and a freeze hold stays held until both are decided', async () => {
    const { fridge, logger } = await fridgeOnSite();
    const lot = await lotIn(fridge, await productWithRange(35, 45, 'F', true), T0 - 60 * MIN);
    await uploadTemps(storage, logger.id, T0, [4, -0.5, 4, 4]);
    const [first, second] = await holdsOf(lot);
    const vet = await signInAs(['veterinarian']);
    await vet.agent.post(`/api/holds/${first.id}/decisions`).set('X-XSRF-TOKEN', vet.csrf).send({ decision: 'release', password: testPassword }).expect(201);
    expect((await undecidedHoldsByLot([lot.id])).get(lot.id)?.map((h) => h.id)).to.deep.equal([second.id]);
    await vet.agent.post(`/api/holds/${second.id}/decisions`).set('X-XSRF-TOKEN', vet.csrf).send({ decision: 'release_with_condition', condition: 'Use first', password: testPassword }).expect(201);
    expect((await undecidedHoldsByLot([lot.id])).get(lot.id)).to.equal(undefined);
  });
});
