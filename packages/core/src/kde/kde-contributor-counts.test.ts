import { describe, expect, it } from 'vitest';
import { randomSeeded } from '../lib/random-seeded.js';
import type { GridSpec, KernelName, PlanarPoints } from '../types.js';
import { kdeContributorCounts } from './kde-contributor-counts.js';
import { kdeExact } from './kde-exact.js';

function cloud(n: number, spec: GridSpec, seed: number): PlanarPoints {
  const rng = randomSeeded(seed);
  const W = spec.width * spec.cellSize;
  const H = spec.height * spec.cellSize;
  const x = new Float64Array(n);
  const y = new Float64Array(n);
  const w = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    // Half clustered, half spread over the grid and 20 % beyond each edge.
    const c = k % 2 === 0;
    x[k] = spec.originX + (c ? 0.4 * W + 0.05 * W * rng.normal() : W * (1.4 * rng.uniform() - 0.2));
    y[k] = spec.originY + (c ? 0.6 * H + 0.05 * H * rng.normal() : H * (1.4 * rng.uniform() - 0.2));
    w[k] = k % 17 === 0 ? 0 : 1 + rng.uniform();
  }
  return { x, y, w };
}

describe('kdeContributorCounts', () => {
  const spec: GridSpec = { originX: 1000, originY: -500, cellSize: 30, width: 90, height: 70 };
  const cases: Array<[KernelName, number]> = [
    ['quartic', 400],
    ['gaussian', 120],
    ['uniform', 333],
    ['triangular', 95],
    ['quartic', 30], // narrow kernel: cell means, counted by the exact sum
  ];
  for (const [kernel, h] of cases) {
    it(`${kernel}, h = ${h} m: equals the exact sum's per-cell counts, points off the grid and zero weights included`, () => {
      const p = cloud(3000, spec, h);
      const exact = kdeExact(p, spec, kernel, h, { countContributors: true }).contributors!;
      const fast = kdeContributorCounts(p, spec, kernel, h);
      expect(Array.from(fast)).toEqual(Array.from(exact));
    });
  }

  it('counts 0 outside the mask', () => {
    const mask = new Uint8Array(spec.width * spec.height).fill(1);
    mask.fill(0, 0, 900);
    const p = cloud(500, spec, 4);
    const exact = kdeExact(p, spec, 'quartic', 300, {
      countContributors: true,
      mask,
    }).contributors!;
    expect(Array.from(kdeContributorCounts(p, spec, 'quartic', 300, { mask }))).toEqual(
      Array.from(exact),
    );
  });
});
