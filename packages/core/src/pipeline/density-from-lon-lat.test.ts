import { describe, expect, it } from 'vitest';
import { demoCustomers } from '../cli/demo-customers.js';
import { isCoreError } from '../errors.js';
import { densityFromLonLat, extentProject } from './density-from-lon-lat.js';
import { densityFromPlanar } from './density-from-planar.js';

describe('densityFromLonLat', () => {
  const c = demoCustomers(4000, 11);
  const r = densityFromLonLat(c.lon, c.lat, c.w, { cellSize: 100 });

  it('projects to the UTM zone of the data and says which', () => {
    // Quillport at lon −38.5: zone 24 spans −42° … −36° [S: UTM zone = floor((lon + 180) / 6) + 1].
    expect(r.projection.epsg).toBe(32624);
    expect(r.projection.proj4).toMatch(/\+proj=utm \+zone=24/);
    expect(r.projection.label).toBe('UTM zone 24N (EPSG:32624)');
  });

  it('defaults to quartic with the normal-reference bandwidth and explains both figures', () => {
    expect(r.surface.stats.kernel).toBe('quartic');
    expect(r.bandwidth.rule).toBe('normal-reference');
    expect(r.bandwidth.explanation).toMatch(/Silverman's rule/);
    // Canonical scaling [S: Marron & Nolan 1988]: quartic radius / Gaussian sd = 1.822708 / 0.655841.
    expect(r.bandwidth.value / r.bandwidth.equivalent.value).toBeCloseTo(1.822708 / 0.655841, 5);
    expect(r.bandwidth.kernelSd).toBeCloseTo(r.bandwidth.value * Math.sqrt(1 / 8), 9);
  });

  it('pads the grid by the kernel reach, so the surface holds the total weight', () => {
    const s = r.surface.stats;
    expect(Math.abs(s.integral / s.totalWeight - 1)).toBeLessThan(1e-3);
    expect(r.contours.levels.every((l) => !l.clipped)).toBe(true);
  });

  it('returns 50/75/90 % contours in lon/lat around Quillport', () => {
    expect(r.contours.levels.map((l) => l.percent)).toEqual([50, 75, 90]);
    expect(r.contours.geojson.units).toBe('degrees');
    const [lon, lat] = r.contours.geojson.features[0].geometry.coordinates[0][0][0];
    expect(lon).toBeGreaterThan(-39);
    expect(lon).toBeLessThan(-38);
    expect(lat).toBeGreaterThan(44.3);
    expect(lat).toBeLessThan(44.7);
  });

  it('restricts the grid to a lon/lat extent, projected with curved edges', () => {
    const extent = { minX: -38.55, minY: 44.47, maxX: -38.45, maxY: 44.53 };
    const p = extentProject(extent, r.converter);
    const small = densityFromLonLat(c.lon, c.lat, c.w, { cellSize: 100, extent, bandwidth: 1200 });
    expect(small.grid.originX).toBeLessThanOrEqual(p.minX);
    expect(small.grid.originY).toBeLessThanOrEqual(p.minY);
    expect(small.grid.originX + small.grid.width * 100).toBeGreaterThanOrEqual(p.maxX);
    // 0.1° of longitude at 44.47° N is 7.94 km and 0.06° of latitude 6.67 km [D: haversine]; the
    // meridians lean by the grid convergence Δλ·sin φ ≈ 0.35° here, widening the box by ≈ 40 m, and
    // the parallels bow (≈ (x₂² − x₁²)·tan φ / 2R ≈ 50 m across the box, 37–45 km from the central meridian).
    expect(p.maxX - p.minX).toBeGreaterThan(7940);
    expect(p.maxX - p.minX).toBeLessThan(8010);
    expect(p.maxY - p.minY).toBeGreaterThan(6650);
    expect(p.maxY - p.minY).toBeLessThan(6730);
  });

  it('reports bad points with the engine error', () => {
    try {
      densityFromLonLat([-38.5, 200], [44.5, 44.5], undefined);
      expect.unreachable();
    } catch (e) {
      expect(isCoreError(e)).toBe(true);
    }
  });
});

describe('densityFromPlanar', () => {
  const pts = { x: Float64Array.of(0, 500, 1000), y: Float64Array.of(0, 0, 300), w: Float64Array.of(1, 2, 1) };

  it('uses a bandwidth set by hand and the suggested cell size', () => {
    const r = densityFromPlanar(pts, { kernel: 'gaussian', bandwidth: 400 });
    expect(r.bandwidth.rule).toBe('manual');
    expect(r.bandwidth.equivalent.kernel).toBe('quartic');
    expect(r.cellSize.value).toBe(20); // 0.06 × 400 m, a round number [see kde-cell-rule.ts]
    expect(r.grid.cellSize).toBe(20);
  });

  it('rejects a bandwidth that is not a positive number', () => {
    expect(() => densityFromPlanar(pts, { bandwidth: -3 })).toThrow(/bandwidth must be a positive number of metres \(got -3\)/);
  });

  it('passes GRID_TOO_LARGE on with a cell size that fits', () => {
    try {
      densityFromPlanar(pts, { bandwidth: 400, cellSize: 1, maxCells: 10_000 });
      expect.unreachable();
    } catch (e) {
      expect(isCoreError(e, 'GRID_TOO_LARGE')).toBe(true);
    }
  });
});
