import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DemandscapeApp } from '../src/app.js';
import { testAppCreate, testClient, testMembershipAdd, testUserSignedIn, type TestClient } from './utils.js';

/** Who calls: a member of org A in each role, a member of org B only, or nobody signed in. */
const CALLERS = ['owner', 'analyst', 'planner', 'executive', 'outsider', 'anonymous'] as const;
type Caller = (typeof CALLERS)[number];
// PRODUCT.md rights table: planners manage sites, analysts view them, executives read shortlists only.
const READERS = ['owner', 'analyst', 'planner'] as const;
const WRITERS = ['owner', 'planner'] as const;

interface RouteRow {
  method: 'GET' | 'POST' | 'PATCH' | 'DELETE' | 'UPLOAD';
  /** `:orgId`/`:workspaceId` of org A; `:siteId` a fresh site for every call. */
  route: string;
  body?: object;
  allowed: readonly Caller[];
  ok: number;
}

const S = '/api/organizations/:orgId/workspaces/:workspaceId/sites';
const SITE = { kind: 'candidate', name: 'Quay corner', lon: -38.51, lat: 44.52, attractiveness: 120, attractivenessLabel: 'sales floor m²' };

const CSV = 'name,kind,lon,lat,attractiveness\nQuay corner,candidate,-38.51,44.52,120\n';

/** The site rows of THE ROLE MATRIX (PERMISSIONS 'site.read' = owner, analyst, planner; 'site.write' = owner, planner). */
const MATRIX: RouteRow[] = [
  { method: 'GET', route: S, allowed: READERS, ok: 200 },
  { method: 'GET', route: `${S}?kind=own`, allowed: READERS, ok: 200 },
  { method: 'POST', route: S, body: SITE, allowed: WRITERS, ok: 201 },
  { method: 'UPLOAD', route: `${S}/import/preview`, allowed: WRITERS, ok: 200 },
  { method: 'UPLOAD', route: `${S}/import`, allowed: WRITERS, ok: 201 },
  { method: 'PATCH', route: `${S}/:siteId`, body: { lon: -38.5, lat: 44.53 }, allowed: WRITERS, ok: 200 },
  { method: 'DELETE', route: `${S}/:siteId`, allowed: WRITERS, ok: 204 },
];

function expectedStatus(row: RouteRow, caller: Caller): number {
  if (row.allowed.includes(caller)) return row.ok;
  if (caller === 'anonymous') return 401;
  if (caller === 'outsider') return 404;
  return 403;
}

describe('role matrix: sites', () => {
  let ds: DemandscapeApp;
  const clients = {} as Record<Caller, TestClient>;
  let ids: { orgId: string; wsId: string };

  beforeAll(async () => {
    ds = await testAppCreate();
    const owner = await testUserSignedIn(ds, 'owner@site-matrix.example', 'Owner A');
    clients.owner = owner.client;
    const orgId = (await owner.client.post('/api/organizations', { name: 'Org A' }).expect(201)).body.organization.id as string;
    for (const role of ['analyst', 'planner', 'executive'] as const) {
      const u = await testUserSignedIn(ds, `${role}@site-matrix.example`, `${role} A`);
      await testMembershipAdd(ds, orgId, u.userId, role);
      clients[role] = u.client;
    }
    clients.outsider = (await testUserSignedIn(ds, 'owner-b@site-matrix.example', 'Owner B')).client;
    await clients.outsider.post('/api/organizations', { name: 'Org B' }).expect(201);
    clients.anonymous = await testClient(ds);
    const wsId = (await owner.client.post(`/api/organizations/${orgId}/workspaces`, { name: 'A study' }).expect(201)).body.workspace.id;
    ids = { orgId, wsId };
  });
  afterAll(() => ds.close());

  async function pathOf(row: RouteRow): Promise<string> {
    const base = S.replace(':orgId', ids.orgId).replace(':workspaceId', ids.wsId);
    const siteId = row.route.includes(':siteId') ? (await clients.owner.post(base, SITE).expect(201)).body.site.id : '';
    return row.route.replace(':orgId', ids.orgId).replace(':workspaceId', ids.wsId).replace(':siteId', siteId);
  }

  for (const row of MATRIX) {
    it(`${row.method} ${row.route}`, async () => {
      const actual: Record<string, number> = {};
      const expected: Record<string, number> = {};
      for (const caller of CALLERS) {
        const path = await pathOf(row);
        const c = clients[caller];
        const res =
          row.method === 'GET'
            ? await c.get(path)
            : row.method === 'POST'
              ? await c.post(path, row.body)
              : row.method === 'PATCH'
                ? await c.patch(path, row.body)
                : row.method === 'UPLOAD'
                  ? await c.agent.post(path).set('x-csrf-token', c.token).attach('file', Buffer.from(CSV), 'sites.csv')
                  : await c.del(path);
        actual[caller] = res.status;
        expected[caller] = expectedStatus(row, caller);
        if (res.status >= 400) expect(res.body.error?.code, `${caller}: error body`).toBeTypeOf('string');
      }
      expect(actual).toEqual(expected);
    });
  }

  it('an executive is told the role does not allow the sites list', async () => {
    const res = await clients.executive.get(S.replace(':orgId', ids.orgId).replace(':workspaceId', ids.wsId)).expect(403);
    expect(res.body.error.code).toBe('FORBIDDEN');
  });
});
