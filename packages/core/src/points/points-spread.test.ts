import { describe, expect, it } from 'vitest';
import { pointsSpread } from './points-spread.js';

const X = [3, 1, 4, 1, 5, 9, 2, 6, 5, 3, 5];

describe('pointsSpread', () => {
  it('equal weights: sd and IQR match numpy (std ddof=1; percentile method="hazen") [D: numpy 1.x]', () => {
    const s = pointsSpread({ x: Float64Array.from(X), y: Float64Array.from(X, (v) => 2 * v), w: new Float64Array(X.length).fill(1) });
    expect(s.nEff).toBeCloseTo(11, 12);
    expect(s.sdX).toBeCloseTo(2.3664319132398464, 12);
    expect(s.sdY).toBeCloseTo(2 * 2.3664319132398464, 12);
    expect(s.iqrX).toBeCloseTo(5 - 2.25, 12);
    expect(s.meanX).toBeCloseTo(44 / 11, 12);
  });
  it('weights: sd matches numpy sqrt(cov(x, aweights=w)) [D: numpy]', () => {
    const w = [1, 2, 1, 1, 3, 1, 1, 2, 1, 1, 1];
    const s = pointsSpread({ x: Float64Array.from(X), y: Float64Array.from(X), w: Float64Array.from(w) });
    expect(s.sdX).toBeCloseTo(2.306512518934159, 12);
    // Kish: (Σw)² / Σw² = 15² / 25 [S: Kish 1965].
    expect(s.nEff).toBeCloseTo(225 / 25, 12);
  });
  it('weighted IQR from Hazen positions: values 0, 10 with weights 1, 3 → 7.5 [D]', () => {
    const s = pointsSpread({ x: Float64Array.of(0, 10), y: Float64Array.of(0, 10), w: Float64Array.of(1, 3) });
    expect(s.iqrX).toBeCloseTo(7.5, 12);
  });
  it('is unchanged when every weight is scaled, and ignores zero-weight points', () => {
    const base = pointsSpread({ x: Float64Array.of(0, 1, 5, 7), y: Float64Array.of(1, 1, 2, 3), w: Float64Array.of(1, 2, 3, 4) });
    const scaled = pointsSpread({ x: Float64Array.of(0, 1, 5, 7, 1000), y: Float64Array.of(1, 1, 2, 3, 1000), w: Float64Array.of(10, 20, 30, 40, 0) });
    expect(scaled.sdX).toBeCloseTo(base.sdX, 12);
    expect(scaled.iqrY).toBeCloseTo(base.iqrY, 12);
    expect(scaled.nEff).toBeCloseTo(base.nEff, 12);
  });
  it('a single point has zero spread', () => {
    const s = pointsSpread({ x: Float64Array.of(4), y: Float64Array.of(2), w: Float64Array.of(3) });
    expect(s).toMatchObject({ sdX: 0, sdY: 0, iqrX: 0, iqrY: 0, nEff: 1 });
  });
});
