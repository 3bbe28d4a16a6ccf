// A flock's schedule through the API: every programme step with its state (done, overdue, planned, cancelled, before
// placement, after depletion, missed), an overdue one planned again or cancelled, the count on the flocks list, the
// projection still counting it, and the migration that generates the steps older flocks were never given.
// Dates are hand-computed from the site's today: hatch at today − 30, so day 10 is today − 20, day 14 today − 16,
// week 4 (day 28) today − 2 and week 6 (day 42) today + 12, as the demo's pullet flock has them.
import { expect } from 'chai';
import { clearProjectionCache } from '../../../api/demand/projection-service.js';
import { up as backfillOverdueSteps } from '../../../database/migrations/2026.12.04T19.30.00.overdue-programme-steps.js';
import { AuditEntry, Vaccination } from '../../../database/models/index.js';
import { appRoleName, resetDatabase } from '../../support/test-database.js';
import { createSite, signInAs, testContext } from '../../support/test-app.js';
import { createFlock, createHouse, createPresentation, createProduct, createProgramme, createSiteFridge, siteDay, stockLot } from '../../support/flock-fixtures.js';

interface Entry {
  key: string;
  state: string;
  date: string;
  daysLate: number;
  productName: string;
  step: { label: string; programmeDate: string } | null;
  vaccination: { id: number; status: string; cancelReason: string | null; movedByHand: boolean } | null;
}

