import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DemandscapeApp } from '../src/app.js';
import { creditsBalance, creditsGrant } from '../src/modules/billing/credits.service.js';
import { customerFileStored, demoPoints, surfaceWait } from './surface-fixtures.js';
import { testAppCreate, testUserSignedIn, type TestClient } from './utils.js';

interface SurfaceBody {
  id: string;
  status: string;
  progress: number;
  attempts: number;
  [key: string]: unknown;
}

describe('surface runs: lifecycle and results', { timeout: 240_000 }, () => {
  let ds: DemandscapeApp;
  let owner: TestClient;
  let base: string;
  let fileId: string;
  const points = demoPoints(3000);
  const sumW = points.w.reduce((a, b) => a + b, 0);

  const get = async (id: string): Promise<SurfaceBody> => (await owner.get(`${base}/surfaces/${id}`).expect(200)).body.surface;

  beforeAll(async () => {
    ds = await testAppCreate({ RUNNER_CONCURRENCY: '2' });
    const o = await testUserSignedIn(ds, 'maren@larchloaf.example', 'Maren Larchwood');
    owner = o.client;
    const orgId = (await owner.post('/api/organizations', { name: 'Larchloaf' }).expect(201)).body.organization.id;
    const wsId = (await owner.post(`/api/organizations/${orgId}/workspaces`, { name: 'Quillport harbour' }).expect(201)).body.workspace.id;
    base = `/api/organizations/${orgId}/workspaces/${wsId}`;
    fileId = await customerFileStored(ds, orgId, wsId, points);
    await creditsGrant(ds.orm.em.fork(), orgId, 10_000, 'surface-tests', 'test credits');
  });
  afterAll(() => ds.close());

  it('runs queued → running → succeeded and stores params, resolved values, timings and the engine version', async () => {
    const created = await owner
      .post(`${base}/surfaces`, { customerFileId: fileId, name: 'Harbour visits', kernel: 'quartic', bandwidth: { mode: 'value', value: 1500 }, studyArea: { type: 'extent' }, unit: 'km2' })
      .expect(201);
    const s0 = created.body.surface;
    const afterReserve = await creditsBalance(ds.orm.em.fork(), base.split('/')[3]);
    expect(s0.status).toBe('queued');
    expect(s0.params.kernel).toBe('quartic');
    expect(s0.pointCount).toBe(3000);
    expect(s0.costCredits).toBeGreaterThanOrEqual(1);
    await ds.surfaceRunner.start();
    const s = await surfaceWait(() => get(s0.id), (x) => x.status === 'succeeded' || x.status === 'failed');
    expect(s.error).toBeNull();
    expect(s.status).toBe('succeeded');
    expect(s.progress).toBe(1);
    expect(s.attempts).toBe(1);
    expect(s.engineVersion).toMatch(/^\d+\.\d+\.\d+/);
    expect(s.startedAt).toBeTypeOf('string');
    expect(s.finishedAt).toBeTypeOf('string');
    const resolved = s.resolved as { bandwidth: { value: number; rule: string }; cellSize: { value: number }; projection: { epsg: number } };
    expect(resolved.bandwidth).toMatchObject({ value: 1500, rule: 'manual' });
    // Quillport (−38.5°) lies in UTM zone 24 north: zone = ⌊(lon + 180) / 6⌋ + 1 [S: NIMA TM 8358.2].
    expect(resolved.projection.epsg).toBe(32624);
    expect(Object.keys(s.timings as object)).toEqual(expect.arrayContaining(['project', 'bandwidth', 'grid', 'density', 'contours']));
    const stats = s.stats as { totalWeight: number; integral: number; pointCount: number };
    expect(stats.totalWeight).toBe(sumW);
    // The grid is the points' extent padded by the kernel radius, so every kernel lies inside:
    // Σ intensity × cell area = Σ w [D: each kernel integrates to 1].
    expect(Math.abs(stats.integral - sumW) / sumW).toBeLessThan(0.01);
    const thresholds = s.thresholds as { percent: number; threshold: number; areaKm2: number }[];
    expect(thresholds.map((t) => t.percent)).toEqual([50, 75, 90]);
    // A larger share of demand needs a lower boundary value and a larger area.
    expect(thresholds[0].threshold).toBeGreaterThan(thresholds[2].threshold);
    expect(thresholds[0].areaKm2).toBeLessThan(thresholds[2].areaKm2);
    // Reserved when queued, charged on success: the balance is down by the run's cost.
    expect(await creditsBalance(ds.orm.em.fork(), base.split('/')[3])).toBe(afterReserve);
    const ledger = (await ds.orm.em.fork().getConnection().execute('select `kind` from `credit_entries` where `ref` like ?', [`surface:${s0.id}:%`], 'all')) as { kind: string }[];
    expect(ledger.map((e) => e.kind).sort()).toEqual(['charge', 'reservation']);
    const mail = ds.mailbox.find((m) => m.to === 'maren@larchloaf.example' && m.subject.includes('Harbour visits'));
    expect(mail?.subject).toBe('Demand surface ready: Harbour visits');
    expect(mail?.text).toContain(`/workspaces/`);
  });

  it('serves the web raster, values and contours of a finished run', async () => {
    const list = (await owner.get(`${base}/surfaces`).expect(200)).body.surfaces as SurfaceBody[];
    const s = list.find((x) => x.status === 'succeeded')!;
    const res = await owner.get(`${base}/surfaces/${s.id}/web-raster?maxSize=256`).buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    });
    expect(res.status).toBe(200);
    const width = Number(res.headers['x-raster-width']);
    const height = Number(res.headers['x-raster-height']);
    expect(Math.max(width, height)).toBeLessThanOrEqual(256);
    expect((res.body as Buffer).length).toBe(width * height * 4);
    const [west, south, east, north] = String(res.headers['x-raster-bounds']).split(',').map(Number);
    expect(west).toBeLessThan(-38.5);
    expect(east).toBeGreaterThan(-38.5);
    expect(south).toBeLessThan(44.5);
    expect(north).toBeGreaterThan(44.5);
    expect(res.headers['x-raster-unit']).toBe('km2');
    const body = res.body as Buffer;
    const px = new Float32Array(body.buffer.slice(body.byteOffset, body.byteOffset + body.length));
    const max = Math.max(...Array.from(px).filter(Number.isFinite));
    expect(Number(res.headers['x-raster-max'])).toBeCloseTo(max, 3);

    const stats = s.stats as { max: number; maxAt: { lon: number; lat: number } };
    const v = (await owner.get(`${base}/surfaces/${s.id}/value?lon=${stats.maxAt.lon}&lat=${stats.maxAt.lat}`).expect(200)).body;
    expect(v.unit).toBe('km2');
    expect(v.value).toBeCloseTo(stats.max, 0);
    const far = (await owner.get(`${base}/surfaces/${s.id}/value?lon=10&lat=10`).expect(200)).body;
    expect(far.value).toBeNull();
    await owner.get(`${base}/surfaces/${s.id}/value?lon=200&lat=10`).expect(400);

    const fc = (await owner.get(`${base}/surfaces/${s.id}/contours`).expect(200)).body;
    expect(fc.type).toBe('FeatureCollection');
    expect(fc.features.map((f: { properties: { percent: number } }) => f.properties.percent).sort()).toEqual([50, 75, 90]);
    for (const f of fc.features) {
      expect(f.geometry.type).toBe('MultiPolygon');
      expect(f.properties.unit).toBe('km2');
      for (const polygon of f.geometry.coordinates) {
        for (const ring of polygon) {
          // RFC 7946 §3.1.6: rings are closed (first position = last).
          expect(ring[0]).toEqual(ring[ring.length - 1]);
          for (const [lon, lat] of ring) {
            expect(Math.abs(lon - -38.5)).toBeLessThan(0.3);
            expect(Math.abs(lat - 44.5)).toBeLessThan(0.3);
          }
        }
      }
    }
  });

  it('reports per square mile as per km² × 2.589988110336 (1 mi = 1.609344 km exactly, NIST SP 811)', async () => {
    const body = { customerFileId: fileId, kernel: 'quartic', bandwidth: { mode: 'value', value: 1500 }, studyArea: { type: 'extent' } };
    const km = (await owner.post(`${base}/surfaces`, { ...body, unit: 'km2' }).expect(201)).body.surface;
    const mi = (await owner.post(`${base}/surfaces`, { ...body, unit: 'sqmi' }).expect(201)).body.surface;
    await surfaceWait(() => get(km.id), (x) => x.status === 'succeeded');
    await surfaceWait(() => get(mi.id), (x) => x.status === 'succeeded');
    const q = `value?lon=${-38.5}&lat=${44.5}`;
    const a = (await owner.get(`${base}/surfaces/${km.id}/${q}`).expect(200)).body;
    const b = (await owner.get(`${base}/surfaces/${mi.id}/${q}`).expect(200)).body;
    expect(b.unit).toBe('sqmi');
    expect(b.value / a.value).toBeCloseTo(1.609344 ** 2, 9);
    const ca = (await owner.get(`${base}/surfaces/${km.id}/contours`).expect(200)).body.features[0].properties;
    const cb = (await owner.get(`${base}/surfaces/${mi.id}/contours`).expect(200)).body.features[0].properties;
    expect(cb.threshold / ca.threshold).toBeCloseTo(2.589988110336, 9);
    const diff = await owner.get(`${base}/surfaces/${km.id}/difference/${mi.id}/web-raster?maxSize=64`).expect(200);
    // Same inputs: the difference is zero everywhere inside the grid.
    expect(Number(diff.headers['x-raster-max'])).toBeLessThan(1e-6);
  });

  it('writes progress between 0 and 1 while a larger run is running', async () => {
    const big = await customerFileStored(ds, base.split('/')[3], base.split('/')[5], demoPoints(30_000, 11));
    const s0 = (
      await owner
        .post(`${base}/surfaces`, { customerFileId: big, kernel: 'quartic', bandwidth: { mode: 'value', value: 2500 }, cellSize: 25, method: 'exact', studyArea: { type: 'extent' } })
        .expect(201)
    ).body.surface;
    const seen: number[] = [];
    const s = await surfaceWait(
      () => get(s0.id),
      (x) => {
        if (x.status === 'running') seen.push(x.progress);
        return x.status === 'succeeded' || x.status === 'failed';
      },
      120_000,
    );
    expect(s.status).toBe('succeeded');
    expect(seen.some((p) => p > 0 && p < 1)).toBe(true);
    for (let k = 1; k < seen.length; k++) expect(seen[k]).toBeGreaterThanOrEqual(seen[k - 1]);
  });
});
