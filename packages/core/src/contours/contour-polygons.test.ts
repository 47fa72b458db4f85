import { describe, expect, it } from 'vitest';
import { gridCellCenter } from '../grid/grid-cell.js';
import { ringSignedArea2, type Position } from './contour-geojson.js';
import { contourPercentVolume } from './contour-percent-volume.js';
import { contourPolygons } from './contour-polygons.js';

function inside(ring: Position[], x: number, y: number): boolean {
  let c = false;
  for (let a = 0, b = ring.length - 1; a < ring.length; b = a++) {
    const [xa, ya] = ring[a];
    const [xb, yb] = ring[b];
    if (ya > y !== yb > y && x < ((xb - xa) * (y - ya)) / (yb - ya) + xa) c = !c;
  }
  return c;
}

describe('contourPolygons', () => {
  it("a single hot cell's polygon surrounds that cell's centre in planar metres", () => {
    const spec = { originX: 1000, originY: 2000, cellSize: 10, width: 5, height: 5 };
    const values = new Float64Array(25);
    values[2 + 3 * 5] = 1;
    const fc = contourPolygons(values, spec, [0.5]);
    const ring = fc.features[0].geometry.coordinates[0][0];
    const [cx, cy] = gridCellCenter(spec, 2, 3);
    expect([cx, cy]).toEqual([1025, 2035]);
    expect(inside(ring, cx, cy)).toBe(true);
    // Vertices sit halfway to the neighbouring centres (linear interpolation, level 0.5).
    for (const [x, y] of ring) expect(Math.hypot(x - cx, y - cy)).toBeCloseTo(5, 9);
    expect(ring[0]).toEqual(ring[ring.length - 1]);
    expect(fc.features[0].properties.threshold).toBe(0.5);
  });
  it('orients exteriors counter-clockwise and holes clockwise (RFC 7946)', () => {
    const spec = { originX: 0, originY: 0, cellSize: 1, width: 5, height: 5 };
    const values = new Float64Array(25).fill(1);
    values[12] = 0;
    const [poly] = contourPolygons(values, spec, [0.5]).features[0].geometry.coordinates;
    expect(poly.length).toBe(2);
    expect(ringSignedArea2(poly[0])).toBeGreaterThan(0);
    expect(ringSignedArea2(poly[1])).toBeLessThan(0);
  });
  it('the 50 % polygon of a Gaussian encloses π(1.1774 s)² [D]', () => {
    const s = 1000;
    const cell = 20;
    const n = 600;
    const spec = { originX: -6000, originY: -6000, cellSize: cell, width: n, height: n };
    const values = new Float64Array(n * n);
    for (let j = 0; j < n; j++) {
      for (let i = 0; i < n; i++) {
        const [x, y] = gridCellCenter(spec, i, j);
        values[i + j * n] = Math.exp(-(x * x + y * y) / (2 * s * s));
      }
    }
    const [level] = contourPercentVolume(values, spec, [50]);
    const fc = contourPolygons(values, spec, [level.threshold], [{ percent: 50 }]);
    const area = ringSignedArea2(fc.features[0].geometry.coordinates[0][0]) / 2;
    expect(Math.sqrt(area / Math.PI) / s).toBeCloseTo(1.1774, 2);
    expect(fc.features[0].properties).toEqual({ percent: 50, threshold: level.threshold });
  });
  it('treats NaN cells (outside the study area) as below every level', () => {
    const spec = { originX: 0, originY: 0, cellSize: 1, width: 3, height: 3 };
    const fc = contourPolygons(Float64Array.of(2, 2, NaN, 2, 2, NaN, 2, 2, NaN), spec, [1]);
    const ring = fc.features[0].geometry.coordinates[0][0];
    // The NaN column x ∈ [2, 3] is outside: the region ends at or before its centre line x = 2.5.
    expect(Math.max(...ring.map((p) => p[0]))).toBeLessThanOrEqual(2.5);
    expect(ring.every((p) => p.every(Number.isFinite))).toBe(true);
  });
  it('returns an empty MultiPolygon when nothing reaches the level', () => {
    const spec = { originX: 0, originY: 0, cellSize: 1, width: 2, height: 2 };
    expect(contourPolygons(new Float64Array(4), spec, [1]).features[0].geometry.coordinates).toEqual([]);
  });
  it('rejects non-finite thresholds and a size mismatch', () => {
    const spec = { originX: 0, originY: 0, cellSize: 1, width: 2, height: 2 };
    expect(() => contourPolygons(new Float64Array(4), spec, [NaN])).toThrow('contour thresholds must be finite numbers (got NaN)');
    expect(() => contourPolygons(new Float64Array(3), spec, [1])).toThrow(/width × height = 4/);
  });
});
