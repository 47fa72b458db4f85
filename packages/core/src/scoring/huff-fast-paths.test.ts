import { describe, expect, it } from 'vitest';
import { randomSeeded } from '../lib/random-seeded.js';
import type { Site } from '../sites/site.js';
import type { GridSpec } from '../types.js';
import { huffCandidatesAlone, huffCandidateTerms } from './huff-candidates-alone.js';
import { huffCandidatesBreakdown } from './huff-breakdown.js';
import { distancePower, fourWayProductSafe, squaredDistancePower } from './huff-distance-power.js';
import { huffBaseCaptured, huffGrid } from './huff-grid.js';
import { demandCells, type ScoringSurface } from './scoring-surface.js';

/**
 * Straightforward Huff sums, cell by cell with Math.pow and Math.hypot [D: Huff 1963,
 * P = A^α d^−β / Σ A^α d^−β, applied directly; loss of own store k = W·a_k(1/S − 1/(S + t))].
 */
function direct(surface: ScoringSurface, own: Site[], rivals: Site[], cands: Site[], alpha: number, beta: number, minM: number) {
  const { spec, values } = surface;
  const captured = cands.map(() => 0);
  const cannibalization = cands.map(() => 0);
  const lost = cands.map(() => own.map(() => 0));
  const ownToday = own.map(() => 0);
  for (let j = 0; j < spec.height; j++)
    for (let i = 0; i < spec.width; i++) {
      const w = (values[i + j * spec.width] * spec.cellSize ** 2) / 1e6;
      if (w === 0) continue;
      const cx = spec.originX + (i + 0.5) * spec.cellSize;
      const cy = spec.originY + (j + 0.5) * spec.cellSize;
      const term = (s: Site) => Math.pow(s.attractiveness, alpha) / Math.pow(Math.max(minM, Math.hypot(cx - s.x, cy - s.y)) / 1000, beta);
      const ownTerms = own.map(term);
      const S = ownTerms.reduce((a, b) => a + b, 0) + rivals.map(term).reduce((a, b) => a + b, 0);
      ownTerms.forEach((t, k) => (ownToday[k] += (w * t) / S));
      cands.forEach((c, m) => {
        const t = term(c);
        captured[m] += (w * t) / (S + t);
        ownTerms.forEach((a, k) => {
          const l = w * a * (1 / S - 1 / (S + t));
          lost[m][k] += l;
          cannibalization[m] += l;
        });
      });
    }
  return { captured, cannibalization, lost, ownToday };
}

/** Random surface with zero cells (several runs a row) and a width that is no multiple of 4. */
function surfaceRandom(seed: number, width = 23, height = 17): ScoringSurface {
  const rnd = randomSeeded(seed).uniform;
  const spec: GridSpec = { originX: 500, originY: -300, cellSize: 200, width, height };
  const values = new Float64Array(width * height);
  for (let c = 0; c < values.length; c++) values[c] = rnd() < 0.25 ? 0 : rnd() * 300;
  return { spec, values };
}

function sitesRandom(seed: number, kind: Site['kind'], n: number, scale = 1): Site[] {
  const rnd = randomSeeded(seed).uniform;
  return Array.from({ length: n }, (_, k) => ({ id: `${kind}-${k}`, kind, x: 300 + 4800 * rnd(), y: -500 + 3800 * rnd(), attractiveness: scale * (0.2 + 3 * rnd()) }));
}

const close = (a: number, b: number, rel: number) => expect(Math.abs(a - b)).toBeLessThanOrEqual(rel * Math.max(1e-300, Math.abs(b)));

