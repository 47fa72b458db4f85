import { describe, expect, it } from 'vitest';
import { kdeExactAt } from '../kde/kde-exact-at.js';
import type { GridSpec } from '../types.js';
import { densityContours } from './density-contours.js';

/** One customer of weight 100 at the origin, Gaussian σ = 1 km, on a 20 m grid out to ±6 km. */
function singleGaussian(): { intensity: Float64Array; spec: GridSpec } {
  const spec: GridSpec = { originX: -6000, originY: -6000, cellSize: 20, width: 600, height: 600 };
  const qx = new Float64Array(spec.width * spec.height);
  const qy = new Float64Array(qx.length);
  for (let c = 0; c < qx.length; c++) {
    qx[c] = spec.originX + ((c % spec.width) + 0.5) * spec.cellSize;
    qy[c] = spec.originY + (Math.floor(c / spec.width) + 0.5) * spec.cellSize;
  }
  const v = kdeExactAt({ x: Float64Array.of(0), y: Float64Array.of(0), w: Float64Array.of(100) }, qx, qy, 'gaussian', 1000);
  return { intensity: v.map((x) => x * 1e6), spec };
}

describe('densityContours levels', () => {
  // DOMAIN.md [D]: a Gaussian holds share p within radius σ·√(−2 ln(1 − p)): 50 % → 1.1774σ,
  // 90 % → 2.1460σ, where the intensity is peak·(1 − p): 15.9155 → 7.9577 and 1.5916 per km².
  it('matches the closed form for one Gaussian customer', () => {
    const { intensity, spec } = singleGaussian();
    const [l50, l90] = densityContours(intensity, spec, [50, 90]).levels;
    expect(l50.threshold).toBeCloseTo(7.9577, 1);
    expect(l90.threshold).toBeCloseTo(1.5916, 2);
    expect(l50.area_m2 / 1e6 / (Math.PI * 1.1774 ** 2)).toBeCloseTo(1, 2);
    expect(l90.area_m2 / 1e6 / (Math.PI * 2.146 ** 2)).toBeCloseTo(1, 2);
    expect(l90.clipped).toBe(false);
  });

  it('flags a contour the grid edge cuts', () => {
    const { intensity, spec } = singleGaussian();
    // Keeping only the southern half of the rows cuts every contour at the new northern edge.
    const half = intensity.slice(0, spec.width * 300);
    expect(densityContours(half, { ...spec, height: 300 }, [90]).levels[0].clipped).toBe(true);
  });

  it('rejects percents outside (0, 100]', () => {
    const { intensity, spec } = singleGaussian();
    expect(() => densityContours(intensity, spec, [0])).toThrow(/contour percents must be numbers in \(0, 100\] \(got 0\)/);
  });

  it('returns no contours for a grid with no demand on it', () => {
    const spec: GridSpec = { originX: 0, originY: 0, cellSize: 10, width: 5, height: 4 };
    const c = densityContours(new Float64Array(20), spec);
    expect(c.levels).toEqual([]);
    expect(c.geojson.features).toEqual([]);
  });
});

describe('densityContours', () => {
  it('draws the 50 % contour as a circle of radius 1.1774 σ, exterior counter-clockwise, largest percent first', () => {
    const { intensity, spec } = singleGaussian();
    const { geojson } = densityContours(intensity, spec);
    expect(geojson.units).toBe('metres');
    expect(geojson.features.map((f) => f.properties.percent)).toEqual([90, 75, 50]);
    const ring = geojson.features[2].geometry.coordinates[0][0];
    for (const [x, y] of ring) expect(Math.hypot(x, y)).toBeCloseTo(1177.4, -1.5);
    let twiceArea = 0;
    for (let k = 0; k + 1 < ring.length; k++) twiceArea += ring[k][0] * ring[k + 1][1] - ring[k + 1][0] * ring[k][1];
    expect(twiceArea).toBeGreaterThan(0);
  });

  it('converts coordinates with a projection when given one', () => {
    const { intensity, spec } = singleGaussian();
    const converter = {
      inversePoint: (x: number, y: number): [number, number] => [x / 1000, y / 1000],
      forwardPoint: (lon: number, lat: number): [number, number] => [lon * 1000, lat * 1000],
      forward: () => ({ x: new Float64Array(0), y: new Float64Array(0) }),
      inverse: () => ({ lon: new Float64Array(0), lat: new Float64Array(0) }),
    };
    const { geojson } = densityContours(intensity, spec, [50], converter);
    expect(geojson.units).toBe('degrees');
    const [lon, lat] = geojson.features[0].geometry.coordinates[0][0][0];
    expect(Math.hypot(lon, lat)).toBeCloseTo(1.1774, 1);
  });
});
