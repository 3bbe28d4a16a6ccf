// The withdrawal rule through the API: a vaccination too close to depletion cannot be confirmed until a veterinarian overrides it with a reason.
import { expect } from 'chai';
import { AuditEntry, Vaccination, WithdrawalOverride } from '../../../database/models/index.js';
import { resetDatabase } from '../../support/test-database.js';
import { createSite, signInAs, testContext } from '../../support/test-app.js';
import { createFlock, createHouse, createProduct, createVaccination, siteDay } from '../../support/flock-fixtures.js';

// Common practice: no vaccination within 21 days before slaughter; the product label's withdrawal period governs.
describe('withdrawal flag and the veterinarian’s override', () => {
  before(() => void testContext());
  beforeEach(resetDatabase);

  async function flagged(withdrawalDays = 21, daysBeforeDepletion = 20) {
    const site = await createSite('NORTH');
    const flock = await createFlock(await createHouse(site), { depletionDays: 40 });
    const product = await createProduct({ withdrawalDays });
    const vaccination = await createVaccination(flock, product, siteDay(site, 40 - daysBeforeDepletion));
    return { site, flock, product, vaccination };
  }

  it('flags a vaccination 20 days before planned depletion and refuses to confirm it, naming the date', async () => {
    const { vaccination } = await flagged();
    const buyer = await signInAs(['purchasing']);
    const view = await buyer.agent.get('/api/vaccinations').expect(200);
    expect(view.body.items[0].withdrawal).to.deep.equal({ flagged: true, withdrawalDays: 21, daysBeforeDepletion: 20, overridden: false, blocksConfirmation: true });
    const response = await buyer.agent.post(`/api/vaccinations/${vaccination.id}/confirm`).set('X-XSRF-TOKEN', buyer.csrf);
    expect(response.status).to.equal(409);
    expect(response.body.error.fields[0].field).to.equal('plannedDate');
    expect(response.body.error.message).to.match(/veterinarian must override/);
    expect((await Vaccination.findByPk(vaccination.id))!.status).to.equal('planned');
  });

  it('confirms a vaccination exactly 21 days before depletion without any override', async () => {
    const { vaccination } = await flagged(21, 21);
    const buyer = await signInAs(['purchasing']);
    const response = await buyer.agent.post(`/api/vaccinations/${vaccination.id}/confirm`).set('X-XSRF-TOKEN', buyer.csrf);
    expect(response.status).to.equal(200);
    expect(response.body).to.include({ status: 'confirmed' });
    expect(response.body.confirmedBy).to.be.a('string');
  });

  it('follows the label: 25 days before depletion is flagged for a product with 28 withdrawal days', async () => {
    const { vaccination } = await flagged(28, 25);
    const buyer = await signInAs(['purchasing']);
    expect((await buyer.agent.post(`/api/vaccinations/${vaccination.id}/confirm`).set('X-XSRF-TOKEN', buyer.csrf)).status).to.equal(409);
  });

  it('lets only a veterinarian override, and only with a reason; the override is recorded (who, when, why) and audited', async () => {
    const { vaccination } = await flagged();
    const buyer = await signInAs(['purchasing']);
    const admin = await signInAs(['admin']);
    for (const who of [buyer, admin]) {
      expect((await who.agent.post(`/api/vaccinations/${vaccination.id}/withdrawal-override`).set('X-XSRF-TOKEN', who.csrf).send({ reason: 'Outbreak nearby, flock must be protected.' })).status).to.equal(403);
    }
    const vet = await signInAs(['veterinarian']);
    const missing = await vet.agent.post(`/api/vaccinations/${vaccination.id}/withdrawal-override`).set('X-XSRF-TOKEN', vet.csrf).send({});
    expect(missing.status).to.equal(400);
    expect(missing.body.error.fields[0].field).to.equal('reason');

    const response = await vet.agent
      .post(`/api/vaccinations/${vaccination.id}/withdrawal-override`)
      .set('X-XSRF-TOKEN', vet.csrf)
      .send({ reason: 'Outbreak two farms away; the label allows it for this product, slaughter plant informed.' });
    expect(response.status, JSON.stringify(response.body)).to.equal(201);
    expect(response.body.withdrawal).to.include({ flagged: true, overridden: true, blocksConfirmation: false });
    expect(response.body.overrides[0]).to.include({ decidedBy: vet.user.name, applies: true, withdrawalDays: 21 });
    const stored = await WithdrawalOverride.findAll();
    expect(stored).to.have.length(1);
    expect(stored[0]).to.deep.include({ decidedBy: vet.user.id, vaccinationDate: vaccination.plannedDate });
    expect(stored[0]!.decidedAt).to.be.instanceOf(Date);
    const audit = await AuditEntry.findOne({ where: { action: 'vaccination.withdrawal_override', entityId: String(vaccination.id) } });
    expect(audit?.actorId).to.equal(vet.user.id);
    expect(JSON.stringify(audit?.after)).to.contain('Outbreak two farms away');

    expect((await buyer.agent.post(`/api/vaccinations/${vaccination.id}/confirm`).set('X-XSRF-TOKEN', buyer.csrf)).status).to.equal(200);
  });

  it('drops the override when the vaccination moves: it goes back to planned and needs a new ruling', async () => {
    const { site, vaccination } = await flagged();
    const vet = await signInAs(['veterinarian']);
    await vet.agent.post(`/api/vaccinations/${vaccination.id}/withdrawal-override`).set('X-XSRF-TOKEN', vet.csrf).send({ reason: 'Outbreak nearby; ruled on the label.' }).expect(201);
    await vet.agent.post(`/api/vaccinations/${vaccination.id}/confirm`).set('X-XSRF-TOKEN', vet.csrf).expect(200);
    const moved = await vet.agent.patch(`/api/vaccinations/${vaccination.id}`).set('X-XSRF-TOKEN', vet.csrf).send({ plannedDate: siteDay(site, 22) });
    expect(moved.status).to.equal(200);
    expect(moved.body).to.include({ status: 'planned', movedByHand: true });
    expect(moved.body.withdrawal).to.include({ flagged: true, overridden: false, blocksConfirmation: true });
    expect(moved.body.overrides[0].applies).to.equal(false);
    expect((await vet.agent.post(`/api/vaccinations/${vaccination.id}/confirm`).set('X-XSRF-TOKEN', vet.csrf)).status).to.equal(409);
  });

  it('has nothing to override outside the window', async () => {
    const { vaccination } = await flagged(21, 30);
    const vet = await signInAs(['veterinarian']);
    const response = await vet.agent.post(`/api/vaccinations/${vaccination.id}/withdrawal-override`).set('X-XSRF-TOKEN', vet.csrf).send({ reason: 'Just in case, to be sure.' });
    expect(response.status).to.equal(409);
    expect(await WithdrawalOverride.count()).to.equal(0);
  });
});
