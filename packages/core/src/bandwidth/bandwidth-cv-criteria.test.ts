import { describe, expect, it } from 'vitest';
import { kernelByName } from '../kernels/kernels.js';
import { randomSeeded } from '../lib/random-seeded.js';
import { cvLeastSquaresScore, cvLikelihoodScore } from './bandwidth-cv-criteria.js';

const rng = randomSeeded(17);
const n = 30;
const pts = {
  x: Float64Array.from({ length: n }, () => 300 * rng.normal()),
  y: Float64Array.from({ length: n }, () => 200 * rng.normal()),
  w: Float64Array.from({ length: n }, () => 1 + 4 * rng.uniform()),
};
const W = pts.w.reduce((s, v) => s + v, 0);
const Kh = (name: string, h: number, d2: number) => kernelByName(name).valueSq(d2 / (h * h)) / (h * h);

/** LSCV by definition, with ∫f̂² by a midpoint sum over a fine grid (independent of the self-convolution). */
function lscvBrute(name: string, h: number): number {
  const step = h / 40;
  const reach = kernelByName(name).reach * h;
  let integral = 0;
  for (let gx = -1200 - reach; gx < 1200 + reach; gx += step) {
    for (let gy = -800 - reach; gy < 800 + reach; gy += step) {
      let f = 0;
      for (let j = 0; j < n; j++) f += pts.w[j] * Kh(name, h, (gx + step / 2 - pts.x[j]) ** 2 + (gy + step / 2 - pts.y[j]) ** 2);
      integral += (f / W) ** 2 * step * step;
    }
  }
  let loo = 0;
  for (let i = 0; i < n; i++) {
    let f = 0;
    for (let j = 0; j < n; j++) if (j !== i) f += pts.w[j] * Kh(name, h, (pts.x[i] - pts.x[j]) ** 2 + (pts.y[i] - pts.y[j]) ** 2);
    loo += pts.w[i] * (f / (W - pts.w[i]));
  }
  return integral - (2 / W) * loo;
}

describe('cvLeastSquaresScore', () => {
  for (const name of ['gaussian', 'quartic', 'epanechnikov'] as const) {
    it(`${name}: equals the definition with ∫f̂² summed on a fine grid [D]`, () => {
      const h = 250;
      const fast = cvLeastSquaresScore(pts, name, 12 * h)(h);
      expect(fast / lscvBrute(name, h)).toBeCloseTo(1, 3);
    });
  }
});

describe('cvLikelihoodScore', () => {
  it('equals Σ wᵢ log λ̂₋ᵢ(xᵢ) − Σw by direct summation [D]', () => {
    const h = 180;
    let l = -W;
    for (let i = 0; i < n; i++) {
      let s = 0;
      for (let j = 0; j < n; j++) if (j !== i) s += pts.w[j] * Kh('gaussian', h, (pts.x[i] - pts.x[j]) ** 2 + (pts.y[i] - pts.y[j]) ** 2);
      l += pts.w[i] * Math.log(s);
    }
    // Binned neighbour sums carry < 1e-3 relative error per point, i.e. < 1e-3 in each log term.
    expect(Math.abs(cvLikelihoodScore(pts, 'gaussian', 0.1, 6 * h).score(h) - l)).toBeLessThan(1e-3 * W);
  });
  it('is −∞ for a compact kernel when a point has no neighbour within h', () => {
    expect(cvLikelihoodScore(pts, 'quartic', 0.01, 5000).score(1)).toBe(-Infinity);
  });
  it('leaves out points with no neighbour within the pairs radius', () => {
    const far = { x: Float64Array.of(0, 10, 20, 1e6), y: Float64Array.of(0, 0, 5, 0), w: Float64Array.of(1, 1, 1, 1) };
    const { score, isolated } = cvLikelihoodScore(far, 'gaussian', 0.01, 1000);
    expect(isolated).toBe(1);
    expect(Number.isFinite(score(10))).toBe(true);
  });
});
