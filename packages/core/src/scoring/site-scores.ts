import { CoreError, throwIfAborted } from '../errors.js';
import type { Site } from '../sites/site.js';
import { huffCandidateSet } from './huff-candidate.js';
import { huffGrid, type HuffGrid } from './huff-grid.js';
import { ringDemands, RING_RADII_DEFAULT_M, type RingDemand } from './ring-demand.js';
import { scoringSurfaceValidate, type ScoringSurface } from './scoring-surface.js';
import { ringRadiiChecked, siteScoresPart, sitesByKind, type SiteScoreOptions, type SiteScoresPart } from './site-scores-part.js';

export type { SiteScoreOptions } from './site-scores-part.js';

/** Demand taken from one own store. */
export interface StoreLoss {
  id: string;
  demand: number;
}

/** One candidate's score with the parts that explain it (demand in the surface weight's unit). */
export interface SiteScore {
  id: string;
  /** Huff captured demand C_j = Σ_c W_c P_cj. */
  captured: number;
  /** Σ over own stores of demand they lose when the candidate opens. */
  cannibalization: number;
  /** The same loss store by store (empty when breakdown is off or there are no own stores). */
  cannibalizedFrom: StoreLoss[];
  /** captured − cannibalization: demand new to the chain. */
  netNew: number;
  /** captured / total demand on the surface. */
  shareOfTotal: number;
  /** Demand inside each ring around the site. */
  rings: RingDemand[];
}

/** Scores of every candidate, each opened alone into today's network. */
export interface SiteScores {
  totalDemand: number;
  /** Demand each own store holds today (Huff, before any candidate opens). */
  ownToday: StoreLoss[];
  candidates: SiteScore[];
  alpha: number;
  beta: number;
}

function storeLosses(grid: HuffGrid, lost: Float64Array | undefined): StoreLoss[] {
  return lost ? grid.own.map((s, k) => ({ id: s.id, demand: lost[k] })) : [];
}

/**
 * Scores every candidate as if it ALONE were added to today's network (own stores +
 * competitors): Huff captured demand, cannibalization of own stores (total and per store),
 * net new demand, share of total demand and ring demands (Huff 1963; see huff-grid.ts for the
 * minimum distance and the absence of any cut-off).
 *
 * @param surface λ̂ per km² on its grid; sites in the same projection (metres)
 * @param sites candidates, own stores and competitors
 * @param options α, β, ring radii, breakdown, abort signal, progress
 * @returns totals, today's own demand and one score per candidate (input order)
 * @example
 * const { candidates } = siteScores({ spec, values: surface.intensity }, sites, { beta: 2 });
 */
export function siteScores(surface: ScoringSurface, sites: readonly Site[], options: SiteScoreOptions = {}): SiteScores {
  const part = siteScoresPart(surface, sites, { ...options, rows: undefined });
  return siteScoresFromParts(surface, sites, [part], options);
}

/**
 * Joins the parts of {@link siteScoresPart} computed over row ranges that together cover every
 * grid row exactly once (e.g. by two worker threads) into the scores siteScores returns.
 *
 * @param surface the surface the parts were computed on (only its grid size is read)
 * @param sites the same sites as given to every part
 * @param parts one part per row range, any order
 * @param options the same radii as given to the parts (default 1, 3, 5 km)
 * @returns totals, today's own demand and one score per candidate (input order)
 * @example
 * const scores = siteScoresFromParts(surface, sites, [partTop, partBottom]);
 */
