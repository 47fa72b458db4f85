import { describe, expect, it } from 'vitest';
import { isCoreError } from '../errors.js';
import { kernelByName } from '../kernels/kernels.js';
import { randomSeeded } from '../lib/random-seeded.js';
import { KERNEL_NAMES, type GridSpec, type PlanarPoints } from '../types.js';
import { kdeExact } from './kde-exact.js';

const PER_KM2 = 1e6;

function points(x: number[], y: number[], w: number[]): PlanarPoints {
  return { x: Float64Array.from(x), y: Float64Array.from(y), w: Float64Array.from(w) };
}

/** A grid of n × n cells of size d whose cell (c, c) has its centre at (0, 0). */
function centredGrid(n: number, d: number): GridSpec {
  const c = Math.floor(n / 2);
  return { originX: -(c + 0.5) * d, originY: -(c + 0.5) * d, cellSize: d, width: n, height: n };
}

describe('kdeExact', () => {
  it('one customer, w = 100, Gaussian σ = 1 km: 15.9155 /km² on it and 9.6532 at 1 km (DOMAIN.md [D], (w/2πσ²)e^{−r²/2σ²})', () => {
    const spec = centredGrid(301, 50);
    const { values } = kdeExact(points([0], [0], [100]), spec, 'gaussian', 1000);
    const c = 150 + 150 * 301;
    expect(values[c] * PER_KM2).toBeCloseTo(15.9155, 4);
    expect(values[c + 20] * PER_KM2).toBeCloseTo(9.6532, 4); // 20 cells east = 1 km
    expect(values[c + 20 * 301] * PER_KM2).toBeCloseTo(9.6532, 4); // 1 km north
  });

  it('one customer, w = 100, quartic radius 2 km: 23.8732 /km² on it and 13.4287 at 1 km (DOMAIN.md [D], (3w/πh²)(1−r²/h²)²)', () => {
    const spec = centredGrid(101, 50);
    const { values } = kdeExact(points([0], [0], [100]), spec, 'quartic', 2000);
    const c = 50 + 50 * 101;
    expect(values[c] * PER_KM2).toBeCloseTo(23.8732, 4);
    expect(values[c - 20] * PER_KM2).toBeCloseTo(13.4287, 4);
    expect(values[c + 40]).toBe(0); // exactly at the radius
  });

  it('a single point gives a surface that peaks on it', () => {
    const spec: GridSpec = { originX: 1000, originY: 2000, cellSize: 100, width: 40, height: 30 };
    const { values } = kdeExact(points([2230], [3370], [1]), spec, 'quartic', 800);
    let best = 0;
    for (let c = 1; c < values.length; c++) if (values[c] > values[best]) best = c;
    // Point at (2230, 3370) lies in cell i = 12, j = 13.
    expect([best % 40, Math.floor(best / 40)]).toEqual([12, 13]);
  });

  for (const name of KERNEL_NAMES) {
    it(`${name}: the grid integral Σλ̂·δ² equals Σw when the grid covers the support ([D] ∫K = 1)`, () => {
      const rng = randomSeeded(21);
      const h = 600;
      const reach = kernelByName(name).reach * h;
      const d = 60;
      const n = Math.ceil((2 * reach + 2000) / d);
      const spec: GridSpec = {
        originX: -reach - 1000,
        originY: -reach - 1000,
        cellSize: d,
        width: n,
        height: n,
      };
      const x: number[] = [];
      const y: number[] = [];
      const w: number[] = [];
      for (let k = 0; k < 50; k++) {
        x.push(2000 * rng.uniform() - 1000);
        y.push(2000 * rng.uniform() - 1000);
        w.push(1 + 4 * rng.uniform());
      }
      const { values } = kdeExact(points(x, y, w), spec, name, h);
      const integral = values.reduce((a, v) => a + v, 0) * d * d;
      const total = w.reduce((a, v) => a + v, 0);
      // Stencil mass tolerance 1e-3 (kde-stencil.ts) plus off-lattice positions [D].
      expect(Math.abs(integral / total - 1)).toBeLessThan(2e-3);
    });
  }

  it('keeps the mass of a kernel narrower than a cell by using cell means', () => {
    const spec = centredGrid(21, 100);
    const res = kdeExact(points([13, -240], [37, 110], [3, 2]), spec, 'quartic', 40);
    expect(res.oversample).toBeGreaterThan(1);
    const integral = res.values.reduce((a, v) => a + v, 0) * 100 * 100;
    expect(integral).toBeCloseTo(5, 2);
  });

  it('equals the sum of separate runs when each point has its own bandwidth', () => {
    const spec = centredGrid(61, 50);
    const p = points([0, 300, -420], [0, -200, 130], [1, 2, 3]);
    const hs = Float64Array.from([400, 700, 250]);
    const joint = kdeExact(p, spec, 'triweight', 500, { bandwidths: hs }).values;
    const sum = new Float64Array(joint.length);
    for (let k = 0; k < 3; k++) {
      const one = kdeExact(points([p.x[k]], [p.y[k]], [p.w[k]]), spec, 'triweight', hs[k]).values;
      for (let c = 0; c < sum.length; c++) sum[c] += one[c];
    }
    for (let c = 0; c < sum.length; c++) expect(joint[c]).toBeCloseTo(sum[c], 15);
  });

  it('counts the distinct points whose kernel reaches each cell', () => {
    const spec = centredGrid(41, 50);
    const p = points([0, 400, 0], [0, 0, 0], [1, 1, 7]);
    const { values, contributors, contributingPoints } = kdeExact(p, spec, 'quartic', 500, {
      countContributors: true,
    });
    expect(contributingPoints).toBe(3);
    for (let j = 0; j < 41; j++) {
      for (let i = 0; i < 41; i++) {
        const cx = (i - 20) * 50;
        const cy = (j - 20) * 50;
        let expected = 0;
        for (let k = 0; k < 3; k++)
          if ((cx - p.x[k]) ** 2 + (cy - p.y[k]) ** 2 < 500 ** 2) expected++;
        expect(contributors![i + j * 41]).toBe(expected);
        expect(values[i + j * 41] > 0).toBe(expected > 0);
      }
    }
  });

  it('counts only points whose kernel reaches the grid', () => {
    const spec: GridSpec = { originX: 0, originY: 0, cellSize: 10, width: 10, height: 10 };
    // Cell centres run 5 … 95; a radius-200 kernel at x = −194 reaches the centre at 5 (199 m), at −195 it does not.
    const res = kdeExact(points([-194, -195, 50], [5, 5, 50], [1, 1, 1]), spec, 'quartic', 200);
    expect(res.contributingPoints).toBe(2);
  });

  it('zeroes the cells outside the study-area mask and leaves the rest unchanged', () => {
    const spec = centredGrid(21, 50);
    const mask = new Uint8Array(21 * 21);
    for (let c = 0; c < mask.length; c++) mask[c] = c % 21 < 10 ? 1 : 0;
    const p = points([10, -60], [20, 30], [1, 2]);
    const full = kdeExact(p, spec, 'quartic', 300).values;
    const masked = kdeExact(p, spec, 'quartic', 300, { mask }).values;
    for (let c = 0; c < full.length; c++) expect(masked[c]).toBe(mask[c] ? full[c] : 0);
  });

  it('stops with code ABORTED when the signal has fired, and reports progress up to 1', () => {
    const spec = centredGrid(21, 50);
    const ctl = new AbortController();
    ctl.abort();
    let err: unknown;
    try {
      kdeExact(points([0], [0], [1]), spec, 'quartic', 300, { signal: ctl.signal });
    } catch (e) {
      err = e;
    }
    expect(isCoreError(err, 'ABORTED')).toBe(true);
    const seen: number[] = [];
    kdeExact(points([0], [0], [1]), spec, 'quartic', 300, { onProgress: (f) => seen.push(f) });
    expect(seen.at(-1)).toBe(1);
  });
});
