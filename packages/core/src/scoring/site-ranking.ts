import { CoreError } from '../errors.js';
import type { SiteScore } from './site-scores.js';

/**
 * What to rank by. Higher is better for all but `cannibalization` (lower is better);
 * `{ ringRadius }` ranks by demand inside that ring (the radius must be one that was scored).
 */
export type RankMeasure = 'netNew' | 'captured' | 'shareOfTotal' | 'cannibalization' | { ringRadius: number };

/** One ranked site. Ranks are 1 … n with no shared places. */
export interface RankedSite {
  id: string;
  rank: number;
  value: number;
}

function measureValue(score: SiteScore, measure: RankMeasure): number {
  if (typeof measure === 'object' && measure !== null) {
    const ring = score.rings.find((r) => r.radius === measure.ringRadius);
    if (!ring) {
      throw new CoreError(
        'INVALID_ARGUMENT',
        `site "${score.id}" has no ring of ${measure.ringRadius} m; rank by one of the scored radii (${score.rings.map((r) => r.radius).join(', ')} m)`,
        'measure',
      );
    }
    return ring.demand;
  }
  if (!['netNew', 'captured', 'shareOfTotal', 'cannibalization'].includes(measure)) {
    throw new CoreError('INVALID_ARGUMENT', `rank measure ${JSON.stringify(measure)} is unknown; use netNew, captured, shareOfTotal, cannibalization or { ringRadius }`, 'measure');
  }
  return score[measure];
}

/**
 * Ranks candidate scores by a measure (net new demand by default). Ties — equal values — are
 * broken by id in code-unit order, so the same scores always give the same ranking.
 *
 * @param scores candidate scores
 * @param measure what to rank by
 * @returns sites from best (rank 1) to worst
 * @example
 * siteRanking(siteScores(surface, sites).candidates)[0].id; // the best candidate
 */
export function siteRanking(scores: readonly SiteScore[], measure: RankMeasure = 'netNew'): RankedSite[] {
  const lowerIsBetter = measure === 'cannibalization';
  const rows = scores.map((s) => ({ id: s.id, value: measureValue(s, measure) }));
  rows.sort((a, b) => {
    if (a.value !== b.value) return lowerIsBetter ? a.value - b.value : b.value - a.value;
    return a.id < b.id ? -1 : a.id > b.id ? 1 : 0;
  });
  return rows.map((r, k) => ({ id: r.id, rank: k + 1, value: r.value }));
}
