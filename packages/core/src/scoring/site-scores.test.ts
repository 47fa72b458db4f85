import { describe, expect, it } from 'vitest';
import { randomSeeded } from '../lib/random-seeded.js';
import type { Site } from '../sites/site.js';
import type { GridSpec } from '../types.js';
import { huffProbabilities } from './huff-probabilities.js';
import type { ScoringSurface } from './scoring-surface.js';
import { siteScores, siteSetScore } from './site-scores.js';

const site = (id: string, kind: Site['kind'], x: number, y: number, attractiveness = 1): Site => ({ id, kind, x, y, attractiveness });

/** One 100 m cell centred on (0, 0) holding W = 1,000. */
function oneCell(w: number): ScoringSurface {
  const spec: GridSpec = { originX: -50, originY: -50, cellSize: 100, width: 1, height: 1 };
  return { spec, values: Float64Array.of(w / 0.01) };
}

/** Brute force: Huff probabilities cell by cell, before and after, through huffProbabilities. */
function bruteForce(surface: ScoringSurface, stores: Site[], cand: Site[], beta: number) {
  const { spec, values } = surface;
  const half = spec.cellSize / 2000;
  const before = new Map<string, number>();
  const after = new Map<string, number>();
  for (let j = 0; j < spec.height; j++)
    for (let i = 0; i < spec.width; i++) {
      const w = (values[i + j * spec.width] * spec.cellSize ** 2) / 1e6;
      if (w === 0) continue;
      const cx = spec.originX + (i + 0.5) * spec.cellSize;
      const cy = spec.originY + (j + 0.5) * spec.cellSize;
      const dist = (s: Site) => Math.max(half, Math.hypot(cx - s.x, cy - s.y) / 1000);
      for (const [set, map] of [[stores, before], [[...stores, ...cand], after]] as const) {
        const p = huffProbabilities(set.map((s) => s.attractiveness), set.map(dist), { beta });
        set.forEach((s, k) => map.set(s.id, (map.get(s.id) ?? 0) + w * p[k]));
      }
    }
  return { before, after };
}

function randomSurface(seed: number): ScoringSurface {
  const rnd = randomSeeded(seed).uniform;
  const spec: GridSpec = { originX: 1000, originY: 2000, cellSize: 250, width: 24, height: 18 };
  const values = new Float64Array(spec.width * spec.height);
  for (let c = 0; c < values.length; c++) values[c] = rnd() < 0.2 ? 0 : rnd() * 400;
  return { spec, values };
}

