import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DemandscapeApp } from '../src/app.js';
import { ScoringRunSchema } from '../src/modules/scoring/scoring-run.entity.js';
import { quillportAt, scoringRunWait } from './scoring-fixtures.js';
import { customerFileStored, demoPoints, surfaceStored } from './surface-fixtures.js';
import { testAppCreate, testClient, testMembershipAdd, testUserSignedIn, type TestClient } from './utils.js';

/** Who calls: a member of org A in each role, a member of org B only, or nobody signed in. */
const CALLERS = ['owner', 'analyst', 'planner', 'executive', 'outsider', 'anonymous'] as const;
type Caller = (typeof CALLERS)[number];
// PRODUCT.md rights table: every role reads rankings (executives included); owners and planners score.
const READERS = ['owner', 'analyst', 'planner', 'executive'] as const;
const WRITERS = ['owner', 'planner'] as const;

interface RouteRow {
  method: 'GET' | 'PUT' | 'POST' | 'DELETE';
  /** `:orgId`/`:workspaceId` of org A; `:runId` a succeeded run, or a fresh one per call when `fresh`. */
  route: string;
  body?: object;
  allowed: readonly Caller[];
  ok: number;
  fresh?: boolean;
}

const W = '/api/organizations/:orgId/workspaces/:workspaceId';
const SETTINGS = { alpha: 1, beta: 2, radii: [1, 3, 5], radiusUnit: 'km', measure: 'netNew', minDistanceM: null };

/** The scoring rows of THE ROLE MATRIX (PERMISSIONS 'scoring.read' = every role, 'scoring.write' = owner, planner). */
const MATRIX: RouteRow[] = [
  { method: 'GET', route: `${W}/scoring-settings`, allowed: READERS, ok: 200 },
  { method: 'PUT', route: `${W}/scoring-settings`, body: SETTINGS, allowed: WRITERS, ok: 200 },
  { method: 'GET', route: `${W}/scoring-runs`, allowed: READERS, ok: 200 },
  { method: 'POST', route: `${W}/scoring-runs`, body: { surfaceId: ':surfaceId' }, allowed: WRITERS, ok: 202 },
  { method: 'GET', route: `${W}/scoring-runs/:runId`, allowed: READERS, ok: 200 },
  { method: 'POST', route: `${W}/scoring-runs/:runId/stability`, allowed: WRITERS, ok: 202, fresh: true },
  { method: 'POST', route: `${W}/scoring-runs/:runId/sets`, body: { siteIds: [':c1', ':c2'] }, allowed: WRITERS, ok: 201 },
  { method: 'DELETE', route: `${W}/scoring-runs/:runId`, allowed: WRITERS, ok: 204, fresh: true },
];

function expectedStatus(row: RouteRow, caller: Caller): number {
  if (row.allowed.includes(caller)) return row.ok;
  if (caller === 'anonymous') return 401;
  if (caller === 'outsider') return 404;
  return 403;
}

