import { describe, expect, it } from 'vitest';
import { isCoreError } from '../errors.js';
import { randomSeeded } from '../lib/random-seeded.js';
import type { GridSpec, KernelName, PlanarPoints } from '../types.js';
import { kdeBinned } from './kde-binned.js';
import {
  KDE_BINNED_MAX_CELL_FRACTION,
  KDE_SUGGESTED_CELL_FRACTION,
  kdeBinnedMeetsBound,
} from './kde-cell-rule.js';
import { kdeExact } from './kde-exact.js';

function points(x: number[], y: number[], w: number[]): PlanarPoints {
  return { x: Float64Array.from(x), y: Float64Array.from(y), w: Float64Array.from(w) };
}

/** Invented data shapes on a grid (seeded): every shape the binned bound is promised for. */
function shapes(h: number, spec: GridSpec): Record<string, PlanarPoints> {
  const W = spec.width * spec.cellSize;
  const H = spec.height * spec.cellSize;
  const { originX: ox, originY: oy, cellSize: d } = spec;
  const rng = randomSeeded(11);
  const cl: number[][] = [[], [], []];
  const centres = [
    [0.3, 0.4, 0.8],
    [0.65, 0.6, 1.5],
    [0.5, 0.25, 0.5],
  ];
  for (let k = 0; k < 1500; k++) {
    const c = centres[k % 3];
    cl[0].push(ox + c[0] * W + c[2] * h * rng.normal());
    cl[1].push(oy + c[1] * H + c[2] * h * rng.normal());
    cl[2].push(1 + 9 * rng.uniform());
  }
  const un: number[][] = [[], [], []];
  for (let k = 0; k < 800; k++) {
    un[0].push(ox + W * rng.uniform());
    un[1].push(oy + H * rng.uniform());
    un[2].push(1);
  }
  // Points on, just inside and up to 0.7 h outside each edge of the grid.
  const ed: number[][] = [[], [], []];
  for (let k = 0; k < 400; k++) {
    const t = rng.uniform();
    const side = k % 4;
    const off = (rng.uniform() - 0.7) * h;
    ed[0].push(side === 0 ? ox + off : side === 1 ? ox + W - off : ox + t * W);
    ed[1].push(side === 2 ? oy + off : side === 3 ? oy + H - off : oy + t * H);
    ed[2].push(1 + rng.uniform());
  }
  const hv: number[][] = [[], [], []];
  for (let k = 0; k < 600; k++) {
    hv[0].push(ox + W * (0.3 + 0.4 * rng.uniform()));
    hv[1].push(oy + H * (0.3 + 0.4 * rng.uniform()));
    hv[2].push(k % 100 === 0 ? 1e4 : 1);
  }
  // A lone point midway between four cell centres is the worst case for linear binning.
  const cx = ox + Math.floor(spec.width / 2) * d;
  const cy = oy + Math.floor(spec.height / 2) * d;
  return {
    clustered: points(cl[0], cl[1], cl[2]),
    uniform: points(un[0], un[1], un[2]),
    'edge points': points(ed[0], ed[1], ed[2]),
    'heavy weights': points(hv[0], hv[1], hv[2]),
    'single point between centres': points([cx], [cy], [5]),
    'single point off-centre': points([cx + 0.13 * d], [cy + 0.41 * d], [5]),
  };
}

function specFor(kernel: KernelName, h: number, fraction: number): GridSpec {
  const d = fraction * h;
  const n = Math.round(((kernel === 'gaussian' ? 8 : 4) * h) / d);
  return { originX: 5000, originY: -3000, cellSize: d, width: n, height: Math.round(n * 0.8) };
}

function relativeMaxError(exact: Float64Array, binned: Float64Array): number {
  let peak = 0;
  let worst = 0;
  for (let c = 0; c < exact.length; c++) {
    peak = Math.max(peak, exact[c]);
    worst = Math.max(worst, Math.abs(exact[c] - binned[c]));
  }
  return worst / peak;
}