describe('siteScores', () => {
  it('reproduces the toy cannibalization check: candidate 666.7, own 500 → 166.7, cannibalization 333.3, net 333.3 [D, DOMAIN.md §2]', () => {
    const sites = [site('own', 'own', 2000, 0), site('rival', 'competitor', 0, -2000), site('cand', 'candidate', 1000, 0)];
    const r = siteScores(oneCell(1000), sites, { beta: 2 });
    expect(r.totalDemand).toBeCloseTo(1000, 9);
    expect(r.ownToday[0].demand).toBeCloseTo(500, 9);
    const c = r.candidates[0];
    expect(c.captured).toBeCloseTo(2000 / 3, 9);
    expect(c.cannibalization).toBeCloseTo(1000 / 3, 9);
    expect(c.cannibalizedFrom).toEqual([{ id: 'own', demand: expect.closeTo(1000 / 3, 9) }]);
    expect(c.netNew).toBeCloseTo(1000 / 3, 9);
    expect(c.shareOfTotal).toBeCloseTo(2 / 3, 12);
  });

  for (const beta of [2, 1.5]) {
    it(`matches a cell-by-cell Huff computation before and after opening each candidate, β = ${beta} [D: Huff 1963 formula applied directly]`, () => {
      const surface = randomSurface(7);
      const today = [site('o1', 'own', 3000, 4000, 2), site('o2', 'own', 6000, 5500, 1), site('k1', 'competitor', 4500, 3000, 3)];
      const cands = [site('c1', 'candidate', 3400, 4100, 1.5), site('c2', 'candidate', 8000, 6000, 1), site('c3', 'candidate', 2100, 2100, 0.5)];
      const r = siteScores(surface, [...today, ...cands], { beta, radii: [500] });
      for (const [k, cand] of cands.entries()) {
        const { before, after } = bruteForce(surface, today, [cand], beta);
        const s = r.candidates[k];
        expect(s.captured).toBeCloseTo(after.get(cand.id)!, 8);
        for (const own of ['o1', 'o2']) {
          const loss = before.get(own)! - after.get(own)!;
          expect(s.cannibalizedFrom.find((l) => l.id === own)!.demand).toBeCloseTo(loss, 8);
        }
        expect(s.cannibalization).toBeCloseTo(s.cannibalizedFrom.reduce((a, l) => a + l.demand, 0), 8);
        expect(r.ownToday[0].demand).toBeCloseTo(before.get('o1')!, 8);
      }
    });
  }

  it('shares all demand when there is no network yet: a lone candidate captures everything [closed form]', () => {
    const surface = randomSurface(3);
    const r = siteScores(surface, [site('c', 'candidate', 4000, 4000)], { breakdown: false });
    expect(r.candidates[0].captured).toBeCloseTo(r.totalDemand, 8);
    expect(r.candidates[0].cannibalizedFrom).toEqual([]);
  });

  for (const beta of [2, 1.5]) {
    it(`gives the same numbers with and without the per-store breakdown (blocked batch path), β = ${beta}`, () => {
      const surface = randomSurface(11);
      surface.values.fill(0, 30, 60); // a gap inside rows: packed cells must keep their columns
      const sites = [
        site('o', 'own', 3000, 4000),
        site('k', 'competitor', 5000, 5000),
        site('c', 'candidate', 4000, 3000),
        site('d', 'candidate', 1125, 2125, 3), // on a cell centre: minimum distance applies
      ];
      const a = siteScores(surface, sites, { beta }).candidates;
      const b = siteScores(surface, sites, { beta, breakdown: false }).candidates;
      for (let k = 0; k < 2; k++) {
        expect(b[k].captured).toBeCloseTo(a[k].captured, 9);
        expect(b[k].cannibalization).toBeCloseTo(a[k].cannibalization, 9);
      }
    });
  }

  it('names the site whose input is wrong', () => {
    const surface = oneCell(10);
    expect(() => siteScores(surface, [site('c9', 'candidate', 0, 0, 0)])).toThrow(/site "c9" has attractiveness 0/);
    expect(() => siteScores(surface, [site('a', 'own', 0, 0), site('a', 'candidate', 1, 1)])).toThrow(/site "a" appears twice/);
    expect(() => siteScores(surface, [site('n', 'candidate', NaN, 0)])).toThrow(/site "n" has x = NaN/);
    expect(() => siteScores(surface, [site('c', 'candidate', 0, 0)], { radii: [-1] })).toThrow(/ring radius #1/);
  });
});

describe('siteSetScore', () => {
  it('equals the single-candidate score for a set of one', () => {
    const surface = randomSurface(5);
    const sites = [site('o', 'own', 3000, 4000), site('k', 'competitor', 5000, 5000), site('c', 'candidate', 4000, 3000), site('d', 'candidate', 7000, 6000)];
    const alone = siteScores(surface, sites).candidates[0];
    const set = siteSetScore(surface, sites, ['c']);
    expect(set.captured).toBeCloseTo(alone.captured, 9);
    expect(set.cannibalization).toBeCloseTo(alone.cannibalization, 9);
    expect(set.netNew).toBeCloseTo(alone.netNew, 9);
  });

  it('matches a cell-by-cell Huff computation when two candidates open together [D]', () => {
    const surface = randomSurface(9);
    const today = [site('o1', 'own', 3000, 4000, 2), site('k1', 'competitor', 4500, 3000, 3)];
    const cands = [site('c1', 'candidate', 3400, 4100, 1.5), site('c2', 'candidate', 3900, 4500, 1)];
    const set = siteSetScore(surface, [...today, ...cands], ['c1', 'c2']);
    const { before, after } = bruteForce(surface, today, cands, 2);
    expect(set.members[0].captured).toBeCloseTo(after.get('c1')!, 8);
    expect(set.members[1].captured).toBeCloseTo(after.get('c2')!, 8);
    expect(set.cannibalization).toBeCloseTo(before.get('o1')! - after.get('o1')!, 8);
  });

  it('rejects ids that are not candidates or repeat', () => {
    const sites = [site('o', 'own', 0, 0), site('c', 'candidate', 10, 10)];
    expect(() => siteSetScore(oneCell(1), sites, ['o'])).toThrow(/"o" is not a candidate site/);
    expect(() => siteSetScore(oneCell(1), sites, ['c', 'c'])).toThrow(/only once/);
    expect(() => siteSetScore(oneCell(1), sites, [])).toThrow(/at least one candidate/);
  });
});
