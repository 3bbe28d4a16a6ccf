// Daily checks: stored in °C as entered in either unit, and an out-of-range value opens an excursion record.
import { expect } from 'chai';
import { Excursion } from '../../../database/models/index.js';
import { resetDatabase } from '../../support/test-database.js';
import { createSite, signInAs, testApp, type SignedIn } from '../../support/test-app.js';
import { createFridge } from '../../support/fridge-fixtures.js';

function check(who: SignedIn, body: object) {
  return who.agent.post('/api/daily-checks').set('X-XSRF-TOKEN', who.csrf).send(body);
}

describe('daily checks', () => {
  let storage: SignedIn;
  before(() => testApp());
  beforeEach(async () => {
    await resetDatabase();
    storage = await signInAs(['storage']);
  });

  it('records a check in °F as °C with the initials, and opens nothing while in range', async () => {
    const fridge = await createFridge(await createSite('LKN'));
    const response = await check(storage, { fridgeId: fridge.id, unit: 'F', current: 41, min: 36, max: 45, initials: 'gl' });
    expect(response.status, JSON.stringify(response.body)).to.equal(201);
    expect(response.body).to.include({ initials: 'GL', enteredUnit: 'F', outOfRange: false, excursionId: null, recordedBy: 'Test storage' });
    expect(response.body.currentC).to.be.closeTo(5, 1e-5); // (41 − 32)/1.8, NIST SP 811
    expect(response.body.maxC).to.be.closeTo(7.2222, 1e-4); // 45 °F is on the limit: in range
    expect(await Excursion.count()).to.equal(0);
    const list = await storage.agent.get(`/api/daily-checks/fridges/${fridge.id}`).expect(200);
    expect(list.body.items).to.have.length(1);
  });

  it('opens an excursion record of unknown length when the maximum since reset was above the range', async () => {
    const fridge = await createFridge(await createSite('LKN'));
    const response = await check(storage, { fridgeId: fridge.id, unit: 'F', current: 41, min: 36, max: 48.2, initials: 'GL', note: 'Door found ajar' });
    expect(response.body.outOfRange).to.equal(true);
    const [excursion] = await Excursion.findAll();
    expect(excursion).to.include({ id: response.body.excursionId, source: 'daily_check', kind: 'high', minutes: null, status: 'open', dailyCheckId: response.body.id });
    expect(excursion.peakC).to.be.closeTo(9, 1e-5); // 48.2 °F, NIST SP 811
  });

  it('refuses impossible values naming the field, and a check in the future', async () => {
    const fridge = await createFridge(await createSite('LKN'));
    const inverted = await check(storage, { fridgeId: fridge.id, unit: 'C', current: 5, min: 6, max: 4, initials: 'GL' });
    expect(inverted.status).to.equal(400);
    expect(inverted.body.error.fields.map((f: { field: string }) => f.field)).to.include.members(['max', 'min']);
    const initials = await check(storage, { fridgeId: fridge.id, unit: 'C', current: 5, initials: 'G. L.' });
    expect(initials.body.error.fields).to.deep.equal([{ field: 'initials', message: '1–4 letters.' }]);
    const future = await check(storage, { fridgeId: fridge.id, unit: 'C', current: 5, initials: 'GL', checkedAt: new Date(Date.now() + 86_400_000).toISOString() });
    expect(future.body.error.fields).to.deep.equal([{ field: 'checkedAt', message: 'In the future.' }]);
  });
});