describe('kdeBinned', () => {
  // The bound and the cell fractions are this module's own claim, measured [D] against kdeExact.
  for (const kernel of ['gaussian', 'quartic', 'triweight'] as const) {
    const fraction = KDE_BINNED_MAX_CELL_FRACTION[kernel];
    const h = 1000;
    const spec = specFor(kernel, h, fraction);
    for (const [shape, p] of Object.entries(shapes(h, spec))) {
      it(`${kernel}, cell = ${fraction}·h: max|binned − exact| ≤ 1e-3 × max(exact) on ${shape}`, () => {
        const e = kdeExact(p, spec, kernel, h).values;
        const b = kdeBinned(p, spec, kernel, h).values;
        expect(relativeMaxError(e, b)).toBeLessThanOrEqual(1e-3);
      });
    }
  }

  for (const kernel of ['epanechnikov', 'triangular', 'uniform'] as const) {
    it(`${kernel}: misses the bound at the suggested cell (${KDE_SUGGESTED_CELL_FRACTION[kernel]}·h), so auto must use exact`, () => {
      const h = 1000;
      const spec = specFor(kernel, h, KDE_SUGGESTED_CELL_FRACTION[kernel]);
      const p = shapes(h, spec)['single point between centres'];
      const err = relativeMaxError(
        kdeExact(p, spec, kernel, h).values,
        kdeBinned(p, spec, kernel, h).values,
      );
      expect(err).toBeGreaterThan(1e-3);
      expect(kdeBinnedMeetsBound(kernel, h, spec.cellSize)).toBe(false);
    });
  }

  for (const kernel of ['epanechnikov', 'triangular'] as const) {
    it(`${kernel}: meets the bound in the worst case at its tiny limit ${KDE_BINNED_MAX_CELL_FRACTION[kernel]}·h (first-order error)`, () => {
      const h = 1000;
      const d = KDE_BINNED_MAX_CELL_FRACTION[kernel] * h;
      const n = Math.ceil((2.2 * h) / d);
      const spec: GridSpec = {
        originX: -1.1 * h,
        originY: -1.1 * h,
        cellSize: d,
        width: n,
        height: n,
      };
      const p = shapes(h, spec)['single point between centres'];
      const err = relativeMaxError(
        kdeExact(p, spec, kernel, h).values,
        kdeBinned(p, spec, kernel, h).values,
      );
      expect(err).toBeLessThanOrEqual(1e-3);
    });
  }

  it('keeps every weight: grid integral = Σw when the grid covers the support, also for points outside the grid ([D] ∫K = 1)', () => {
    const spec: GridSpec = { originX: 0, originY: 0, cellSize: 25, width: 200, height: 160 };
    // Points up to 400 m outside the west edge are still binned onto the margin; the grid is
    // widened below so it covers their whole support for the integral.
    const p = points([-300, 2500, 4100, 10], [2000, 1990, 3000, 3990], [2, 3, 4, 5]);
    const wide: GridSpec = {
      originX: -1200,
      originY: -1000,
      cellSize: 25,
      width: 280,
      height: 250,
    };
    const res = kdeBinned(p, wide, 'quartic', 800);
    const integral = res.values.reduce((a, v) => a + v, 0) * 25 * 25;
    expect(Math.abs(integral / 14 - 1)).toBeLessThan(1e-3);
    expect(res.contributingPoints).toBe(4);
    expect(kdeBinned(p, spec, 'quartic', 800).contributingPoints).toBe(4);
  });

  it('Gaussian cluster identity: N(μ, s²I) smoothed by h gives peak/Σw = 1/(2π(s² + h²)) = 0.127324 /km² for s = 1, h = 0.5 km ([S] convolution of normals; DOMAIN.md [D])', () => {
    const rng = randomSeeded(2026);
    const n = 100_000;
    const x = new Float64Array(n);
    const y = new Float64Array(n);
    const w = new Float64Array(n).fill(1);
    for (let k = 0; k < n; k++) {
      x[k] = 1000 * rng.normal();
      y[k] = 1000 * rng.normal();
    }
    const d = 25; // cell centre (80, 80) sits on μ = (0, 0)
    const spec: GridSpec = {
      originX: -80.5 * d,
      originY: -80.5 * d,
      cellSize: d,
      width: 161,
      height: 161,
    };
    const { values } = kdeBinned({ x, y, w }, spec, 'gaussian', 500);
    const atMean = (values[80 + 80 * 161] * 1e6) / n;
    // Sampling sd of f̂(μ) ≈ √(f(μ)·R(K)/(n h²)) = 1.4e-3 /km² (≈ 1.1 %); tolerance ≈ 3 sd.
    expect(atMean).toBeCloseTo(0.127324, 2);
    expect(Math.abs(atMean / 0.127324 - 1)).toBeLessThan(0.035);
  });

  it('zeroes cells outside the mask', () => {
    const spec: GridSpec = { originX: 0, originY: 0, cellSize: 20, width: 50, height: 50 };
    const mask = new Uint8Array(2500);
    for (let c = 0; c < 2500; c++) mask[c] = Math.floor(c / 50) < 25 ? 1 : 0;
    const p = points([500], [500], [1]);
    const full = kdeBinned(p, spec, 'quartic', 300).values;
    const masked = kdeBinned(p, spec, 'quartic', 300, { mask }).values;
    for (let c = 0; c < 2500; c++) expect(masked[c]).toBe(mask[c] ? full[c] : 0);
  });

  it('refuses a lattice beyond the FFT limit with GRID_TOO_LARGE and says what to change', () => {
    const spec: GridSpec = { originX: 0, originY: 0, cellSize: 1, width: 4000, height: 4000 };
    let err: unknown;
    try {
      kdeBinned(points([5], [5], [1]), spec, 'quartic', 300);
    } catch (e) {
      err = e;
    }
    expect(isCoreError(err, 'GRID_TOO_LARGE')).toBe(true);
    expect((err as Error).message).toMatch(/use a larger cell size/);
  });

  it('stops with code ABORTED when the signal has fired', () => {
    const ctl = new AbortController();
    ctl.abort();
    const spec: GridSpec = { originX: 0, originY: 0, cellSize: 20, width: 50, height: 50 };
    let err: unknown;
    try {
      kdeBinned(points([500], [500], [1]), spec, 'quartic', 300, { signal: ctl.signal });
    } catch (e) {
      err = e;
    }
    expect(isCoreError(err, 'ABORTED')).toBe(true);
  });
});
