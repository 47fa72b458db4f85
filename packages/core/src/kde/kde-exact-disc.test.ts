import { describe, expect, it } from 'vitest';
import { randomSeeded } from '../lib/random-seeded.js';
import type { GridSpec, PlanarPoints } from '../types.js';
import { kdeExact } from './kde-exact.js';
import { kdeRowRun } from './kde-row-run.js';

const spec: GridSpec = { originX: -400, originY: 300, cellSize: 20, width: 60, height: 45 };

function cloud(n: number): PlanarPoints {
  const rng = randomSeeded(31);
  const p: PlanarPoints = {
    x: new Float64Array(n),
    y: new Float64Array(n),
    w: new Float64Array(n),
  };
  for (let k = 0; k < n; k++) {
    p.x[k] = -500 + 1400 * rng.uniform();
    p.y[k] = 200 + 1100 * rng.uniform();
    p.w[k] = k % 9 === 0 ? 0 : 1 + 3 * rng.uniform();
  }
  return p;
}

/** Direct definition: mean of the disc kernel w/(πh²)·[r < h] over s × s sub-samples per cell [D]. */
function bruteForce(
  p: PlanarPoints,
  hs: Float64Array,
  s: number,
): { values: Float64Array; counts: Uint32Array } {
  const values = new Float64Array(spec.width * spec.height);
  const counts = new Uint32Array(values.length);
  for (let j = 0; j < spec.height; j++) {
    for (let i = 0; i < spec.width; i++) {
      for (let k = 0; k < p.x.length; k++) {
        if (p.w[k] === 0) continue;
        let inside = 0;
        for (let q = 0; q < s; q++) {
          for (let r = 0; r < s; r++) {
            const cx = spec.originX + (i + (r + 0.5) / s) * spec.cellSize;
            const cy = spec.originY + (j + (q + 0.5) / s) * spec.cellSize;
            if ((cx - p.x[k]) ** 2 + (cy - p.y[k]) ** 2 < hs[k] ** 2) inside++;
          }
        }
        if (inside > 0) {
          values[i + j * spec.width] += (p.w[k] * inside) / (Math.PI * hs[k] ** 2 * s * s);
          counts[i + j * spec.width]++;
        }
      }
    }
  }
  return { values, counts };
}

describe('uniform disc by row runs', () => {
  const p = cloud(120);
  const hs = new Float64Array(p.x.length);
  for (let k = 0; k < hs.length; k++) hs[k] = 90 + (k % 7) * 23;
  for (const s of [1, 3]) {
    it(`equals the direct sum of the disc kernel over ${s}×${s} samples per cell, with per-point bandwidths and counts`, () => {
      const fast = kdeExact(p, spec, 'uniform', 100, {
        bandwidths: hs,
        oversample: s,
        countContributors: true,
      });
      const ref = bruteForce(p, hs, s);
      let peak = 0;
      for (const v of ref.values) peak = Math.max(peak, v);
      for (let c = 0; c < ref.values.length; c++) {
        expect(Math.abs(fast.values[c] - ref.values[c])).toBeLessThan(1e-12 * peak);
        expect(fast.contributors![c]).toBe(ref.counts[c]);
      }
    });
  }
});

describe('kdeRowRun', () => {
  it('finds the cells of a row within the disc', () => {
    const run = new Int32Array(2);
    kdeRowRun(10.3, 0.1, 0.25, 1, 0, 99, run);
    expect(Array.from(run)).toEqual([2, 18]); // |i − 10.3|·0.1 < √0.75 ⇔ 1.64 < i < 18.96
    kdeRowRun(10.3, 0.1, 1.2, 1, 0, 99, run);
    expect(run[0]).toBeGreaterThan(run[1]);
  });
});