describe('role matrix: scoring', { timeout: 240_000 }, () => {
  let ds: DemandscapeApp;
  const clients = {} as Record<Caller, TestClient>;
  let ids: { orgId: string; wsId: string; fileId: string; surfaceId: string; runId: string; c1: string; c2: string };
  const points = demoPoints(1200, 5);

  beforeAll(async () => {
    ds = await testAppCreate();
    const owner = await testUserSignedIn(ds, 'owner@scoring-matrix.example', 'Owner A');
    clients.owner = owner.client;
    const orgId = (await owner.client.post('/api/organizations', { name: 'Org A' }).expect(201)).body.organization.id as string;
    for (const role of ['analyst', 'planner', 'executive'] as const) {
      const u = await testUserSignedIn(ds, `${role}@scoring-matrix.example`, `${role} A`);
      await testMembershipAdd(ds, orgId, u.userId, role);
      clients[role] = u.client;
    }
    clients.outsider = (await testUserSignedIn(ds, 'owner-b@scoring-matrix.example', 'Owner B')).client;
    await clients.outsider.post('/api/organizations', { name: 'Org B' }).expect(201);
    clients.anonymous = await testClient(ds);
    const wsId = (await owner.client.post(`/api/organizations/${orgId}/workspaces`, { name: 'A study' }).expect(201)).body.workspace.id;
    const fileId = await customerFileStored(ds, orgId, wsId, points);
    const surfaceId = await surfaceStored(ds, { orgId, wsId, fileId }, points, 'succeeded');
    const base = `/api/organizations/${orgId}/workspaces/${wsId}`;
    const c1 = (await owner.client.post(`${base}/sites`, { kind: 'candidate', name: 'North quay', ...quillportAt(0.5, 0.5), attractiveness: 100 }).expect(201)).body.site.id;
    const c2 = (await owner.client.post(`${base}/sites`, { kind: 'candidate', name: 'South quay', ...quillportAt(-1, -1), attractiveness: 100 }).expect(201)).body.site.id;
    await owner.client.post(`${base}/sites`, { kind: 'own', name: 'Harbour Row', ...quillportAt(0, 0), attractiveness: 100 }).expect(201);
    ids = { orgId, wsId, fileId, surfaceId, runId: '', c1, c2 };
    ids.runId = await runSucceeded();
  }, 240_000);
  afterAll(() => ds.close());

  async function runSucceeded(): Promise<string> {
    const base = `/api/organizations/${ids.orgId}/workspaces/${ids.wsId}/scoring-runs`;
    const id = (await clients.owner.post(base, { surfaceId: ids.surfaceId }).expect(202)).body.run.id;
    await scoringRunWait(clients.owner, `${base}/${id}`, (r) => r.status === 'succeeded');
    return id;
  }

  /** A copy of the succeeded run under a new id (as a finished run would be stored), so each call has its own. */
  async function runCopy(): Promise<string> {
    const em = ds.orm.em.fork();
    const run = await em.findOneOrFail(ScoringRunSchema, ids.runId, { populate: ['sites', 'results'] });
    const id = randomUUID();
    const { id: _id, createdAt: _c, updatedAt: _u, ...rest } = run;
    em.create(ScoringRunSchema, { ...rest, id, createdAt: new Date(), updatedAt: new Date() } as never);
    await em.flush();
    return id;
  }

  async function pathOf(row: RouteRow): Promise<string> {
    const runId = row.fresh ? await runCopy() : ids.runId;
    return row.route.replace(':orgId', ids.orgId).replace(':workspaceId', ids.wsId).replace(':runId', runId);
  }

  for (const row of MATRIX) {
    it(`${row.method} ${row.route}`, async () => {
      const actual: Record<string, number> = {};
      const expected: Record<string, number> = {};
      const body = row.body ? JSON.parse(JSON.stringify(row.body).replace(':surfaceId', ids.surfaceId).replace(':c1', ids.c1).replace(':c2', ids.c2)) : undefined;
      for (const caller of CALLERS) {
        const path = await pathOf(row);
        const c = clients[caller];
        const res =
          row.method === 'GET'
            ? await c.get(path)
            : row.method === 'PUT'
              ? await c.agent.put(path).set('x-csrf-token', c.token).send(body)
              : row.method === 'POST'
                ? await c.post(path, body)
                : await c.del(path);
        actual[caller] = res.status;
        expected[caller] = expectedStatus(row, caller);
        if (res.status >= 400) expect(res.body.error?.code, `${caller}: error body`).toBeTypeOf('string');
      }
      expect(actual).toEqual(expected);
    });
  }

  it('an executive reads the ranking with its explanations', async () => {
    const res = await clients.executive.get(`/api/organizations/${ids.orgId}/workspaces/${ids.wsId}/scoring-runs/${ids.runId}`).expect(200);
    expect(res.body.run.results.candidates).toHaveLength(2);
    expect(res.body.run.results.candidates[0].explanation).toMatch(/^Captures /);
  });

  it("org B's member gets 404 for org A's runs even through org B's own path", async () => {
    const orgB = (await clients.outsider.get('/api/organizations').expect(200)).body.organizations[0].id;
    const res = await clients.outsider.get(`/api/organizations/${orgB}/workspaces/${ids.wsId}/scoring-runs/${ids.runId}`);
    expect(res.status).toBe(404);
  });
});
