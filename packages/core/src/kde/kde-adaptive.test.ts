import { describe, expect, it } from 'vitest';
import { randomSeeded } from '../lib/random-seeded.js';
import type { GridSpec, PlanarPoints } from '../types.js';
import { ADAPTIVE_MAX_FACTOR, kdeAdaptive, kdeAdaptiveBandwidths } from './kde-adaptive.js';
import { kdeExact } from './kde-exact.js';
import { kdeExactAt } from './kde-exact-at.js';

const spec: GridSpec = { originX: -6000, originY: -6000, cellSize: 40, width: 300, height: 300 };

/** A dense core (sd 400 m) and a sparse halo (sd 2 km), weights 1 … 3. */
function coreAndHalo(n: number): PlanarPoints {
  const rng = randomSeeded(99);
  const x = new Float64Array(n);
  const y = new Float64Array(n);
  const w = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    const s = k % 4 === 0 ? 2000 : 400;
    x[k] = s * rng.normal();
    y[k] = s * rng.normal();
    w[k] = 1 + 2 * rng.uniform();
  }
  return { x, y, w };
}

/** A uniform square of 6 km with a dense 1 km patch in the middle: density ratio ≈ 13, nothing clamps. */
function squareAndPatch(): PlanarPoints {
  const rng = randomSeeded(5);
  const n = 2000;
  const x = new Float64Array(n);
  const y = new Float64Array(n);
  const w = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    const half = k < 500 ? 500 : 3000;
    x[k] = half * (2 * rng.uniform() - 1);
    y[k] = half * (2 * rng.uniform() - 1);
    w[k] = 1 + 2 * rng.uniform();
  }
  return { x, y, w };
}

describe('kdeAdaptiveBandwidths', () => {
  const p = squareAndPatch();
  const res = kdeAdaptiveBandwidths(p, spec, 'quartic', 800);

  it('weighted geometric mean of hᵢ equals h₀ when no factor is clamped (Abramson 1982 [S]; [D] Σw·log(f̃/γ) = 0)', () => {
    let clamped = 0;
    let logSum = 0;
    let wSum = 0;
    for (let k = 0; k < p.x.length; k++) {
      const f = res.bandwidths[k] / 800;
      if (f >= ADAPTIVE_MAX_FACTOR - 1e-12 || f <= 1 / ADAPTIVE_MAX_FACTOR + 1e-12) clamped++;
      logSum += p.w[k] * Math.log(res.bandwidths[k]);
      wSum += p.w[k];
    }
    expect(clamped).toBe(0);
    expect(Math.exp(logSum / wSum)).toBeCloseTo(800, 6);
  });

  it('follows the square-root law: hᵢ·√f̃(xᵢ) is the same for every point', () => {
    const c = res.bandwidths[0] * Math.sqrt(res.pilot[0]);
    for (let k = 1; k < p.x.length; k += 37)
      expect(res.bandwidths[k] * Math.sqrt(res.pilot[k])).toBeCloseTo(c, 6);
  });

  it('gives narrower kernels in the dense core than in the halo', () => {
    const p = coreAndHalo(2000);
    const res = kdeAdaptiveBandwidths(p, spec, 'quartic', 800);
    let core = 0;
    let halo = 0;
    for (let k = 0; k < p.x.length; k++) {
      const r = Math.hypot(p.x[k], p.y[k]);
      if (r < 200) core = Math.max(core, res.bandwidths[k]);
      if (r > 3000 && r < 5000) halo = Math.max(halo, res.bandwidths[k]);
    }
    expect(core).toBeLessThan(800);
    expect(halo).toBeGreaterThan(2 * core);
  });

  it('reads the pilot at the points within 0.5 % of the direct sum (bilinear interpolation on 40 m cells, h = 800 m)', () => {
    const p = coreAndHalo(2000);
    const res = kdeAdaptiveBandwidths(p, spec, 'quartic', 800);
    const direct = kdeExactAt(p, p.x, p.y, 'quartic', 800);
    for (let k = 0; k < p.x.length; k += 11) {
      if (Math.abs(p.x[k]) > 5000 || Math.abs(p.y[k]) > 5000) continue;
      expect(Math.abs(res.pilot[k] / direct[k] - 1)).toBeLessThan(5e-3);
    }
  });

  it(`clamps the factor to [1/${ADAPTIVE_MAX_FACTOR}, ${ADAPTIVE_MAX_FACTOR}] and gives the widest kernel where the pilot is 0`, () => {
    // 500 coincident points and one loner 5 km away: the loner's pilot is tiny.
    const n = 501;
    const q: PlanarPoints = {
      x: new Float64Array(n),
      y: new Float64Array(n),
      w: new Float64Array(n).fill(1),
    };
    q.x[500] = 5000;
    const r = kdeAdaptiveBandwidths(q, spec, 'quartic', 300);
    expect(r.bandwidths[500]).toBeCloseTo(300 * ADAPTIVE_MAX_FACTOR, 9);
    for (let k = 0; k < n; k++) {
      expect(r.bandwidths[k]).toBeGreaterThanOrEqual(300 / ADAPTIVE_MAX_FACTOR - 1e-9);
      expect(r.bandwidths[k]).toBeLessThanOrEqual(300 * ADAPTIVE_MAX_FACTOR + 1e-9);
    }
  });
});

describe('kdeAdaptive', () => {
  it('equals the exact sum with the Abramson bandwidths and keeps the total weight ([D] ∫K = 1)', () => {
    const p = coreAndHalo(600);
    const res = kdeAdaptive(p, spec, 'quartic', 800);
    const direct = kdeExact(p, spec, 'quartic', 800, { bandwidths: res.bandwidths }).values;
    expect(Array.from(res.values)).toEqual(Array.from(direct));
    let inside = 0;
    for (let k = 0; k < p.x.length; k++) {
      // Points whose whole support lies on the grid.
      if (Math.max(Math.abs(p.x[k]), Math.abs(p.y[k])) + res.bandwidths[k] < 5900) inside += p.w[k];
    }
    const integral = res.values.reduce((a, v) => a + v, 0) * 40 * 40;
    const total = p.w.reduce((a, v) => a + v, 0);
    expect(integral).toBeGreaterThanOrEqual(inside * (1 - 2e-3));
    expect(integral).toBeLessThanOrEqual(total * (1 + 2e-3));
  });
});
