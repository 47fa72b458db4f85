import { describe, expect, it } from 'vitest';
import type { SiteScore } from './site-scores.js';
import { siteRanking } from './site-ranking.js';

const score = (id: string, netNew: number, captured = netNew * 2, cannibalization = captured - netNew): SiteScore => ({
  id,
  captured,
  cannibalization,
  cannibalizedFrom: [],
  netNew,
  shareOfTotal: captured / 1000,
  rings: [{ radius: 1000, demand: 1000 - netNew }],
});

describe('siteRanking', () => {
  const scores = [score('b', 50), score('a', 80), score('d', 50), score('c', 20)];

  it('ranks by net new demand, best first, by default', () => {
    expect(siteRanking(scores).map((r) => [r.id, r.rank])).toEqual([
      ['a', 1],
      ['b', 2],
      ['d', 3],
      ['c', 4],
    ]);
  });

  it('breaks ties by id whatever the input order', () => {
    const reversed = [...scores].reverse();
    expect(siteRanking(reversed).map((r) => r.id)).toEqual(['a', 'b', 'd', 'c']);
  });

  it('ranks lowest cannibalization first and by a scored ring', () => {
    expect(siteRanking(scores, 'cannibalization')[0].id).toBe('c');
    expect(siteRanking(scores, { ringRadius: 1000 })[0].id).toBe('c');
  });

  it('rejects an unknown measure or ring', () => {
    expect(() => siteRanking(scores, { ringRadius: 3000 })).toThrow(/no ring of 3000 m; rank by one of the scored radii \(1000 m\)/);
    expect(() => siteRanking(scores, 'profit' as never)).toThrow(/rank measure "profit" is unknown/);
  });
});
