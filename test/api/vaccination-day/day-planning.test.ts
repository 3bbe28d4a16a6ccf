// A planner's side of the vaccination day: choosing whose day sheet to read, the water volumes list, the site's heat limit.
import { expect } from 'chai';
import { Site } from '../../../database/models/index.js';
import { resetDatabase } from '../../support/test-database.js';
import { signInAs, testContext } from '../../support/test-app.js';
import { createPurchaseOrder } from '../../support/receiving-fixtures.js';
import { createProduct, createSupplier, siteDay } from '../../support/flock-fixtures.js';
import { passAllChecks, setUpDay } from '../../support/vaccination-day-fixtures.js';

describe('vaccination day: planners', () => {
  before(() => void testContext());
  beforeEach(resetDatabase);

  it('lists the day’s crew leads on the sites the planner sees, and shows a chosen lead’s day sheet', async () => {
    const north = await setUpDay({ code: 'NORTH' });
    const south = await setUpDay({ code: 'SOUTH' });
    const today = siteDay(north.site, 0);
    const vet = await signInAs(['veterinarian']);
    const leads = await vet.agent.get(`/api/vaccination-day/leads?day=${today}`).expect(200);
    expect(leads.body.items.map((l: { id: number }) => l.id).sort()).to.deep.equal([north.lead.user.id, south.lead.user.id].sort());
    expect(leads.body.items.find((l: { id: number }) => l.id === north.lead.user.id).siteNames).to.deep.equal(['Site NORTH']);

    // A veterinarian of NORTH only does not see SOUTH's lead.
    const northVet = await signInAs(['veterinarian'], [north.site]);
    const seen = await northVet.agent.get(`/api/vaccination-day/leads?day=${today}`).expect(200);
    expect(seen.body.items.map((l: { id: number }) => l.id)).to.deep.equal([north.lead.user.id]);

    const sheet = await vet.agent.get(`/api/vaccination-day/sheet?day=${today}&leadId=${south.lead.user.id}`).expect(200);
    expect(sheet.body).to.include({ leadId: south.lead.user.id, leadName: south.lead.user.name });
    expect(sheet.body.entries.map((e: { vaccinationId: number }) => e.vaccinationId)).to.deep.equal([south.vaccination.id]);
    // The vet's own sheet (no lead given) is empty: they lead no crew today.
    expect((await vet.agent.get(`/api/vaccination-day/sheet?day=${today}`).expect(200)).body.entries).to.deep.equal([]);
  });

  it('lets a crew lead read only their own day sheet and refuses them the list of leads', async () => {
    const north = await setUpDay({ code: 'NORTH' });
    const other = await setUpDay({ code: 'SOUTH' });
    const today = siteDay(north.site, 0);
    await north.lead.agent.get(`/api/vaccination-day/sheet?day=${today}&leadId=${north.lead.user.id}`).expect(200);
    const refused = await north.lead.agent.get(`/api/vaccination-day/sheet?day=${today}&leadId=${other.lead.user.id}`).expect(403);
    expect(refused.body.error.message).to.match(/own day sheet/);
    await north.lead.agent.get(`/api/vaccination-day/leads?day=${today}`).expect(403);
    const admin = await signInAs(['admin']);
    const noDay = await admin.agent.get('/api/vaccination-day/leads').expect(400);
    expect(noDay.body.error.fields.map((f: { field: string }) => f.field)).to.include('day');
  });

  it('lists water volumes with who entered them and from what, newest first per age, filtered by product', async () => {
    const a = await createProduct({ name: 'Spray A' });
    const b = await createProduct({ name: 'Spray B' });
    const vet = await signInAs(['veterinarian']);
    const add = (body: object) => vet.agent.post('/api/vaccination-day/water-volumes').set('X-XSRF-TOKEN', vet.csrf).send(body);
    await add({ productId: a.id, ageFromDays: 0, ageToDays: 42, mlPer1000Birds: 250, source: 'label', note: 'label, panel 2' }).expect(201);
    await add({ productId: a.id, ageFromDays: 0, ageToDays: 42, mlPer1000Birds: 300, source: 'veterinarian' }).expect(201);
    await add({ productId: b.id, ageFromDays: 43, ageToDays: 500, mlPer1000Birds: 600, source: 'label' }).expect(201);

    const crew = await signInAs(['crew']);
    const all = await crew.agent.get('/api/vaccination-day/water-volumes').expect(200);
    expect(all.body.items.map((w: { productName: string; mlPer1000Birds: number }) => `${w.productName} ${w.mlPer1000Birds}`)).to.deep.equal(['Spray A 300', 'Spray A 250', 'Spray B 600']);
    expect(all.body.items[1]).to.include({ source: 'label', note: 'label, panel 2', enteredBy: vet.user.name, ageFromDays: 0, ageToDays: 42 });
    const onlyB = await crew.agent.get(`/api/vaccination-day/water-volumes?productId=${b.id}`).expect(200);
    expect(onlyB.body.items).to.have.length(1);

    // Crew read but do not enter volumes; a bad entry names its field and writes nothing.
    await crew.agent.post('/api/vaccination-day/water-volumes').set('X-XSRF-TOKEN', crew.csrf).send({ productId: a.id, ageFromDays: 0, ageToDays: 1, mlPer1000Birds: 1, source: 'label' }).expect(403);
    const bad = await add({ productId: a.id, ageFromDays: 30, ageToDays: 10, mlPer1000Birds: 0, source: 'guess' });
    expect(bad.status).to.equal(400);
    expect(bad.body.error.fields.map((f: { field: string }) => f.field)).to.include.members(['mlPer1000Birds', 'source']);
    expect((await crew.agent.get('/api/vaccination-day/water-volumes').expect(200)).body.items).to.have.length(3);
  });

  it('keeps the site’s spray heat limit set by an admin, refuses one out of range and lets the heat check use it', async () => {
    const day = await setUpDay({ code: 'NORTH' });
    const admin = await signInAs(['admin']);
    const put = (settings: object) => admin.agent.put(`/api/sites/${day.site.id}`).set('X-XSRF-TOKEN', admin.csrf).send({ code: 'NORTH', name: 'Site NORTH', timeZone: 'America/Chicago', settings });
    const saved = await put({ sprayHeatLimitF: 86 }).expect(200);
    expect(saved.body.settings).to.include({ sprayHeatLimitF: 86, overagePercent: 0 });
    const tooHot = await put({ sprayHeatLimitF: 200 }).expect(400);
    expect(tooHot.body.error.fields.map((f: { field: string }) => f.field)).to.include('settings.sprayHeatLimitF');
    expect(((await Site.findByPk(day.site.id))!.settings as { sprayHeatLimitF: number }).sprayHeatLimitF).to.equal(86);

    await passAllChecks(day);
    // Hand-computed: 31 °C = 87.8 °F, above the site's 86 °F limit, so the check fails and advises the night.
    const heat = await day.lead.agent.post(`/api/vaccination-day/vaccinations/${day.vaccination.id}/checks`).set('X-XSRF-TOKEN', day.lead.csrf)
      .send({ kind: 'heat', answers: { expectedTemperature: { value: 31, unit: 'C' } } }).expect(201);
    const latest = heat.body.checks.filter((c: { kind: string }) => c.kind === 'heat').at(-1);
    expect(latest.passed).to.equal(false);

    const cleared = await put({ sprayHeatLimitF: null }).expect(200);
    expect(cleared.body.settings.sprayHeatLimitF).to.equal(null);
    const crewPut = await day.lead.agent.put(`/api/sites/${day.site.id}`).set('X-XSRF-TOKEN', day.lead.csrf).send({ code: 'NORTH', name: 'Site NORTH', timeZone: 'America/Chicago', settings: { sprayHeatLimitF: 90 } });
    expect(crewPut.status).to.equal(403);
  });

  it('says which doses the plan takes from an order not yet received, besides the vials to take', async () => {
    const day = await setUpDay({ code: 'NORTH', vials: 4, birds: 9_500 });
    const order = await createPurchaseOrder(day.site, { supplier: await createSupplier(), product: day.product, presentation: day.presentation }, { expectedDate: siteDay(day.site, 0), packs: 1 });
    const sheet = await day.lead.agent.get(`/api/vaccination-day/sheet?day=${siteDay(day.site, 0)}`).expect(200);
    const [entry] = sheet.body.entries;
    // Hand-computed: 9,500 doses; the fridge's 4 vials of 1,000 give 4,000; the other 5,500 come as 6 vials of the order.
    expect(entry.lotsToTake.map((l: { vials: number }) => l.vials)).to.deep.equal([4]);
    expect(entry.awaited).to.deep.equal([{ source: 'order', label: order.reference, doses: 6000 }]);
  });
});
