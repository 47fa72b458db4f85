import { kdeBinnedMultiBandwidth, rankStabilityFromSurfaces, type ScoringSurface } from '@demandscape/core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DemandscapeApp } from '../src/app.js';
import { SurfaceSchema } from '../src/modules/surface/surface.entity.js';
import { quillportAt, SCORING_SITES, scoringRunWait, storedScoringSurface } from './scoring-fixtures.js';
import { customerFileStored, demoPoints, surfaceStored } from './surface-fixtures.js';
import { testAppCreate, testUserSignedIn, type TestClient } from './utils.js';

describe('scoring runs: rank stability across bandwidths', { timeout: 180_000 }, () => {
  let ds: DemandscapeApp;
  let owner: TestClient;
  let ids: { orgId: string; wsId: string; fileId: string };
  let base: string;
  let surfaceId: string;
  const points = demoPoints(2500, 21);
  const siteIds: Record<string, string> = {};

  beforeAll(async () => {
    ds = await testAppCreate({ RUNNER_CONCURRENCY: '2' });
    owner = (await testUserSignedIn(ds, 'odile@larchloaf.example', 'Odile Owner')).client;
    const orgId = (await owner.post('/api/organizations', { name: 'Larchloaf' }).expect(201)).body.organization.id;
    const wsId = (await owner.post(`/api/organizations/${orgId}/workspaces`, { name: 'Quillport harbour' }).expect(201)).body.workspace.id;
    const fileId = await customerFileStored(ds, orgId, wsId, points);
    ids = { orgId, wsId, fileId };
    base = `/api/organizations/${orgId}/workspaces/${wsId}`;
    surfaceId = await surfaceStored(ds, ids, points, 'succeeded');
    for (const s of SCORING_SITES) siteIds[s.name] = (await owner.post(`${base}/sites`, s).expect(201)).body.site.id;
  }, 240_000);
  afterAll(() => ds.close());

  const runPath = (id: string): string => `${base}/scoring-runs/${id}`;

  it('rescored at 0.5, 0.75, 1.5 and 2 × the bandwidth on the same grid gives rank ranges and τ equal to core called directly', async () => {
    const id = (await owner.post(`${base}/scoring-runs`, { surfaceId }).expect(202)).body.run.id;
    const run = await scoringRunWait(owner, runPath(id), (r) => r.status === 'succeeded' || r.status === 'failed');
    expect(run.status).toBe('succeeded');
    const started = (await owner.post(`${runPath(id)}/stability`).expect(202)).body.run;
    expect(started.stability.status).toBe('running');
    const done = await scoringRunWait(owner, runPath(id), (r) => r.stability?.status !== 'running');
    const st = done.stability;
    expect(st.error).toBeNull();
    expect(st.status).toBe('succeeded');
    expect(st.factors).toEqual([0.5, 0.75, 1, 1.5, 2]);
    expect(st.variants.map((v: { bandwidthM: number }) => v.bandwidthM)).toEqual([750, 1125, 1500, 2250, 3000]);
    expect(st.variants[2].tau).toBe(1);
    // [CP] flag rule of the engine: more than max(2, 20 % of 4 candidates) = 2 places.
    expect(st.threshold).toBe(2);
    expect(st.finishedAt).toBeTypeOf('string');
    const rankOf = new Map(done.results.candidates.map((c: { siteId: string; rank: number }) => [c.siteId, c.rank]));
    for (const s of st.sites) {
      expect(s.baseRank).toBe(rankOf.get(s.siteId));
      expect(s.ranks).toHaveLength(5);
      expect(s.ranks[2]).toBe(s.baseRank);
      expect(s.minRank).toBe(Math.min(...s.ranks));
      expect(s.maxRank).toBe(Math.max(...s.ranks));
      expect(s.unstable).toBe(s.maxShift > st.threshold);
    }

    // The same check with core called directly: points projected with the surface's proj4, binned on its grid.
    const { surface, project } = await storedScoringSurface(ds, surfaceId);
    const s0 = await ds.orm.em.fork().findOneOrFail(SurfaceSchema, surfaceId);
    const planar = SCORING_SITES.map((s) => project(siteIds[s.name], s.kind, s.lon, s.lat, s.attractiveness));
    const xy = Array.from({ length: points.count }, (_, k) => project('p', 'own', points.lon[k], points.lat[k], 1));
    const pts = { x: Float64Array.from(xy, (p) => p.x), y: Float64Array.from(xy, (p) => p.y), w: points.w };
    const others = [0.5, 0.75, 1.5, 2];
    const built = kdeBinnedMultiBandwidth(pts, s0.resolved!.grid, 'quartic', others.map((f) => f * 1500));
    const variants = [0.5, 0.75, 1, 1.5, 2].map((factor): { factor: number; surface: ScoringSurface } =>
      factor === 1 ? { factor, surface } : { factor, surface: { spec: surface.spec, values: built[others.indexOf(factor)].values.map((v) => v * 1e6) } },
    );
    const direct = rankStabilityFromSurfaces(variants, planar, { alpha: 1, beta: 2, radii: [1000, 3000, 5000], measure: 'netNew' });
    expect(st.variants.map((v: { tau: number }) => v.tau)).toEqual(direct.variants.map((v) => v.tau));
    for (const s of direct.sites) {
      expect(st.sites.find((x: { siteId: string }) => x.siteId === s.id)).toMatchObject({ minRank: s.minRank, maxRank: s.maxRank, maxShift: s.maxShift, unstable: s.unstable });
    }
  });

  it('refuses with a clear reason: run not finished, fewer than 2 candidates, customer file deleted', async () => {
    const ws = (await owner.post(`/api/organizations/${ids.orgId}/workspaces`, { name: 'Single' }).expect(201)).body.workspace.id;
    const b = `/api/organizations/${ids.orgId}/workspaces/${ws}`;
    const fileId = await customerFileStored(ds, ids.orgId, ws, points);
    const sId = await surfaceStored(ds, { orgId: ids.orgId, wsId: ws, fileId }, points, 'succeeded');
    await owner.post(`${b}/sites`, { kind: 'candidate', name: 'Only one', ...quillportAt(0, 0), attractiveness: 1 }).expect(201);
    const single = (await owner.post(`${b}/scoring-runs`, { surfaceId: sId }).expect(202)).body.run.id;
    const early = await owner.post(`${b}/scoring-runs/${single}/stability`);
    if (early.status === 409) expect(early.body.error.code).toBe('RUN_NOT_READY');
    await scoringRunWait(owner, `${b}/scoring-runs/${single}`, (r) => r.status === 'succeeded');
    let res = await owner.post(`${b}/scoring-runs/${single}/stability`).expect(400);
    expect(res.body.error.code).toBe('TOO_FEW_CANDIDATES');
    expect(res.body.error.message).toMatch(/at least 2 candidates; this run has 1/);

    const id = (await owner.post(`${base}/scoring-runs`, { surfaceId }).expect(202)).body.run.id;
    await scoringRunWait(owner, runPath(id), (r) => r.status === 'succeeded');
    await owner.del(`${base}/customer-files/${ids.fileId}`).expect(204);
    res = await owner.post(`${runPath(id)}/stability`).expect(409);
    expect(res.body.error.code).toBe('CUSTOMER_FILE_DELETED');
    expect(res.body.error.message).toMatch(/customer file .* was deleted/);
    // The run itself is untouched.
    expect((await owner.get(runPath(id)).expect(200)).body.run).toMatchObject({ status: 'succeeded', stability: null });
  });
});
