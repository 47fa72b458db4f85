import { describe, expect, it } from 'vitest';
import { kdeExactAt } from './kde-exact-at.js';

const one = (x: number, y: number, w: number) => ({
  x: Float64Array.of(x),
  y: Float64Array.of(y),
  w: Float64Array.of(w),
});

describe('kdeExactAt', () => {
  // DOMAIN.md check values [D]: one customer w = 100; per km² = per m² × 1e6.
  it('matches the Gaussian check values for one customer (σ = 1 km)', () => {
    const v = kdeExactAt(one(0, 0, 100), Float64Array.of(0, 1000), Float64Array.of(0, 0), 'gaussian', 1000);
    expect(v[0] * 1e6).toBeCloseTo(15.9155, 4);
    expect(v[1] * 1e6).toBeCloseTo(9.6532, 4);
  });

  it('matches the quartic check values for one customer (radius 2 km)', () => {
    const v = kdeExactAt(one(10, 20, 100), Float64Array.of(10, 10, 10), Float64Array.of(20, 1020, 2020), 'quartic', 2000);
    expect(v[0] * 1e6).toBeCloseTo(23.8732, 4);
    expect(v[1] * 1e6).toBeCloseTo(13.4287, 4);
    expect(v[2]).toBe(0);
  });

  it('adds the weights of coincident points', () => {
    const pts = { x: Float64Array.of(0, 0), y: Float64Array.of(0, 0), w: Float64Array.of(30, 70) };
    const a = kdeExactAt(pts, Float64Array.of(300), Float64Array.of(400), 'epanechnikov', 1000);
    const b = kdeExactAt(one(0, 0, 100), Float64Array.of(300), Float64Array.of(400), 'epanechnikov', 1000);
    expect(a[0]).toBeCloseTo(b[0], 15);
  });

  it('returns nothing for no queries and zero for no points', () => {
    expect(kdeExactAt(one(0, 0, 1), new Float64Array(0), new Float64Array(0), 'quartic', 10)).toHaveLength(0);
    const empty = { x: new Float64Array(0), y: new Float64Array(0), w: new Float64Array(0) };
    expect(Array.from(kdeExactAt(empty, Float64Array.of(1), Float64Array.of(1), 'quartic', 10))).toEqual([0]);
  });

  it('rejects a non-positive bandwidth', () => {
    expect(() => kdeExactAt(one(0, 0, 1), Float64Array.of(0), Float64Array.of(0), 'quartic', 0)).toThrow(
      /bandwidth must be a positive number of metres \(got 0\)/,
    );
  });
});
