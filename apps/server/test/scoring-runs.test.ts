import { siteRanking, siteScores, siteSetScore } from '@demandscape/core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DemandscapeApp } from '../src/app.js';
import { SurfaceRasterSchema, SurfaceSchema } from '../src/modules/surface/surface.entity.js';
import { ScoringRunSchema } from '../src/modules/scoring/scoring-run.entity.js';
import { SiteSchema } from '../src/modules/site/site.entity.js';
import { quillportAt, SCORING_SITES, scoringRunWait, storedScoringSurface } from './scoring-fixtures.js';
import { customerFileStored, demoPoints, surfaceStored } from './surface-fixtures.js';
import { testAppCreate, testUserSignedIn, type TestClient } from './utils.js';

describe('scoring runs: settings, Huff scores, ranking, snapshots, failures', { timeout: 120_000 }, () => {
  let ds: DemandscapeApp;
  let planner: TestClient;
  let ids: { orgId: string; wsId: string; fileId: string };
  let base: string;
  let surfaceId: string;
  const points = demoPoints(2000, 11);
  const siteIds: Record<string, string> = {};

  beforeAll(async () => {
    ds = await testAppCreate({ RUNNER_CONCURRENCY: '2' });
    planner = (await testUserSignedIn(ds, 'pia@larchloaf.example', 'Pia Planner')).client;
    const orgId = (await planner.post('/api/organizations', { name: 'Larchloaf' }).expect(201)).body.organization.id;
    const wsId = (await planner.post(`/api/organizations/${orgId}/workspaces`, { name: 'Quillport harbour' }).expect(201)).body.workspace.id;
    const fileId = await customerFileStored(ds, orgId, wsId, points);
    ids = { orgId, wsId, fileId };
    base = `/api/organizations/${orgId}/workspaces/${wsId}`;
    surfaceId = await surfaceStored(ds, ids, points, 'succeeded');
    for (const s of SCORING_SITES) siteIds[s.name] = (await planner.post(`${base}/sites`, s).expect(201)).body.site.id;
  }, 240_000);
  afterAll(() => ds.close());

  const runPath = (id: string): string => `${base}/scoring-runs/${id}`;
  const put = (path: string, body: object) => planner.agent.put(path).set('x-csrf-token', planner.token).send(body);

  it('serves the defaults until a planner saves settings, then the saved ones', async () => {
    const d = (await planner.get(`${base}/scoring-settings`).expect(200)).body.settings;
    expect(d).toMatchObject({ alpha: 1, beta: 2, radii: [1, 3, 5], radiusUnit: 'km', measure: 'netNew', minDistanceM: null, isDefault: true, updatedBy: null });
    const saved = (await put(`${base}/scoring-settings`, { alpha: 1, beta: 2, radii: [1, 2, 4], radiusUnit: 'km', measure: 'netNew', minDistanceM: null }).expect(200)).body.settings;
    expect(saved).toMatchObject({ radii: [1, 2, 4], isDefault: false, updatedBy: { name: 'Pia Planner' } });
    expect((await planner.get(`${base}/scoring-settings`).expect(200)).body.settings.radii).toEqual([1, 2, 4]);
  });

  it('rejects bad settings with the field and a specific message', async () => {
    const ok = { alpha: 1, beta: 2, radii: [1, 3, 5], radiusUnit: 'km', measure: 'netNew', minDistanceM: null };
    const cases: Array<[object, string, RegExp]> = [
      [{ ...ok, alpha: 0.05 }, 'alpha', /at least 0\.1/],
      [{ ...ok, alpha: 6 }, 'alpha', /at most 5/],
      [{ ...ok, beta: 0.2 }, 'beta', /at least 0\.5/],
      [{ ...ok, radii: [3, 1] }, 'radii.1', /ascending/],
      [{ ...ok, radii: [1, 2, 3, 4, 5, 6] }, 'radii', /at most 5/],
      [{ ...ok, radii: [] }, 'radii', /at least one/],
      [{ ...ok, radii: [10, 60] }, 'radii.1', /larger than 50 km/],
      [{ ...ok, radii: [10, 40], radiusUnit: 'mi' }, 'radii.1', /31\.07 mi/],
      [{ ...ok, measure: 'ring:3' }, 'measure', /ring:0 … ring:2/],
      [{ ...ok, measure: 'footfall' }, 'measure', /netNew, captured/],
      [{ ...ok, radiusUnit: 'ft' }, 'radiusUnit', /km or mi/],
      [{ ...ok, minDistanceM: 0 }, 'minDistanceM', /at least 1 m/],
      [{ ...ok, minDistanceM: 6000 }, 'minDistanceM', /at most 5,000 m/],
    ];
    for (const [body, field, message] of cases) {
      const res = await put(`${base}/scoring-settings`, body).expect(400);
      expect(res.body.error.field, JSON.stringify(body)).toBe(field);
      expect(res.body.error.message).toMatch(message);
    }
  });

  it('scores every candidate in a worker and matches core called directly on the stored surface', async () => {
    const created = await planner.post(`${base}/scoring-runs`, { surfaceId, name: 'Harbour first look' }).expect(202);
    expect(['queued', 'running', 'succeeded']).toContain(created.body.run.status);
    expect(created.body.run.candidateCount).toBe(4);
    const run = await scoringRunWait(planner, runPath(created.body.run.id), (r) => r.status === 'succeeded' || r.status === 'failed');
    expect(run.error).toBeNull();
    expect(run.status).toBe('succeeded');
    expect(run.progress).toBe(1);
    expect(run.settings.radiiM).toEqual([1000, 2000, 4000]);
    expect(run.weightLabel).toBe('visits per year');
    expect(run.surface).toMatchObject({ bandwidthM: 1500, kernel: 'quartic' });
    expect(run.sites).toHaveLength(SCORING_SITES.length);
    expect(Object.keys(run.timings)).toEqual(expect.arrayContaining(['prepare', 'huff', 'rank']));
    // No competitor-free or store-free warnings here; Far Point (5.5 km E, 5 km S) is still on the grid.
    expect(run.warnings).toEqual([]);

    const { surface, project } = await storedScoringSurface(ds, surfaceId);
    const sites = SCORING_SITES.map((s) => project(siteIds[s.name], s.kind, s.lon, s.lat, s.attractiveness));
    const direct = siteScores(surface, sites, { alpha: 1, beta: 2, radii: [1000, 2000, 4000] });
    const ranking = siteRanking(direct.candidates, 'netNew');
    expect(run.results.totalDemand).toBeCloseTo(direct.totalDemand, 6);
    expect(run.results.candidates.map((c: { siteId: string }) => c.siteId)).toEqual(ranking.map((r) => r.id));
    for (const c of run.results.candidates) {
      const d = direct.candidates.find((x) => x.id === c.siteId)!;
      expect(c.captured).toBeCloseTo(d.captured, 6);
      expect(c.cannibalization).toBeCloseTo(d.cannibalization, 6);
      expect(c.netNew).toBeCloseTo(c.captured - c.cannibalization, 6);
      expect(c.value).toBeCloseTo(c.netNew, 6);
      expect(c.rings.map((r: { radiusM: number }) => r.radiusM)).toEqual([1000, 2000, 4000]);
      // Per-store losses add up to the total and carry the stores' names.
      expect(c.cannibalizedFrom.reduce((s: number, l: { demand: number }) => s + l.demand, 0)).toBeCloseTo(c.cannibalization, 6);
      expect(c.cannibalizedFrom.map((l: { name: string }) => l.name).sort()).toEqual(['Harbour Row', 'Tidewater Market']);
      expect(c.explanation).toMatch(new RegExp(`^Captures [\\d,.]+ visits per year \\([\\d.]+ % of all demand\\); .* Ranks ${c.rank} of 4 by net new demand\\.$`));
    }
    expect(run.results.candidates.map((c: { rank: number }) => c.rank)).toEqual([1, 2, 3, 4]);
    expect(run.results.ownToday.map((o: { name: string }) => o.name).sort()).toEqual(['Harbour Row', 'Tidewater Market']);
    // The list shows the run without results, newest first.
    const list = (await planner.get(`${base}/scoring-runs`).expect(200)).body.runs;
    expect(list[0]).toMatchObject({ id: run.id, status: 'succeeded', candidateCount: 4, surfaceName: 'Stored succeeded' });
    expect(list[0].results).toBeUndefined();
  });

  it('uses the saved α, β, minimum distance and ring measure, as core does with the same options', async () => {
    await put(`${base}/scoring-settings`, { alpha: 0.5, beta: 1.5, radii: [0.5, 2], radiusUnit: 'mi', measure: 'ring:1', minDistanceM: 400 }).expect(200);
    const id = (await planner.post(`${base}/scoring-runs`, { surfaceId }).expect(202)).body.run.id;
    const run = await scoringRunWait(planner, runPath(id), (r) => r.status === 'succeeded' || r.status === 'failed');
    expect(run.status).toBe('succeeded');
    expect(run.settings).toMatchObject({ alpha: 0.5, beta: 1.5, minDistanceM: 400, measure: 'ring:1' });
    expect(run.settings.radiiM).toEqual([804.672, 3218.688]);
    const { surface, project } = await storedScoringSurface(ds, surfaceId);
    const sites = SCORING_SITES.map((s) => project(siteIds[s.name], s.kind, s.lon, s.lat, s.attractiveness));
    const options = { alpha: 0.5, beta: 1.5, radii: [804.672, 3218.688], minDistanceM: 400 };
    const direct = siteScores(surface, sites, options);
    const ranking = siteRanking(direct.candidates, { ringRadius: 3218.688 });
    expect(run.results.candidates.map((c: { siteId: string }) => c.siteId)).toEqual(ranking.map((r) => r.id));
    for (const c of run.results.candidates) {
      const d = direct.candidates.find((x) => x.id === c.siteId)!;
      expect(c.captured).toBeCloseTo(d.captured, 6);
      expect(c.value).toBeCloseTo(d.rings[1].demand, 6);
      expect(c.explanation).toMatch(/by demand within 2 mi \([\d,.]+ visits per year\)\.$/);
    }
    // The default minimum distance (half a cell) gives other numbers: the option reached the engine.
    const halfCell = siteScores(surface, sites, { ...options, minDistanceM: null });
    expect(halfCell.candidates[0].captured).not.toBeCloseTo(direct.candidates[0].captured, 3);
    await put(`${base}/scoring-settings`, { alpha: 1, beta: 2, radii: [1, 2, 4], radiusUnit: 'km', measure: 'netNew', minDistanceM: null }).expect(200);
  });

  it('one candidate alone with no stores captures all the demand on the surface (closed form)', async () => {
    const ws = (await planner.post(`/api/organizations/${ids.orgId}/workspaces`, { name: 'Lone site' }).expect(201)).body.workspace.id;
    const b = `/api/organizations/${ids.orgId}/workspaces/${ws}`;
    const fileId = await customerFileStored(ds, ids.orgId, ws, points);
    const sId = await surfaceStored(ds, { orgId: ids.orgId, wsId: ws, fileId }, points, 'succeeded');
    await planner.post(`${b}/sites`, { kind: 'candidate', name: 'Only hope', ...quillportAt(0, 0), attractiveness: 1 }).expect(201);
    const id = (await planner.post(`${b}/scoring-runs`, { surfaceId: sId }).expect(202)).body.run.id;
    const run = await scoringRunWait(planner, `${b}/scoring-runs/${id}`, (r) => r.status !== 'queued' && r.status !== 'running');
    expect(run.status).toBe('succeeded');
    // [D] Huff with one store: P = 1 in every cell, so captured = Σ_c λ̂_c · A_cell, computed here from the raw raster.
    const em = ds.orm.em.fork();
    const s = await em.findOneOrFail(SurfaceSchema, sId);
    const r = await em.findOneOrFail(SurfaceRasterSchema, { surface: sId }, { populate: ['data'] });
    const raster = new Float32Array(new Uint8Array(r.data).buffer);
    const cellKm2 = (s.resolved!.grid.cellSize / 1000) ** 2;
    let total = 0;
    for (const v of raster) if (!Number.isNaN(v)) total += v * cellKm2;
    const c = run.results.candidates[0];
    expect(c.captured / total).toBeCloseTo(1, 9);
    expect(c.shareOfTotal).toBeCloseTo(1, 12);
    expect(c.cannibalization).toBe(0);
    expect(c.netNew).toBeCloseTo(c.captured, 9);
    // [D] the KDE keeps the customers' total weight when the grid covers every kernel: ≈ Σ w (binning and edge cells cost < 1 %).
    const sumW = points.w.reduce((a, v) => a + v, 0);
    expect(Math.abs(c.captured - sumW) / sumW).toBeLessThan(0.01);
    expect(c.explanation).toContain('there are no own stores');
    expect(run.warnings.join(' ')).toMatch(/No own stores: cannibalization is 0/);
    expect(run.warnings.join(' ')).toMatch(/No competitor stores/);
  });

  it('keeps a finished run as it was when sites are edited or deleted later', async () => {
    const id = (await planner.post(`${base}/scoring-runs`, { surfaceId }).expect(202)).body.run.id;
    const before = await scoringRunWait(planner, runPath(id), (r) => r.status === 'succeeded');
    await planner.patch(`${base}/sites/${siteIds['Quay corner']}`, { name: 'Quay corner (renamed)', attractiveness: 999 }).expect(200);
    const extra = (await planner.post(`${base}/sites`, { kind: 'candidate', name: 'Temporary', ...quillportAt(1, 1), attractiveness: 50 }).expect(201)).body.site.id;
    await planner.del(`${base}/sites/${extra}`).expect(204);
    const after = (await planner.get(runPath(id)).expect(200)).body.run;
    expect(after.sites).toEqual(before.sites);
    expect(after.results).toEqual(before.results);
    expect(after.sites.find((s: { siteId: string }) => s.siteId === siteIds['Quay corner']).name).toBe('Quay corner');
    await planner.patch(`${base}/sites/${siteIds['Quay corner']}`, { name: 'Quay corner', attractiveness: 120 }).expect(200);
  });

  it('warns about candidates outside the surface grid', async () => {
    const far = (await planner.post(`${base}/sites`, { kind: 'candidate', name: 'Open Water', ...quillportAt(60, 60), attractiveness: 80 }).expect(201)).body.site.id;
    const id = (await planner.post(`${base}/scoring-runs`, { surfaceId }).expect(202)).body.run.id;
    const run = await scoringRunWait(planner, runPath(id), (r) => r.status === 'succeeded');
    expect(run.warnings[0]).toMatch(/^Candidate outside the surface's grid \(Open Water\)/);
    await planner.del(`${base}/sites/${far}`).expect(204);
  });

  it('scores a set of candidates opened together and stores it on the run', async () => {
    const id = (await planner.post(`${base}/scoring-runs`, { surfaceId }).expect(202)).body.run.id;
    await scoringRunWait(planner, runPath(id), (r) => r.status === 'succeeded');
    const chosen = [siteIds['Quay corner'], siteIds['Lantern Hill']];
    const set = (await planner.post(`${runPath(id)}/sets`, { siteIds: chosen }).expect(201)).body.set;
    const { surface, project } = await storedScoringSurface(ds, surfaceId);
    const sites = SCORING_SITES.map((s) => project(siteIds[s.name], s.kind, s.lon, s.lat, s.attractiveness));
    const direct = siteSetScore(surface, sites, chosen, { alpha: 1, beta: 2, radii: [1000, 2000, 4000] });
    expect(set.name).toBe('Quay corner + Lantern Hill');
    expect(set.captured).toBeCloseTo(direct.captured, 6);
    expect(set.cannibalization).toBeCloseTo(direct.cannibalization, 6);
    expect(set.netNew).toBeCloseTo(set.captured - set.cannibalization, 6);
    expect(set.members.map((m: { name: string }) => m.name)).toEqual(['Quay corner', 'Lantern Hill']);
    expect(set.createdBy.name).toBe('Pia Planner');
    const run = (await planner.get(runPath(id)).expect(200)).body.run;
    expect(run.sets).toHaveLength(1);
    expect(run.sets[0].id).toBe(set.id);

    let res = await planner.post(`${runPath(id)}/sets`, { siteIds: [chosen[0]] }).expect(400);
    expect(res.body.error).toMatchObject({ field: 'siteIds' });
    expect(res.body.error.message).toMatch(/at least 2/);
    res = await planner.post(`${runPath(id)}/sets`, { siteIds: [chosen[0], siteIds['Harbour Row']] }).expect(400);
    expect(res.body.error).toMatchObject({ field: 'siteIds.1' });
    expect(res.body.error.message).toMatch(/not a candidate of this run/);
    res = await planner.post(`${runPath(id)}/sets`, { siteIds: [chosen[0], chosen[0]] }).expect(400);
    expect(res.body.error.message).toMatch(/listed twice/);
  });

  it('says why a run cannot start: no candidates, surface not ready, unknown surface', async () => {
    const ws = (await planner.post(`/api/organizations/${ids.orgId}/workspaces`, { name: 'Empty' }).expect(201)).body.workspace.id;
    const b = `/api/organizations/${ids.orgId}/workspaces/${ws}`;
    const fileId = await customerFileStored(ds, ids.orgId, ws, points);
    const ready = await surfaceStored(ds, { orgId: ids.orgId, wsId: ws, fileId }, points, 'succeeded');
    const queued = await surfaceStored(ds, { orgId: ids.orgId, wsId: ws, fileId }, points, 'queued');
    let res = await planner.post(`${b}/scoring-runs`, { surfaceId: ready }).expect(400);
    expect(res.body.error.code).toBe('NO_CANDIDATES');
    await planner.post(`${b}/sites`, { kind: 'candidate', name: 'One', ...quillportAt(0, 0), attractiveness: 1 }).expect(201);
    res = await planner.post(`${b}/scoring-runs`, { surfaceId: queued }).expect(409);
    expect(res.body.error).toMatchObject({ code: 'SURFACE_NOT_READY', field: 'surfaceId' });
    res = await planner.post(`${b}/scoring-runs`, { surfaceId: surfaceId }).expect(404);
    expect(res.body.error.code).toBe('NOT_FOUND');
    res = await planner.post(`${b}/scoring-runs`, {}).expect(400);
    expect(res.body.error.field).toBe('surfaceId');
  });

  it('a failing run stores a clear error and leaves other runs and sites untouched', async () => {
    const good = (await planner.post(`${base}/scoring-runs`, { surfaceId }).expect(202)).body.run.id;
    const goodRun = await scoringRunWait(planner, runPath(good), (r) => r.status === 'succeeded');
    // A surface whose raster row is missing: the worker input cannot be built.
    const broken = await surfaceStored(ds, ids, points, 'succeeded');
    await ds.orm.em.fork().nativeDelete(SurfaceRasterSchema, { surface: broken });
    const id = (await planner.post(`${base}/scoring-runs`, { surfaceId: broken }).expect(202)).body.run.id;
    const failed = await scoringRunWait(planner, runPath(id), (r) => r.status === 'failed' || r.status === 'succeeded');
    expect(failed.status).toBe('failed');
    expect(failed.error.code).toBe('SURFACE_NOT_READY');
    expect(failed.error.message).toMatch(/no stored raster; compute the surface again/);
    expect(failed.results).toBeNull();
    expect((await planner.get(runPath(good)).expect(200)).body.run.results).toEqual(goodRun.results);
    expect(await ds.orm.em.fork().count(SiteSchema, { workspace: ids.wsId })).toBe(SCORING_SITES.length);
  });

  it('fails work orphaned by a stopped server with a reason when it is read', async () => {
    const id = (await planner.post(`${base}/scoring-runs`, { surfaceId }).expect(202)).body.run.id;
    await scoringRunWait(planner, runPath(id), (r) => r.status === 'succeeded');
    await ds.orm.em.fork().nativeUpdate(ScoringRunSchema, { id }, { status: 'running', results: null, claimedBy: 'scoring:gone-host:1:dead', heartbeatAt: new Date(Date.now() - 120_000) });
    const run = (await planner.get(runPath(id)).expect(200)).body.run;
    expect(run.status).toBe('failed');
    expect(run.error).toMatchObject({ code: 'SERVER_RESTARTED' });
    expect(run.error.message).toMatch(/server stopped/);
  });

  it('keeps results when the surface is deleted (surfaceName stays) and deletes runs with 204', async () => {
    const sId = await surfaceStored(ds, ids, points, 'succeeded');
    const id = (await planner.post(`${base}/scoring-runs`, { surfaceId: sId }).expect(202)).body.run.id;
    const before = await scoringRunWait(planner, runPath(id), (r) => r.status === 'succeeded');
    await ds.orm.em.fork().nativeDelete(SurfaceSchema, { id: sId });
    const after = (await planner.get(runPath(id)).expect(200)).body.run;
    expect(after.surfaceName).toBe('Stored succeeded');
    expect(after.results).toEqual(before.results);
    const res = await planner.post(`${runPath(id)}/sets`, { siteIds: [siteIds['Quay corner'], siteIds['Lantern Hill']] }).expect(409);
    expect(res.body.error.code).toBe('SURFACE_DELETED');
    await planner.del(runPath(id)).expect(204);
    await planner.get(runPath(id)).expect(404);
  });
});
