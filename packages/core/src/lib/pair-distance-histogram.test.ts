import { describe, expect, it } from 'vitest';
import { pairDistanceHistogram } from './pair-distance-histogram.js';
import { randomSeeded } from './random-seeded.js';

describe('pairDistanceHistogram', () => {
  const rng = randomSeeded(4);
  const n = 300;
  const x = Float64Array.from({ length: n }, () => 500 * rng.normal());
  const y = Float64Array.from({ length: n }, () => 500 * rng.normal());
  const w = Float64Array.from({ length: n }, () => 1 + rng.uniform());
  it('sums a smooth function of distance over pairs like the direct double loop [D]', () => {
    const h = pairDistanceHistogram(x, y, 4000, [(i, j) => w[i] * w[j]], 4096);
    const f = (d: number) => Math.exp(-(d * d) / (2 * 300 * 300));
    let direct = 0;
    for (let a = 0; a < n; a++) for (let b = a + 1; b < n; b++) direct += w[a] * w[b] * f(Math.hypot(x[a] - x[b], y[a] - y[b]));
    let binned = 0;
    h.sums[0].forEach((c, k) => (binned += c * f(k * h.step)));
    expect(binned / direct).toBeCloseTo(1, 5);
  });
  it('keeps the total pair weight exactly and drops pairs beyond the radius', () => {
    const h = pairDistanceHistogram(x, y, 200, [() => 1]);
    let pairs = 0;
    for (let a = 0; a < n; a++) for (let b = a + 1; b < n; b++) if (Math.hypot(x[a] - x[b], y[a] - y[b]) <= 200) pairs++;
    expect(h.sums[0].reduce((s, v) => s + v, 0)).toBeCloseTo(pairs, 9);
  });
});
