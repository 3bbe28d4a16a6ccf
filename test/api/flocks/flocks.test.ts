// Flocks through the API: placement with a programme that generates vaccinations, the one-flock-per-house rule, dates and field errors.
import { expect } from 'chai';
import { AuditEntry, Flock, Vaccination } from '../../../database/models/index.js';
import { addDays } from '../../../shared/planning/iso-date.js';
import { resetDatabase } from '../../support/test-database.js';
import { createSite, signInAs, testContext } from '../../support/test-app.js';
import { createFlock, createHouse, createProduct, createProgramme, createVaccination, siteDay } from '../../support/flock-fixtures.js';

describe('flocks', () => {
  before(() => void testContext());
  beforeEach(resetDatabase);

  async function setUp() {
    const site = await createSite('NORTH');
    const house = await createHouse(site, 'House 1');
    const product = await createProduct({ name: 'Spray vaccine A' });
    const buyer = await signInAs(['purchasing']);
    return { site, house, product, buyer };
  }

  it('places a flock with a programme and generates its vaccinations at hatch date + age, skipping steps before placement', async () => {
    const { site, house, product, buyer } = await setUp();
    const programme = await createProgramme([
      { product, ageValue: 1 },
      { product, ageValue: 18, ageUnit: 'weeks' },
      { product, ageValue: 30, ageUnit: 'weeks' },
    ]);
    // Hatched 16 weeks ago, placed today: the day-1 step belonged to the hatchery.
    const hatchDate = siteDay(site, -112);
    const response = await buyer.agent
      .post(`/api/flocks/houses/${house.id}`)
      .set('X-XSRF-TOKEN', buyer.csrf)
      .send({ name: 'H1-26A', hatchDate, placementDate: siteDay(site), birdsPlaced: 20_000, plannedDepletionDate: siteDay(site, 500), programmeId: programme.id });
    expect(response.status, JSON.stringify(response.body)).to.equal(201);
    expect(response.body).to.deep.include({ name: 'H1-26A', ageDays: 112, currentBirds: 20_000, status: 'placed', programmeName: programme.name });
    expect(response.body.vaccinations.map((v: { plannedDate: string; ageDays: number }) => [v.plannedDate, v.ageDays])).to.deep.equal([
      [addDays(hatchDate, 126), 126],
      [addDays(hatchDate, 210), 210],
    ]);
    expect(response.body.nextVaccination.plannedDate).to.equal(addDays(hatchDate, 126));
    expect(await AuditEntry.count({ where: { action: ['flock.create', 'flock.vaccinations_generated'] } })).to.equal(2);
  });

  it('refuses a second flock in a house while the first is there (409 on the placement date), and allows one after depletion', async () => {
    const { site, house, buyer } = await setUp();
    await createFlock(house, { placementDays: -90, depletionDays: 60 });
    const body = { name: 'Next', hatchDate: siteDay(site, 30), placementDate: siteDay(site, 30), birdsPlaced: 18_000, plannedDepletionDate: siteDay(site, 400) };
    const clash = await buyer.agent.post(`/api/flocks/houses/${house.id}`).set('X-XSRF-TOKEN', buyer.csrf).send(body);
    expect(clash.status).to.equal(409);
    expect(clash.body.error.fields[0].field).to.equal('placementDate');
    const later = { ...body, hatchDate: siteDay(site, 60), placementDate: siteDay(site, 60) };
    expect((await buyer.agent.post(`/api/flocks/houses/${house.id}`).set('X-XSRF-TOKEN', buyer.csrf).send(later)).status).to.equal(201);
  });

  it('names each bad field and stores nothing: placement before hatch, no birds, an unknown programme', async () => {
    const { site, house, buyer } = await setUp();
    const post = (body: object) => buyer.agent.post(`/api/flocks/houses/${house.id}`).set('X-XSRF-TOKEN', buyer.csrf).send(body);
    const dates = await post({ name: 'X', hatchDate: siteDay(site), placementDate: siteDay(site, -1), birdsPlaced: 100 });
    expect(dates.status).to.equal(400);
    expect(dates.body.error.fields.map((f: { field: string }) => f.field)).to.deep.equal(['placementDate']);
    const noBirds = await post({ name: 'X', hatchDate: siteDay(site), placementDate: siteDay(site) });
    expect(noBirds.body.error.fields.map((f: { field: string }) => f.field)).to.deep.equal(['birdsPlaced']);
    const programme = await post({ name: 'X', hatchDate: siteDay(site), placementDate: siteDay(site), birdsPlaced: 100, programmeId: 999 });
    expect(programme.status).to.equal(400);
    expect(programme.body.error.fields).to.deep.equal([{ field: 'programmeId', message: 'Unknown programme.' }]);
    expect(await Flock.count()).to.equal(0);
  });

  it('keeps bird numbers as a history: mortality lowers the current birds, a headcount sets them, a loss beyond them is refused', async () => {
    const { site, house, buyer } = await setUp();
    const flock = await createFlock(house, { birds: 20_000 });
    const post = (body: object) => buyer.agent.post(`/api/flocks/${flock.id}/bird-counts`).set('X-XSRF-TOKEN', buyer.csrf).send(body);
    const first = await post({ countedOn: siteDay(site, -7), kind: 'mortality', birds: 120 });
    expect(first.body.currentBirds).to.equal(19_880);
    const counted = await post({ countedOn: siteDay(site, -1), kind: 'count', birds: 19_800, note: 'Monthly count' });
    expect(counted.body.currentBirds).to.equal(19_800);
    expect(counted.body.birdCounts.map((c: { birdsAfter: number }) => c.birdsAfter)).to.deep.equal([19_880, 19_800]);
    const tooMany = await post({ countedOn: siteDay(site), kind: 'mortality', birds: 19_801 });
    expect(tooMany.status).to.equal(409);
    expect(tooMany.body.error.fields[0].field).to.equal('birds');
    const future = await post({ countedOn: siteDay(site, 1), kind: 'mortality', birds: 1 });
    expect(future.status).to.equal(400);
    expect(future.body.error.fields[0].field).to.equal('countedOn');
  });

  it('refuses bird numbers and a depletion for a flock not placed yet (409 naming the date field), and takes them from the placement day', async () => {
    const { site, house, buyer } = await setUp();
    // Placed in 5 days on the site's calendar: no birds on the farm until then.
    const flock = await createFlock(house, { hatchDays: 3, placementDays: 5, birds: 18_000 });
    const birds = (countedOn: string) => buyer.agent.post(`/api/flocks/${flock.id}/bird-counts`).set('X-XSRF-TOKEN', buyer.csrf).send({ countedOn, kind: 'mortality', birds: 10 });
    const deplete = (depletedOn: string) => buyer.agent.post(`/api/flocks/${flock.id}/depletion`).set('X-XSRF-TOKEN', buyer.csrf).send({ depletedOn });
    for (const day of [siteDay(site), siteDay(site, 5)]) {
      const refused = await birds(day);
      expect(refused.status, day).to.equal(409);
      expect(refused.body.error.message).to.equal(`This flock is not placed yet: it is placed on ${siteDay(site, 5)}.`);
      expect(refused.body.error.fields).to.deep.equal([{ field: 'countedOn', message: `Not placed until ${siteDay(site, 5)}.` }]);
      const early = await deplete(day);
      expect(early.status, day).to.equal(409);
      expect(early.body.error.fields[0].field).to.equal('depletedOn');
    }
    const view = (await buyer.agent.get(`/api/flocks/${flock.id}`).expect(200)).body;
    expect(view.status).to.equal('planned');
    expect(view.birdCounts).to.deep.equal([]);
    expect(view.depletedOn).to.equal(null);
    expect(await AuditEntry.count({ where: { action: ['flock.bird_count', 'flock.deplete'] } })).to.equal(0);
    // On the placement day the same writes go through.
    await flock.update({ hatchDate: siteDay(site, -2), placementDate: siteDay(site) });
    expect((await birds(siteDay(site))).status).to.equal(201);
    expect((await deplete(siteDay(site))).status).to.equal(200);
  });

  it('moves untouched generated vaccinations with a new hatch date and leaves a hand-moved one where it was', async () => {
    const { site, house, product, buyer } = await setUp();
    const programme = await createProgramme([{ product, ageValue: 100 }, { product, ageValue: 120 }]);
    const hatchDate = siteDay(site, -90);
    const created = await buyer.agent
      .post(`/api/flocks/houses/${house.id}`)
      .set('X-XSRF-TOKEN', buyer.csrf)
      .send({ name: 'F', hatchDate, placementDate: hatchDate, birdsPlaced: 20_000, programmeId: programme.id });
    const [first, second] = created.body.vaccinations as { id: number }[];
    const movedTo = siteDay(site, 40);
    expect((await buyer.agent.patch(`/api/vaccinations/${second!.id}`).set('X-XSRF-TOKEN', buyer.csrf).send({ plannedDate: movedTo })).status).to.equal(200);
    const updated = await buyer.agent
      .put(`/api/flocks/${created.body.id}`)
      .set('X-XSRF-TOKEN', buyer.csrf)
      .send({ name: 'F', hatchDate: addDays(hatchDate, -2), placementDate: addDays(hatchDate, -2), birdsPlaced: 20_000, programmeId: programme.id });
    expect(updated.status, JSON.stringify(updated.body)).to.equal(200);
    const dates = Object.fromEntries((updated.body.vaccinations as { id: number; plannedDate: string }[]).map((v) => [v.id, v.plannedDate]));
    expect(dates).to.deep.equal({ [first!.id]: addDays(hatchDate, 98), [second!.id]: movedTo });
  });

  it('cancels open vaccinations from the depletion day on, and the depleted flock no longer changes', async () => {
    const { site, house, product, buyer } = await setUp();
    const flock = await createFlock(house, { depletionDays: 30 });
    const before = await createVaccination(flock, product, siteDay(site, -2));
    const after = await createVaccination(flock, product, siteDay(site, 5));
    const depleted = await buyer.agent.post(`/api/flocks/${flock.id}/depletion`).set('X-XSRF-TOKEN', buyer.csrf).send({ depletedOn: siteDay(site) });
    expect(depleted.status).to.equal(200);
    expect(depleted.body.status).to.equal('depleted');
    expect((await Vaccination.findByPk(after.id))!.status).to.equal('cancelled');
    expect((await Vaccination.findByPk(before.id))!.status).to.equal('planned');
    const change = await buyer.agent.post(`/api/flocks/${flock.id}/bird-counts`).set('X-XSRF-TOKEN', buyer.csrf).send({ countedOn: siteDay(site), kind: 'mortality', birds: 1 });
    expect(change.status).to.equal(201);
    expect((await buyer.agent.put(`/api/flocks/${flock.id}`).set('X-XSRF-TOKEN', buyer.csrf).send({ name: 'X', hatchDate: flock.hatchDate, placementDate: flock.placementDate, birdsPlaced: 1 })).status).to.equal(409);
  });

  it('lists only the flocks of the user’s own sites, and hides another site’s flock', async () => {
    const mine = await createSite('MINE');
    const theirs = await createSite('THEIRS');
    await createFlock(await createHouse(mine), { name: 'Mine' });
    const hidden = await createFlock(await createHouse(theirs), { name: 'Theirs' });
    const crew = await signInAs(['crew'], [mine]);
    const list = await crew.agent.get('/api/flocks').expect(200);
    expect(list.body.items.map((f: { name: string }) => f.name)).to.deep.equal(['Mine']);
    expect((await crew.agent.get(`/api/flocks/${hidden.id}`)).status).to.equal(404);
    expect((await crew.agent.get(`/api/flocks?siteId=${theirs.id}`)).body.items).to.deep.equal([]);
  });
});
