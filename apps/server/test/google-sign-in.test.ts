import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import type { DemandscapeApp } from '../src/app.js';
import { oauthFakeStart, type OAuthFake } from '../src/dev/oauth-fake.js';
import { TEST_PASSWORD, testAppCreate, testClient } from './utils.js';

/** Follows the browser flow by hand: app → fake /authorize (real HTTP) → app callback. */
async function googleSignIn(client: Awaited<ReturnType<typeof testClient>>): Promise<string> {
  const start = await client.agent.get('/api/auth/google').expect(302);
  const authorize = new URL(start.headers.location);
  expect(authorize.searchParams.get('redirect_uri')).toBe('http://localhost:3999/api/auth/google/callback');
  expect(authorize.searchParams.get('state')).toBeTruthy();
  const fakeResponse = await fetch(authorize, { redirect: 'manual' });
  expect(fakeResponse.status).toBe(302);
  const back = new URL(fakeResponse.headers.get('location')!);
  const callback = await client.agent.get(back.pathname + back.search).expect(302);
  return callback.headers.location;
}

describe('Google sign-in through the local fake', () => {
  let fake: OAuthFake;
  let ds: DemandscapeApp;
  beforeAll(async () => {
    fake = await oauthFakeStart(0);
    ds = await testAppCreate({
      GOOGLE_AUTH_URL: `${fake.url}/authorize`,
      GOOGLE_TOKEN_URL: `${fake.url}/token`,
      GOOGLE_USERINFO_URL: `${fake.url}/userinfo`,
    });
  });
  afterAll(async () => {
    await ds.close();
    await fake.stop();
  });

  it('creates a verified user on first sign-in and signs them in', async () => {
    fake.identitySet({ sub: 'g-1001', email: 'Juniper@Larchloaf.example', emailVerified: true, name: 'Juniper Saltmarsh' });
    const client = await testClient(ds);
    expect(await googleSignIn(client)).toBe('/');
    const me = await client.get('/api/me').expect(200);
    expect(me.body.user).toMatchObject({ email: 'juniper@larchloaf.example', name: 'Juniper Saltmarsh', emailVerified: true });
  });

  it('links an existing password account by verified e-mail', async () => {
    const owner = await testClient(ds);
    const created = await owner.post('/api/auth/sign-up', { email: 'hazel@larchloaf.example', password: TEST_PASSWORD, name: 'Hazel Brine' }).expect(201);
    fake.identitySet({ sub: 'g-1002', email: 'hazel@larchloaf.example', emailVerified: true, name: 'Hazel B.' });
    const client = await testClient(ds);
    expect(await googleSignIn(client)).toBe('/');
    const me = await client.get('/api/me').expect(200);
    expect(me.body.user.id).toBe(created.body.user.id);
    expect(me.body.user.emailVerified).toBe(true);
  });

  it('recognises a returning identity by subject even after its e-mail changes', async () => {
    fake.identitySet({ sub: 'g-1001', email: 'juniper.new@larchloaf.example', emailVerified: true, name: 'Juniper Saltmarsh' });
    const client = await testClient(ds);
    await googleSignIn(client);
    const me = await client.get('/api/me').expect(200);
    expect(me.body.user.email).toBe('juniper@larchloaf.example');
  });

  it('refuses an unverified e-mail and redirects to the sign-in page with an error', async () => {
    fake.identitySet({ sub: 'g-1003', email: 'hazel@larchloaf.example', emailVerified: false, name: 'Impostor' });
    const client = await testClient(ds);
    expect(await googleSignIn(client)).toBe('/sign-in?error=google');
    await client.get('/api/me').expect(401);
  });

  it('refuses a callback without a valid state', async () => {
    const res = await request(ds.app).get('/api/auth/google/callback?code=abc&state=forged').expect(302);
    expect(res.headers.location).toBe('/sign-in?error=google');
  });

  it('records the Google sign-in in the audit log', async () => {
    const rows: { action: string; details: string }[] = await ds.orm.em.getConnection().execute("select action, details from audit_events where action = 'auth.sign_in'");
    expect(rows.some((r) => JSON.parse(r.details).method === 'google')).toBe(true);
  });
});
