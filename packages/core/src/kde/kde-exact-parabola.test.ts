import { describe, expect, it } from 'vitest';
import { randomSeeded } from '../lib/random-seeded.js';
import type { GridSpec, PlanarPoints } from '../types.js';
import { kdeExact } from './kde-exact.js';

/** Direct definition at cell centres: Σ w·(2/πh²)(1 − r²/h²) over r < h [D, DOMAIN.md kernel table]. */
function bruteForce(
  p: PlanarPoints,
  spec: GridSpec,
  hs: Float64Array,
): { values: Float64Array; counts: Uint32Array } {
  const values = new Float64Array(spec.width * spec.height);
  const counts = new Uint32Array(values.length);
  for (let j = 0; j < spec.height; j++) {
    for (let i = 0; i < spec.width; i++) {
      const cx = spec.originX + (i + 0.5) * spec.cellSize;
      const cy = spec.originY + (j + 0.5) * spec.cellSize;
      for (let k = 0; k < p.x.length; k++) {
        if (p.w[k] === 0) continue;
        const r2 = ((cx - p.x[k]) ** 2 + (cy - p.y[k]) ** 2) / hs[k] ** 2;
        if (r2 < 1) {
          values[i + j * spec.width] += (p.w[k] * 2 * (1 - r2)) / (Math.PI * hs[k] ** 2);
          counts[i + j * spec.width]++;
        }
      }
    }
  }
  return { values, counts };
}

describe('Epanechnikov by row parabolas', () => {
  it('equals the direct sum at cell centres, with per-point bandwidths and counts, far from the origin', () => {
    // A wide grid far from (0, 0) maximises the cancellation in the row polynomials.
    const spec: GridSpec = {
      originX: 512_345,
      originY: 4_100_000,
      cellSize: 10,
      width: 400,
      height: 30,
    };
    const rng = randomSeeded(12);
    const n = 300;
    const p: PlanarPoints = {
      x: new Float64Array(n),
      y: new Float64Array(n),
      w: new Float64Array(n),
    };
    const hs = new Float64Array(n);
    for (let k = 0; k < n; k++) {
      p.x[k] = spec.originX - 300 + 4600 * rng.uniform();
      p.y[k] = spec.originY - 200 + 700 * rng.uniform();
      p.w[k] = k % 11 === 0 ? 0 : 1 + 50 * rng.uniform();
      hs[k] = 200 + 300 * rng.uniform(); // 20–50 cells: centre samples
    }
    const fast = kdeExact(p, spec, 'epanechnikov', 300, {
      bandwidths: hs,
      countContributors: true,
    });
    expect(fast.oversample).toBe(1);
    const ref = bruteForce(p, spec, hs);
    let peak = 0;
    for (const v of ref.values) peak = Math.max(peak, v);
    for (let c = 0; c < ref.values.length; c++) {
      expect(Math.abs(fast.values[c] - ref.values[c])).toBeLessThan(1e-11 * peak);
      expect(fast.contributors![c]).toBe(ref.counts[c]);
    }
  });
});
