import { CoreError, throwIfAborted } from '../errors.js';
import type { Site } from '../sites/site.js';
import type { GridSpec, KernelName, PlanarPoints } from '../types.js';
import { kdeBinnedMultiBandwidth } from './kde-binned-multi-bandwidth.js';
import { kendallTau } from './kendall-tau.js';
import type { ScoringSurface } from './scoring-surface.js';
import { siteScores, type SiteScoreOptions } from './site-scores.js';
import { siteRanking, type RankedSite, type RankMeasure } from './site-ranking.js';

/** Bandwidth multipliers tried by default: half to double the chosen bandwidth. */
export const RANK_STABILITY_FACTORS: readonly number[] = [0.5, 0.75, 1, 1.5, 2];

/** A surface computed with bandwidth factor × the chosen one. */
export interface BandwidthVariant {
  factor: number;
  surface: ScoringSurface;
}

export interface RankStabilityOptions extends SiteScoreOptions {
  /** Ranking measure (default net new demand). */
  measure?: RankMeasure;
}

/** How one candidate's rank moves across bandwidths. */
export interface SiteRankStability {
  id: string;
  baseRank: number;
  minRank: number;
  maxRank: number;
  /** Largest |rank − base rank| over the variants. */
  maxShift: number;
  /** maxShift > threshold. */
  unstable: boolean;
}

export interface RankStability {
  /** A site is flagged when its rank moves by more than max(2, 20 % of the candidates). */
  threshold: number;
  variants: Array<{ factor: number; tau: number; ranking: RankedSite[] }>;
  sites: SiteRankStability[];
}

/**
 * Rescores the candidates on surfaces built with other bandwidths and reports how the ranking
 * holds: each site's rank range (min–max), Kendall's τ-b between the base ranking (factor 1)
 * and each variant, and a flag for sites whose rank moves by more than
 * max(2, 0.2 × number of candidates) places — a rule of thumb [CP]: two places is noise in a
 * short list, a fifth of the list is a different decision in a long one.
 *
 * @param variants surfaces by bandwidth factor; one must have factor 1 (the base)
 * @param sites candidates (at least 2), own stores and competitors
 * @param options Huff settings, rings and the ranking measure
 * @returns per-variant τ and ranking, per-site rank range and flag
 * @example
 * rankStabilityFromSurfaces([{ factor: 1, surface }, { factor: 2, surface2 }], sites);
 */
export function rankStabilityFromSurfaces(
  variants: readonly BandwidthVariant[],
  sites: readonly Site[],
  options: RankStabilityOptions = {},
): RankStability {
  const base = variants.find((v) => v.factor === 1);
  if (!base) {
    throw new CoreError('INVALID_ARGUMENT', 'include the surface at the chosen bandwidth (factor 1) to compare the others with', 'variants');
  }
  const nCand = sites.filter((s) => s.kind === 'candidate').length;
  if (nCand < 2) {
    throw new CoreError('INVALID_ARGUMENT', `rank stability needs at least 2 candidate sites (got ${nCand})`, 'sites');
  }
  const measure = options.measure ?? 'netNew';
  const scoreOptions: SiteScoreOptions = { ...options, breakdown: false, onProgress: undefined };
  const rankings = variants.map((v) => {
    throwIfAborted(options.signal);
    return { factor: v.factor, ranking: siteRanking(siteScores(v.surface, sites, scoreOptions).candidates, measure) };
  });
  const baseRanking = rankings.find((r) => r.factor === 1)!.ranking;
  const ids = baseRanking.map((r) => r.id);
  const rankOf = (ranking: RankedSite[]): number[] => {
    const m = new Map(ranking.map((r) => [r.id, r.rank]));
    return ids.map((id) => m.get(id)!);
  };
  const baseRanks = rankOf(baseRanking);
  const perVariant = rankings.map((r) => ({ ...r, ranks: rankOf(r.ranking) }));
  const threshold = Math.max(2, 0.2 * nCand);
  return {
    threshold,
    variants: perVariant.map((v) => ({ factor: v.factor, tau: kendallTau(baseRanks, v.ranks), ranking: v.ranking })),
    sites: ids.map((id, k) => {
      const ranks = perVariant.map((v) => v.ranks[k]);
      const maxShift = Math.max(...ranks.map((r) => Math.abs(r - baseRanks[k])));
      return { id, baseRank: baseRanks[k], minRank: Math.min(...ranks), maxRank: Math.max(...ranks), maxShift, unstable: maxShift > threshold };
    }),
  };
}

/**
 * Rank stability straight from the customer points: builds the surfaces at factor × bandwidth
 * with {@link kdeBinnedMultiBandwidth} (one binning, one FFT of the lattice), converts them to
 * per km² and calls {@link rankStabilityFromSurfaces}.
 *
 * @param points planar points (metres, weights ≥ 0, validated by the caller)
 * @param spec the grid of the base surface
 * @param kernel kernel name
 * @param bandwidth the chosen bandwidth in metres (factor 1)
 * @param sites candidates, own stores and competitors
 * @param options factors (default 0.5, 0.75, 1, 1.5, 2), study-area mask, Huff settings, measure
 * @returns see {@link rankStabilityFromSurfaces}
 * @example
 * const report = rankStability(points, spec, 'quartic', 2500, sites);
 * report.sites.filter((s) => s.unstable);
 */
export function rankStability(
  points: PlanarPoints,
  spec: GridSpec,
  kernel: KernelName,
  bandwidth: number,
  sites: readonly Site[],
  options: RankStabilityOptions & { factors?: readonly number[]; mask?: Uint8Array } = {},
): RankStability {
  const factors = options.factors ?? RANK_STABILITY_FACTORS;
  if (!factors.includes(1)) {
    throw new CoreError('INVALID_ARGUMENT', 'bandwidth factors must include 1 (the chosen bandwidth)', 'factors');
  }
  const surfaces = kdeBinnedMultiBandwidth(
    points,
    spec,
    kernel,
    factors.map((f) => f * bandwidth),
    { mask: options.mask, signal: options.signal },
  );
  const variants = surfaces.map((s, k) => {
    for (let c = 0; c < s.values.length; c++) s.values[c] *= 1e6; // per m² → per km²
    return { factor: factors[k], surface: { spec, values: s.values } };
  });
  return rankStabilityFromSurfaces(variants, sites, options);
}
