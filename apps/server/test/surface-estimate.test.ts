import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DemandscapeApp } from '../src/app.js';
import { creditsGrant } from '../src/modules/billing/credits.service.js';
import { customerFileStored, demoPoints, QUILLPORT } from './surface-fixtures.js';
import { testAppCreate, testUserSignedIn, type TestClient } from './utils.js';

/** A square around Quillport, ±d degrees, counter-clockwise and closed (RFC 7946). */
function square(d: number): number[][][] {
  const { lon, lat } = QUILLPORT;
  return [
    [
      [lon - d, lat - d],
      [lon + d, lat - d],
      [lon + d, lat + d],
      [lon - d, lat + d],
      [lon - d, lat - d],
    ],
  ];
}

describe('POST …/surfaces/estimate', { timeout: 120_000 }, () => {
  let ds: DemandscapeApp;
  let owner: TestClient;
  let url: string;
  let fileId: string;
  const post = (body: object) => owner.post(url, { customerFileId: fileId, ...body });

  beforeAll(async () => {
    ds = await testAppCreate();
    owner = (await testUserSignedIn(ds, 'teodor@larchloaf.example', 'Teodor Brine')).client;
    const orgId = (await owner.post('/api/organizations', { name: 'Larchloaf' }).expect(201)).body.organization.id;
    const wsId = (await owner.post(`/api/organizations/${orgId}/workspaces`, { name: 'Estimate' }).expect(201)).body.workspace.id;
    fileId = await customerFileStored(ds, orgId, wsId, demoPoints(5000, 21));
    await creditsGrant(ds.orm.em.fork(), orgId, 100, 'estimate-tests', 'test credits');
    url = `/api/organizations/${orgId}/workspaces/${wsId}/surfaces/estimate`;
  });
  afterAll(() => ds.close());

  it('returns the rule bandwidth with its explanation, cell size, grid, cost and projection', async () => {
    const e = (await post({ kernel: 'quartic', bandwidth: { mode: 'rule', rule: 'normal-reference' } }).expect(200)).body;
    expect(e.bandwidth.rule).toBe('normal-reference');
    expect(e.bandwidth.value).toBeGreaterThan(0);
    expect(e.bandwidth.explanation).toBeTypeOf('string');
    // Quartic radius ↔ Gaussian sd by canonical scaling δ₀ = (R(K)/μ₂²)^(1/6) in 2-D [S: Marron & Nolan 1988]:
    // quartic R = 9/(5π), μ₂ = 1/8; Gaussian R = 1/(4π), μ₂ = 1 → ratio (2304/5)^(1/6) ≈ 2.7792 [D].
    expect(e.bandwidth.value / e.bandwidth.gaussianSd).toBeCloseTo((2304 / 5) ** (1 / 6), 6);
    expect(e.bandwidth.radius).toBe(e.bandwidth.value);
    expect(e.cellSize.value).toBeGreaterThan(0);
    expect(e.cellSize.explanation).toBeTypeOf('string');
    expect(e.grid.cells).toBe(e.grid.width * e.grid.height);
    // credits = max(1, ⌈points × cells / 3e9⌉) [D: the documented formula].
    expect(e.cost.credits).toBe(Math.max(1, Math.ceil((5000 * e.grid.cells) / 3e9)));
    expect(e.cost.formula).toMatch(/3,000,000,000/);
    expect(e.projection).toEqual({ epsg: 32624, label: expect.stringContaining('24N') });
    expect(e.warnings).toEqual([]);
  });

  it('warns that executive views need a bandwidth of at least 564 m', async () => {
    const e = (await post({ kernel: 'quartic', bandwidth: { mode: 'value', value: 400 } }).expect(200)).body;
    expect(e.warnings.join(' ')).toMatch(/below 564 m/);
  });

  it('answers 400 GRID_TOO_LARGE with the engine message and a cell size that fits', async () => {
    const res = await post({ kernel: 'quartic', bandwidth: { mode: 'value', value: 1500 }, cellSize: 2 }).expect(400);
    expect(res.body.error.code).toBe('GRID_TOO_LARGE');
    expect(res.body.error.field).toBe('cellSize');
    expect(res.body.error.message).toMatch(/cell limit/);
    const fit = res.body.error.details.suggestedCellSize;
    expect(fit).toBeGreaterThan(2);
    await post({ kernel: 'quartic', bandwidth: { mode: 'value', value: 1500 }, cellSize: fit }).expect(200);
  });

  it('uses a study-area polygon: a smaller grid than the padded extent', async () => {
    const all = (await post({ bandwidth: { mode: 'value', value: 1500 }, cellSize: 100 }).expect(200)).body;
    const part = (await post({ bandwidth: { mode: 'value', value: 1500 }, cellSize: 100, studyArea: { type: 'polygon', geometry: { type: 'Polygon', coordinates: square(0.02) } } }).expect(200)).body;
    expect(part.grid.cells).toBeLessThan(all.grid.cells);
    // 0.04° × 0.04° at 44.5° N ≈ 3.2 km × 4.5 km → about 32 × 45 cells of 100 m [D].
    expect(part.grid.width).toBeGreaterThanOrEqual(30);
    expect(part.grid.width).toBeLessThanOrEqual(34);
  });

  it('rejects invalid study areas with a message naming the problem', async () => {
    const short = await post({ studyArea: { type: 'polygon', geometry: { type: 'Polygon', coordinates: [square(0.02)[0].slice(0, 3)] } } }).expect(400);
    expect(short.body.error.code).toBe('VALIDATION_FAILED');
    expect(short.body.error.message).toMatch(/at least 4 positions/);
    // About 1 m across: no 100 m cell centre lies inside.
    const tiny = await post({ cellSize: 100, studyArea: { type: 'polygon', geometry: { type: 'Polygon', coordinates: square(0.00001) } } }).expect(400);
    expect(tiny.body.error.code).toBe('INVALID_POLYGON');
    expect(tiny.body.error.message).toMatch(/covers no grid cell/);
    const same = [[[-38.5, 44.5], [-38.5, 44.5], [-38.5, 44.5], [-38.5, 44.5]]];
    const degenerate = await post({ studyArea: { type: 'polygon', geometry: { type: 'Polygon', coordinates: same } } }).expect(400);
    expect(degenerate.body.error.code).toBe('INVALID_POLYGON');
    expect(degenerate.body.error.field).toBe('studyArea');
    const badLat = await post({ studyArea: { type: 'polygon', geometry: { type: 'Polygon', coordinates: [[[0, 95], [1, 0], [1, 1], [0, 95]]] } } }).expect(400);
    expect(badLat.body.error.message).toMatch(/latitude must be within ±90°/);
  });

  it('rejects unknown kernels, bad bandwidths and unknown files', async () => {
    expect((await post({ kernel: 'box' }).expect(400)).body.error.field).toBe('kernel');
    expect((await post({ bandwidth: { mode: 'value', value: -5 } }).expect(400)).body.error.message).toMatch(/positive number of metres/);
    expect((await post({ bandwidth: { mode: 'rule', rule: 'thumb' } }).expect(400)).body.error.message).toMatch(/normal-reference/);
    const missing = await owner.post(url, { customerFileId: '00000000-0000-4000-8000-000000000000' }).expect(404);
    expect(missing.body.error.message).toMatch(/Customer file/);
  });
});
