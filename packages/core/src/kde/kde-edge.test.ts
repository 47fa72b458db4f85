import { describe, expect, it } from 'vitest';
import type { GridSpec } from '../types.js';
import { kdeBinned } from './kde-binned.js';
import { KDE_EDGE_MIN_FACTOR, kdeEdgeCorrect, kdeEdgeFactor } from './kde-edge.js';

/** Standard normal CDF via the Abramowitz & Stegun 7.1.26 erf approximation (|error| < 1.5e-7) [S]. */
function phi(z: number): number {
  const t = 1 / (1 + (0.3275911 * Math.abs(z)) / Math.SQRT2);
  const poly =
    t *
    (0.254829592 + t * (-0.284496736 + t * (1.421413741 + t * (-1.453152027 + t * 1.061405429))));
  const erf = 1 - poly * Math.exp(-(z * z) / 2);
  return z >= 0 ? 0.5 * (1 + erf) : 0.5 * (1 - erf);
}

const H = 1000;
const D = 50;
const N = 300;
const EDGE = 150; // mask = 1 for cells i ≥ EDGE (and j ≥ EDGE for the corner)
const spec: GridSpec = { originX: 0, originY: 0, cellSize: D, width: N, height: N };

function halfPlaneMask(corner: boolean): Uint8Array {
  const m = new Uint8Array(N * N);
  for (let j = 0; j < N; j++)
    for (let i = 0; i < N; i++) m[i + j * N] = i >= EDGE && (!corner || j >= EDGE) ? 1 : 0;
  return m;
}

describe('kdeEdgeFactor', () => {
  const straight = kdeEdgeFactor(spec, 'gaussian', H, halfPlaneMask(false));
  const row = 150 * N;
  /**
   * e at distance d (metres) inside the straight edge, linear between the two nearest cell
   * centres; at d < δ/2 extrapolated from the two innermost (Φ is linear near 0: Φ''(0) = 0).
   */
  const at = (d: number): number => {
    const f = (EDGE * D + d) / D - 0.5;
    const i = Math.max(EDGE, Math.floor(f));
    return straight[row + i] + (f - i) * (straight[row + i + 1] - straight[row + i]);
  };

  it('Gaussian, point at distance d from a straight edge: e = Φ(d/h) = 0.5, 0.6915, 0.8413, 0.9772 for d/h = 0, 0.5, 1, 2 (DOMAIN.md [D])', () => {
    // Tolerance 2e-3: stencil mass and linear interpolation between centres 50 m apart.
    expect(at(0)).toBeCloseTo(0.5, 3);
    expect(Math.abs(at(500) - 0.6915)).toBeLessThan(2e-3);
    expect(Math.abs(at(1000) - 0.8413)).toBeLessThan(2e-3);
    expect(Math.abs(at(2000) - 0.9772)).toBeLessThan(2e-3);
  });

  it('follows Φ(d/h) at every cell centre inside the edge ([S] normal CDF, Abramowitz & Stegun 7.1.26)', () => {
    for (let i = EDGE; i < EDGE + 80; i++) {
      const d = (i - EDGE + 0.5) * D;
      expect(Math.abs(straight[row + i] - phi(d / H))).toBeLessThan(1e-3);
    }
    expect(straight[row + EDGE - 1]).toBe(0); // outside W
  });

  it('a right-angle corner: e = 0.25 at the corner (DOMAIN.md [D], Φ(0)²)', () => {
    const e = kdeEdgeFactor(spec, 'gaussian', H, halfPlaneMask(true));
    const c = EDGE + EDGE * N;
    // The innermost cell sits δ/2 from both edges: Φ(0.025)².
    expect(Math.abs(e[c] - phi(0.025) ** 2)).toBeLessThan(1e-3);
    // Bilinear extrapolation from the 2 × 2 innermost cells to the corner itself (t = −½ per axis).
    const corner = 2.25 * e[c] - 0.75 * e[c + 1] - 0.75 * e[c + N] + 0.25 * e[c + 1 + N];
    expect(Math.abs(corner - 0.25)).toBeLessThan(2e-3);
  });

  it('is 1 deep inside and treats the world beyond the grid as outside when there is no mask', () => {
    const e = kdeEdgeFactor(spec, 'quartic', 1000);
    expect(e[150 + 150 * N]).toBeCloseTo(1, 12);
    expect(e[0]).toBeLessThan(0.3);
  });
});

describe('kdeEdgeCorrect', () => {
  it('restores a flat intensity up to the coast: points on every cell of W give 1/δ² everywhere in W', () => {
    const mask = halfPlaneMask(false);
    const xs: number[] = [];
    const ys: number[] = [];
    for (let j = 0; j < N; j += 1)
      for (let i = EDGE; i < N; i++) {
        xs.push((i + 0.5) * D);
        ys.push((j + 0.5) * D);
      }
    const p = {
      x: Float64Array.from(xs),
      y: Float64Array.from(ys),
      w: new Float64Array(xs.length).fill(1),
    };
    const raw = kdeBinned(p, spec, 'quartic', 600, { mask }).values;
    const rho = 1 / (D * D);
    expect(raw[EDGE + 150 * N] / rho).toBeLessThan(0.6); // about half at the edge before correction
    const corrected = kdeEdgeCorrect(raw, kdeEdgeFactor(spec, 'quartic', 600, mask), mask);
    // Rows far from the grid's south and north borders (600 m = 12 cells).
    for (let j = 20; j < N - 20; j += 7) {
      for (let i = EDGE; i < N - 20; i += 3)
        expect(Math.abs(corrected[i + j * N] / rho - 1)).toBeLessThan(2e-3);
      expect(corrected[EDGE - 1 + j * N]).toBe(0);
    }
  });

  it(`caps the correction at ×${1 / KDE_EDGE_MIN_FACTOR} in slivers`, () => {
    const v = Float64Array.of(1, 1, 1);
    kdeEdgeCorrect(v, Float64Array.of(0.5, 0.01, 1));
    expect(Array.from(v)).toEqual([2, 1 / KDE_EDGE_MIN_FACTOR, 1]);
  });
});
