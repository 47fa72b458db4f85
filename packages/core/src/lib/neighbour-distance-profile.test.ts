import { describe, expect, it } from 'vitest';
import { neighbourDistanceProfile } from './neighbour-distance-profile.js';
import { randomSeeded } from './random-seeded.js';

describe('neighbourDistanceProfile', () => {
  const rng = randomSeeded(6);
  const n = 200;
  const x = Float64Array.from({ length: n }, () => 400 * rng.normal());
  const y = Float64Array.from({ length: n }, () => 400 * rng.normal());
  const w = Float64Array.from({ length: n }, () => 1 + 3 * rng.uniform());
  it('reproduces per-point Gaussian sums Σ_{j≠i} wⱼ K_h(dᵢⱼ) of the direct loop to 2e-3 [D]', () => {
    const p = neighbourDistanceProfile(x, y, w, 0.5, 6000);
    const Q = p.nodes.length;
    for (const h of [20, 150, 900]) {
      const kv = Array.from(p.nodes, (d) => Math.exp(-(d * d) / (2 * h * h)));
      for (const i of [0, 17, 123]) {
        let direct = 0;
        for (let j = 0; j < n; j++) if (j !== i) direct += w[j] * Math.exp(-((x[i] - x[j]) ** 2 + (y[i] - y[j]) ** 2) / (2 * h * h));
        let binned = 0;
        for (let q = 0; q < Q; q++) binned += p.profile[i * Q + q] * kv[q];
        expect(Math.abs(binned / direct - 1)).toBeLessThan(2e-3);
      }
    }
  });
  it('flags points with no neighbour within the radius', () => {
    const p = neighbourDistanceProfile(Float64Array.of(0, 5, 1e5), Float64Array.of(0, 0, 0), Float64Array.of(1, 1, 1), 0.1, 100);
    expect(Array.from(p.hasNeighbour)).toEqual([1, 1, 0]);
  });
});
