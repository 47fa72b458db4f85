import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DemandscapeApp } from '../src/app.js';
import { entityId } from '../src/modules/common/base.entity.js';
import { WorkspaceSchema } from '../src/modules/workspace/workspace.entity.js';
import { testAppCreate, testClient, testMembershipAdd, testUserSignedIn, type TestClient } from './utils.js';

/** Who calls: a member of org A in each role, a member of org B only, or nobody signed in. */
const CALLERS = ['owner', 'analyst', 'planner', 'executive', 'outsider', 'anonymous'] as const;
type Caller = (typeof CALLERS)[number];
const ROLES_ALL = ['owner', 'analyst', 'planner', 'executive'] as const;
const SIGNED_IN = [...ROLES_ALL, 'outsider'] as const;

interface RouteRow {
  method: 'GET' | 'POST' | 'PATCH' | 'DELETE';
  /** Route pattern; `:orgId` is org A, `:workspaceId` a workspace of org A. */
  route: string;
  body?: object;
  /** Callers that succeed; everyone else is denied (anonymous 401, outsider 404, other roles 403). */
  allowed: readonly Caller[];
  ok: number;
  /** Use a fresh workspace for each call (destructive routes). */
  fresh?: boolean;
}

const ORG = '/api/organizations/:orgId';
const WS = `${ORG}/workspaces/:workspaceId`;

/**
 * THE ROLE MATRIX — one row per route. New routes add one row here.
 * Mirrors PERMISSIONS in src/modules/common/permissions.ts and the rights table in PRODUCT.md.
 */
const MATRIX: RouteRow[] = [
  { method: 'GET', route: '/api/me', allowed: SIGNED_IN, ok: 200 },
  { method: 'PATCH', route: '/api/me', body: { name: 'Renamed Person' }, allowed: SIGNED_IN, ok: 200 },
  { method: 'POST', route: '/api/auth/resend-verification', allowed: SIGNED_IN, ok: 204 },
  { method: 'GET', route: '/api/organizations', allowed: SIGNED_IN, ok: 200 },
  { method: 'POST', route: '/api/organizations', body: { name: 'Another org' }, allowed: SIGNED_IN, ok: 201 },
  { method: 'GET', route: ORG, allowed: ROLES_ALL, ok: 200 },
  { method: 'PATCH', route: ORG, body: { name: 'Larchloaf Bakery-Cafés' }, allowed: ['owner'], ok: 200 },
  { method: 'GET', route: `${ORG}/members`, allowed: ROLES_ALL, ok: 200 },
  { method: 'GET', route: `${ORG}/audit-events`, allowed: ['owner'], ok: 200 },
  { method: 'GET', route: `${ORG}/workspaces`, allowed: ROLES_ALL, ok: 200 },
  { method: 'POST', route: `${ORG}/workspaces`, body: { name: 'Matrix study' }, allowed: ['owner', 'analyst', 'planner'], ok: 201 },
  { method: 'GET', route: WS, allowed: ROLES_ALL, ok: 200 },
  { method: 'PATCH', route: WS, body: { description: 'Edited in the matrix' }, allowed: ['owner', 'analyst', 'planner'], ok: 200 },
  { method: 'DELETE', route: WS, allowed: ['owner', 'analyst'], ok: 204, fresh: true },
  { method: 'GET', route: `${ORG}/billing`, allowed: ['owner'], ok: 200 },
  { method: 'GET', route: `${ORG}/billing/ledger`, allowed: ['owner'], ok: 200 },
  { method: 'GET', route: `${ORG}/billing/receipts`, allowed: ['owner'], ok: 200 },
  { method: 'POST', route: `${ORG}/billing/seats`, body: { seats: 0 }, allowed: ['owner'], ok: 400 },
  { method: 'GET', route: `${ORG}/invitations`, allowed: ['owner'], ok: 200 },
  { method: 'POST', route: `${ORG}/invitations`, body: { email: 'not-an-address', role: 'analyst' }, allowed: ['owner'], ok: 400 },
  { method: 'PATCH', route: `${ORG}/members/no-such-user`, body: { role: 'planner' }, allowed: ['owner'], ok: 404 },
  { method: 'DELETE', route: `${ORG}/members/no-such-user`, allowed: ['owner'], ok: 404 },
];

