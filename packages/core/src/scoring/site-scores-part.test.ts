import { describe, expect, it } from 'vitest';
import { randomSeeded } from '../lib/random-seeded.js';
import type { Site } from '../sites/site.js';
import type { GridSpec } from '../types.js';
import type { ScoringSurface } from './scoring-surface.js';
import { siteScores, siteScoresFromParts } from './site-scores.js';
import { siteScoresPart, siteScoresRowRanges } from './site-scores-part.js';

function fixture(): { surface: ScoringSurface; sites: Site[] } {
  const rnd = randomSeeded(42).uniform;
  const spec: GridSpec = { originX: 0, originY: 0, cellSize: 250, width: 30, height: 21 };
  const values = new Float64Array(spec.width * spec.height).map(() => (rnd() < 0.2 ? 0 : 50 + 400 * rnd()));
  const at = (id: string, kind: Site['kind']): Site => ({ id, kind, x: 7500 * rnd(), y: 5250 * rnd(), attractiveness: 0.5 + 2 * rnd() });
  const sites = [
    ...['o1', 'o2', 'o3'].map((id) => at(id, 'own')),
    ...['k1', 'k2'].map((id) => at(id, 'competitor')),
    ...['c1', 'c2', 'c3', 'c4', 'c5'].map((id) => at(id, 'candidate')),
  ];
  return { surface: { spec, values }, sites };
}

describe('siteScoresPart and siteScoresFromParts', () => {
  for (const breakdown of [true, false]) {
    it(`parts over row ranges add up to the whole surface's scores (breakdown ${breakdown}) [D: every score is a sum over cells]`, () => {
      const { surface, sites } = fixture();
      const options = { beta: 2, radii: [400, 1200], breakdown };
      const whole = siteScores(surface, sites, options);
      const parts = [[9, 21], [0, 4], [4, 9]].map(([a, b]) => siteScoresPart(surface, sites, { ...options, rows: [a, b] }));
      const joined = siteScoresFromParts(surface, sites, parts, options);
      expect(joined.totalDemand).toBeCloseTo(whole.totalDemand, 9);
      joined.ownToday.forEach((o, k) => expect(o.demand).toBeCloseTo(whole.ownToday[k].demand, 9));
      joined.candidates.forEach((c, j) => {
        const w = whole.candidates[j];
        expect(c.id).toBe(w.id);
        for (const key of ['captured', 'cannibalization', 'netNew', 'shareOfTotal'] as const) expect(c[key]).toBeCloseTo(w[key], 9);
        expect(c.cannibalizedFrom.length).toBe(breakdown ? 3 : 0);
        c.cannibalizedFrom.forEach((l, k) => expect(l.demand).toBeCloseTo(w.cannibalizedFrom[k].demand, 9));
        c.rings.forEach((r, k) => expect(r.demand).toBeCloseTo(w.rings[k].demand, 9));
      });
      expect(joined.candidates[0].captured).toBeGreaterThan(0);
    });
  }

  it('splits rows into nearly equal contiguous ranges', () => {
    expect(siteScoresRowRanges(1000, 2)).toEqual([[0, 500], [500, 1000]]);
    expect(siteScoresRowRanges(7, 3)).toEqual([[0, 3], [3, 5], [5, 7]]);
    expect(siteScoresRowRanges(1, 2)).toEqual([[0, 1], [1, 1]]);
    expect(() => siteScoresRowRanges(10, 0)).toThrow(/whole number ≥ 1 \(got 0\)/);
  });

  it('names missing, doubled and mismatched row ranges', () => {
    const { surface, sites } = fixture();
    const a = siteScoresPart(surface, sites, { rows: [0, 10] });
    const b = siteScoresPart(surface, sites, { rows: [10, 21] });
    const c = siteScoresPart(surface, sites, { rows: [8, 21] });
    expect(() => siteScoresFromParts(surface, sites, [a])).toThrow(/parts must cover grid rows 0–21; they end at row 10/);
    expect(() => siteScoresFromParts(surface, sites, [a, c])).toThrow(/rows 10 to 8 are covered twice/);
    expect(() => siteScoresFromParts(surface, sites, [b])).toThrow(/rows 0 to 10 are missing/);
    expect(() => siteScoresFromParts(surface, sites, [a, b], { radii: [1000] })).toThrow(/computed for other sites or radii/);
    expect(() => siteScoresPart(surface, sites, { rows: [5, 30] })).toThrow(/rows must be \[rowStart, rowEnd\]/);
  });
});
