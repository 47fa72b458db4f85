import { describe, expect, it } from 'vitest';
import type { GridSpec } from '../types.js';
import { contourPercentVolume } from './contour-percent-volume.js';

/** N(0, s²I) density at the cell centres of a square grid centred on 0 reaching ±half. */
function gaussianGrid(s: number, cell: number, half: number): { values: Float64Array; spec: GridSpec } {
  const n = Math.round((2 * half) / cell);
  const spec = { originX: -half, originY: -half, cellSize: cell, width: n, height: n };
  const values = new Float64Array(n * n);
  for (let j = 0; j < n; j++) {
    for (let i = 0; i < n; i++) {
      const x = -half + (i + 0.5) * cell;
      const y = -half + (j + 0.5) * cell;
      values[i + j * n] = Math.exp(-(x * x + y * y) / (2 * s * s)) / (2 * Math.PI * s * s);
    }
  }
  return { values, spec };
}

describe('contourPercentVolume', () => {
  it('Gaussian N(0, s²I): 50 % radius s·√(2 ln 2) = 1.1774 s, 90 % radius 2.1460 s [D: DOMAIN.md]', () => {
    const s = 1000;
    const { values, spec } = gaussianGrid(s, 10, 6 * s);
    const levels = contourPercentVolume(values, spec, [50, 90]);
    const r50 = Math.sqrt(levels[0].area_m2 / Math.PI);
    const r90 = Math.sqrt(levels[1].area_m2 / Math.PI);
    expect(r50 / s).toBeCloseTo(1.1774, 3);
    expect(r90 / s).toBeCloseTo(2.146, 3);
    // The level is the density at that radius: e^{−r²/2s²}/(2πs²) = (1 − p)/(2πs²) [D].
    expect(levels[0].threshold * 2 * Math.PI * s * s).toBeCloseTo(0.5, 3);
    expect(levels.every((l) => !l.clipped)).toBe(true);
  });
  it('defaults to 50, 75 and 90 %, with growing areas and falling thresholds', () => {
    const { values, spec } = gaussianGrid(500, 25, 3000);
    const levels = contourPercentVolume(values, spec);
    expect(levels.map((l) => l.percent)).toEqual([50, 75, 90]);
    expect(levels[0].area_m2).toBeLessThan(levels[1].area_m2);
    expect(levels[1].threshold).toBeLessThan(levels[0].threshold);
  });
  it('flags contours the grid edge cuts', () => {
    const { values, spec } = gaussianGrid(1000, 50, 1500);
    const levels = contourPercentVolume(values, spec, [50, 90]);
    expect(levels[0].clipped).toBe(false);
    expect(levels[1].clipped).toBe(true);
  });
  it('counts tied cells at the threshold inside, and ignores NaN and negative cells', () => {
    const spec = { originX: 0, originY: 0, cellSize: 10, width: 3, height: 1 };
    // Shares: 50 %, 25 %, 25 %: the 60 % level reaches into the tie at 1 → both tied cells inside.
    const [l] = contourPercentVolume(Float64Array.of(2, 1, 1), spec, [60]);
    expect(l).toEqual({ percent: 60, threshold: 1, area_m2: 300, clipped: true });
    const [m] = contourPercentVolume(Float64Array.of(NaN, 3, -1), spec, [50]);
    expect(m.threshold).toBe(3);
    expect(m.area_m2).toBe(100);
  });
  it('rejects bad percents, a size mismatch and an all-zero surface', () => {
    const spec = { originX: 0, originY: 0, cellSize: 1, width: 2, height: 1 };
    expect(() => contourPercentVolume(Float64Array.of(1, 2), spec, [0])).toThrow('contour percents must be numbers in (0, 100] (got 0)');
    expect(() => contourPercentVolume(Float64Array.of(1, 2), spec, [150])).toThrow(/got 150/);
    expect(() => contourPercentVolume(Float64Array.of(1), spec)).toThrow(/width × height = 2 entries \(got 1\)/);
    expect(() => contourPercentVolume(Float64Array.of(0, 0), spec)).toThrow(/zero everywhere/);
  });
});
