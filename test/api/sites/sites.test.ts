// Sites: users read only their own; admins create and change them with validated settings.
import { expect } from 'chai';
import { AuditEntry } from '../../../database/models/index.js';
import { resetDatabase } from '../../support/test-database.js';
import { createSite, signInAs, testContext } from '../../support/test-app.js';

describe('sites', () => {
  before(() => void testContext());
  beforeEach(resetDatabase);

  it('a user limited to one site lists only that site; an all-sites user lists both', async () => {
    const north = await createSite('NORTH');
    await createSite('SOUTH', 'America/Denver');
    const limited = await signInAs(['storage'], [north]);
    const all = await signInAs(['veterinarian']);
    expect((await limited.agent.get('/api/sites')).body.items.map((s: { code: string }) => s.code)).to.deep.equal(['NORTH']);
    expect((await all.agent.get('/api/sites')).body.items).to.have.length(2);
  });

  it('an admin creates a site with default settings and an IANA time zone', async () => {
    const { agent, csrf } = await signInAs(['admin']);
    const response = await agent.post('/api/sites').set('X-XSRF-TOKEN', csrf).send({ code: 'west', name: 'West farm', timeZone: 'America/Chicago' });
    expect(response.status).to.equal(201);
    expect(response.body).to.include({ code: 'WEST', timeZone: 'America/Chicago' });
    expect(response.body.settings).to.deep.equal({
      overagePercent: 0,
      storeWithinMinutes: 30,
      staleDataHours: 24,
      projectionHorizonDays: 180,
      expiryAlertDays: [30, 60, 90],
      reorderMarginDays: 3,
      sprayHeatLimitF: null,
    });
    expect(await AuditEntry.count({ where: { action: 'site.create' } })).to.equal(1);
  });

  it('refuses an unknown time zone and an out-of-range setting, naming each field', async () => {
    const { agent, csrf } = await signInAs(['admin']);
    const response = await agent.post('/api/sites').set('X-XSRF-TOKEN', csrf)
      .send({ code: 'EAST', name: 'East', timeZone: 'Mars/Olympus', settings: { overagePercent: -3 } });
    expect(response.status).to.equal(400);
    const fields = response.body.error.fields.map((f: { field: string }) => f.field);
    expect(fields).to.include.members(['timeZone', 'settings.overagePercent']);
  });
});
