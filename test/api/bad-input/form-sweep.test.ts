// Every state-changing route in Express's route table gets hostile bodies: wrong types, negative and fractional counts,
// impossible and far-off dates, 100 kB text, text with a NUL. Each answer is a 4xx that names fields (or says clearly what
// is wrong), never a 5xx, and nothing is stored.
import { expect } from 'chai';
import { roles } from '../../../shared/auth/roles.js';
import { routeCatalog } from '../../../api/http/secure-router.js';
import { schemaFieldNames } from '../../support/schema-field-names.js';
import { siteRecordPath } from '../../support/site-records.js';
import { createSite, createTestUser, signIn, testApp, type SignedIn } from '../../support/test-app.js';
import { ownerConnection, resetDatabase } from '../../support/test-database.js';

interface Layer {
  route?: { path: string; methods: Record<string, boolean> };
  handle: { stack?: Layer[] };
}

/** Method and path of every route in Express's own table. */
function expressRoutes(stack: Layer[]): { method: string; path: string }[] {
  return stack.flatMap((layer) => {
    if (layer.route) return Object.keys(layer.route.methods).map((method) => ({ method, path: layer.route!.path }));
    return layer.handle.stack ? expressRoutes(layer.handle.stack) : [];
  });
}

/**
 * Routes that take no input at all (an action on the record the path names): any body is ignored, so they may answer
 * 2xx to one. A new route that takes input belongs nowhere here.
 */
const inputlessRoutes = new Set([
  'post /api/auth/sign-out',
  'post /api/notifications/read-all',
  'post /api/notifications/:notificationId/read',
  'post /api/shipments/:shipmentId/report/mail',
  'post /api/purchase-orders/:purchaseOrderId/cancel',
  'post /api/vaccinations/:vaccinationId/confirm',
  'post /api/demand/transfers/:transferId/cancel',
  'post /api/demand/transfers/:transferId/done',
  'post /api/demand/purchase-orders/:purchaseOrderId/send',
]);

/** Routes whose only input is free text (a reason): a short string is valid there, so only long or NUL text must fail. */
const freeTextRoutes = new Set(['post /api/vaccinations/:vaccinationId/cancel']);

/** Tables that change on any request (sessions, throttle counters, upload progress), left out of "nothing stored". */
const volatileTables = new Set(['session', 'sessions', 'sign_in_limits', 'log_import_progress', 'schema_migrations']);

async function rowCounts(): Promise<Record<string, number>> {
  const [tables] = await ownerConnection().query(`SELECT tablename FROM pg_tables WHERE schemaname = 'public' ORDER BY tablename`);
  const names = (tables as { tablename: string }[]).map((t) => t.tablename).filter((name) => !volatileTables.has(name));
  const [rows] = await ownerConnection().query(names.map((name) => `SELECT '${name}' AS t, count(*)::int AS n FROM "${name}"`).join(' UNION ALL '));
  return Object.fromEntries((rows as { t: string; n: number }[]).map((row) => [row.t, row.n]));
}

const unsafe = new Set(['post', 'put', 'patch', 'delete']);
const fill = (fields: string[], value: unknown) => Object.fromEntries(fields.map((field) => [field, value]));
const chunks = <T>(list: T[], size: number) => Array.from({ length: Math.ceil(list.length / size) }, (_, i) => list.slice(i * size, i * size + size));

describe('form-wide bad-input sweep over every state-changing route', function () {
  this.timeout(120_000);
  const app = testApp();
  // Express's table holds paths relative to each router; the secure routers' catalogue has the full ones.
  const inExpress = expressRoutes((app as unknown as { router: { stack: Layer[] } }).router.stack).filter((r) => unsafe.has(r.method));
  const routes = routeCatalog.filter((r) => unsafe.has(r.method));
  let names: string[];
  let who: SignedIn;
  let siteId: number;

  before(async () => {
    await resetDatabase();
    names = await schemaFieldNames();
    siteId = (await createSite('SWEEP')).id;
    // Every role on every site: access never stands between a body and its validation.
    who = await signIn((await createTestUser({ roles: [...roles] })).email);
  });

  it('finds the state-changing routes and the field names of the shared schemas', () => {
    expect(routes.length).to.be.greaterThan(30);
    expect(inExpress.length, 'the catalogue and Express agree').to.equal(routes.length);
    expect(names).to.include.members(['lotNumber', 'vials', 'expiry', 'name', 'capacity']);
  });

  for (const route of routes) {
    const key = `${route.method} ${route.path}`;
    if (key === 'post /api/auth/sign-out') continue; // would end the sweep's own session
    it(`${route.method.toUpperCase()} ${route.path}`, async () => {
      const path = await siteRecordPath(route.path, siteId);
      const send = (body: unknown) => who.agent[route.method as 'post'](path).set('X-XSRF-TOKEN', who.csrf).send(body as object);
      const inputless = inputlessRoutes.has(key);
      const freeText = freeTextRoutes.has(key);
      let textValue: unknown;
      let before = await rowCounts();
      const check = async (what: string, body: unknown) => {
        textValue = body && typeof body === 'object' && !Array.isArray(body) ? Object.values(body)[0] : undefined;
        const response = await send(body);
        const shown = `${what}: ${response.status} ${JSON.stringify(response.body).slice(0, 400)}`;
        expect(response.status, `never a 5xx — ${shown}`).to.be.below(500);
        const shortText = typeof textValue === 'string' && textValue.length <= 100 && !textValue.includes('\u0000');
        if (response.status < 300 && (inputless || (freeText && shortText))) {
          before = await rowCounts(); // the action was done: what it stored is the new baseline
          return response;
        }
        expect(response.status, `refused — ${shown}`).to.be.within(400, 499);
        expect(response.body.error?.message, `a message — ${shown}`).to.be.a('string').and.not.equal('');
        if (response.status === 400 && response.body.error.code !== 'csrf') {
          const fields = response.body.error.fields as { field: string; message: string }[] | undefined;
          expect(fields, `400 names fields — ${shown}`).to.be.an('array').that.is.not.empty;
          for (const field of fields!) expect(field.field, shown).to.be.a('string').and.not.equal('');
        }
        expect(await rowCounts(), `nothing stored — ${shown}`).to.deep.equal(before);
        return response;
      };

      await check('an array instead of an object', [1, 2]);
      const wrongTypes = await check('every known field an object', fill(names, { x: [1] }));
      if (inputless) return;
      // The route's own fields, as its answer named them; then hostile values in each of them.
      const fields = [...new Set(((wrongTypes.body.error?.fields ?? []) as { field: string }[]).map((f) => f.field.split('.')[0]))].filter((f) => names.includes(f));
      if (!fields.length) return;
      await check('negative numbers', fill(fields, -1));
      await check('fractions', fill(fields, 1.5));
      await check('numbers far too big', fill(fields, 1e15));
      await check('an impossible date', fill(fields, '2026-02-30'));
      await check('dates far out of range', fill(fields, '9999-12-31'));
      await check('dates long past', fill(fields, '1800-01-01T00:00:00Z'));
      await check('text with a NUL', fill(fields, 'a\u0000b'));
      for (const batch of chunks(fields, 9)) await check(`100 kB of text in ${batch.join(', ')}`, fill(batch, 'x'.repeat(100_000)));
    });
  }
});

