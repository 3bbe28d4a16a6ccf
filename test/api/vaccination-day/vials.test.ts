// Vials out and back on the vaccination day: issue by scan (held, expired, wrong-product lots refused), concurrent issues, returns and their holds.
import { expect } from 'chai';
import { Hold, StockBalance, StockMovement } from '../../../database/models/index.js';
import { resetDatabase } from '../../support/test-database.js';
import { signInAs, testContext } from '../../support/test-app.js';
import { createPresentation, createProduct, siteDay, stockLot } from '../../support/flock-fixtures.js';
import { setUpDay, startDay, testGtin, type DaySetup } from '../../support/vaccination-day-fixtures.js';

const scan = (day: DaySetup, lotNumber = day.lot.lotNumber, gtin = day.gtin) => `(01)${gtin}(10)${lotNumber}`;
const issue = (day: DaySetup, body: object) =>
  day.lead.agent.post(`/api/vaccination-day/vaccinations/${day.vaccination.id}/issues`).set('X-XSRF-TOKEN', day.lead.csrf).send(body);
const giveBack = (day: DaySetup, body: object) =>
  day.lead.agent.post(`/api/vaccination-day/vaccinations/${day.vaccination.id}/returns`).set('X-XSRF-TOKEN', day.lead.csrf).send({ unopened: true, ...body });

