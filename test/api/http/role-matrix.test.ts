// The role matrix, generated from the router: every route declares its access, and each declaration holds.
import { expect } from 'chai';
import request from 'supertest';
import { roles, type Role } from '../../../shared/auth/roles.js';
import { accessMarker } from '../../../api/http/access.js';
import { routeCatalog, type RouteEntry } from '../../../api/http/secure-router.js';
import { resetDatabase } from '../../support/test-database.js';
import { createSite, signInAs, testApp, type SignedIn } from '../../support/test-app.js';
import { siteRecordPath } from '../../support/site-records.js';

interface Layer {
  route?: { path: string; methods: Record<string, boolean>; stack: { handle: object }[] };
  handle: { stack?: Layer[] };
}

/** Walks Express's own route table (not our catalogue) and returns each route's first handler. */
function expressRoutes(stack: Layer[]): { path: string; first: object }[] {
  return stack.flatMap((layer) => {
    if (layer.route) return [{ path: layer.route.path, first: layer.route.stack[0].handle }];
    return layer.handle.stack ? expressRoutes(layer.handle.stack) : [];
  });
}

const publicRoutes = ['get /api/auth/session', 'post /api/auth/sign-in', 'get /api/health'];

function concretePath(route: RouteEntry, siteId = 1): string {
  return route.path.replace(':siteId', String(siteId)).replace(/:[A-Za-z]+/g, '1');
}

function send(agent: SignedIn['agent'] | ReturnType<typeof request>, route: RouteEntry, path: string, csrf?: string) {
  const call = (agent as ReturnType<typeof request.agent>)[route.method](path);
  return csrf ? call.set('X-XSRF-TOKEN', csrf).send({}) : call.send({});
}

describe('role matrix (generated from the router)', () => {
  const app = testApp();
  const catalogue = [...routeCatalog];

  it('every route in Express carries an access declaration', () => {
    const routes = expressRoutes((app as unknown as { router: { stack: Layer[] } }).router.stack);
    expect(routes.length).to.be.greaterThan(5);
    const undeclared = routes.filter((r) => !(accessMarker in r.first)).map((r) => r.path);
    expect(undeclared, 'routes added without createSecureRouter').to.deep.equal([]);
    expect(routes.length).to.equal(catalogue.length);
  });

  it('only the sign-in, session and health routes are public in the API', () => {
    const open = catalogue.filter((r) => 'public' in r.access && r.path.startsWith('/api/')).map((r) => `${r.method} ${r.path}`);
    expect(open.sort()).to.deep.equal([...publicRoutes].sort());
  });

  describe('without a session', () => {
    for (const route of catalogue.filter((r) => !('public' in r.access))) {
      it(`${route.method.toUpperCase()} ${route.path} → 401`, async () => {
        const response = await send(request(app), route, concretePath(route));
        expect(response.status).to.equal(401);
      });
    }
  });

  describe('with a role the route does not allow', () => {
    const agents = new Map<Role, SignedIn>();
    before(async () => {
      await resetDatabase();
      for (const role of roles) agents.set(role, await signInAs([role]));
    });
    for (const route of catalogue) {
      if ('public' in route.access || route.access.roles === 'signed-in') continue;
      const allowed = route.access.roles;
      for (const role of roles.filter((r) => !allowed.includes(r))) {
        it(`${route.method.toUpperCase()} ${route.path} as ${role} → 403`, async () => {
          const agent = agents.get(role)!;
          const response = await send(agent.agent, route, concretePath(route), agent.csrf);
          expect(response.status).to.equal(403);
        });
      }
    }
  });

  describe('for a record on another site', () => {
    const siteScoped = catalogue.filter((r) => !('public' in r.access) && r.access.siteOf);
    it('at least one route is scoped to a site', () => expect(siteScoped.length).to.be.greaterThan(0));
    for (const route of siteScoped) {
      it(`${route.method.toUpperCase()} ${route.path} → 404 for a user of another site`, async () => {
        await resetDatabase();
        const mine = await createSite('MINE');
        const theirs = await createSite('THEIRS');
        const allowed = route.access as { roles: readonly Role[] | 'signed-in' };
        const role: Role = allowed.roles === 'signed-in' ? 'crew' : allowed.roles[0];
        const { agent, csrf } = await signInAs([role], [mine]);
        const response = await send(agent, route, await siteRecordPath(route.path, theirs.id), csrf);
        expect(response.status).to.equal(404);
        if (route.method === 'get') {
          const own = await agent.get(await siteRecordPath(route.path, mine.id));
          expect(own.status, 'the same user reads their own site').to.equal(200);
        }
      });
    }
  });
});