function expectedStatus(row: RouteRow, caller: Caller): number {
  if (row.allowed.includes(caller)) return row.ok;
  if (caller === 'anonymous') return 401;
  if (caller === 'outsider') return 404;
  return 403;
}

function send(client: TestClient, method: RouteRow['method'], path: string, body?: object) {
  if (method === 'GET') return client.get(path);
  if (method === 'POST') return client.post(path, body);
  if (method === 'PATCH') return client.patch(path, body);
  return client.del(path);
}

describe('role matrix', () => {
  let ds: DemandscapeApp;
  const clients = {} as Record<Caller, TestClient>;
  let orgA: string;
  let workspaceA: string;
  let orgB: string;

  async function workspaceFresh(): Promise<string> {
    const em = ds.orm.em.fork();
    const id = entityId();
    em.create(WorkspaceSchema, { id, organization: orgA, name: 'To delete', description: '', createdBy: null } as never);
    await em.flush();
    return id;
  }

  async function pathOf(row: RouteRow): Promise<string> {
    return row.route.replace(':orgId', orgA).replace(':workspaceId', row.fresh ? await workspaceFresh() : workspaceA);
  }

  beforeAll(async () => {
    ds = await testAppCreate();
    const owner = await testUserSignedIn(ds, 'owner@matrix.example', 'Owner A');
    clients.owner = owner.client;
    orgA = (await owner.client.post('/api/organizations', { name: 'Org A' }).expect(201)).body.organization.id as string;
    for (const role of ['analyst', 'planner', 'executive'] as const) {
      const u = await testUserSignedIn(ds, `${role}@matrix.example`, `${role} A`);
      await testMembershipAdd(ds, orgA, u.userId, role);
      clients[role] = u.client;
    }
    const outsider = await testUserSignedIn(ds, 'owner-b@matrix.example', 'Owner B');
    clients.outsider = outsider.client;
    orgB = (await outsider.client.post('/api/organizations', { name: 'Org B' }).expect(201)).body.organization.id;
    clients.anonymous = await testClient(ds);
    workspaceA = (await owner.client.post(`/api/organizations/${orgA}/workspaces`, { name: 'A study' }).expect(201)).body.workspace.id;
  });
  afterAll(() => ds.close());

  for (const row of MATRIX) {
    it(`${row.method} ${row.route}`, async () => {
      const actual: Record<string, number> = {};
      const expected: Record<string, number> = {};
      for (const caller of CALLERS) {
        const res = await send(clients[caller], row.method, await pathOf(row), row.body);
        actual[caller] = res.status;
        expected[caller] = expectedStatus(row, caller);
        if (res.status >= 400) expect(res.body.error?.code, `${caller}: error body`).toBeTypeOf('string');
      }
      expect(actual).toEqual(expected);
    });
  }

  it("org B's member cannot reach org A's workspace through org B's path (404, no leak)", async () => {
    const path = `/api/organizations/${orgB}/workspaces/${workspaceA}`;
    const b = clients.outsider;
    const results = [(await b.get(path)).status, (await b.patch(path, { name: 'stolen' })).status, (await b.del(path)).status];
    expect(results).toEqual([404, 404, 404]);
    const still = await clients.owner.get(`/api/organizations/${orgA}/workspaces/${workspaceA}`).expect(200);
    expect(still.body.workspace.name).toBe('A study');
  });

  it('the 404 for a foreign organization matches the 404 for a made-up id', async () => {
    const foreign = await clients.outsider.get(`/api/organizations/${orgA}`);
    const madeUp = await clients.outsider.get(`/api/organizations/${entityId()}`);
    expect(foreign.status).toBe(404);
    expect(foreign.body).toEqual(madeUp.body);
  });
});
