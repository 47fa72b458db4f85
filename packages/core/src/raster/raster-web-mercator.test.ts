import { describe, expect, it } from 'vitest';
import { isCoreError } from '../errors.js';
import { gridFromPoints } from '../grid/grid-from-points.js';
import { densitySurface } from '../kde/density-surface.js';
import { haversineMetres } from '../lib/haversine.js';
import { projectionForLonLat } from '../projection/projection-for-lon-lat.js';
import { projectionConverter } from '../projection/projection-transform.js';
import { rasterWebMercator, rasterWebMercatorLayout } from './raster-web-mercator.js';

// A customer in the open sea off the demo city (fictional location).
const LON = -31.62;
const LAT = 38.47;
const projection = projectionForLonLat(Float64Array.of(LON), Float64Array.of(LAT));
const converter = projectionConverter(projection);
const [px, py] = converter.forwardPoint(LON, LAT);
const points = { x: Float64Array.of(px), y: Float64Array.of(py), w: Float64Array.of(1) };
const spec = gridFromPoints(points, 50, 2000);
const surface = densitySurface(points, spec, { kernel: 'quartic', bandwidth: 1500 });

function pixelLonLat(r: ReturnType<typeof rasterWebMercator>, index: number): [number, number] {
  const c = index % r.width;
  const row = Math.floor(index / r.width);
  // Web Mercator inverse (EPSG:3857, IOGP Guidance Note 7-2) [S].
  const x = r.west + (c + 0.5) * r.pixelSize;
  const y = r.north - (row + 0.5) * r.pixelSize;
  const lon = (x / 6378137) * (180 / Math.PI);
  const lat = (2 * Math.atan(Math.exp(y / 6378137)) - Math.PI / 2) * (180 / Math.PI);
  return [lon, lat];
}

describe('rasterWebMercator', () => {
  it('keeps the peak of a single-point surface within one cell of the point', () => {
    const r = rasterWebMercator(surface.intensity, spec, converter);
    let best = -1;
    for (let k = 0; k < r.values.length; k++) if (best < 0 ? Number.isFinite(r.values[k]) : r.values[k] > r.values[best]) best = k;
    const [lon, lat] = pixelLonLat(r, best);
    expect(haversineMetres(lon, lat, LON, LAT)).toBeLessThan(spec.cellSize);
    // Bilinear sampling never exceeds the grid's own maximum.
    expect(r.max).toBeLessThanOrEqual(surface.stats.max * (1 + 1e-6));
    expect(r.max).toBeGreaterThan(surface.stats.max * 0.95);
  });

  it('has bounds that contain every corner of the metric grid', () => {
    const r = rasterWebMercatorLayout(spec, converter);
    const w = spec.width * spec.cellSize;
    const h = spec.height * spec.cellSize;
    for (const [x, y] of [
      [spec.originX, spec.originY],
      [spec.originX + w, spec.originY],
      [spec.originX, spec.originY + h],
      [spec.originX + w, spec.originY + h],
    ]) {
      const [lon, lat] = converter.inversePoint(x, y);
      expect(lon).toBeGreaterThanOrEqual(r.bounds.west);
      expect(lon).toBeLessThanOrEqual(r.bounds.east);
      expect(lat).toBeGreaterThanOrEqual(r.bounds.south);
      expect(lat).toBeLessThanOrEqual(r.bounds.north);
    }
  });

  it('uses pixels about one cell wide at the centre latitude, capped by maxSize', () => {
    const full = rasterWebMercatorLayout(spec, converter);
    // Mercator scale factor sec φ at the centre latitude [S: Snyder 1987, p. 44].
    expect(full.pixelSize).toBeCloseTo(spec.cellSize / Math.cos((LAT * Math.PI) / 180), 0);
    expect(Math.abs(full.width - spec.width)).toBeLessThanOrEqual(2);
    const small = rasterWebMercatorLayout(spec, converter, 16);
    expect(Math.max(small.width, small.height)).toBeLessThanOrEqual(16);
    expect(small.bounds.west).toBeCloseTo(full.bounds.west, 9);
    expect(small.bounds.north).toBeCloseTo(full.bounds.north, 9);
    const [eastLon] = converter.inversePoint(spec.originX + spec.width * spec.cellSize, spec.originY + (spec.height * spec.cellSize) / 2);
    expect(small.bounds.east).toBeGreaterThanOrEqual(eastLon);
  });

  it('is NaN where the source is NaN (outside the study area)', () => {
    const masked = Float64Array.from(surface.intensity, (v, k) => (k % spec.width < spec.width / 2 ? Number.NaN : v));
    const r = rasterWebMercator(masked, spec, converter, { maxSize: 64 });
    const row = Math.floor(r.height / 2) * r.width;
    expect(Number.isNaN(r.values[row + 1])).toBe(true);
    expect(Number.isFinite(r.values[row + r.width - 2])).toBe(true);
  });

  it('rejects a maxSize below 2 and mismatched values', () => {
    expect(() => rasterWebMercatorLayout(spec, converter, 1)).toThrow(/maxSize must be a whole number/);
    try {
      rasterWebMercator(new Float64Array(3), spec, converter);
      expect.unreachable();
    } catch (e) {
      expect(isCoreError(e, 'INVALID_ARGUMENT')).toBe(true);
    }
  });
});
