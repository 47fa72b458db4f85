import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DemandscapeApp } from '../src/app.js';
import { testAppCreate, testMembershipAdd, testUserSignedIn, type TestClient } from './utils.js';

describe('organizations', () => {
  let ds: DemandscapeApp;
  let owner: TestClient;
  let orgId: string;
  beforeAll(async () => {
    ds = await testAppCreate();
    ({ client: owner } = await testUserSignedIn(ds, 'owner@org-test.example', 'Maren Larchwood'));
  });
  afterAll(() => ds.close());

  it('creates an organization with a slug; the creator becomes owner', async () => {
    const res = await owner.post('/api/organizations', { name: 'Larchloaf Bakery-Cafés' }).expect(201);
    expect(res.body.organization).toMatchObject({ name: 'Larchloaf Bakery-Cafés', slug: 'larchloaf-bakery-cafes' });
    orgId = res.body.organization.id;
    const mine = await owner.get('/api/organizations').expect(200);
    expect(mine.body.organizations).toEqual([{ ...res.body.organization, role: 'owner' }]);
    const me = await owner.get('/api/me').expect(200);
    expect(me.body.memberships).toEqual([{ organization: { id: orgId, name: 'Larchloaf Bakery-Cafés', slug: 'larchloaf-bakery-cafes' }, role: 'owner' }]);
  });

  it('keeps slugs unique when names repeat', async () => {
    const res = await owner.post('/api/organizations', { name: 'Larchloaf Bakery-Cafés' }).expect(201);
    expect(res.body.organization.slug).toMatch(/^larchloaf-bakery-cafes-[0-9a-f]{6}$/);
  });

  it('validates the name', async () => {
    const empty = await owner.post('/api/organizations', { name: '   ' }).expect(400);
    expect(empty.body.error).toMatchObject({ code: 'VALIDATION_FAILED', field: 'name' });
    const long = await owner.post('/api/organizations', { name: 'x'.repeat(121) }).expect(400);
    expect(long.body.error.message).toBe('name: must be at most 120 characters');
  });

  it('reads the organization with the caller role, renames it, lists members', async () => {
    const { client: planner, userId } = await testUserSignedIn(ds, 'planner@org-test.example', 'Ilse Dunmore');
    await testMembershipAdd(ds, orgId, userId, 'planner');
    const read = await planner.get(`/api/organizations/${orgId}`).expect(200);
    expect(read.body.role).toBe('planner');
    const renamed = await owner.patch(`/api/organizations/${orgId}`, { name: 'Larchloaf Cafés' }).expect(200);
    expect(renamed.body.organization).toMatchObject({ name: 'Larchloaf Cafés', slug: 'larchloaf-bakery-cafes' });
    const members = await planner.get(`/api/organizations/${orgId}/members`).expect(200);
    expect(members.body.members.map((m: { name: string; role: string }) => [m.name, m.role])).toEqual([
      ['Ilse Dunmore', 'planner'],
      ['Maren Larchwood', 'owner'],
    ]);
    expect(Object.keys(members.body.members[0]).sort()).toEqual(['email', 'joinedAt', 'name', 'role', 'userId']);
  });

  it('answers 404 for an organization id that does not exist', async () => {
    await owner.get('/api/organizations/00000000-0000-4000-8000-000000000000').expect(404);
  });
});
