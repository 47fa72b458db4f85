import { describe, expect, it } from 'vitest';
import { CoreError, isCoreError, type CoreErrorCode } from '../errors.js';
import { randomSeeded } from '../lib/random-seeded.js';
import type { GridSpec, PlanarPoints } from '../types.js';
import { densitySurface, type DensitySurfaceOptions } from './density-surface.js';

function points(x: number[], y: number[], w: number[]): PlanarPoints {
  return { x: Float64Array.from(x), y: Float64Array.from(y), w: Float64Array.from(w) };
}

/** n × n cells of size d with cell (n/2, n/2) centred on (0, 0). */
function centred(n: number, d: number): GridSpec {
  const c = Math.floor(n / 2);
  return { originX: -(c + 0.5) * d, originY: -(c + 0.5) * d, cellSize: d, width: n, height: n };
}

function thrown(fn: () => unknown): CoreError {
  try {
    fn();
  } catch (e) {
    if (e instanceof CoreError) return e;
    throw e;
  }
  throw new Error('expected a CoreError');
}

const one = points([0], [0], [100]);

describe('densitySurface', () => {
  it('reports per km²: one customer, w = 100, Gaussian σ = 1 km → 15.9155 and 9.6532 at 1 km (DOMAIN.md [D])', () => {
    const spec = centred(201, 50);
    for (const method of ['exact', 'binned'] as const) {
      const s = densitySurface(one, spec, { kernel: 'gaussian', bandwidth: 1000, method });
      expect(s.intensity[100 + 100 * 201]).toBeCloseTo(15.9155, 3);
      expect(s.intensity[120 + 100 * 201]).toBeCloseTo(9.6532, 3);
      expect(s.stats.max).toBeCloseTo(15.9155, 3);
      expect(s.stats.maxCell).toEqual({ i: 100, j: 100, x: 0, y: 0 });
      expect(s.share[100 + 100 * 201]).toBeCloseTo(0.159155, 5);
    }
  });

  it('quartic radius 2 km → 23.8732 on the customer and 13.4287 at 1 km (DOMAIN.md [D])', () => {
    const s = densitySurface(one, centred(101, 50), { kernel: 'quartic', bandwidth: 2000 });
    expect(s.intensity[50 + 50 * 101]).toBeCloseTo(23.8732, 3);
    expect(s.intensity[50 + 70 * 101]).toBeCloseTo(13.4287, 3);
  });

  it('integrates to Σw, and the share to 1, when the grid covers every kernel ([D] ∫K = 1)', () => {
    const rng = randomSeeded(8);
    const x: number[] = [];
    const y: number[] = [];
    const w: number[] = [];
    for (let k = 0; k < 300; k++) {
      x.push(800 * rng.normal());
      y.push(800 * rng.normal());
      w.push(1 + rng.uniform() * 20);
    }
    const p = points(x, y, w);
    const spec = centred(301, 25);
    // Every point lies within 3 km of the centre; the grid reaches 3.76 km each way, so it covers
    // every 700 m kernel.
    expect(Math.max(...x.map(Math.abs), ...y.map(Math.abs))).toBeLessThan(3000);
    for (const method of ['exact', 'binned'] as const) {
      const s = densitySurface(p, spec, { kernel: 'quartic', bandwidth: 700, method });
      expect(s.stats.integral / s.stats.totalWeight).toBeCloseTo(1, 3);
      const shareMass = (s.share.reduce((a, v) => a + v, 0) * (25 * 25)) / 1e6;
      expect(shareMass).toBeCloseTo(1, 3);
      expect(s.stats.contributingPoints).toBe(300);
      expect(s.stats.pointCount).toBe(300);
      expect(s.method).toBe(method);
    }
  });

  it('auto: binned for many points with a smooth kernel on fine cells, exact for Epanechnikov', () => {
    const rng = randomSeeded(3);
    const n = 20_000;
    const p: PlanarPoints = {
      x: new Float64Array(n),
      y: new Float64Array(n),
      w: new Float64Array(n).fill(1),
    };
    for (let k = 0; k < n; k++) {
      p.x[k] = 2000 * rng.normal();
      p.y[k] = 2000 * rng.normal();
    }
    const spec = centred(200, 50);
    expect(densitySurface(p, spec, { kernel: 'quartic', bandwidth: 2000 }).method).toBe('binned');
    expect(densitySurface(p, spec, { kernel: 'epanechnikov', bandwidth: 2000 }).method).toBe(
      'exact',
    );
  });

  it('a single point gives a surface that peaks on it', () => {
    const spec: GridSpec = { originX: 500, originY: 700, cellSize: 20, width: 60, height: 50 };
    const s = densitySurface(points([1234], [1456], [3]), spec, {
      kernel: 'triweight',
      bandwidth: 300,
    });
    expect([s.stats.maxCell.i, s.stats.maxCell.j]).toEqual([36, 37]);
  });

  for (const method of ['exact', 'binned'] as const) {
    it(`counts contributors per cell with the ${method} method`, () => {
      const s = densitySurface(points([0, 100], [0, 0], [1, 1]), centred(41, 25), {
        kernel: 'quartic',
        bandwidth: 200,
        method,
        countContributors: true,
      });
      expect(s.contributors![20 + 20 * 41]).toBe(2);
      expect(s.contributors![24 + 20 * 41]).toBe(2); // 100 m east: 100 m from both
      expect(s.contributors![13 + 20 * 41]).toBe(1); // 175 m west: only the first point is within 200 m
      expect(s.contributors![12 + 20 * 41]).toBe(0); // 200 m west: exactly at the radius, K = 0
      expect(s.contributors![20 + 30 * 41]).toBe(0);
    });
  }

  it('adaptive: returns per-point bandwidths and runs the exact sum', () => {
    const p = points([0, 30, -40, 2000], [0, 10, 25, -1500], [1, 1, 1, 1]);
    const s = densitySurface(p, centred(161, 40), {
      kernel: 'quartic',
      bandwidth: 800,
      adaptive: { pilotBandwidth: 900 },
    });
    expect(s.method).toBe('exact');
    expect(s.bandwidths).toHaveLength(4);
    expect(s.bandwidths![3]).toBeGreaterThan(s.bandwidths![0]);
    expect(s.stats.adaptive).toBe(true);
  });

  it('edge correction lifts the coast: a flat lattice of customers stays flat up to the study-area edge', () => {
    const spec = centred(81, 25);
    const mask = new Uint8Array(81 * 81);
    const x: number[] = [];
    const y: number[] = [];
    for (let j = 0; j < 81; j++) {
      for (let i = 0; i < 81; i++) {
        if (i < 40) continue;
        mask[i + j * 81] = 1;
        x.push(spec.originX + (i + 0.5) * 25);
        y.push(spec.originY + (j + 0.5) * 25);
      }
    }
    const p = points(x, y, new Array(x.length).fill(1));
    const opts: DensitySurfaceOptions = {
      kernel: 'quartic',
      bandwidth: 200,
      mask,
      method: 'binned',
    };
    const raw = densitySurface(p, spec, opts);
    const corrected = densitySurface(p, spec, { ...opts, edgeCorrection: true });
    const rho = 1e6 / (25 * 25); // customers per km²
    const c = 40 + 40 * 81;
    expect(raw.intensity[c] / rho).toBeLessThan(0.7);
    expect(corrected.intensity[c] / rho).toBeCloseTo(1, 2);
    expect(corrected.intensity[c - 1]).toBe(0);
    expect(corrected.stats.edgeCorrection).toBe(true);
  });

  it('stops with code ABORTED when the signal has fired', () => {
    const ctl = new AbortController();
    ctl.abort();
    expect(
      thrown(() =>
        densitySurface(one, centred(11, 50), {
          kernel: 'quartic',
          bandwidth: 300,
          signal: ctl.signal,
        }),
      ).code,
    ).toBe('ABORTED');
  });

  describe('rejects bad input with a specific code and a message that says what to change', () => {
    const spec = centred(11, 50);
    const cases: Array<[string, CoreErrorCode, () => unknown, RegExp]> = [
      [
        'no points',
        'EMPTY_POINTS',
        () => densitySurface(points([], [], []), spec, { kernel: 'quartic', bandwidth: 300 }),
        /no customer locations/,
      ],
      [
        'NaN x',
        'INVALID_COORDINATE',
        () =>
          densitySurface(points([0, NaN], [0, 0], [1, 1]), spec, {
            kernel: 'quartic',
            bandwidth: 300,
          }),
        /point 1 has x = NaN/,
      ],
      [
        'infinite y',
        'INVALID_COORDINATE',
        () =>
          densitySurface(points([0], [Infinity], [1]), spec, { kernel: 'quartic', bandwidth: 300 }),
        /point 0 has y = Infinity/,
      ],
      [
        'negative weight',
        'INVALID_WEIGHT',
        () =>
          densitySurface(points([0, 1], [0, 1], [1, -2]), spec, {
            kernel: 'quartic',
            bandwidth: 300,
          }),
        /point 1 has weight -2/,
      ],
      [
        'NaN weight',
        'INVALID_WEIGHT',
        () => densitySurface(points([0], [0], [NaN]), spec, { kernel: 'quartic', bandwidth: 300 }),
        /weight NaN/,
      ],
      [
        'zero total weight',
        'ZERO_TOTAL_WEIGHT',
        () =>
          densitySurface(points([0, 1], [0, 1], [0, 0]), spec, {
            kernel: 'quartic',
            bandwidth: 300,
          }),
        /add up to 0/,
      ],
      [
        'negative bandwidth',
        'INVALID_BANDWIDTH',
        () =>
          densitySurface(points([0, 900], [0, 400], [1, 1]), spec, {
            kernel: 'quartic',
            bandwidth: -3,
          }),
        /bandwidth must be a positive number of metres \(got -3\); try the suggested \d+ m/,
      ],
      [
        'NaN bandwidth',
        'INVALID_BANDWIDTH',
        () => densitySurface(one, spec, { kernel: 'quartic', bandwidth: NaN }),
        /got NaN/,
      ],
      [
        'bad pilot',
        'INVALID_BANDWIDTH',
        () =>
          densitySurface(one, spec, {
            kernel: 'quartic',
            bandwidth: 300,
            adaptive: { pilotBandwidth: 0 },
          }),
        /pilot bandwidth/,
      ],
      [
        'zero cell size',
        'INVALID_CELL_SIZE',
        () => densitySurface(one, { ...spec, cellSize: 0 }, { kernel: 'quartic', bandwidth: 300 }),
        /cell size must be a positive number of metres \(got 0\); for a bandwidth of 300 m try 9 m/,
      ],
      [
        'mask length',
        'INVALID_ARGUMENT',
        () =>
          densitySurface(one, spec, { kernel: 'quartic', bandwidth: 300, mask: new Uint8Array(5) }),
        /11 × 11 = 121 \(got 5\)/,
      ],
      [
        'empty mask',
        'INVALID_ARGUMENT',
        () =>
          densitySurface(one, spec, {
            kernel: 'quartic',
            bandwidth: 300,
            mask: new Uint8Array(121),
          }),
        /no cell inside/,
      ],
      [
        'unknown kernel',
        'INVALID_ARGUMENT',
        () => densitySurface(one, spec, { kernel: 'box' as never, bandwidth: 300 }),
        /kernel must be one of/,
      ],
      [
        'unknown method',
        'INVALID_ARGUMENT',
        () =>
          densitySurface(one, spec, { kernel: 'quartic', bandwidth: 300, method: 'fast' as never }),
        /method must be exact, binned or auto/,
      ],
      [
        'ragged arrays',
        'INVALID_ARGUMENT',
        () =>
          densitySurface(points([0, 1], [0], [1, 1]), spec, { kernel: 'quartic', bandwidth: 300 }),
        /same length/,
      ],
      [
        'zero width',
        'INVALID_ARGUMENT',
        () => densitySurface(one, { ...spec, width: 0 }, { kernel: 'quartic', bandwidth: 300 }),
        /width must be a whole number/,
      ],
    ];
    for (const [name, code, fn, message] of cases) {
      it(`${name} → ${code}`, () => {
        const e = thrown(fn);
        expect(isCoreError(e, code)).toBe(true);
        expect(e.message).toMatch(message);
      });
    }

    it('names the index of the bad row in the details', () => {
      expect(
        thrown(() =>
          densitySurface(points([0, 0, 5], [0, 0, NaN], [1, 1, 1]), spec, {
            kernel: 'quartic',
            bandwidth: 300,
          }),
        ).details,
      ).toEqual({ index: 2 });
    });
  });
});
