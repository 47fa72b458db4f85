import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DemandscapeApp } from '../src/app.js';
import { testSeatsSet } from './billing-utils.js';
import { testAppCreate, testMembershipAdd, testUserSignedIn, type TestClient } from './utils.js';

describe('members: role change and removal', () => {
  let ds: DemandscapeApp;
  let owner: TestClient;
  let ownerId: string;
  let orgId: string;
  const users = {} as Record<'analyst' | 'planner' | 'executive', { client: TestClient; userId: string }>;
  const member = (userId: string) => `/api/organizations/${orgId}/members/${userId}`;

  beforeAll(async () => {
    ds = await testAppCreate();
    const o = await testUserSignedIn(ds, 'owner@members.example', 'Olga Owner');
    owner = o.client;
    ownerId = o.userId;
    orgId = (await owner.post('/api/organizations', { name: 'Larchloaf Members' }).expect(201)).body.organization.id;
    for (const role of ['analyst', 'planner', 'executive'] as const) {
      users[role] = await testUserSignedIn(ds, `${role}@members.example`, `${role} person`);
      await testMembershipAdd(ds, orgId, users[role].userId, role);
    }
  });
  afterAll(() => ds.close());

  it('changes a role and records it in the audit log', async () => {
    const res = await owner.patch(member(users.analyst.userId), { role: 'planner' }).expect(200);
    expect(res.body.member).toMatchObject({ userId: users.analyst.userId, role: 'planner', email: 'analyst@members.example' });
    const events = (await owner.get(`/api/organizations/${orgId}/audit-events?action=member.role_change`).expect(200)).body.events;
    expect(events[0]).toMatchObject({ target: { type: 'user', id: users.analyst.userId }, details: { from: 'analyst', to: 'planner' } });
    const bad = await owner.patch(member(users.analyst.userId), { role: 'baker' }).expect(400);
    expect(bad.body.error.field).toBe('role');
  });

  it('never demotes or removes the last owner (409 LAST_OWNER)', async () => {
    const demote = await owner.patch(member(ownerId), { role: 'analyst' }).expect(409);
    expect(demote.body.error.code).toBe('LAST_OWNER');
    expect(demote.body.error.message).toContain('Olga Owner is the last owner of Larchloaf Members');
    expect((await owner.del(member(ownerId)).expect(409)).body.error.code).toBe('LAST_OWNER');
  });

  it('lets an owner step down once another member is owner', async () => {
    await owner.patch(member(users.planner.userId), { role: 'owner' }).expect(200);
    await users.planner.client.patch(member(ownerId), { role: 'analyst' }).expect(200);
    await owner.get(`/api/organizations/${orgId}/audit-events`).expect(403);
    await users.planner.client.patch(member(ownerId), { role: 'owner' }).expect(200);
  });

  it('removes a member: access ends, the seat is free again', async () => {
    await testSeatsSet(ds, orgId, 4);
    await owner.post(`/api/organizations/${orgId}/invitations`, { email: 'new@members.example', role: 'analyst' }).expect(409);
    await owner.del(member(users.executive.userId)).expect(204);
    await users.executive.client.get(`/api/organizations/${orgId}`).expect(404);
    await owner.post(`/api/organizations/${orgId}/invitations`, { email: 'new@members.example', role: 'analyst' }).expect(201);
    const events = (await owner.get(`/api/organizations/${orgId}/audit-events?action=member.remove`).expect(200)).body.events;
    expect(events[0]).toMatchObject({ target: { type: 'user', id: users.executive.userId }, details: { role: 'executive' } });
    await owner.del(member(users.executive.userId)).expect(404);
  });

  it('lets only owners change roles or remove members', async () => {
    const analystRole = await users.analyst.client.patch(member(users.planner.userId), { role: 'executive' });
    expect(analystRole.status).toBe(403);
    const outsider = await testUserSignedIn(ds, 'outsider@members.example', 'Outsider');
    await outsider.client.del(member(users.analyst.userId)).expect(404);
  });
});
