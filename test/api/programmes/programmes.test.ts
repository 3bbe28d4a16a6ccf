// Programmes through the API: steps saved in order, edits carried to the flocks that follow them, field errors.
import { expect } from 'chai';
import { AuditEntry, Vaccination } from '../../../database/models/index.js';
import { addDays } from '../../../shared/planning/iso-date.js';
import { resetDatabase } from '../../support/test-database.js';
import { createSite, signInAs, testContext } from '../../support/test-app.js';
import { createFlock, createHouse, createProduct } from '../../support/flock-fixtures.js';

describe('programmes', () => {
  before(() => void testContext());
  beforeEach(resetDatabase);

  it('a veterinarian saves a programme; its steps come back in order with ages in days, and the crew reads it', async () => {
    const product = await createProduct({ name: 'Spray vaccine A' });
    const vet = await signInAs(['veterinarian']);
    const response = await vet.agent
      .post('/api/programmes')
      .set('X-XSRF-TOKEN', vet.csrf)
      .send({ name: 'Layer programme', steps: [{ productId: product.id, ageValue: 18, ageUnit: 'weeks', route: 'spray', notes: 'Before transfer' }, { productId: product.id, ageValue: 10, ageUnit: 'days', route: 'drinking_water' }] });
    expect(response.status, JSON.stringify(response.body)).to.equal(201);
    expect(response.body.steps.map((s: { position: number; ageDays: number; productName: string }) => [s.position, s.ageDays, s.productName])).to.deep.equal([
      [1, 126, 'Spray vaccine A'],
      [2, 10, 'Spray vaccine A'],
    ]);
    expect(await AuditEntry.count({ where: { action: 'programme.create' } })).to.equal(1);
    const crew = await signInAs(['crew']);
    expect((await crew.agent.get('/api/programmes').expect(200)).body.items).to.have.length(1);
  });

  it('names the step of an unknown product, and refuses a second programme of the same name', async () => {
    const product = await createProduct();
    const buyer = await signInAs(['purchasing']);
    const bad = await buyer.agent.post('/api/programmes').set('X-XSRF-TOKEN', buyer.csrf).send({ name: 'P', steps: [{ productId: product.id, ageValue: 1, ageUnit: 'days', route: 'spray' }, { productId: 999, ageValue: 2, ageUnit: 'days', route: 'spray' }] });
    expect(bad.status).to.equal(400);
    expect(bad.body.error.fields).to.deep.equal([{ field: 'steps.1.productId', message: 'Unknown product.' }]);
    await buyer.agent.post('/api/programmes').set('X-XSRF-TOKEN', buyer.csrf).send({ name: 'P', steps: [{ productId: product.id, ageValue: 1, ageUnit: 'days', route: 'spray' }] }).expect(201);
    const clash = await buyer.agent.post('/api/programmes').set('X-XSRF-TOKEN', buyer.csrf).send({ name: 'p', steps: [{ productId: product.id, ageValue: 1, ageUnit: 'days', route: 'spray' }] });
    expect(clash.status).to.equal(409);
    expect(clash.body.error.fields[0].field).to.equal('name');
  });

  it('carries an edit to the flocks that follow it: a changed age moves, a dropped step goes, a new step appears, a confirmed one stays', async () => {
    const site = await createSite('NORTH');
    const product = await createProduct();
    const buyer = await signInAs(['purchasing']);
    const saved = await buyer.agent
      .post('/api/programmes')
      .set('X-XSRF-TOKEN', buyer.csrf)
      .send({ name: 'P', steps: [100, 110, 120].map((ageValue) => ({ productId: product.id, ageValue, ageUnit: 'days', route: 'spray' })) });
    const [a, b, c] = saved.body.steps as { id: number }[];
    const flock = await createFlock(await createHouse(site), { hatchDays: -90, placementDays: -90, programmeId: saved.body.id });
    await buyer.agent.put(`/api/flocks/${flock.id}`).set('X-XSRF-TOKEN', buyer.csrf).send({
      name: flock.name, hatchDate: flock.hatchDate, placementDate: flock.placementDate, birdsPlaced: flock.birdsPlaced, plannedDepletionDate: flock.plannedDepletionDate, programmeId: saved.body.id,
    }).expect(200);
    const confirmed = (await Vaccination.findOne({ where: { programmeStepId: c!.id } }))!;
    await buyer.agent.post(`/api/vaccinations/${confirmed.id}/confirm`).set('X-XSRF-TOKEN', buyer.csrf).expect(200);

    const edit = await buyer.agent.put(`/api/programmes/${saved.body.id}`).set('X-XSRF-TOKEN', buyer.csrf).send({
      name: 'P',
      steps: [
        { id: a!.id, productId: product.id, ageValue: 105, ageUnit: 'days', route: 'spray' },
        { id: c!.id, productId: product.id, ageValue: 125, ageUnit: 'days', route: 'spray' },
        { productId: product.id, ageValue: 130, ageUnit: 'days', route: 'spray' },
      ],
    });
    expect(edit.status, JSON.stringify(edit.body)).to.equal(200);
    expect(edit.body.steps.map((s: { id: number }) => s.id).slice(0, 2)).to.deep.equal([a!.id, c!.id]);
    const rows = await Vaccination.findAll({ where: { flockId: flock.id }, order: [['plannedDate', 'ASC']] });
    expect(rows.map((v) => [v.plannedDate, v.status])).to.deep.equal([
      [addDays(flock.hatchDate, 105), 'planned'],
      [addDays(flock.hatchDate, 120), 'confirmed'],
      [addDays(flock.hatchDate, 130), 'planned'],
    ]);
    expect(rows.some((v) => v.programmeStepId === b!.id)).to.equal(false);
  });

  it('refuses a step id from another programme, naming it', async () => {
    const product = await createProduct();
    const buyer = await signInAs(['purchasing']);
    const step = { productId: product.id, ageValue: 1, ageUnit: 'days', route: 'spray' };
    const one = await buyer.agent.post('/api/programmes').set('X-XSRF-TOKEN', buyer.csrf).send({ name: 'One', steps: [step] });
    const two = await buyer.agent.post('/api/programmes').set('X-XSRF-TOKEN', buyer.csrf).send({ name: 'Two', steps: [step] });
    const response = await buyer.agent.put(`/api/programmes/${two.body.id}`).set('X-XSRF-TOKEN', buyer.csrf).send({ name: 'Two', steps: [{ ...step, id: one.body.steps[0].id }] });
    expect(response.status).to.equal(400);
    expect(response.body.error.fields[0].field).to.equal('steps.0.id');
  });
});
