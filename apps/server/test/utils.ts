import request from 'supertest';
import type TestAgent from 'supertest/lib/agent.js';
import { createApp, type DemandscapeApp } from '../src/app.js';
import { configFromEnv } from '../src/config.js';
import { entityId } from '../src/modules/common/base.entity.js';
import { MembershipSchema, type Role } from '../src/modules/organization/membership.entity.js';

/**
 * A fresh app on an in-memory SQLite database (migrations applied), capturing e-mail.
 * @param env - extra environment variables
 * @returns the app handles
 * @example
 * const ds = await testAppCreate(); afterAll(() => ds.close());
 */
export async function testAppCreate(env: Record<string, string> = {}): Promise<DemandscapeApp> {
  return createApp(
    configFromEnv({
      NODE_ENV: 'test',
      DATABASE_FILE: ':memory:',
      PUBLIC_URL: 'http://localhost:3999',
      RATE_LIMIT_AUTH_PER_MINUTE: '10000',
      WEB_DIST: '/nonexistent-web-dist',
      ...env,
    }),
  );
}

/** A cookie-keeping client with the CSRF header filled in for state-changing requests. */
export interface TestClient {
  agent: InstanceType<typeof TestAgent>;
  token: string;
  /** Fetches a fresh CSRF token (needed after sign-in / sign-out, as the web client does). */
  refresh(): Promise<void>;
  post(path: string, body?: object): request.Test;
  patch(path: string, body?: object): request.Test;
  del(path: string): request.Test;
  get(path: string): request.Test;
}

/**
 * A client that holds cookies and a CSRF token.
 * @param ds - the app
 * @returns the client
 * @example
 * const c = await testClient(ds); await c.post('/api/auth/sign-in', { email, password }).expect(200);
 */
export async function testClient(ds: DemandscapeApp): Promise<TestClient> {
  const agent = request.agent(ds.app);
  const client: TestClient = {
    agent,
    token: '',
    async refresh() {
      const res = await agent.get('/api/auth/csrf').expect(200);
      client.token = res.body.csrfToken;
    },
    post: (path, body) => agent.post(path).set('x-csrf-token', client.token).send(body ?? {}),
    patch: (path, body) => agent.patch(path).set('x-csrf-token', client.token).send(body ?? {}),
    del: (path) => agent.delete(path).set('x-csrf-token', client.token),
    get: (path) => agent.get(path),
  };
  await client.refresh();
  return client;
}

export const TEST_PASSWORD = 'quillport-harbour-27';

/**
 * Signs up a new user and returns a signed-in client (CSRF token refreshed).
 * @param ds - the app
 * @param email - e-mail (use .example domains)
 * @param name - display name
 * @returns the client and the user id
 * @example
 * const { client, userId } = await testUserSignedIn(ds, 'ada@larchloaf.example', 'Ada');
 */
export async function testUserSignedIn(ds: DemandscapeApp, email: string, name = 'Test User'): Promise<{ client: TestClient; userId: string }> {
  const client = await testClient(ds);
  const res = await client.post('/api/auth/sign-up', { email, password: TEST_PASSWORD, name }).expect(201);
  await client.refresh();
  return { client, userId: res.body.user.id };
}

/**
 * The first link in the newest captured e-mail to `to` whose text contains `pathPart`.
 * @param ds - the app (capture transport)
 * @param to - recipient
 * @param pathPart - e.g. '/reset-password'
 * @returns the token query parameter
 * @example
 * const token = mailedToken(ds, 'ada@larchloaf.example', '/verify-email');
 */
export function mailedToken(ds: DemandscapeApp, to: string, pathPart: string): string {
  const mail = [...ds.mailbox].reverse().find((m) => m.to === to && m.text.includes(pathPart));
  if (!mail) throw new Error(`no captured e-mail to ${to} containing ${pathPart}`);
  const match = mail.text.match(/https?:\/\/\S+/);
  if (!match) throw new Error('no link in e-mail');
  const token = new URL(match[0]).searchParams.get('token');
  if (!token) throw new Error('link has no token');
  return token;
}

/**
 * Adds a membership directly in the database (invitations come later).
 * @param ds - the app
 * @param organizationId - the organization
 * @param userId - the user
 * @param role - the role
 * @returns nothing
 * @example
 * await testMembershipAdd(ds, orgId, userId, 'planner');
 */
export async function testMembershipAdd(ds: DemandscapeApp, organizationId: string, userId: string, role: Role): Promise<void> {
  const em = ds.orm.em.fork();
  em.create(MembershipSchema, { id: entityId(), organization: organizationId, user: userId, role } as never);
  await em.flush();
}
