import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import type { DemandscapeApp } from '../src/app.js';
import { TEST_PASSWORD, mailedToken, testAppCreate, testClient, testUserSignedIn } from './utils.js';

describe('auth', () => {
  let ds: DemandscapeApp;
  beforeAll(async () => {
    ds = await testAppCreate();
  });
  afterAll(() => ds.close());

  describe('sign-up', () => {
    it('creates the user, signs in and sends a verification link', async () => {
      const c = await testClient(ds);
      const res = await c.post('/api/auth/sign-up', { email: ' Wren@Larchloaf.example ', password: TEST_PASSWORD, name: 'Wren Tidewell' }).expect(201);
      expect(res.body.user).toMatchObject({ email: 'wren@larchloaf.example', name: 'Wren Tidewell', emailVerified: false });
      expect(Object.keys(res.body.user).sort()).toEqual(['createdAt', 'email', 'emailVerified', 'id', 'name']);
      const me = await c.get('/api/me').expect(200);
      expect(me.body).toEqual({ user: res.body.user, memberships: [] });
      expect(mailedToken(ds, 'wren@larchloaf.example', 'http://localhost:3999/verify-email?token=')).toMatch(/^[\w-]{43}$/);
    });

    it('rejects a taken e-mail with 409 EMAIL_TAKEN', async () => {
      await testUserSignedIn(ds, 'taken@larchloaf.example');
      const c = await testClient(ds);
      const res = await c.post('/api/auth/sign-up', { email: 'TAKEN@larchloaf.example', password: TEST_PASSWORD, name: 'Again' }).expect(409);
      expect(res.body.error).toMatchObject({ code: 'EMAIL_TAKEN', field: 'email' });
    });

    it('names the first bad field and lists all of them', async () => {
      const c = await testClient(ds);
      const res = await c.post('/api/auth/sign-up', { email: 'not-an-email', password: 'short', name: '' }).expect(400);
      expect(res.body.error.code).toBe('VALIDATION_FAILED');
      expect(res.body.error.field).toBe('email');
      expect(Object.keys(res.body.error.fields).sort()).toEqual(['email', 'name', 'password']);
      expect(res.body.error.fields.password).toBe('must be at least 10 characters');
    });

    it('answers malformed JSON with 400, not 500', async () => {
      const c = await testClient(ds);
      const res = await c.agent.post('/api/auth/sign-up').set('x-csrf-token', c.token).set('content-type', 'application/json').send('{"email":').expect(400);
      expect(res.body.error.code).toBe('VALIDATION_FAILED');
    });
  });

  describe('sign-in and sign-out', () => {
    beforeAll(async () => {
      await testUserSignedIn(ds, 'sorrel@larchloaf.example', 'Sorrel Quay');
    });

    it('signs in with the right password and issues a new session id', async () => {
      const c = await testClient(ds);
      const before = c.agent.jar.getCookie('ds.sid', { domain: '127.0.0.1', path: '/', secure: false, script: false })?.value;
      const res = await c.post('/api/auth/sign-in', { email: 'sorrel@larchloaf.example', password: TEST_PASSWORD }).expect(200);
      expect(res.body.user.email).toBe('sorrel@larchloaf.example');
      const after = c.agent.jar.getCookie('ds.sid', { domain: '127.0.0.1', path: '/', secure: false, script: false })?.value;
      expect(after).toBeDefined();
      expect(after).not.toBe(before);
      await c.get('/api/me').expect(200);
    });

    it('gives the same generic 401 for a wrong password and for an unknown e-mail', async () => {
      const c = await testClient(ds);
      const wrong = await c.post('/api/auth/sign-in', { email: 'sorrel@larchloaf.example', password: 'not-the-password' }).expect(401);
      const unknown = await c.post('/api/auth/sign-in', { email: 'nobody@larchloaf.example', password: 'not-the-password' }).expect(401);
      expect(wrong.body).toEqual({ error: { code: 'INVALID_CREDENTIALS', message: 'E-mail or password is incorrect.' } });
      expect(unknown.body).toEqual(wrong.body);
      await c.get('/api/me').expect(401);
    });

    it('signs out with 204; the old session no longer works', async () => {
      const c = await testClient(ds);
      await c.post('/api/auth/sign-in', { email: 'sorrel@larchloaf.example', password: TEST_PASSWORD }).expect(200);
      await c.refresh();
      await c.post('/api/auth/sign-out').expect(204);
      const me = await c.get('/api/me').expect(401);
      expect(me.body.error.code).toBe('UNAUTHENTICATED');
    });

    it('sets the session cookie httpOnly and SameSite=Lax (not Secure on http)', async () => {
      const c = await testClient(ds);
      const res = await c.post('/api/auth/sign-in', { email: 'sorrel@larchloaf.example', password: TEST_PASSWORD }).expect(200);
      const cookie = (res.headers['set-cookie'] as unknown as string[]).find((h) => h.startsWith('ds.sid='));
      expect(cookie).toMatch(/HttpOnly/);
      expect(cookie).toMatch(/SameSite=Lax/);
      expect(cookie).not.toMatch(/Secure/);
    });
  });

  describe('CSRF', () => {
    it('rejects a state-changing request without the token with 403 CSRF_INVALID', async () => {
      const agent = request.agent(ds.app);
      await agent.get('/api/auth/csrf').expect(200);
      const res = await agent.post('/api/auth/sign-in').send({ email: 'a@b.example', password: 'x' }).expect(403);
      expect(res.body.error.code).toBe('CSRF_INVALID');
    });

    it('rejects a token issued for another session', async () => {
      const a = await testClient(ds);
      const b = await testClient(ds);
      const res = await b.agent.post('/api/auth/sign-in').set('x-csrf-token', a.token).send({ email: 'a@b.example', password: 'x' }).expect(403);
      expect(res.body.error.code).toBe('CSRF_INVALID');
    });

    it('does not guard safe methods', async () => {
      await request(ds.app).get('/api/auth/providers').expect(200, { google: { enabled: true, label: 'Continue with Google' } });
    });
  });

  describe('password reset by e-mail', () => {
    it('resets once with the mailed token, signs out other sessions, and the token cannot be reused', async () => {
      const { client: oldSession } = await testUserSignedIn(ds, 'fennel@larchloaf.example', 'Fennel Marsh');
      const c = await testClient(ds);
      await c.post('/api/auth/forgot-password', { email: 'fennel@larchloaf.example' }).expect(202);
      const token = mailedToken(ds, 'fennel@larchloaf.example', 'http://localhost:3999/reset-password?token=');
      await c.post('/api/auth/reset-password', { token, password: 'a-brand-new-password' }).expect(204);
      await oldSession.get('/api/me').expect(401);
      const again = await c.post('/api/auth/reset-password', { token, password: 'another-new-password' }).expect(400);
      expect(again.body.error).toMatchObject({ code: 'TOKEN_INVALID', field: 'token' });
      await c.post('/api/auth/sign-in', { email: 'fennel@larchloaf.example', password: TEST_PASSWORD }).expect(401);
      await c.post('/api/auth/sign-in', { email: 'fennel@larchloaf.example', password: 'a-brand-new-password' }).expect(200);
    });

    it('answers 202 for an unknown e-mail and sends nothing', async () => {
      const c = await testClient(ds);
      const count = ds.mailbox.length;
      await c.post('/api/auth/forgot-password', { email: 'ghost@larchloaf.example' }).expect(202);
      expect(ds.mailbox.length).toBe(count);
    });

    it('rejects an unknown token and an expired one', async () => {
      const c = await testClient(ds);
      await c.post('/api/auth/reset-password', { token: 'made-up-token', password: 'a-brand-new-password' }).expect(400);
      await testUserSignedIn(ds, 'expired@larchloaf.example');
      await c.post('/api/auth/forgot-password', { email: 'expired@larchloaf.example' }).expect(202);
      const token = mailedToken(ds, 'expired@larchloaf.example', '/reset-password');
      await ds.orm.em.getConnection().execute("update auth_tokens set expires_at = ? where purpose = 'reset_password'", [new Date(Date.now() - 1000)]);
      const res = await c.post('/api/auth/reset-password', { token, password: 'a-brand-new-password' }).expect(400);
      expect(res.body.error.code).toBe('TOKEN_INVALID');
    });

    it('stores only a SHA-256 hash of the token', async () => {
      await testUserSignedIn(ds, 'hash@larchloaf.example');
      const token = mailedToken(ds, 'hash@larchloaf.example', '/verify-email');
      const rows: { token_hash: string }[] = await ds.orm.em.getConnection().execute('select token_hash from auth_tokens');
      expect(rows.some((r) => r.token_hash.includes(token))).toBe(false);
      expect(rows.every((r) => /^[0-9a-f]{64}$/.test(r.token_hash))).toBe(true);
    });
  });

  describe('e-mail verification', () => {
    it('verifies with the mailed token; resend sends a fresh link', async () => {
      const { client } = await testUserSignedIn(ds, 'thyme@larchloaf.example', 'Thyme Reed');
      await client.post('/api/auth/resend-verification').expect(204);
      const token = mailedToken(ds, 'thyme@larchloaf.example', '/verify-email');
      await client.post('/api/auth/verify-email', { token }).expect(204);
      const me = await client.get('/api/me').expect(200);
      expect(me.body.user.emailVerified).toBe(true);
      await client.post('/api/auth/verify-email', { token }).expect(400);
    });

    it('needs a session to resend', async () => {
      const c = await testClient(ds);
      await c.post('/api/auth/resend-verification').expect(401);
    });
  });

  describe('me', () => {
    it('renames and changes the password (current password checked)', async () => {
      const { client } = await testUserSignedIn(ds, 'basil@larchloaf.example', 'Basil');
      const renamed = await client.patch('/api/me', { name: 'Basil Holloway' }).expect(200);
      expect(renamed.body.user.name).toBe('Basil Holloway');
      const wrong = await client.post('/api/me/password', { currentPassword: 'nope', newPassword: 'a-new-password-1' }).expect(400);
      expect(wrong.body.error.field).toBe('currentPassword');
      await client.post('/api/me/password', { currentPassword: TEST_PASSWORD, newPassword: 'a-new-password-1' }).expect(204);
      await client.get('/api/me').expect(200);
      const c = await testClient(ds);
      await c.post('/api/auth/sign-in', { email: 'basil@larchloaf.example', password: 'a-new-password-1' }).expect(200);
    });
  });

  describe('sessions', () => {
    it('expire: an expired stored session is ignored and removed', async () => {
      const { client } = await testUserSignedIn(ds, 'expiry@larchloaf.example');
      await client.get('/api/me').expect(200);
      const conn = ds.orm.em.getConnection();
      const [{ n }]: { n: number }[] = await conn.execute('select count(*) as n from sessions');
      await conn.execute('update sessions set expires_at = ?', [new Date(Date.now() - 1000)]);
      await client.get('/api/me').expect(401);
      expect(await ds.sessionStore.prune()).toBeLessThanOrEqual(n);
      const [{ left }]: { left: number }[] = await conn.execute('select count(*) as left from sessions where expires_at > ?', [new Date()]);
      expect(left).toBe(0);
    });
  });
});