describe('Huff fast paths against the straightforward formula on random small inputs', () => {
  for (const beta of [2, 1, 1.5, 2.5, 3, 2.3]) {
    it(`candidates alone and with the per-store split match, β = ${beta} [D]`, () => {
      const surface = surfaceRandom(11 + beta * 10);
      const own = sitesRandom(1, 'own', 5);
      const rivals = sitesRandom(2, 'competitor', 3);
      const cands = sitesRandom(3, 'candidate', 7);
      // On a cell centre (minimum distance used), off the grid, and on a row of the grid.
      cands.push({ id: 'on-cell', kind: 'candidate', x: 500 + 5.5 * 200, y: -300 + 3.5 * 200, attractiveness: 1 });
      cands.push({ id: 'outside', kind: 'candidate', x: -4000, y: 9000, attractiveness: 2 });
      const want = direct(surface, own, rivals, cands, 1, beta, 100);
      const grid = huffGrid(surface, own, rivals, { beta });
      const alone = huffCandidatesAlone(grid, cands);
      const split = huffCandidatesBreakdown(grid, cands);
      expect(huffCandidateTerms(grid, cands).every((t) => t.fourWay)).toBe(true);
      cands.forEach((_, m) => {
        close(alone.captured[m], want.captured[m], 1e-12);
        close(alone.cannibalization[m], want.cannibalization[m], 1e-12);
        close(split.captured[m], want.captured[m], 1e-12);
        close(split.cannibalization[m], want.cannibalization[m], 1e-12);
        own.forEach((_, k) => close(split.cannibalizedFrom[m * own.length + k], want.lost[m][k], 1e-11));
      });
      huffBaseCaptured(grid, own).forEach((v, k) => close(v, want.ownToday[k], 1e-12));
    });
  }

  it('falls back to one division a cell when four-way products could overflow (α = 5, A^α up to 1e65) [D]', () => {
    const surface = surfaceRandom(5);
    const own = sitesRandom(4, 'own', 2, 1e13);
    const rivals = sitesRandom(5, 'competitor', 2, 1e13);
    const cands = sitesRandom(6, 'candidate', 3, 1e13);
    const want = direct(surface, own, rivals, cands, 5, 2, 100);
    const grid = huffGrid(surface, own, rivals, { alpha: 5, beta: 2 });
    expect(huffCandidateTerms(grid, cands).some((t) => t.fourWay)).toBe(false);
    const alone = huffCandidatesAlone(grid, cands);
    cands.forEach((_, m) => close(alone.captured[m], want.captured[m], 1e-12));
  });

  it('uses the given minimum distance instead of half a cell [D]', () => {
    const surface = surfaceRandom(8);
    const own = sitesRandom(7, 'own', 3);
    const cands = [{ id: 'c', kind: 'candidate' as const, x: 500 + 2.5 * 200, y: -300 + 2.5 * 200, attractiveness: 1 }];
    const want = direct(surface, own, [], cands, 1, 2, 250);
    const alone = huffCandidatesAlone(huffGrid(surface, own, [], { minDistanceM: 250 }), cands);
    close(alone.captured[0], want.captured[0], 1e-12);
    expect(() => huffGrid(surface, own, [], { minDistanceM: -1 })).toThrow(/minimum distance must be a positive number of metres \(got -1\)/);
  });

  it('scores a surface without demand as zero and no candidates as empty', () => {
    const spec: GridSpec = { originX: 0, originY: 0, cellSize: 100, width: 5, height: 4 };
    const grid = huffGrid({ spec, values: new Float64Array(20) }, sitesRandom(1, 'own', 2), []);
    expect(Array.from(huffCandidatesAlone(grid, sitesRandom(2, 'candidate', 2)).captured)).toEqual([0, 0]);
    expect(huffCandidatesBreakdown(grid, []).cannibalizedFrom.length).toBe(0);
  });
});

describe('demandCells runs', () => {
  it('packs demand cells row by row and records each run of consecutive cells', () => {
    const spec: GridSpec = { originX: 0, originY: 0, cellSize: 1000, width: 5, height: 3 };
    const values = Float64Array.of(0, 1, 1, 0, 2, /**/ 0, 0, 0, 0, 0, /**/ 3, 3, 3, 3, 3);
    const cells = demandCells({ spec, values });
    expect(Array.from(cells.runs)).toEqual([0, 1, 3, 0, 0, 4, 5, 2, 2, 0, 5, 3]);
    expect(Array.from(cells.demand)).toEqual([1, 1, 2, 3, 3, 3, 3, 3]);
    const part = demandCells({ spec, values }, [1, 3]);
    expect(Array.from(part.runs)).toEqual([2, 0, 5, 0]);
    expect(part.total).toBe(15);
    expect(() => demandCells({ spec, values }, [2, 4])).toThrow(/rows must be \[rowStart, rowEnd\] with whole numbers 0 ≤ rowStart ≤ rowEnd ≤ 3 \(got \[2, 4\]\)/);
  });
});

describe('distance powers', () => {
  it('takes e^(β/2) by products and square roots for β a multiple of 0.5, exp·ln otherwise [closed form: Math.pow]', () => {
    for (const beta of [0.5, 1, 1.5, 2, 2.5, 3, 3.5, 4, 5, 2.3, 1.7, 20]) {
      const { whole, quarters, halfBeta } = distancePower(beta);
      expect(quarters >= 0).toBe(Number.isInteger(beta * 2) && beta < 16);
      for (const e of [1e-4, 0.37, 1, 2, 123.4, 5e5]) close(squaredDistancePower(e, whole, quarters, halfBeta), Math.pow(e, beta / 2), 4e-15 * Math.max(1, Math.abs(Math.log(e))));
    }
  });

  it('allows four-way products only inside the float64 range', () => {
    expect(fourWayProductSafe(1e-3, 1e4, 1, 10)).toBe(true);
    expect(fourWayProductSafe(1e-3, 1e80, 1, 10)).toBe(false);
    expect(fourWayProductSafe(1e-70, 1, 1, 1)).toBe(false);
    expect(fourWayProductSafe(1, 2, 1e260, 1e260)).toBe(false);
  });
});
