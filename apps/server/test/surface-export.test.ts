import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fromArrayBuffer } from 'geotiff';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DemandscapeApp } from '../src/app.js';
import { SurfaceRasterSchema, SurfaceSchema, type SurfaceResolved } from '../src/modules/surface/surface.entity.js';
import { customerFileStored, demoPoints, surfaceStored } from './surface-fixtures.js';
import { testAppCreate, testClient, testMembershipAdd, testUserSignedIn, type TestClient } from './utils.js';

/** 1 sq mi = 1.609344² km² = 2.589988110336 km² [S: NIST SP 811, B.8]. */
const KM2_PER_SQMI_NIST = 2.589988110336;
const GDALINFO = spawnSync('which', ['gdalinfo']).status === 0;

function binary(test: ReturnType<TestClient['get']>) {
  return test.buffer(true).parse((r, cb) => {
    const chunks: Buffer[] = [];
    r.on('data', (c: Buffer) => chunks.push(c));
    r.on('end', () => cb(null, Buffer.concat(chunks)));
  });
}

describe('surface exports: GeoTIFF and contour download', { timeout: 120_000 }, () => {
  let ds: DemandscapeApp;
  const c = {} as Record<'owner' | 'executive' | 'outsider' | 'anonymous', TestClient>;
  let ids: { orgId: string; wsId: string; fileId: string };
  let base: string;
  let coarse: string;
  let sqmi: string;
  let fine: string;
  const points = demoPoints(1500, 11);

  /** The stored run and its raster straight from the database (per km², j = 0 south). */
  async function stored(id: string): Promise<{ resolved: SurfaceResolved; values: Float32Array }> {
    const em = ds.orm.em.fork();
    const s = await em.findOneOrFail(SurfaceSchema, { id });
    const r = await em.findOneOrFail(SurfaceRasterSchema, { surface: id }, { populate: ['data'] });
    const bytes = new Uint8Array(r.data.byteLength);
    bytes.set(r.data);
    return { resolved: s.resolved!, values: new Float32Array(bytes.buffer) };
  }

  beforeAll(async () => {
    ds = await testAppCreate();
    const owner = await testUserSignedIn(ds, 'owner@surface-export.example', 'Owner A');
    c.owner = owner.client;
    const orgId = (await c.owner.post('/api/organizations', { name: 'Larchloaf' }).expect(201)).body.organization.id as string;
    const exec = await testUserSignedIn(ds, 'executive@surface-export.example', 'Executive A');
    await testMembershipAdd(ds, orgId, exec.userId, 'executive');
    c.executive = exec.client;
    c.outsider = (await testUserSignedIn(ds, 'owner-b@surface-export.example', 'Owner B')).client;
    await c.outsider.post('/api/organizations', { name: 'Org B' }).expect(201);
    c.anonymous = await testClient(ds);
    const wsId = (await c.owner.post(`/api/organizations/${orgId}/workspaces`, { name: 'Quillport harbour' }).expect(201)).body.workspace.id as string;
    const fileId = await customerFileStored(ds, orgId, wsId, points);
    ids = { orgId, wsId, fileId };
    base = `/api/organizations/${orgId}/workspaces/${wsId}/surfaces`;
    coarse = await surfaceStored(ds, ids, points, 'succeeded', { kernel: 'quartic', bandwidth: { mode: 'value', value: 1500 } });
    sqmi = await surfaceStored(ds, ids, points, 'succeeded', { kernel: 'quartic', bandwidth: { mode: 'value', value: 1500 }, unit: 'sqmi' });
    fine = await surfaceStored(ds, ids, points, 'succeeded', { kernel: 'quartic', bandwidth: { mode: 'value', value: 400 } });
    await ds.orm.em.fork().nativeUpdate(SurfaceSchema, { id: coarse }, { name: 'Harbour · "north"/visits' });
  });
  afterAll(() => ds.close());

  it('downloads a north-up Float32 GeoTIFF with the run’s grid, EPSG code and values per km²', async () => {
    const res = await binary(c.owner.get(`${base}/${coarse}/export.tif`));
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('image/tiff');
    // Quotes, slashes and the non-ASCII dot are replaced so the header stays well-formed.
    expect(res.headers['content-disposition']).toBe('attachment; filename="Harbour _ _north__visits.tif"');
    const { resolved, values } = await stored(coarse);
    const { width, height, cellSize, originX, originY } = resolved.grid;
    const body = res.body as Buffer;
    const image = await (await fromArrayBuffer(new Uint8Array(body).buffer)).getImage();
    expect(image.getWidth()).toBe(width);
    expect(image.getHeight()).toBe(height);
    expect(image.getSamplesPerPixel()).toBe(1);
    expect(image.getSampleFormat()).toBe(3);
    expect(image.getBitsPerSample()).toBe(32);
    const dir = image.getFileDirectory();
    // GeoTIFF 1.1 (OGC 19-008r4) [S]: pixel (0,0) of a pixel-is-area image is the north-west corner.
    expect(Array.from((await dir.loadValue('ModelPixelScale')) as ArrayLike<number>)).toEqual([cellSize, cellSize, 0]);
    expect(Array.from((await dir.loadValue('ModelTiepoint')) as ArrayLike<number>)).toEqual([0, 0, 0, originX, originY + height * cellSize, 0]);
    expect(image.getGeoKeys()?.ProjectedCSTypeGeoKey).toBe(resolved.projection.epsg);
    expect(resolved.projection.epsg).toBe(32624);
    expect(Number.isNaN(image.getGDALNoData())).toBe(true);

    const [band] = (await image.readRasters()) as unknown as Float32Array[];
    let at = -1;
    let nan = 0;
    for (let k = 0; k < values.length; k++) {
      if (Number.isNaN(values[k])) nan++;
      else if (at < 0 || values[k] > values[at]) at = k;
    }
    const i = at % width;
    const j = Math.floor(at / width);
    // Row 0 of the image is the northern grid row j = height − 1.
    expect(band[i + (height - 1 - j) * width]).toBe(values[at]);
    expect(band.filter(Number.isNaN).length).toBe(nan);
    // One band of grid cells and nothing else: header + width × height × 4 bytes.
    expect(body.length - width * height * 4).toBeLessThan(1024);
  });

  it('scales a per-square-mile run by 2.589988110336', async () => {
    const res = await binary(c.owner.get(`${base}/${sqmi}/export.tif`)).expect(200);
    const { resolved, values } = await stored(sqmi);
    const body = res.body as Buffer;
    const image = await (await fromArrayBuffer(new Uint8Array(body).buffer)).getImage();
    const [band] = (await image.readRasters()) as unknown as Float32Array[];
    const { width, height } = resolved.grid;
    let at = 0;
    for (let k = 0; k < values.length; k++) if (values[k] > values[at]) at = k;
    const pixel = band[(at % width) + (height - 1 - Math.floor(at / width)) * width];
    expect(pixel).toBe(Math.fround(values[at] * KM2_PER_SQMI_NIST));
    expect(image.getGeoKeys()?.GTCitationGeoKey).toMatch(/per sq mi; CRS EPSG:32624/);
  });

  it.skipIf(!GDALINFO)('gdalinfo reads the same size, CRS and origin', async () => {
    const res = await binary(c.owner.get(`${base}/${coarse}/export.tif`)).expect(200);
    const dir = mkdtempSync(join(tmpdir(), 'ds-export-'));
    try {
      const path = join(dir, 'surface.tif');
      writeFileSync(path, res.body as Buffer);
      const info = JSON.parse(execFileSync('gdalinfo', ['-json', path], { encoding: 'utf8' }));
      const { resolved } = await stored(coarse);
      expect(info.size).toEqual([resolved.grid.width, resolved.grid.height]);
      expect(info.geoTransform[0]).toBe(resolved.grid.originX);
      expect(info.geoTransform[1]).toBe(resolved.grid.cellSize);
      expect(JSON.stringify(info.coordinateSystem)).toMatch(/32624/);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it('downloads the contours as a GeoJSON attachment and records both exports in the audit log', async () => {
    const res = await c.owner.get(`${base}/${coarse}/contours.geojson`).expect(200);
    expect(res.headers['content-type']).toMatch(/^application\/geo\+json/);
    expect(res.headers['content-disposition']).toBe('attachment; filename="Harbour _ _north__visits.geojson"');
    const fc = JSON.parse(res.text);
    expect(fc.type).toBe('FeatureCollection');
    expect(fc.features.map((f: { properties: { percent: number } }) => f.properties.percent).sort()).toEqual([50, 75, 90]);
    for (const f of fc.features) expect(f.geometry.type).toBe('MultiPolygon');

    const audit = async (action: string) =>
      (await c.owner.get(`/api/organizations/${ids.orgId}/audit-events?action=${action}`).expect(200)).body.events as { target: { id: string }; details: Record<string, unknown> }[];
    const tif = await audit('export.surface_geotiff');
    expect(tif.some((e) => e.target.id === coarse && e.details.unit === 'km2')).toBe(true);
    expect((await audit('export.surface_contours')).some((e) => e.target.id === coarse)).toBe(true);
  });

  it('keeps executives away from exports of surfaces finer than 564 m and other organizations out', async () => {
    const tif = await c.executive.get(`${base}/${fine}/export.tif`).expect(403);
    expect(tif.body.error.code).toBe('PRIVACY_MIN_BANDWIDTH');
    expect(tif.body.error.message).toMatch(/564 m/);
    expect((await c.executive.get(`${base}/${fine}/contours.geojson`).expect(403)).body.error.code).toBe('PRIVACY_MIN_BANDWIDTH');
    await binary(c.executive.get(`${base}/${coarse}/export.tif`)).expect(200);
    await binary(c.owner.get(`${base}/${fine}/export.tif`)).expect(200);
    expect((await c.outsider.get(`${base}/${coarse}/export.tif`).expect(404)).body.error.code).toBeTypeOf('string');
    await c.outsider.get(`${base}/${coarse}/contours.geojson`).expect(404);
    await c.anonymous.get(`${base}/${coarse}/export.tif`).expect(401);
  });

  it('answers 409 SURFACE_NOT_READY for a queued run', async () => {
    const queued = await surfaceStored(ds, ids, points, 'queued');
    expect((await c.owner.get(`${base}/${queued}/export.tif`).expect(409)).body.error.code).toBe('SURFACE_NOT_READY');
  });
});
