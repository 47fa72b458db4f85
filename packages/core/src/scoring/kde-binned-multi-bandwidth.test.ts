import { describe, expect, it } from 'vitest';
import { kdeBinned } from '../kde/kde-binned.js';
import { randomSeeded } from '../lib/random-seeded.js';
import type { GridSpec, PlanarPoints } from '../types.js';
import { kdeBinnedMultiBandwidth } from './kde-binned-multi-bandwidth.js';

function cluster(n: number, seed: number): PlanarPoints {
  const r = randomSeeded(seed);
  const p = { x: new Float64Array(n), y: new Float64Array(n), w: new Float64Array(n) };
  for (let k = 0; k < n; k++) {
    p.x[k] = 5000 + 800 * r.normal();
    p.y[k] = 4000 + 600 * r.normal();
    p.w[k] = 1 + r.uniform() * 3;
  }
  return p;
}

describe('kdeBinnedMultiBandwidth', () => {
  const spec: GridSpec = { originX: 0, originY: 0, cellSize: 100, width: 100, height: 80 };
  const points = cluster(2000, 4);

  for (const kernel of ['gaussian', 'quartic'] as const) {
    it(`equals kdeBinned for each bandwidth (${kernel}) within 1e-10 × max [same method, one binning]`, () => {
      const hs = [300, 450, 600, 900, 1200];
      const multi = kdeBinnedMultiBandwidth(points, spec, kernel, hs);
      hs.forEach((h, k) => {
        const single = kdeBinned(points, spec, kernel, h).values;
        let max = 0;
        let err = 0;
        for (let c = 0; c < single.length; c++) {
          max = Math.max(max, single[c]);
          err = Math.max(err, Math.abs(single[c] - multi[k].values[c]));
        }
        expect(multi[k].bandwidth).toBe(h);
        expect(err).toBeLessThan(1e-10 * max);
      });
    });
  }

  it('keeps the total weight: Σ λ̂ × cell area = Σ w for a cluster well inside the grid [closed form: ∫K = 1]', () => {
    let total = 0;
    for (const w of points.w) total += w;
    for (const s of kdeBinnedMultiBandwidth(points, spec, 'gaussian', [300, 600])) {
      let sum = 0;
      for (const v of s.values) sum += v * spec.cellSize ** 2;
      expect(Math.abs(sum - total) / total).toBeLessThan(1e-3);
    }
  });

  it('rejects an empty or bad bandwidth list', () => {
    expect(() => kdeBinnedMultiBandwidth(points, spec, 'gaussian', [])).toThrow(/at least one bandwidth/);
    expect(() => kdeBinnedMultiBandwidth(points, spec, 'gaussian', [500, -1])).toThrow(/bandwidth #2 must be a positive number of metres \(got -1\)/);
  });
});
