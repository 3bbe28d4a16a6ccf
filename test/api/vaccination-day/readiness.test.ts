// The day sheet in visit order and the readiness checks that gate the start, with the veterinarian's override.
import { expect } from 'chai';
import { AuditEntry, Flock } from '../../../database/models/index.js';
import { resetDatabase } from '../../support/test-database.js';
import { createSite, signInAs, testContext } from '../../support/test-app.js';
import { createFlock, createHouse, createVaccination, siteDay } from '../../support/flock-fixtures.js';
import { passAllChecks, setUpDay } from '../../support/vaccination-day-fixtures.js';

describe('vaccination day: day sheet and readiness', () => {
  before(() => void testContext());
  beforeEach(resetDatabase);

  it('lists the lead’s confirmed vaccinations across sites in visit order, with birds, doses, vials per lot and water', async () => {
    const day = await setUpDay({ code: 'NORTH', hatchDays: -30 });
    const { lead } = day;
    // A second site whose youngest flock is younger (20 days) comes first; within it the 20-day flock before the 60-day one.
    const east = await createSite('EAST');
    await day.lead.user.update({ allSites: true });
    const younger = await setUpDay({ site: east, hatchDays: -20, lead });
    const older = await createVaccination(await createFlock(await createHouse(east, 'House 9'), { hatchDays: -60, placementDays: -59 }), younger.product, siteDay(east, 0), 'confirmed');
    const planned = await createVaccination(await createFlock(await createHouse(east, 'House 7'), { hatchDays: -10, placementDays: -9 }), younger.product, siteDay(east, 0));
    const vet = await signInAs(['veterinarian']);
    await vet.agent.post('/api/vaccination-day/water-volumes').set('X-XSRF-TOKEN', vet.csrf)
      .send({ productId: day.product.id, ageFromDays: 0, ageToDays: 60, mlPer1000Birds: 250, source: 'label' }).expect(201);

    const sheet = await lead.agent.get(`/api/vaccination-day/sheet?day=${siteDay(day.site, 0)}`).expect(200);
    // Hand-computed: EAST (youngest 20 d) before NORTH (30 d); in EAST 20 d before 60 d; the planned (unconfirmed) one is left out.
    expect(sheet.body.entries.map((e: { vaccinationId: number }) => e.vaccinationId)).to.deep.equal([younger.vaccination.id, older.id, day.vaccination.id]);
    expect(sheet.body.entries.some((e: { vaccinationId: number }) => e.vaccinationId === planned.id)).to.equal(false);
    const north = sheet.body.entries[2];
    // Hand-computed: 9,500 birds, no overage → 9,500 doses → 10 vials of 1,000; 250 mL per 1,000 birds → 2,375 mL.
    expect(north).to.include({ visit: 3, birds: 9500, dosesNeeded: 9500, waterMl: 2375, blockers: 3 + 6 });
    expect(north.lotsToTake).to.have.length(1);
    expect(north.lotsToTake[0]).to.include({ lotId: day.lot.id, vials: 10, doses: 10000 });
    expect(north.lotsToTake[0].fridges[0]).to.include({ fridgeId: day.fridge.id, vials: 30 });
    // No volume entered for the EAST product: none is invented.
    expect(sheet.body.entries[0].waterMl).to.equal(null);
  });

  it('blocks the start until every check passes; the 12-hour rule counts only farms outside the sheet', async () => {
    const day = await setUpDay();
    const { lead, vaccination, site } = day;
    const url = `/api/vaccination-day/vaccinations/${vaccination.id}`;
    const refused = await lead.agent.post(`${url}/start`).set('X-XSRF-TOKEN', lead.csrf).send({});
    expect(refused.status).to.equal(409);
    expect(refused.body.error.fields[0].field).to.equal('checks');
    // The run carries its site's zone: its times are shown and typed on the farm's clock.
    expect((await lead.agent.get(url).expect(200)).body.timeZone).to.equal(site.timeZone);

    const firstVisitAt = new Date(Date.now() + 3_600_000).toISOString();
    const fiveHoursBefore = new Date(Date.now() - 4 * 3_600_000).toISOString();
    // Common practice: no other farm in the 12 hours before vaccination day's first visit.
    const other = await lead.agent.post(`${url}/member-checks`).set('X-XSRF-TOKEN', lead.csrf)
      .send({ day: siteDay(site, 0), memberId: lead.user.id, kind: 'twelve_hour', firstVisitAt, answers: { visits: [{ siteId: null, at: fiveHoursBefore, label: 'a neighbour’s broiler farm' }] } });
    expect(other.status).to.equal(201);
    const failed = other.body.checks.find((c: { kind: string }) => c.kind === 'twelve_hour');
    expect(failed.passed).to.equal(false);
    expect(failed.message).to.match(/neighbour/);
    // The same visit to this sheet's own site does not count.
    const own = await lead.agent.post(`${url}/member-checks`).set('X-XSRF-TOKEN', lead.csrf)
      .send({ day: siteDay(site, 0), memberId: lead.user.id, kind: 'twelve_hour', firstVisitAt, answers: { visits: [{ siteId: site.id, at: fiveHoursBefore }] } });
    expect(own.body.checks.at(-1).passed).to.equal(true);
    // 13 hours before is outside the window.
    const early = await lead.agent.post(`${url}/member-checks`).set('X-XSRF-TOKEN', lead.csrf)
      .send({ day: siteDay(site, 0), memberId: lead.user.id, kind: 'twelve_hour', firstVisitAt, answers: { visits: [{ siteId: null, at: new Date(Date.now() - 12 * 3_600_000).toISOString() }] } });
    expect(early.body.checks.at(-1).passed).to.equal(true);

    const missingPpe = await lead.agent.post(`${url}/member-checks`).set('X-XSRF-TOKEN', lead.csrf)
      .send({ day: siteDay(site, 0), memberId: lead.user.id, kind: 'ppe', answers: { hairnet: true, mask: true, gloves: true } });
    expect(missingPpe.body.checks.at(-1)).to.include({ kind: 'ppe', passed: false });
    expect(missingPpe.body.checks.at(-1).message).to.match(/Eye protection/);

    const stranger = await signInAs(['crew'], [site]);
    const notCrew = await lead.agent.post(`${url}/member-checks`).set('X-XSRF-TOKEN', lead.csrf).send({ day: siteDay(site, 0), memberId: stranger.user.id, kind: 'ppe', answers: {} });
    expect(notCrew.status).to.equal(422);
    expect(notCrew.body.error.fields[0].field).to.equal('memberId');

    await passAllChecks(day);
    const started = await lead.agent.post(`${url}/start`).set('X-XSRF-TOKEN', lead.csrf).send({});
    expect(started.status, JSON.stringify(started.body)).to.equal(200);
    expect(started.body.startedAt).to.be.a('string');
    expect(await AuditEntry.count({ where: { action: 'readiness.check' } })).to.equal(4 + 9);
  });

  it('computes the withdrawal check (default 21 days) and the heat check against the site’s limit', async () => {
    const day = await setUpDay();
    const { lead, vaccination, site } = day;
    await site.update({ settings: { sprayHeatLimitF: 86 } });
    const flock = (await vaccination.reload()).flockId;
    // Common practice: never within 21 days before slaughter (the label's withdrawal period; 21 days here).
    await (await Flock.findByPk(flock))!.update({ plannedDepletionDate: siteDay(site, 20) });
    const url = `/api/vaccination-day/vaccinations/${vaccination.id}/checks`;
    const inside = await lead.agent.post(url).set('X-XSRF-TOKEN', lead.csrf).send({ kind: 'withdrawal' });
    expect(inside.body.checks.at(-1)).to.include({ kind: 'withdrawal', passed: false });
    await (await Flock.findByPk(flock))!.update({ plannedDepletionDate: siteDay(site, 21) });
    const outside = await lead.agent.post(url).set('X-XSRF-TOKEN', lead.csrf).send({ kind: 'withdrawal' });
    expect(outside.body.checks.at(-1).passed, 'exactly 21 days before depletion is outside the window').to.equal(true);

    const hot = await lead.agent.post(url).set('X-XSRF-TOKEN', lead.csrf).send({ kind: 'heat', answers: { expectedTemperature: { value: 31, unit: 'C' } } });
    // Hand-computed: 31 °C = 87.8 °F, above the site's 86 °F → advise night.
    expect(hot.body.checks.at(-1)).to.include({ kind: 'heat', passed: false });
    expect(hot.body.checks.at(-1).message).to.match(/night/);
    const night = await lead.agent.post(url).set('X-XSRF-TOKEN', lead.csrf).send({ kind: 'heat', answers: { expectedTemperature: { value: 30, unit: 'C' } } });
    expect(night.body.checks.at(-1).passed, '30 °C = 86 °F is not above the limit').to.equal(true);
    const none = await lead.agent.post(url).set('X-XSRF-TOKEN', lead.csrf).send({ kind: 'heat' });
    expect(none.body.checks.at(-1).passed).to.equal(false);

    const unhealthy = await lead.agent.post(url).set('X-XSRF-TOKEN', lead.csrf).send({ kind: 'flock_health', answers: { healthy: false } });
    expect(unhealthy.body.checks.at(-1).passed).to.equal(false);
    for (const kind of ['water_treatments', 'battery']) {
      const r = await lead.agent.post(url).set('X-XSRF-TOKEN', lead.csrf).send({ kind, answers: {} });
      expect(r.body.checks.at(-1), kind).to.include({ kind, passed: false });
    }
  });

  it('counts enough vaccine from the site’s fridges: short stock fails the check', async () => {
    const day = await setUpDay({ vials: 5 });
    const r = await day.lead.agent.post(`/api/vaccination-day/vaccinations/${day.vaccination.id}/checks`).set('X-XSRF-TOKEN', day.lead.csrf)
      .send({ kind: 'enough_vaccine', answers: { equipmentAssembled: true } });
    // Hand-computed: 9,500 doses needed, 5 vials × 1,000 = 5,000 doses on hand → 4,500 short.
    expect(r.body.checks.at(-1)).to.include({ passed: false });
    expect(r.body.checks.at(-1).message).to.match(/4500 doses short/);
  });

  it('lets a veterinarian, and only a veterinarian, override a failed check with a reason', async () => {
    const day = await setUpDay();
    const { lead, vaccination } = day;
    await passAllChecks(day);
    const url = `/api/vaccination-day/vaccinations/${vaccination.id}`;
    const failed = await lead.agent.post(`${url}/checks`).set('X-XSRF-TOKEN', lead.csrf).send({ kind: 'flock_health', answers: { healthy: false } });
    const checkId = failed.body.checks.at(-1).id;
    expect((await lead.agent.post(`${url}/start`).set('X-XSRF-TOKEN', lead.csrf).send({})).status).to.equal(409);
    expect((await lead.agent.post(`${url}/checks/${checkId}/override`).set('X-XSRF-TOKEN', lead.csrf).send({ reason: 'I say so, trust me.' })).status).to.equal(403);
    const vet = await signInAs(['veterinarian']);
    const short = await vet.agent.post(`${url}/checks/${checkId}/override`).set('X-XSRF-TOKEN', vet.csrf).send({ reason: 'ok' });
    expect(short.status).to.equal(400);
    expect(short.body.error.fields[0].field).to.equal('reason');
    const overridden = await vet.agent.post(`${url}/checks/${checkId}/override`).set('X-XSRF-TOKEN', vet.csrf).send({ reason: 'Mild cough in two birds; examined, fit to vaccinate today.' });
    expect(overridden.status).to.equal(201);
    expect(overridden.body.checks.find((c: { id: number }) => c.id === checkId).override.reason).to.match(/Mild cough/);
    expect(overridden.body.blockers).to.deep.equal([]);
    expect((await vet.agent.post(`${url}/checks/${checkId}/override`).set('X-XSRF-TOKEN', vet.csrf).send({ reason: 'Mild cough in two birds again.' })).status).to.equal(409);
    expect((await lead.agent.post(`${url}/start`).set('X-XSRF-TOKEN', lead.csrf).send({})).status).to.equal(200);
  });

  it('lets a crew lead assign only their own day, and an admin assign any lead', async () => {
    const site = await createSite('NORTH');
    const lead = await signInAs(['crew'], [site]);
    const other = await signInAs(['crew'], [site]);
    const admin = await signInAs(['admin']);
    const body = { siteId: site.id, day: siteDay(site, 1), leadId: other.user.id, memberIds: [] };
    expect((await lead.agent.post('/api/vaccination-day/crews').set('X-XSRF-TOKEN', lead.csrf).send(body)).status).to.equal(403);
    const assigned = await admin.agent.post('/api/vaccination-day/crews').set('X-XSRF-TOKEN', admin.csrf).send({ ...body, memberIds: [lead.user.id] });
    expect(assigned.status).to.equal(200);
    expect(assigned.body).to.include({ leadId: other.user.id });
    expect(assigned.body.members.map((m: { id: number }) => m.id)).to.deep.equal([lead.user.id]);
    expect((await lead.agent.post('/api/vaccination-day/crews').set('X-XSRF-TOKEN', lead.csrf).send({ ...body, leadId: lead.user.id })).status, 'no takeover').to.equal(403);
    const receiving = await signInAs(['receiving'], [site]);
    const wrongRole = await admin.agent.post('/api/vaccination-day/crews').set('X-XSRF-TOKEN', admin.csrf).send({ ...body, memberIds: [receiving.user.id] });
    expect(wrongRole.status).to.equal(422);
    expect(wrongRole.body.error.fields[0].field).to.equal('memberIds.0');
    const read = await lead.agent.get(`/api/vaccination-day/sites/${site.id}/crew?day=${siteDay(site, 1)}`).expect(200);
    expect(read.body.crew).to.include({ leadId: other.user.id });
    // Candidates are the crew, admins and veterinarians who see the site; the receiving clerk is not one.
    const names = read.body.candidates.map((c: { id: number }) => c.id);
    expect(names).to.include.members([lead.user.id, other.user.id, admin.user.id]);
    expect(names).to.not.include(receiving.user.id);
    expect((await lead.agent.get(`/api/vaccination-day/sites/${site.id}/crew`).expect(200)).body.crew, 'no crew today').to.equal(null);
  });
});
