// A fridge excursion follows the veterinarian's decisions on the holds it caused, and a hold's reason gives its peak
// in the unit of the product's own range. Readings every 10 min, each standing for 10 min; figures hand-computed.
import { expect } from 'chai';
import { Excursion } from '../../../database/models/index.js';
import { exposureReason } from '../../../api/holds/exposure-reason.js';
import { resetDatabase } from '../../support/test-database.js';
import { createSite, signInAs, testApp, testPassword } from '../../support/test-app.js';
import { createFridge, createLogger } from '../../support/fridge-fixtures.js';
import { holdsOf, lotIn, MIN, productWithRange, T0, uploadTemps } from './hold-test-setup.js';

describe('the excursion review status and the hold reason', () => {
  before(() => testApp());
  beforeEach(resetDatabase);

  it('marks the fridge excursion in review after the first decision and decided after the last', async () => {
    const fridge = await createFridge(await createSite('XRS'));
    const logger = await createLogger(fridge);
    // Fridge alarm range 35–45 °F = 1.667–7.222 °C; 9 °C for 30 min is outside it and outside both products' 35–45 °F.
    const first = await lotIn(fridge, await productWithRange(35, 45, 'F'), T0 - 60 * MIN);
    const second = await lotIn(fridge, await productWithRange(35, 45, 'F'), T0 - 60 * MIN);
    await uploadTemps(await signInAs(['storage']), logger.id, T0, [4, 4, 9, 9, 9, 4, 4]);
    const [excursion] = await Excursion.findAll();
    expect(excursion.status).to.equal('open');
    const [firstHold] = await holdsOf(first);
    const [secondHold] = await holdsOf(second);
    expect(firstHold.reason, '9 °C is 48.2 °F: the peak in the range\'s unit').to.match(/above the product's range 35–45 °F for 30 min \(highest 48\.2 °F\)/);

    const vet = await signInAs(['veterinarian']);
    const storage = await signInAs(['storage']);
    const openIds = async () => ((await storage.agent.get('/api/fridges/overview').expect(200)).body.openExcursions as { id: number }[]).map((e) => e.id);
    expect(await openIds()).to.deep.equal([excursion.id]);
    await vet.agent.post(`/api/holds/${firstHold.id}/decisions`).set('X-XSRF-TOKEN', vet.csrf).send({ decision: 'release', password: testPassword }).expect(201);
    await excursion.reload();
    expect(excursion.status, 'one of two holds decided').to.equal('in_review');
    expect(await openIds(), 'still listed while in review').to.deep.equal([excursion.id]);
    await vet.agent.post(`/api/holds/${secondHold.id}/decisions`).set('X-XSRF-TOKEN', vet.csrf).send({ decision: 'release_with_condition', condition: 'Use first', password: testPassword }).expect(201);
    await excursion.reload();
    expect(excursion.status, 'every hold decided').to.equal('decided');
    expect(await openIds(), 'the storage home no longer lists it as undecided').to.deep.equal([]);
  });

  it('keeps a °C range in °C and a freeze in °C', () => {
    const base = { kind: 'high' as const, fridgeName: 'Test fridge', peakC: 9.04, minutes: 20 };
    expect(exposureReason({ ...base, cause: 'excursion', range: { low: 2, high: 8, unit: 'C' } })).to.equal("Test fridge read above the product's range 2–8 °C for 20 min (highest 9.0 °C).");
    expect(exposureReason({ ...base, cause: 'freeze', kind: 'low', peakC: -0.5, range: { low: 35, high: 45, unit: 'F' } })).to.match(/at or below 0 °C \(lowest -0\.5 °C\)/);
  });
});