describe('vaccination day: vials out and back', () => {
  before(() => void testContext());
  beforeEach(resetDatabase);

  it('issues by scanning the lot’s barcode: an issue movement out of the fridge, for this vaccination', async () => {
    const day = await setUpDay();
    expect((await issue(day, { barcode: scan(day), vials: 10 })).status, 'not started yet').to.equal(409);
    await startDay(day);
    const issued = await issue(day, { barcode: scan(day), vials: 10 });
    expect(issued.status, JSON.stringify(issued.body)).to.equal(201);
    expect(issued.body.lotsOut).to.have.length(1);
    expect(issued.body.lotsOut[0]).to.include({ lotId: day.lot.id, issued: 10, returned: 0, out: 10, fromFridgeId: day.fridge.id });
    const movement = (await StockMovement.findOne({ where: { kind: 'issue' } }))!;
    // The contract with the lots page: source is the vaccination, leftAt = at = when the vials left.
    expect(movement).to.include({ sourceKind: 'vaccination', sourceId: day.vaccination.id, fromFridgeId: day.fridge.id, toFridgeId: null, vials: 10 });
    expect(movement.leftAt!.getTime()).to.equal(movement.at.getTime());
    expect((await StockBalance.findOne({ where: { lotId: day.lot.id } }))!.vials).to.equal(20);
    // Typing the lot number works too, whatever the letter case.
    expect((await issue(day, { lotNumber: day.lot.lotNumber.toLowerCase(), vials: 1 })).status).to.equal(201);
  });

  it('takes a vaccination whose vials are out off the purchasing projection, so the vials out are not planned twice', async () => {
    const day = await setUpDay();
    const buyer = await signInAs(['purchasing'], [day.site]);
    const planned = async () => (await buyer.agent.get(`/api/demand/sites/${day.site.id}/projection`).expect(200)).body.vaccinations.map((v: { id: number }) => v.id);
    expect(await planned()).to.deep.equal([day.vaccination.id]);
    await startDay(day);
    expect((await issue(day, { barcode: scan(day), vials: 10 })).status).to.equal(201);
    expect(await planned()).to.deep.equal([]);
  });

  it('refuses held, expired, wrong-product and unreadable lots with the reason and the field', async () => {
    const day = await setUpDay();
    await startDay(day);
    const held = await stockLot(day.fridge, day.presentation, 5, siteDay(day.site, 100));
    await Hold.create({ lotId: held.id, cause: 'excursion', sourceKind: 'test', sourceId: 1, reason: 'fridge warm', openedBy: null });
    const onHold = await issue(day, { barcode: scan(day, held.lotNumber), vials: 1 });
    expect(onHold.status).to.equal(409);
    expect(onHold.body.error.message).to.match(/on hold/);
    expect(onHold.body.error.fields[0]).to.include({ field: 'barcode', message: 'On hold.' });

    const old = await stockLot(day.fridge, day.presentation, 5, siteDay(day.site, -1));
    const expired = await issue(day, { barcode: scan(day, old.lotNumber), vials: 1 });
    expect(expired.status).to.equal(409);
    expect(expired.body.error.fields[0]).to.include({ field: 'barcode', message: 'Expired.' });

    const otherPresentation = await createPresentation(await createProduct(), 1000);
    const otherGtin = testGtin();
    await otherPresentation.update({ packGtin: otherGtin });
    const other = await stockLot(day.fridge, otherPresentation, 5, siteDay(day.site, 100));
    const wrong = await issue(day, { barcode: scan(day, other.lotNumber, otherGtin), vials: 1 });
    expect(wrong.status).to.equal(422);
    expect(wrong.body.error.fields[0]).to.include({ field: 'barcode', message: 'Wrong product.' });

    const garbled = await issue(day, { barcode: '(01)12345', vials: 1 });
    expect(garbled.status).to.equal(422);
    expect(garbled.body.error.fields[0].field).to.equal('barcode');
    const nothing = await issue(day, { vials: 1 });
    expect(nothing.status).to.equal(400);
    expect(nothing.body.error.fields[0].field).to.equal('barcode');
    const tooMany = await issue(day, { barcode: scan(day), vials: 31 });
    expect(tooMany.status).to.equal(409);
    expect(tooMany.body.error.fields[0].field).to.equal('vials');
    expect(await StockMovement.count({ where: { kind: 'issue' } })).to.equal(0);
  });

  it('50 concurrent issues of 1 vial against a lot of 7: exactly 7 succeed and the balance never goes below zero', async () => {
    const day = await setUpDay({ vials: 7, birds: 5_000 });
    await startDay(day);
    const responses = await Promise.all(Array.from({ length: 50 }, () => issue(day, { barcode: scan(day), vials: 1 })));
    const statuses = responses.map((r) => r.status);
    expect(statuses.filter((s) => s === 201)).to.have.length(7);
    expect(statuses.filter((s) => s === 409), JSON.stringify([...new Set(statuses)])).to.have.length(43);
    expect((await StockBalance.findOne({ where: { lotId: day.lot.id } }))!.vials).to.equal(0);
    expect(await StockMovement.sum('vials', { where: { kind: 'issue', lotId: day.lot.id } })).to.equal(7);
  });

  it('returns unopened vials within the limit straight to stock, and over the limit with a return hold', async () => {
    const day = await setUpDay({ timeOutLimitMinutes: 120 });
    await startDay(day);
    await issue(day, { barcode: scan(day), vials: 10 });
    const opened = await giveBack(day, { lotId: day.lot.id, vials: 1, unopened: false });
    expect(opened.status, 'opened vials never return').to.equal(400);
    expect(opened.body.error.fields[0].field).to.equal('unopened');
    const tooMany = await giveBack(day, { lotId: day.lot.id, vials: 11 });
    expect(tooMany.status).to.equal(422);
    expect(tooMany.body.error.fields[0].field).to.equal('vials');
    const back = await giveBack(day, { lotId: day.lot.id, vials: 2 });
    expect(back.status, JSON.stringify(back.body)).to.equal(201);
    expect(back.body.lotsOut[0]).to.include({ issued: 10, returned: 2, out: 8 });
    const movement = (await StockMovement.findOne({ where: { kind: 'return' } }))!;
    const issued = (await StockMovement.findOne({ where: { kind: 'issue' } }))!;
    // leftAt of the return is when the vials left at issue; at is when they were back.
    expect(movement).to.include({ sourceKind: 'vaccination', sourceId: day.vaccination.id, toFridgeId: day.fridge.id });
    expect(movement.leftAt!.getTime()).to.equal(issued.leftAt!.getTime());
    expect(await Hold.count({ where: { lotId: day.lot.id } }), 'within 120 minutes: no hold').to.equal(0);

    // Hand-computed: with a 0-minute limit any time out is over it.
    await day.product.update({ timeOutLimitMinutes: 0 });
    await giveBack(day, { lotId: day.lot.id, vials: 1 });
    const hold = (await Hold.findOne({ where: { lotId: day.lot.id } }))!;
    expect(hold).to.include({ cause: 'return', sourceKind: 'vaccination', sourceId: day.vaccination.id });
    expect(hold.reason).to.match(/allows 0/);
  });

  it('sends every return to the veterinarian when the product has no time-out limit', async () => {
    const day = await setUpDay({ timeOutLimitMinutes: null });
    await startDay(day);
    await issue(day, { barcode: scan(day), vials: 3 });
    expect((await giveBack(day, { lotId: day.lot.id, vials: 3 })).status).to.equal(201);
    const hold = (await Hold.findOne({ where: { lotId: day.lot.id } }))!;
    expect(hold.cause).to.equal('return');
    expect(hold.reason).to.match(/No time-out limit/);
    // The lot is now held: a second issue is refused.
    expect((await issue(day, { barcode: scan(day), vials: 1 })).status).to.equal(409);
  });
});