export function siteScoresFromParts(
  surface: ScoringSurface,
  sites: readonly Site[],
  parts: readonly SiteScoresPart[],
  options: Pick<SiteScoreOptions, 'radii'> = {},
): SiteScores {
  const { candidates, own } = sitesByKind(sites);
  const radii = ringRadiiChecked(options.radii ?? RING_RADII_DEFAULT_M);
  const m = candidates.length;
  const K = own.length;
  const R = radii.length;
  const sorted = [...(Array.isArray(parts) ? parts : [])].sort((p, q) => p.rows[0] - q.rows[0]);
  let next = 0;
  for (const p of sorted) {
    if (p.rows[0] !== next) {
      throw new CoreError('INVALID_ARGUMENT', `parts must cover grid rows 0–${surface.spec.height} once each; rows ${next} to ${p.rows[0]} are ${p.rows[0] > next ? 'missing' : 'covered twice'}`, 'parts');
    }
    next = p.rows[1];
    if (p.captured.length !== m || p.ownToday.length !== K || p.rings.length !== m * R || (p.cannibalizedFrom !== null && p.cannibalizedFrom.length !== m * K)) {
      throw new CoreError('INVALID_ARGUMENT', `the part for rows ${p.rows[0]}–${p.rows[1]} was computed for other sites or radii; score every part with the same sites and options`, 'parts');
    }
    if (p.alpha !== sorted[0].alpha || p.beta !== sorted[0].beta) {
      throw new CoreError('INVALID_ARGUMENT', 'all parts must use the same α and β', 'parts');
    }
  }
  if (sorted.length === 0 || next !== surface.spec.height) {
    throw new CoreError('INVALID_ARGUMENT', `parts must cover grid rows 0–${surface.spec.height}; they end at row ${next}`, 'parts');
  }
  const breakdown = sorted.every((p) => p.cannibalizedFrom !== null);
  const sum = (pick: (p: SiteScoresPart) => Float64Array | null, len: number): Float64Array => {
    const out = new Float64Array(len);
    for (const p of sorted) {
      const v = pick(p);
      if (v) for (let i = 0; i < len; i++) out[i] += v[i];
    }
    return out;
  };
  const total = sorted.reduce((s, p) => s + p.totalDemand, 0);
  const captured = sum((p) => p.captured, m);
  const cannibalization = sum((p) => p.cannibalization, m);
  const lost = breakdown ? sum((p) => p.cannibalizedFrom, m * K) : null;
  const rings = sum((p) => p.rings, m * R);
  const ownToday = sum((p) => p.ownToday, K);
  return {
    totalDemand: total,
    ownToday: own.map((s, k) => ({ id: s.id, demand: ownToday[k] })),
    candidates: candidates.map((site, j) => ({
      id: site.id,
      captured: captured[j],
      cannibalization: cannibalization[j],
      cannibalizedFrom: lost ? own.map((s, k) => ({ id: s.id, demand: lost[j * K + k] })) : [],
      netNew: captured[j] - cannibalization[j],
      shareOfTotal: total > 0 ? captured[j] / total : 0,
      rings: radii.map((radius, k) => ({ radius, demand: rings[j * R + k] })),
    })),
    alpha: sorted[0].alpha,
    beta: sorted[0].beta,
  };
}

/** A set of candidates opened together. */
export interface SiteSetScore {
  ids: string[];
  /** Per candidate: captured demand with the others open too (no own-store split per candidate). */
  members: Array<{ id: string; captured: number; shareOfTotal: number; rings: RingDemand[] }>;
  captured: number;
  cannibalization: number;
  cannibalizedFrom: StoreLoss[];
  netNew: number;
  shareOfTotal: number;
  totalDemand: number;
}

/**
 * Scores a set of candidates opened together into today's network: they compete with each
 * other as well as with own stores and competitors.
 *
 * @param surface λ̂ per km²
 * @param sites all sites (own stores and competitors are today's network)
 * @param ids candidate ids opened together (at least one)
 * @param options α, β, ring radii
 * @returns the set's captured demand, cannibalization, net new demand and per-member parts
 * @example
 * siteSetScore(surface, sites, ['cand-3', 'cand-7']);
 */
export function siteSetScore(
  surface: ScoringSurface,
  sites: readonly Site[],
  ids: readonly string[],
  options: SiteScoreOptions = {},
): SiteSetScore {
  scoringSurfaceValidate(surface);
  const { candidates, own, competitors } = sitesByKind(sites);
  const radii = ringRadiiChecked(options.radii ?? RING_RADII_DEFAULT_M);
  throwIfAborted(options.signal);
  if (!Array.isArray(ids) || ids.length === 0) {
    throw new CoreError('INVALID_ARGUMENT', 'name at least one candidate id to open together', 'ids');
  }
  const chosen = ids.map((id) => {
    const s = candidates.find((c) => c.id === id);
    if (!s) throw new CoreError('INVALID_ARGUMENT', `"${id}" is not a candidate site; pick ids of sites with kind "candidate"`, 'ids', { id });
    return s;
  });
  if (new Set(ids).size !== ids.length) {
    throw new CoreError('INVALID_ARGUMENT', 'each candidate id may appear only once in a set', 'ids');
  }
  const grid = huffGrid(surface, own, competitors, options, options.signal);
  const total = grid.cells.total;
  const r = huffCandidateSet(grid, chosen);
  const captured = r.captured.reduce((s, v) => s + v, 0);
  return {
    ids: [...ids],
    members: chosen.map((s, j) => ({
      id: s.id,
      captured: r.captured[j],
      shareOfTotal: total > 0 ? r.captured[j] / total : 0,
      rings: ringDemands(surface, s.x, s.y, radii),
    })),
    captured,
    cannibalization: r.cannibalization,
    cannibalizedFrom: storeLosses(grid, r.cannibalizedFrom),
    netNew: captured - r.cannibalization,
    shareOfTotal: total > 0 ? captured / total : 0,
    totalDemand: total,
  };
}
