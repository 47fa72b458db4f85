import { describe, expect, it } from 'vitest';
import { discRectOverlap } from '../lib/disc-rect-overlap.js';
import { randomSeeded } from '../lib/random-seeded.js';
import type { GridSpec } from '../types.js';
import { ringDemand, ringDemands, ringRadiusFromMiles } from './ring-demand.js';
import type { ScoringSurface } from './scoring-surface.js';

function surfaceOf(spec: GridSpec, f: (x: number, y: number) => number): ScoringSurface {
  const values = new Float64Array(spec.width * spec.height);
  for (let j = 0; j < spec.height; j++)
    for (let i = 0; i < spec.width; i++)
      values[i + j * spec.width] = f(spec.originX + (i + 0.5) * spec.cellSize, spec.originY + (j + 0.5) * spec.cellSize);
  return { spec, values };
}

describe('ringDemand', () => {
  const spec: GridSpec = { originX: 0, originY: 0, cellSize: 100, width: 200, height: 200 };

  it('gives intensity × πr² on a uniform surface, off-centre and for radii between cell edges [closed form]', () => {
    const uniform = surfaceOf(spec, () => 250); // 250 per km²
    for (const r of [137, 1000, 2345.6, 5000]) {
      const expected = 250 * Math.PI * (r / 1000) ** 2;
      expect(Math.abs(ringDemand(uniform, 10_033, 9_871, r) - expected) / expected).toBeLessThan(1e-12);
    }
  });

  it('gives total × (1 − exp(−r²/2s²)) for a Gaussian surface centred on the site, within 1e-3 relative [closed form; midpoint discretisation, s = 10 cells]', () => {
    const s = 1000;
    const total = 5000;
    const cx = 10_000;
    const cy = 10_000;
    const g = surfaceOf(spec, (x, y) => ((total / (2 * Math.PI * s * s)) * Math.exp(-((x - cx) ** 2 + (y - cy) ** 2) / (2 * s * s))) * 1e6);
    for (const r of [500, 1000, 1609.344, 3000]) {
      const expected = total * (1 - Math.exp(-(r * r) / (2 * s * s)));
      expect(Math.abs(ringDemand(g, cx, cy, r) - expected) / expected).toBeLessThan(1e-3);
    }
  });

  it('counts the part of a cell inside the ring, not cell centres — a radius of half a cell around a centre takes π/4 of it [closed form]', () => {
    const one = surfaceOf({ originX: 0, originY: 0, cellSize: 1000, width: 1, height: 1 }, () => 100);
    expect(ringDemand(one, 500, 500, 500)).toBeCloseTo(100 * Math.PI * 0.25, 12);
  });

  it('equals clipping every cell of an uneven surface one by one, also for rings reaching past the grid [D]', () => {
    const rnd = randomSeeded(3).uniform;
    const small: GridSpec = { originX: -1000, originY: 500, cellSize: 70, width: 90, height: 70 };
    const s = surfaceOf(small, () => (rnd() < 0.1 ? 0 : rnd() * 100));
    for (const [x, y, r] of [
      [2000, 3000, 1234],
      [-950, 560, 800],
      [4000, 4000, 3000],
      [2035, 2985, 35],
      [2000, 3000, 10_000],
    ]) {
      let brute = 0;
      for (let j = 0; j < small.height; j++)
        for (let i = 0; i < small.width; i++) {
          const xw = small.originX + i * small.cellSize;
          const ys = small.originY + j * small.cellSize;
          brute += s.values[i + j * small.width] * discRectOverlap(x, y, r, xw, ys, xw + small.cellSize, ys + small.cellSize);
        }
      expect(ringDemand(s, x, y, r)).toBeCloseTo(brute / 1e6, 9);
    }
  });

  it('gives 0 outside the grid and rejects a non-positive radius', () => {
    const uniform = surfaceOf(spec, () => 1);
    expect(ringDemand(uniform, -50_000, 0, 1000)).toBe(0);
    expect(() => ringDemand(uniform, 0, 0, 0)).toThrow(/ring radius must be a positive number of metres \(got 0\)/);
  });

  it('lists the default rings 1, 3, 5 km and converts miles at 1609.344 m [S: NIST SP 811]', () => {
    const uniform = surfaceOf(spec, () => 1);
    expect(ringDemands(uniform, 10_000, 10_000).map((r) => r.radius)).toEqual([1000, 3000, 5000]);
    expect(ringRadiusFromMiles(3)).toBeCloseTo(4828.032, 9);
  });
});
