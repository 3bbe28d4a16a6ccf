// One app and context per test run (Sequelize models bind to a single instance), plus sign-in helpers for supertest.
import type { Express } from 'express';
import request from 'supertest';
import type { Role } from '../../shared/auth/roles.js';
import { createApp } from '../../api/app.js';
import type { AppContext } from '../../api/app-context.js';
import { readConfig, type Config } from '../../api/config.js';
import { closeContext, createContext } from '../../api/create-context.js';
import { Site, User, UserSite } from '../../database/models/index.js';

let context: AppContext | undefined;
let app: Express | undefined;

export function testConfig(overrides: Partial<Record<keyof Config, string>> = {}): Config {
  return readConfig({ ...process.env, LOG_LEVEL: 'silent', BCRYPT_COST: process.env.BCRYPT_COST ?? '4', ...overrides });
}

export function testContext(): AppContext {
  context ??= createContext(testConfig());
  return context;
}

export function testApp(): Express {
  app ??= createApp(testContext());
  return app;
}

export async function closeTestContext(): Promise<void> {
  if (context) await closeContext(context);
  context = undefined;
  app = undefined;
}

export const testPassword = 'correct horse battery staple';

export async function createSite(code: string, timeZone = 'America/Chicago'): Promise<Site> {
  return Site.create({ code, name: `Site ${code}`, timeZone });
}

export async function createTestUser(options: { email?: string; roles: Role[]; sites?: Site[]; password?: string; active?: boolean }): Promise<User> {
  const email = options.email ?? `${options.roles.join('-')}-${Math.random().toString(36).slice(2, 8)}@test.example`;
  const user = await User.create({
    email,
    name: `Test ${options.roles.join(' ')}`,
    roles: options.roles,
    allSites: !options.sites,
    active: options.active ?? true,
    passwordHash: await testContext().hasher.hash(options.password ?? testPassword),
  });
  for (const site of options.sites ?? []) await UserSite.create({ userId: user.id, siteId: site.id });
  return user;
}

export interface SignedIn {
  agent: ReturnType<typeof request.agent>;
  /** The XSRF token to send as X-XSRF-TOKEN on state-changing requests. */
  csrf: string;
}

export function cookieValue(setCookie: string[] | string | undefined, name: string): string | undefined {
  const list = Array.isArray(setCookie) ? setCookie : setCookie ? [setCookie] : [];
  const entry = list.find((cookie) => cookie.startsWith(`${name}=`));
  return entry ? decodeURIComponent(entry.slice(name.length + 1).split(';')[0]) : undefined;
}

/** An agent with a fresh anonymous session and its XSRF token. */
export async function anonymousAgent(): Promise<SignedIn> {
  const agent = request.agent(testApp());
  const response = await agent.get('/api/auth/session').expect(200);
  const csrf = cookieValue(response.headers['set-cookie'], 'XSRF-TOKEN');
  if (!csrf) throw new Error('the session route did not set XSRF-TOKEN');
  return { agent, csrf };
}

export async function signIn(email: string, password = testPassword): Promise<SignedIn> {
  const { agent, csrf } = await anonymousAgent();
  const response = await agent.post('/api/auth/sign-in').set('X-XSRF-TOKEN', csrf).send({ email, password });
  if (response.status !== 200) throw new Error(`sign-in failed for ${email}: ${response.status} ${JSON.stringify(response.body)}`);
  return { agent, csrf: cookieValue(response.headers['set-cookie'], 'XSRF-TOKEN')! };
}

export async function signInAs(roles: Role[], sites?: Site[]): Promise<SignedIn & { user: User }> {
  const user = await createTestUser({ roles, sites });
  return { ...(await signIn(user.email)), user };
}
