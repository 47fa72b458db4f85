import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DemandscapeApp } from '../src/app.js';
import { DEMO_ORGANIZATION, DEMO_PASSWORD, DEMO_USERS, DEMO_WORKSPACE, demoSeed } from '../src/seed/demo-seed.js';
import { testAppCreate, testClient } from './utils.js';

describe('demoSeed', () => {
  let ds: DemandscapeApp;
  beforeAll(async () => {
    ds = await testAppCreate();
  });
  afterAll(() => ds.close());

  it('creates the demo organization, workspace and one user per role, and is idempotent', async () => {
    const first = await demoSeed(ds.orm.em.fork());
    expect(first.created).toHaveLength(1 + 4 + 4 + 1);
    const second = await demoSeed(ds.orm.em.fork());
    expect(second).toEqual({ created: [], organizationId: first.organizationId, workspaceId: first.workspaceId });
    const [{ n }]: { n: number }[] = await ds.orm.em.getConnection().execute('select count(*) as n from users');
    expect(n).toBe(4);
  });

  it('lets every demo user sign in with the demo password and see their role', async () => {
    for (const demo of DEMO_USERS) {
      expect(demo.email.endsWith('.example')).toBe(true);
      const c = await testClient(ds);
      await c.post('/api/auth/sign-in', { email: demo.email, password: DEMO_PASSWORD }).expect(200);
      const me = await c.get('/api/me').expect(200);
      expect(me.body.memberships).toEqual([{ organization: expect.objectContaining({ name: DEMO_ORGANIZATION.name }), role: demo.role }]);
      const orgId = me.body.memberships[0].organization.id;
      const list = await c.get(`/api/organizations/${orgId}/workspaces`).expect(200);
      expect(list.body.workspaces.map((w: { name: string }) => w.name)).toEqual([DEMO_WORKSPACE.name]);
    }
  });
});
