import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DemandscapeApp } from '../src/app.js';
import { scoredWorkspace } from './shortlist-fixtures.js';
import {
  testAppCreate,
  testClient,
  testMembershipAdd,
  testUserSignedIn,
  type TestClient,
} from './utils.js';

/** Who calls: a member of org A in each role, a member of org B only, or nobody signed in. */
const CALLERS = ['owner', 'analyst', 'planner', 'executive', 'outsider', 'anonymous'] as const;
type Caller = (typeof CALLERS)[number];
// PRODUCT.md rights table: every role reads and exports shortlists and rankings; owners and planners build and share them.
const READERS = ['owner', 'analyst', 'planner', 'executive'] as const;
const WRITERS = ['owner', 'planner'] as const;

interface RouteRow {
  method: 'GET' | 'POST' | 'PATCH' | 'DELETE';
  /** `:orgId`/`:workspaceId` of org A; `:runId` its scoring run; `:shortlistId` a fresh shortlist for every call. */
  route: string;
  body?: object;
  allowed: readonly Caller[];
  ok: number;
}

const WS = '/api/organizations/:orgId/workspaces/:workspaceId';
const SL = `${WS}/shortlists`;
const RUN = `${WS}/scoring-runs/:runId`;

/** The shortlist and report rows of THE ROLE MATRIX (PERMISSIONS 'shortlist.read' = every role, 'shortlist.write' = owner, planner; exports = 'scoring.read'). */
const MATRIX: RouteRow[] = [
  { method: 'GET', route: '/api/organizations/:orgId/shortlists', allowed: READERS, ok: 200 },
  { method: 'GET', route: SL, allowed: READERS, ok: 200 },
  {
    method: 'POST',
    route: SL,
    body: { name: 'Matrix pick', scoringRunId: ':runId', items: [{ siteId: ':candidateId' }] },
    allowed: WRITERS,
    ok: 201,
  },
  { method: 'GET', route: `${SL}/:shortlistId`, allowed: READERS, ok: 200 },
  { method: 'GET', route: `${SL}/:shortlistId?version=1`, allowed: READERS, ok: 200 },
  {
    method: 'POST',
    route: `${SL}/:shortlistId/versions`,
    body: { scoringRunId: ':runId', items: [{ siteId: ':candidateId', note: 'second look' }] },
    allowed: WRITERS,
    ok: 201,
  },
  {
    method: 'PATCH',
    route: `${SL}/:shortlistId`,
    body: { name: 'Matrix pick, renamed' },
    allowed: WRITERS,
    ok: 200,
  },
  { method: 'DELETE', route: `${SL}/:shortlistId`, allowed: WRITERS, ok: 204 },
  {
    method: 'POST',
    route: `${SL}/:shortlistId/share`,
    body: { message: 'For the board' },
    allowed: WRITERS,
    ok: 200,
  },
  { method: 'GET', route: `${SL}/:shortlistId/export.xlsx`, allowed: READERS, ok: 200 },
  { method: 'GET', route: `${RUN}/export.xlsx`, allowed: READERS, ok: 200 },
  { method: 'GET', route: `${RUN}/ranking.csv`, allowed: READERS, ok: 200 },
  { method: 'GET', route: `${RUN}/sites.geojson`, allowed: READERS, ok: 200 },
];

function expectedStatus(row: RouteRow, caller: Caller): number {
  if (row.allowed.includes(caller)) return row.ok;
  if (caller === 'anonymous') return 401;
  if (caller === 'outsider') return 404;
  return 403;
}

describe('role matrix: shortlists and reports', { timeout: 180_000 }, () => {
  let ds: DemandscapeApp;
  const clients = {} as Record<Caller, TestClient>;
  let ids: { orgId: string; orgB: string; wsId: string; runId: string; candidateId: string };

  beforeAll(async () => {
    ds = await testAppCreate();
    const owner = await testUserSignedIn(ds, 'owner@shortlist-matrix.example', 'Owner A');
    clients.owner = owner.client;
    const orgId = (await owner.client.post('/api/organizations', { name: 'Org A' }).expect(201))
      .body.organization.id as string;
    for (const role of ['analyst', 'planner', 'executive'] as const) {
      const u = await testUserSignedIn(ds, `${role}@shortlist-matrix.example`, `${role} A`);
      await testMembershipAdd(ds, orgId, u.userId, role);
      clients[role] = u.client;
    }
    clients.outsider = (
      await testUserSignedIn(ds, 'owner-b@shortlist-matrix.example', 'Owner B')
    ).client;
    const orgB = (await clients.outsider.post('/api/organizations', { name: 'Org B' }).expect(201))
      .body.organization.id as string;
    clients.anonymous = await testClient(ds);
    const w = await scoredWorkspace(ds, owner.client, orgId);
    ids = { orgId, orgB, wsId: w.wsId, runId: w.runId, candidateId: w.siteIds['Quay corner'] };
  });
  afterAll(() => ds.close());

  const fill = (text: string, shortlistId = '') =>
    text
      .replace(':orgId', ids.orgId)
      .replace(':workspaceId', ids.wsId)
      .replace(':runId', ids.runId)
      .replace(':candidateId', ids.candidateId)
      .replace(':shortlistId', shortlistId);

  async function shortlistFresh(): Promise<string> {
    const body = { name: 'Fresh', scoringRunId: ids.runId, items: [{ siteId: ids.candidateId }] };
    return (await clients.owner.post(fill(SL), body).expect(201)).body.shortlist.id;
  }

  for (const row of MATRIX) {
    it(`${row.method} ${row.route}`, async () => {
      const actual: Record<string, number> = {};
      const expected: Record<string, number> = {};
      for (const caller of CALLERS) {
        const path = fill(
          row.route,
          row.route.includes(':shortlistId') ? await shortlistFresh() : '',
        );
        const body = row.body ? JSON.parse(fill(JSON.stringify(row.body))) : undefined;
        const c = clients[caller];
        const res =
          row.method === 'GET'
            ? await c.get(path)
            : row.method === 'POST'
              ? await c.post(path, body)
              : row.method === 'PATCH'
                ? await c.patch(path, body)
                : await c.del(path);
        actual[caller] = res.status;
        expected[caller] = expectedStatus(row, caller);
        if (res.status >= 400)
          expect(res.body.error?.code, `${caller}: error body`).toBeTypeOf('string');
      }
      expect(actual).toEqual(expected);
    });
  }

  it("another organization's member gets 404 for org A's workspace, shortlist and run under their own organization", async () => {
    const shortlistId = await shortlistFresh();
    const underB = (route: string) => fill(route, shortlistId).replace(ids.orgId, ids.orgB);
    for (const route of [
      `${SL}/:shortlistId`,
      `${SL}/:shortlistId/export.xlsx`,
      `${RUN}/ranking.csv`,
      SL,
    ]) {
      const res = await clients.outsider.get(underB(route)).expect(404);
      expect(res.body.error.code).toBe('NOT_FOUND');
    }
    await clients.outsider.patch(underB(`${SL}/:shortlistId`), { name: 'Taken' }).expect(404);
    const orgBList = (
      await clients.outsider.get(`/api/organizations/${ids.orgB}/shortlists`).expect(200)
    ).body.shortlists;
    expect(orgBList).toEqual([]);
  });
});