describe('the flock schedule', () => {
  before(() => void testContext());
  beforeEach(async () => {
    await resetDatabase();
    clearProjectionCache();
  });

  async function setUp() {
    const site = await createSite('FENNEL', 'America/Denver');
    const house = await createHouse(site, 'Pullet barn A');
    const nd = await createProduct({ name: 'Spray vaccine ND' });
    const ib = await createProduct({ name: 'Water vaccine IB' });
    const programme = await createProgramme(
      [
        { product: ib, ageValue: 10 },
        { product: nd, ageValue: 14 },
        { product: ib, ageValue: 4, ageUnit: 'weeks' },
        { product: nd, ageValue: 6, ageUnit: 'weeks' },
      ],
      'Pullet rearing',
    );
    const vet = await signInAs(['veterinarian']);
    const flockBody = { name: 'PA-26', hatchDate: siteDay(site, -30), placementDate: siteDay(site, -30), birdsPlaced: 18_000, plannedDepletionDate: siteDay(site, 82) };
    return { site, house, nd, ib, programme, vet, flockBody };
  }

  const states = (schedule: Entry[]) => schedule.map((e) => [e.step?.label ?? null, e.state, e.date, e.daysLate]);

  it('generates the steps whose day passed before the flock was entered, overdue, beside the planned ones', async () => {
    const { site, house, programme, vet, flockBody } = await setUp();
    const created = await vet.agent.post(`/api/flocks/houses/${house.id}`).set('X-XSRF-TOKEN', vet.csrf).send({ ...flockBody, programmeId: programme.id });
    expect(created.status, JSON.stringify(created.body)).to.equal(201);
    expect(created.body.today).to.equal(siteDay(site));
    expect(states(created.body.schedule)).to.deep.equal([
      ['Day 10', 'overdue', siteDay(site, -20), 20],
      ['Day 14', 'overdue', siteDay(site, -16), 16],
      ['Week 4', 'overdue', siteDay(site, -2), 2],
      ['Week 6', 'planned', siteDay(site, 12), 0],
    ]);
    expect(created.body.schedule.every((e: Entry) => e.vaccination !== null), 'each has a vaccination to act on').to.equal(true);
    expect(created.body.overdueVaccinations).to.equal(3);
    expect(created.body.nextVaccination.plannedDate, 'the next one ahead, not an overdue one').to.equal(siteDay(site, 12));
    const audit = (await AuditEntry.findOne({ where: { action: 'flock.vaccinations_generated' } }))!;
    expect((audit.after as { overdueStepIds: number[] }).overdueStepIds).to.have.length(3);

    // The crew of the site reads the same schedule; the list carries the count.
    const crew = await signInAs(['crew'], [site]);
    const read = await crew.agent.get(`/api/flocks/${created.body.id}`).expect(200);
    expect(states(read.body.schedule)).to.deep.equal(states(created.body.schedule));
    const list = await crew.agent.get(`/api/flocks?siteId=${site.id}`).expect(200);
    expect(list.body.items[0]).to.include({ overdueVaccinations: 3 });
  });

  it('an overdue step is planned again from today (never before), or cancelled with its reason; it cannot be confirmed for its past day', async () => {
    const { site, house, programme, vet, flockBody } = await setUp();
    const flock = (await vet.agent.post(`/api/flocks/houses/${house.id}`).set('X-XSRF-TOKEN', vet.csrf).send({ ...flockBody, programmeId: programme.id })).body;
    const entry = (label: string, schedule: Entry[] = flock.schedule) => schedule.find((e) => e.step?.label === label)!;
    // Day 10 was given and signed (as a vaccination-day record leaves it).
    await Vaccination.update({ status: 'done', confirmedAt: new Date() }, { where: { id: entry('Day 10').vaccination!.id } });

    const day14 = entry('Day 14').vaccination!.id;
    const confirm = await vet.agent.post(`/api/vaccinations/${day14}/confirm`).set('X-XSRF-TOKEN', vet.csrf);
    expect(confirm.status).to.equal(409);
    expect(confirm.body.error.fields[0]).to.deep.equal({ field: 'plannedDate', message: 'Overdue: choose a new date.' });
    const yesterday = await vet.agent.patch(`/api/vaccinations/${day14}`).set('X-XSRF-TOKEN', vet.csrf).send({ plannedDate: siteDay(site, -1) });
    expect(yesterday.status).to.equal(400);
    expect(yesterday.body.error.fields[0].field).to.equal('plannedDate');
    const planned = await vet.agent.patch(`/api/vaccinations/${day14}`).set('X-XSRF-TOKEN', vet.csrf).send({ plannedDate: siteDay(site, 1) });
    expect(planned.status, JSON.stringify(planned.body)).to.equal(200);
    expect(planned.body).to.include({ status: 'planned', movedByHand: true, plannedDate: siteDay(site, 1) });

    const week4 = entry('Week 4').vaccination!.id;
    const reason = 'Given at the rearing farm before transfer; paper record filed.';
    await vet.agent.post(`/api/vaccinations/${week4}/cancel`).set('X-XSRF-TOKEN', vet.csrf).send({ reason }).expect(200);

    const after = (await vet.agent.get(`/api/flocks/${flock.id}`).expect(200)).body;
    expect(states(after.schedule)).to.deep.equal([
      ['Day 10', 'done', siteDay(site, -20), 0],
      ['Week 4', 'cancelled', siteDay(site, -2), 0],
      // Moved: at its new date, with the programme's date kept beside it.
      ['Day 14', 'planned', siteDay(site, 1), 0],
      ['Week 6', 'planned', siteDay(site, 12), 0],
    ]);
    expect(entry('Day 14', after.schedule).step!.programmeDate).to.equal(siteDay(site, -16));
    expect(entry('Week 4', after.schedule).vaccination!.cancelReason).to.equal(reason);
    expect(after.overdueVaccinations).to.equal(0);
    // A flock update brings the programme in line again: the moved and cancelled steps stay as people left them.
    await vet.agent.put(`/api/flocks/${flock.id}`).set('X-XSRF-TOKEN', vet.csrf).send({ ...flockBody, programmeId: programme.id, notes: 'Checked' }).expect(200);
    expect(states((await vet.agent.get(`/api/flocks/${flock.id}`)).body.schedule)).to.deep.equal(states(after.schedule));
  });

  it('shows the steps before placement and after depletion without planning them, and a programme chosen late makes its past steps overdue', async () => {
    const { site, house, programme, vet, flockBody } = await setUp();
    // Placed at day 18 (today − 12), leaving at day 33 (today + 3): days 10 and 14 were the rearing farm's, week 6 is after it.
    const body = { ...flockBody, placementDate: siteDay(site, -12), plannedDepletionDate: siteDay(site, 3) };
    const flock = (await vet.agent.post(`/api/flocks/houses/${house.id}`).set('X-XSRF-TOKEN', vet.csrf).send(body).expect(201)).body;
    expect(flock.schedule).to.deep.equal([]);
    const chosen = await vet.agent.put(`/api/flocks/${flock.id}`).set('X-XSRF-TOKEN', vet.csrf).send({ ...body, programmeId: programme.id });
    expect(chosen.status, JSON.stringify(chosen.body)).to.equal(200);
    expect(states(chosen.body.schedule)).to.deep.equal([
      ['Day 10', 'before_placement', siteDay(site, -20), 0],
      ['Day 14', 'before_placement', siteDay(site, -16), 0],
      ['Week 4', 'overdue', siteDay(site, -2), 2],
      ['Week 6', 'after_depletion', siteDay(site, 12), 0],
    ]);
    expect(chosen.body.schedule.map((e: Entry) => e.vaccination !== null)).to.deep.equal([false, false, true, false]);
    expect(await Vaccination.count({ where: { flockId: flock.id } })).to.equal(1);
  });

  it('calls what stayed open at depletion missed; the open ones from the depletion day on are cancelled', async () => {
    const { site, house, programme, vet, flockBody } = await setUp();
    const flock = (await vet.agent.post(`/api/flocks/houses/${house.id}`).set('X-XSRF-TOKEN', vet.csrf).send({ ...flockBody, programmeId: programme.id })).body;
    const depleted = await vet.agent.post(`/api/flocks/${flock.id}/depletion`).set('X-XSRF-TOKEN', vet.csrf).send({ depletedOn: siteDay(site, -1) });
    expect(depleted.status, JSON.stringify(depleted.body)).to.equal(200);
    expect(states(depleted.body.schedule)).to.deep.equal([
      ['Day 10', 'missed', siteDay(site, -20), 20],
      ['Day 14', 'missed', siteDay(site, -16), 16],
      ['Week 4', 'missed', siteDay(site, -2), 2],
      ['Week 6', 'cancelled', siteDay(site, 12), 0],
    ]);
    expect(depleted.body.overdueVaccinations).to.equal(0);
  });

  it('leaves no overdue step out of the projection: it needs its doses today', async () => {
    const { site, house, programme, vet, flockBody, nd } = await setUp();
    // 2 vials × 1,000 doses of the spray on hand; the flock's 18,000 birds need it at day 14 (overdue) and week 6.
    await stockLot(await createSiteFridge(site), await createPresentation(nd, 1000), 2, siteDay(site, 200));
    const flock = (await vet.agent.post(`/api/flocks/houses/${house.id}`).set('X-XSRF-TOKEN', vet.csrf).send({ ...flockBody, programmeId: programme.id })).body;
    const buyer = await signInAs(['purchasing']);
    const projection = (await buyer.agent.get(`/api/demand/sites/${site.id}/projection`).expect(200)).body;
    const spray = projection.vaccinations.filter((v: { productId: number }) => v.productId === nd.id);
    expect(spray.map((v: { plannedDate: string; overdue: boolean }) => [v.plannedDate, v.overdue])).to.deep.equal([
      [siteDay(site, -16), true],
      [siteDay(site, 12), false],
    ]);
    // Planned as if today, it takes the stock first.
    expect(spray[0].dosesAllocated).to.equal(2000);

    // Cancelled, it needs nothing.
    const day14 = flock.schedule.find((e: Entry) => e.step?.label === 'Day 14').vaccination.id;
    await vet.agent.post(`/api/vaccinations/${day14}/cancel`).set('X-XSRF-TOKEN', vet.csrf).send({ reason: 'Given before the flock came to Vialyard.' }).expect(200);
    const after = (await buyer.agent.get(`/api/demand/sites/${site.id}/projection`).expect(200)).body;
    expect(after.vaccinations.filter((v: { productId: number }) => v.productId === nd.id).map((v: { plannedDate: string }) => v.plannedDate)).to.deep.equal([siteDay(site, 12)]);
  });

  it('the migration gives flocks stored under the earlier rule their missing steps, once, and leaves depleted flocks alone', async () => {
    const { site, house, programme } = await setUp();
    // Stored directly, as the earlier rule left them: nothing generated for the steps already past. Placed at day 12
    // (today − 18), so day 10 stays the rearing farm's.
    const open = await createFlock(house, { name: 'Open', hatchDays: -30, placementDays: -18, depletionDays: 82, programmeId: programme.id });
    // A vaccination added by hand is no programme step's: the steps are still generated beside it.
    const byHand = await Vaccination.create({ flockId: open.id, programmeStepId: null, productId: (await createProduct()).id, route: 'spray', plannedDate: siteDay(site, 12), createdBy: null });
    const gone = await createFlock(await createHouse(site, 'Pullet barn B'), { name: 'Gone', hatchDays: -30, placementDays: -30, depletionDays: 82, programmeId: programme.id });
    await gone.update({ depletedOn: siteDay(site, -5) });

    const context = { sequelize: testContext().sequelize, appRole: appRoleName() };
    await backfillOverdueSteps({ context });
    const generated = await Vaccination.findAll({ where: { flockId: open.id }, order: [['plannedDate', 'ASC'], ['id', 'ASC']] });
    expect(generated.filter((v) => v.id !== byHand.id).map((v) => [v.plannedDate, v.status, v.createdBy])).to.deep.equal([
      [siteDay(site, -16), 'planned', null],
      [siteDay(site, -2), 'planned', null],
      [siteDay(site, 12), 'planned', null],
    ]);
    expect(await Vaccination.count({ where: { flockId: gone.id } }), 'a depleted flock’s record no longer changes').to.equal(0);
    const audit = await AuditEntry.findAll({ where: { action: 'flock.vaccinations_generated' } });
    expect(audit.map((a) => [a.entityId, (a.after as { created: unknown[] }).created.length])).to.deep.equal([[String(open.id), 3]]);

    await backfillOverdueSteps({ context });
    expect(await Vaccination.count({ where: { flockId: open.id } }), 'a second run adds nothing').to.equal(4);
  });
});