describe('targeted bad input: each field named', () => {
  let who: SignedIn;
  let siteId: number;
  const fieldsOf = (response: { body: { error?: { fields?: { field: string }[] } } }) => (response.body.error?.fields ?? []).map((f) => f.field);

  before(async () => {
    testApp();
    await resetDatabase();
    siteId = (await createSite('AIM')).id;
    who = await signIn((await createTestUser({ roles: [...roles] })).email);
  });

  const post = (path: string, body: object) => who.agent.post(path).set('X-XSRF-TOKEN', who.csrf).send(body);

  it('a NUL in an otherwise valid name is a 400 naming the name, not a database error', async () => {
    const before = await rowCounts();
    const response = await post('/api/sites', { code: 'NULSITE', name: 'North\u0000farm', timeZone: 'UTC' });
    expect(response.status).to.equal(400);
    expect(fieldsOf(response)).to.deep.equal(['name']);
    expect(await rowCounts()).to.deep.equal(before);
  });

  it('a NUL in the sign-in e-mail is a 400, not a database error', async () => {
    const response = await who.agent.post('/api/auth/sign-in').set('X-XSRF-TOKEN', who.csrf).send({ email: 'a\u0000@b.example', password: 'x'.repeat(20) });
    expect(response.status).to.equal(400);
    expect(fieldsOf(response)).to.deep.equal(['email']);
  });

  it('a NUL inside JSON sent in a multipart field (the shipment) is a 400 naming the field', async () => {
    const response = await who.agent.post(`/api/shipments/sites/${siteId}`).set('X-XSRF-TOKEN', who.csrf).field('shipment', JSON.stringify({ notes: 'warm\u0000box' }));
    expect(response.status).to.equal(400);
    expect(fieldsOf(response)).to.deep.equal(['notes']);
  });

  it('a negative capacity and a 100 kB house name are named', async () => {
    const before = await rowCounts();
    const response = await post(`/api/houses/sites/${siteId}`, { name: 'x'.repeat(100_000), capacity: -5 });
    expect(response.status).to.equal(400);
    expect(fieldsOf(response)).to.include.members(['name', 'capacity']);
    expect(await rowCounts()).to.deep.equal(before);
  });

  it('a product with a 100 kB name, negative withdrawal days and a text where minutes go is refused field by field', async () => {
    const before = await rowCounts();
    const response = await post('/api/catalogue/products', {
      name: 'x'.repeat(100_000), kind: 'live', route: 'spray', storageLow: 35, storageHigh: 45, storageUnit: 'F',
      withdrawalDays: -1, useWithinMinutes: 'two hours',
    });
    expect(response.status).to.equal(400);
    expect(fieldsOf(response)).to.include.members(['name', 'withdrawalDays', 'useWithinMinutes']);
    expect(await rowCounts()).to.deep.equal(before);
  });

  it('a body over the 1 MB limit is a 413 with a message, and a body that is not JSON a 400', async () => {
    const big = await post('/api/sites', { code: 'BIG', name: 'x'.repeat(1_100_000), timeZone: 'UTC' });
    expect(big.status).to.equal(413);
    expect(big.body.error.message).to.be.a('string').and.not.equal('');
    const broken = await who.agent.post('/api/sites').set('X-XSRF-TOKEN', who.csrf).set('Content-Type', 'application/json').send('{"code": "OOPS",');
    expect(broken.status).to.equal(400);
    expect(broken.body.error.message).to.be.a('string').and.not.equal('');
  });
});