describe('auth rate limit', () => {
  let ds: DemandscapeApp;
  beforeAll(async () => {
    ds = await testAppCreate({ RATE_LIMIT_AUTH_PER_MINUTE: '3' });
  });
  afterAll(() => ds.close());

  it('answers 429 RATE_LIMITED after the configured number of sign-in attempts per minute', async () => {
    const c = await testClient(ds);
    const statuses: number[] = [];
    for (let i = 0; i < 5; i++) {
      statuses.push((await c.post('/api/auth/sign-in', { email: 'x@larchloaf.example', password: 'whatever-it-is' })).status);
    }
    expect(statuses).toEqual([401, 401, 401, 429, 429]);
    const res = await c.post('/api/auth/sign-in', { email: 'x@larchloaf.example', password: 'whatever-it-is' });
    expect(res.body.error.code).toBe('RATE_LIMITED');
    expect(res.headers['ratelimit-policy']).toBeDefined();
  });
});

describe('secure cookies behind https', () => {
  it('marks the session cookie Secure when PUBLIC_URL is https', async () => {
    const ds = await testAppCreate({ PUBLIC_URL: 'https://demandscape.example', TRUST_PROXY: 'true' });
    try {
      const res = await request(ds.app).get('/api/auth/csrf').set('x-forwarded-proto', 'https').expect(200);
      const cookies = res.headers['set-cookie'] as unknown as string[];
      expect(cookies.find((h) => h.startsWith('ds.sid='))).toMatch(/; Secure/);
      expect(cookies.find((h) => h.startsWith('__Host-ds.csrf='))).toMatch(/; Secure/);
    } finally {
      await ds.close();
    }
  });
});
