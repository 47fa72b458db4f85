import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DemandscapeApp } from '../src/app.js';
import { creditsGrant } from '../src/modules/billing/credits.service.js';
import { customerFileStored, demoPoints, surfaceStored } from './surface-fixtures.js';
import { testAppCreate, testClient, testMembershipAdd, testUserSignedIn, type TestClient } from './utils.js';

/** Who calls: a member of org A in each role, a member of org B only, or nobody signed in. */
const CALLERS = ['owner', 'analyst', 'planner', 'executive', 'outsider', 'anonymous'] as const;
type Caller = (typeof CALLERS)[number];
const ROLES_ALL = ['owner', 'analyst', 'planner', 'executive'] as const;
const WRITERS = ['owner', 'analyst'] as const;

interface RouteRow {
  method: 'GET' | 'POST' | 'DELETE';
  /** `:orgId`/`:workspaceId` of org A; `:surfaceId` a succeeded run, or a fresh run in `fresh` state. */
  route: string;
  body?: object;
  allowed: readonly Caller[];
  ok: number;
  fresh?: 'queued' | 'cancelled';
}

const S = '/api/organizations/:orgId/workspaces/:workspaceId/surfaces';
const CREATE = { customerFileId: ':fileId', kernel: 'quartic', bandwidth: { mode: 'value', value: 1500 }, studyArea: { type: 'extent' } };

/** The surface rows of THE ROLE MATRIX (PERMISSIONS 'surface.read' = every role, 'surface.write' = owner, analyst). */
const MATRIX: RouteRow[] = [
  { method: 'POST', route: `${S}/estimate`, body: CREATE, allowed: WRITERS, ok: 200 },
  { method: 'POST', route: S, body: CREATE, allowed: WRITERS, ok: 201 },
  { method: 'GET', route: S, allowed: ROLES_ALL, ok: 200 },
  { method: 'GET', route: `${S}/:surfaceId`, allowed: ROLES_ALL, ok: 200 },
  { method: 'POST', route: `${S}/:surfaceId/cancel`, allowed: WRITERS, ok: 200, fresh: 'queued' },
  { method: 'POST', route: `${S}/:surfaceId/retry`, allowed: WRITERS, ok: 200, fresh: 'cancelled' },
  { method: 'DELETE', route: `${S}/:surfaceId`, allowed: WRITERS, ok: 204, fresh: 'queued' },
  { method: 'GET', route: `${S}/:surfaceId/web-raster?maxSize=64`, allowed: ROLES_ALL, ok: 200 },
  { method: 'GET', route: `${S}/:surfaceId/value?lon=-38.5&lat=44.5`, allowed: ROLES_ALL, ok: 200 },
  { method: 'GET', route: `${S}/:surfaceId/contours`, allowed: ROLES_ALL, ok: 200 },
  { method: 'GET', route: `${S}/:surfaceId/contours.geojson`, allowed: ROLES_ALL, ok: 200 },
  { method: 'GET', route: `${S}/:surfaceId/export.tif`, allowed: ROLES_ALL, ok: 200 },
  { method: 'GET', route: `${S}/:surfaceId/difference/:surfaceId/web-raster?maxSize=64`, allowed: ROLES_ALL, ok: 200 },
];

function expectedStatus(row: RouteRow, caller: Caller): number {
  if (row.allowed.includes(caller)) return row.ok;
  if (caller === 'anonymous') return 401;
  if (caller === 'outsider') return 404;
  return 403;
}

describe('role matrix: surfaces', { timeout: 240_000 }, () => {
  let ds: DemandscapeApp;
  const clients = {} as Record<Caller, TestClient>;
  let ids: { orgId: string; wsId: string; fileId: string };
  let succeeded: string;
  let fine: string;
  const points = demoPoints(1500, 9);

  beforeAll(async () => {
    ds = await testAppCreate();
    const owner = await testUserSignedIn(ds, 'owner@surface-matrix.example', 'Owner A');
    clients.owner = owner.client;
    const orgId = (await owner.client.post('/api/organizations', { name: 'Org A' }).expect(201)).body.organization.id as string;
    for (const role of ['analyst', 'planner', 'executive'] as const) {
      const u = await testUserSignedIn(ds, `${role}@surface-matrix.example`, `${role} A`);
      await testMembershipAdd(ds, orgId, u.userId, role);
      clients[role] = u.client;
    }
    clients.outsider = (await testUserSignedIn(ds, 'owner-b@surface-matrix.example', 'Owner B')).client;
    await clients.outsider.post('/api/organizations', { name: 'Org B' }).expect(201);
    clients.anonymous = await testClient(ds);
    const wsId = (await owner.client.post(`/api/organizations/${orgId}/workspaces`, { name: 'A study' }).expect(201)).body.workspace.id;
    const fileId = await customerFileStored(ds, orgId, wsId, points);
    ids = { orgId, wsId, fileId };
    await creditsGrant(ds.orm.em.fork(), orgId, 10_000, 'matrix', 'test credits');
    succeeded = await surfaceStored(ds, ids, points, 'succeeded');
    fine = await surfaceStored(ds, ids, points, 'succeeded', { kernel: 'quartic', bandwidth: { mode: 'value', value: 400 } });
  });
  afterAll(() => ds.close());

  async function pathOf(row: RouteRow): Promise<string> {
    const surfaceId = row.fresh ? await surfaceStored(ds, ids, points, row.fresh) : succeeded;
    return row.route.replace(':orgId', ids.orgId).replace(':workspaceId', ids.wsId).replaceAll(':surfaceId', surfaceId);
  }

  for (const row of MATRIX) {
    it(`${row.method} ${row.route}`, async () => {
      const actual: Record<string, number> = {};
      const expected: Record<string, number> = {};
      const body = row.body ? JSON.parse(JSON.stringify(row.body).replace(':fileId', ids.fileId)) : undefined;
      for (const caller of CALLERS) {
        const path = await pathOf(row);
        const c = clients[caller];
        const res = row.method === 'GET' ? await c.get(path) : row.method === 'POST' ? await c.post(path, body) : await c.del(path);
        actual[caller] = res.status;
        expected[caller] = expectedStatus(row, caller);
        if (res.status >= 400) expect(res.body.error?.code, `${caller}: error body`).toBeTypeOf('string');
      }
      expect(actual).toEqual(expected);
    });
  }

  it('keeps executives away from surfaces finer than 564 m, with the reason', async () => {
    const path = `${S}/${fine}/web-raster`.replace(':orgId', ids.orgId).replace(':workspaceId', ids.wsId);
    const res = await clients.executive.get(path).expect(403);
    expect(res.body.error.code).toBe('PRIVACY_MIN_BANDWIDTH');
    expect(res.body.error.message).toMatch(/564 m/);
    await clients.analyst.get(path).expect(200);
  });

  it("org B's member gets 404 for org A's surfaces even through org B's own path", async () => {
    const orgB = (await clients.outsider.get('/api/organizations').expect(200)).body.organizations[0].id;
    const res = await clients.outsider.get(`/api/organizations/${orgB}/workspaces/${ids.wsId}/surfaces/${succeeded}`);
    expect(res.status).toBe(404);
  });
});
