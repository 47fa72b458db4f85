import { describe, expect, it } from 'vitest';
import type { GridSpec } from '../types.js';
import { densityMethodCost } from './kde-cost.js';

const big: GridSpec = { originX: 0, originY: 0, cellSize: 50, width: 1000, height: 1000 };

describe('densityMethodCost', () => {
  it('picks binned for a million points on a 1000 × 1000 grid (quartic 2.5 km, 50 m cells)', () => {
    const c = densityMethodCost(1e6, big, 'quartic', 2500);
    expect(c.binnedMeetsBound).toBe(true);
    expect(c.method).toBe('binned');
    // Exact visits ≈ π·50² ≈ 7,850 cells per point [D]; binned is a few FFTs of 2048².
    expect(c.exactSeconds / c.binnedSeconds).toBeGreaterThan(10);
    expect(c.seconds).toBe(c.binnedSeconds);
  });

  it('picks exact for a handful of points, where the FFT costs more than the sum', () => {
    expect(densityMethodCost(20, big, 'quartic', 2500).method).toBe('exact');
  });

  it('picks exact when binned cannot meet its bound at this cell size', () => {
    const c = densityMethodCost(1e6, big, 'epanechnikov', 2500);
    expect(c.binnedMeetsBound).toBe(false);
    expect(c.method).toBe('exact');
    expect(densityMethodCost(1e6, big, 'quartic', 1000).method).toBe('exact'); // δ/h = 0.05 > 0.03
  });

  it('picks exact when the FFT lattice would not fit in memory', () => {
    const huge: GridSpec = { originX: 0, originY: 0, cellSize: 1, width: 4000, height: 4000 };
    expect(densityMethodCost(1e7, huge, 'quartic', 300).method).toBe('exact');
  });

  it('charges the adaptive pilot and edge correction on top, and the adaptive sum is exact', () => {
    const plain = densityMethodCost(1e5, big, 'quartic', 2500);
    const adaptive = densityMethodCost(1e5, big, 'quartic', 2500, { adaptive: true });
    expect(adaptive.method).toBe('exact');
    expect(adaptive.seconds).toBeGreaterThan(plain.exactSeconds);
    expect(
      densityMethodCost(1e5, big, 'quartic', 2500, { edgeCorrection: true }).seconds,
    ).toBeGreaterThan(plain.seconds);
  });

  it('prices the uniform disc and Epanechnikov by row runs, below a cell-by-cell sum', () => {
    const uniform = densityMethodCost(1e5, big, 'uniform', 2500);
    const epanechnikov = densityMethodCost(1e5, big, 'epanechnikov', 2500);
    const quartic = densityMethodCost(1e5, big, 'quartic', 2500);
    expect(uniform.method).toBe('exact');
    // Measured [D] for 10⁵ points: uniform (2 × 2 cell means) 1.0 s, Epanechnikov 0.5 s,
    // quartic cell by cell ≈ 2.5–3 s.
    expect(uniform.exactSeconds).toBeLessThan(quartic.exactSeconds / 2);
    expect(epanechnikov.exactSeconds).toBeLessThan(quartic.exactSeconds / 4);
  });

  it('grows with the number of points and with the kernel area', () => {
    const a = densityMethodCost(1e4, big, 'quartic', 1000).exactSeconds;
    expect(densityMethodCost(2e4, big, 'quartic', 1000).exactSeconds).toBeCloseTo(2 * a, 10);
    expect(densityMethodCost(1e4, big, 'quartic', 2000).exactSeconds / a).toBeGreaterThan(3.5);
  });
});
