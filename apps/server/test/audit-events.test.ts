import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DemandscapeApp } from '../src/app.js';
import { TEST_PASSWORD, mailedToken, testAppCreate, testClient, testMembershipAdd, testUserSignedIn, type TestClient } from './utils.js';

interface EventBody {
  id: number;
  action: string;
  actor: { id: string; name: string; email: string } | null;
  target: { type: string; id: string } | null;
  details: Record<string, unknown>;
  createdAt: string;
}

describe('audit events', () => {
  let ds: DemandscapeApp;
  let owner: TestClient;
  let ownerId: string;
  let orgId: string;
  let workspaceId: string;
  let plannerId: string;

  beforeAll(async () => {
    ds = await testAppCreate();
    ({ client: owner, userId: ownerId } = await testUserSignedIn(ds, 'owner@audit.example', 'Maren Larchwood'));
    orgId = (await owner.post('/api/organizations', { name: 'Larchloaf' }).expect(201)).body.organization.id;
    await owner.patch(`/api/organizations/${orgId}`, { name: 'Larchloaf Cafés' }).expect(200);
    const base = `/api/organizations/${orgId}/workspaces`;
    workspaceId = (await owner.post(base, { name: 'North corridor' }).expect(201)).body.workspace.id;
    await owner.patch(`${base}/${workspaceId}`, { name: 'North corridor 2027' }).expect(200);
    await owner.del(`${base}/${workspaceId}`).expect(204);

    const planner = await testUserSignedIn(ds, 'planner@audit.example', 'Ilse Dunmore');
    plannerId = planner.userId;
    await testMembershipAdd(ds, orgId, plannerId, 'planner');
    await planner.client.post('/api/auth/sign-out').expect(204);
    const c = await testClient(ds);
    await c.post('/api/auth/sign-in', { email: 'planner@audit.example', password: 'wrong-password!' }).expect(401);
    await c.post('/api/auth/sign-in', { email: 'planner@audit.example', password: TEST_PASSWORD }).expect(200);
    await c.refresh();
    await c.post('/api/auth/forgot-password', { email: 'planner@audit.example' }).expect(202);
    const token = mailedToken(ds, 'planner@audit.example', '/reset-password');
    await c.post('/api/auth/reset-password', { token, password: 'planner-new-password' }).expect(204);

    await testUserSignedIn(ds, 'stranger@audit.example', 'Not A Member');
  });
  afterAll(() => ds.close());

  async function events(query = ''): Promise<{ events: EventBody[]; nextBefore: number | null }> {
    return (await owner.get(`/api/organizations/${orgId}/audit-events${query}`).expect(200)).body;
  }

  it('records every contract action for the organization and its members, newest first', async () => {
    const { events: list, nextBefore } = await events();
    expect(nextBefore).toBeNull();
    const ids = list.map((e) => e.id);
    expect([...ids].sort((a, b) => b - a)).toEqual(ids);
    expect(new Set(list.map((e) => e.action))).toEqual(
      new Set([
        'auth.sign_up',
        'organization.create',
        'organization.rename',
        'workspace.create',
        'workspace.update',
        'workspace.delete',
        'auth.sign_out',
        'auth.sign_in_failed',
        'auth.sign_in',
        'auth.password_reset',
      ]),
    );
  });

  it('names actor and target, and details never carry e-mails, passwords or tokens', async () => {
    const { events: list } = await events();
    const rename = list.find((e) => e.action === 'organization.rename')!;
    expect(rename.actor).toEqual({ id: ownerId, name: 'Maren Larchwood', email: 'owner@audit.example' });
    expect(rename.target).toEqual({ type: 'organization', id: orgId });
    expect(rename.details).toEqual({ from: 'Larchloaf', to: 'Larchloaf Cafés' });
    const del = list.find((e) => e.action === 'workspace.delete')!;
    expect(del.target).toEqual({ type: 'workspace', id: workspaceId });
    const failed = list.find((e) => e.action === 'auth.sign_in_failed')!;
    expect(failed.actor?.id).toBe(plannerId);
    const detailsText = JSON.stringify(list.map((e) => e.details));
    expect(detailsText).not.toContain('@');
    expect(list.flatMap((e) => Object.keys(e.details)).filter((k) => /password|token|email/i.test(k))).toEqual([]);
    expect(detailsText).not.toContain(TEST_PASSWORD);
  });

  it('leaves out account events of non-members', async () => {
    const { events: list } = await events();
    expect(list.some((e) => e.actor?.email === 'stranger@audit.example')).toBe(false);
  });

  it('filters by action and pages with limit and before', async () => {
    const { events: signUps } = await events('?action=auth.sign_up');
    expect(signUps.map((e) => e.actor?.name).sort()).toEqual(['Ilse Dunmore', 'Maren Larchwood']);
    const all = (await events()).events;
    const first = await events('?limit=3');
    expect(first.events.map((e) => e.id)).toEqual(all.slice(0, 3).map((e) => e.id));
    expect(first.nextBefore).toBe(all[2].id);
    const second = await events(`?limit=3&before=${first.nextBefore}`);
    expect(second.events.map((e) => e.id)).toEqual(all.slice(3, 6).map((e) => e.id));
  });

  it('rejects bad query values with the field named', async () => {
    const res = await owner.get(`/api/organizations/${orgId}/audit-events?limit=0`).expect(400);
    expect(res.body.error).toMatchObject({ code: 'VALIDATION_FAILED', field: 'limit', message: 'limit: must be between 1 and 200' });
    const action = await owner.get(`/api/organizations/${orgId}/audit-events?action=made.up`).expect(400);
    expect(action.body.error.field).toBe('action');
  });
});
