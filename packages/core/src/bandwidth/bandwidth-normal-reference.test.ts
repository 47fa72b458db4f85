import { describe, expect, it } from 'vitest';
import { randomSeeded } from '../lib/random-seeded.js';
import { bandwidthNormalReference } from './bandwidth-normal-reference.js';

/** 40 deterministic points: x_k = frac(kφ)·1000, y_k = frac(k√2)·600 + 0.3·x_k, k = 1…40. */
function lattice() {
  const phi = (Math.sqrt(5) - 1) / 2;
  const x = new Float64Array(40);
  const y = new Float64Array(40);
  for (let k = 1; k <= 40; k++) {
    x[k - 1] = ((k * phi) % 1) * 1000;
    y[k - 1] = ((k * Math.SQRT2) % 1) * 600 + 0.3 * x[k - 1];
  }
  return { x, y, w: new Float64Array(40).fill(1) };
}

describe('bandwidthNormalReference', () => {
  it('σ̂ = 1 km, n = 10,000 → Gaussian 0.215 km, Epanechnikov 0.517 km, quartic 0.599 km [D: DOMAIN.md]', () => {
    // A 100 × 100 lattice of equal-weight points with sd exactly 1 km per axis (IQR/1.349 is larger).
    const n = 100;
    const xs = Array.from({ length: n }, (_, i) => i - (n - 1) / 2);
    const sd = Math.sqrt(xs.reduce((s, v) => s + v * v, 0) / (n - 1));
    const x = new Float64Array(n * n);
    const y = new Float64Array(n * n);
    for (let j = 0; j < n; j++) for (let i = 0; i < n; i++) [x[i + j * n], y[i + j * n]] = [(xs[i] / sd) * 1000, (xs[j] / sd) * 1000];
    const pts = { x, y, w: new Float64Array(n * n).fill(1) };
    // Over all n² points (each axis value repeated n times) the sd is 1 km · √(n/(n+1)).
    const corr = Math.sqrt(((n - 1) * n * n) / (n * (n * n - 1)));
    expect(bandwidthNormalReference(pts, 'gaussian').value / corr / 1000).toBeCloseTo(0.215, 3);
    expect(bandwidthNormalReference(pts, 'epanechnikov').value / corr / 1000).toBeCloseTo(0.517, 3);
    expect(bandwidthNormalReference(pts, 'quartic').value / corr / 1000).toBeCloseTo(0.599, 3);
  });
  it("equals scipy gaussian_kde(bw_method='scott') bandwidth, pooled √((cov₀₀+cov₁₁)/2) [D: scipy 1.17.1]", () => {
    // python3: kde = scipy.stats.gaussian_kde(vstack([x, y]), bw_method='scott'); factor 0.5407418735600995 = 40^(−1/6)
    const r = bandwidthNormalReference(lattice(), 'gaussian');
    expect(r.value).toBeCloseTo(132.80951728327466, 9);
    expect(r.gaussianSd).toBeCloseTo(132.80951728327466, 9);
    expect(r.kernelSd).toBeCloseTo(r.value, 12);
  });
  it('uses IQR/1.349 when it is smaller than the sd (an outlier inflates the sd) [S: Silverman 1986]', () => {
    const rng = randomSeeded(3);
    const n = 2000;
    const pts = { x: new Float64Array(n), y: new Float64Array(n), w: new Float64Array(n).fill(1) };
    for (let i = 0; i < n; i++) [pts.x[i], pts.y[i]] = [1000 * rng.normal(), 1000 * rng.normal()];
    const before = bandwidthNormalReference(pts, 'gaussian').value;
    pts.x[0] = 1e6;
    const after = bandwidthNormalReference(pts, 'gaussian').value;
    expect(after / before).toBeCloseTo(1, 1);
  });
  it('weights count through Kish n_eff: doubling every weight changes nothing, one heavy point shrinks n_eff', () => {
    const a = lattice();
    const b = { ...a, w: new Float64Array(40).fill(2) };
    expect(bandwidthNormalReference(b, 'quartic').value).toBeCloseTo(bandwidthNormalReference(a, 'quartic').value, 9);
  });
  it('explains itself in one line with the rule and units', () => {
    const r = bandwidthNormalReference(lattice(), 'quartic');
    expect(r.rule).toBe('normal-reference');
    expect(r.explanation).toMatch(/m radius from Silverman's rule/);
    expect(r.value / r.gaussianSd).toBeCloseTo(1.822708 / 0.655841, 5);
  });
  it('rejects data with no spread', () => {
    const p = { x: Float64Array.of(5, 5), y: Float64Array.of(1, 1), w: Float64Array.of(1, 1) };
    expect(() => bandwidthNormalReference(p, 'quartic')).toThrow(/set the bandwidth by hand/);
  });
});
