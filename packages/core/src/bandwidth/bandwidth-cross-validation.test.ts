import { describe, expect, it } from 'vitest';
import { randomSeeded } from '../lib/random-seeded.js';
import { cvLeastSquaresScore } from './bandwidth-cv-criteria.js';
import { bandwidthByRule } from './bandwidth-by-rule.js';
import { bandwidthCrossValidation } from './bandwidth-cross-validation.js';
import { bandwidthNormalReference } from './bandwidth-normal-reference.js';

function gaussianSample(n: number, seed: number, sd = 1000) {
  const rng = randomSeeded(seed);
  const p = { x: new Float64Array(n), y: new Float64Array(n), w: new Float64Array(n) };
  for (let i = 0; i < n; i++) {
    p.x[i] = sd * rng.normal();
    p.y[i] = sd * rng.normal();
    p.w[i] = 1;
  }
  return p;
}

describe('bandwidthCrossValidation', () => {
  const sample = gaussianSample(1500, 11);
  // For a Gaussian sample the normal reference is near-optimal, so sound CV lands near it [S: Silverman 1986 §3.4; Bowman & Azzalini 1997].
  for (const method of ['least-squares', 'likelihood'] as const) {
    for (const kernel of ['gaussian', 'quartic'] as const) {
      it(`${method}, ${kernel}: within a factor 2 of the normal-reference bandwidth on a Gaussian sample`, () => {
        const ref = bandwidthNormalReference(sample, kernel).value;
        const cv = bandwidthCrossValidation(sample, kernel, { method, seed: 1 });
        expect(cv.value / ref).toBeGreaterThan(0.5);
        expect(cv.value / ref).toBeLessThan(2);
        expect(cv.searchEdge).toBeUndefined();
        expect(cv.rule).toBe(method === 'likelihood' ? 'likelihood-cv' : 'least-squares-cv');
      });
    }
  }
  it('finds the minimum of the criterion (no trial bandwidth scores better)', () => {
    const r = bandwidthCrossValidation(sample, 'quartic', { method: 'least-squares' });
    const score = cvLeastSquaresScore(sample, 'quartic', 2 * 3 * r.value);
    const at = score(r.value);
    for (const f of [0.8, 0.9, 0.97, 1.03, 1.1, 1.25]) expect(score(f * r.value)).toBeGreaterThanOrEqual(at - 1e-18);
  });
  it('merges coincident points: tripled data gives the same bandwidth, not ~0', () => {
    const base = gaussianSample(500, 5);
    const tripled = { x: new Float64Array(1500), y: new Float64Array(1500), w: new Float64Array(1500).fill(1) };
    for (let c = 0; c < 3; c++) {
      tripled.x.set(base.x, c * 500);
      tripled.y.set(base.y, c * 500);
    }
    // Without merging the duplicates, LSCV keeps falling as h → 0 (the danger merging removes).
    const unmerged = cvLeastSquaresScore(tripled, 'quartic', 2000);
    expect(unmerged(1)).toBeLessThan(unmerged(300));
    const a = bandwidthCrossValidation(base, 'quartic', { method: 'least-squares' });
    const b = bandwidthCrossValidation(tripled, 'quartic', { method: 'least-squares' });
    expect(b.value).toBeCloseTo(a.value, 6);
    expect(b.explanation).toMatch(/1,000 coincident points merged/);
  });
  it('subsamples reproducibly from the seed and stays close to the full-data value', () => {
    const big = gaussianSample(3000, 8);
    const full = bandwidthCrossValidation(big, 'gaussian', { method: 'likelihood', maxSample: 3000 });
    const sub1 = bandwidthCrossValidation(big, 'gaussian', { method: 'likelihood', maxSample: 1000, seed: 4 });
    const sub2 = bandwidthCrossValidation(big, 'gaussian', { method: 'likelihood', maxSample: 1000, seed: 4 });
    expect(sub1.value).toBe(sub2.value);
    expect(sub1.value / full.value).toBeGreaterThan(0.7);
    expect(sub1.value / full.value).toBeLessThan(1.4);
    expect(sub1.explanation).toMatch(/1,000 of 3,000 locations sampled/);
  });
  it('likelihood is not dictated by one remote customer, even for a compact kernel', () => {
    const p = gaussianSample(800, 2);
    p.x[0] = 50_000;
    const ref = bandwidthNormalReference(p, 'quartic').value;
    const cv = bandwidthCrossValidation(p, 'quartic', { method: 'likelihood' });
    expect(cv.value / ref).toBeLessThan(2);
    expect(cv.explanation).toMatch(/converted by canonical scaling/);
  });
  it('rejects fewer than 3 distinct locations and bad options', () => {
    const p = { x: Float64Array.of(0, 0, 5), y: Float64Array.of(0, 0, 5), w: Float64Array.of(1, 1, 1) };
    expect(() => bandwidthCrossValidation(p, 'quartic')).toThrow(/at least 3 distinct customer locations with weight \(got 2\)/);
    expect(() => bandwidthCrossValidation(sample, 'quartic', { maxSample: 10_000 })).toThrow(/maxSample must be a whole number from 10 to 4000/);
    expect(() => bandwidthCrossValidation(sample, 'quartic', { method: 'bogus' as never })).toThrow(/method must be/);
  });
});

describe('bandwidthByRule', () => {
  const sample = gaussianSample(300, 13);
  it('dispatches to each rule', () => {
    expect(bandwidthByRule(sample, 'quartic', 'normal-reference').rule).toBe('normal-reference');
    expect(bandwidthByRule(sample, 'quartic', 'likelihood-cv').rule).toBe('likelihood-cv');
    expect(bandwidthByRule(sample, 'quartic', 'least-squares-cv').rule).toBe('least-squares-cv');
    expect(() => bandwidthByRule(sample, 'quartic', 'eyeball' as never)).toThrow(/rule must be one of normal-reference, likelihood-cv, least-squares-cv/);
  });
});
