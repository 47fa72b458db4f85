import { CoreError, throwIfAborted } from '../errors.js';
import { sitesValidate, type Site } from '../sites/site.js';
import { huffCandidate, huffCandidateSet } from './huff-candidate.js';
import { huffCandidatesAlone } from './huff-candidates-alone.js';
import { huffBaseCaptured, huffGrid, type HuffGrid } from './huff-grid.js';
import type { HuffOptions } from './huff-options.js';
import { ringDemands, RING_RADII_DEFAULT_M, type RingDemand } from './ring-demand.js';
import { scoringSurfaceValidate, type ScoringSurface } from './scoring-surface.js';

export interface SiteScoreOptions extends HuffOptions {
  /** Ring radii in metres (default 1, 3, 5 km). */
  radii?: readonly number[];
  /** Split each candidate's cannibalization by own store (default true; one extra pass per own store). */
  breakdown?: boolean;
  signal?: AbortSignal;
  onProgress?: (fraction: number) => void;
}

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

function splitSites(sites: readonly Site[]): { candidates: Site[]; own: Site[]; competitors: Site[] } {
  sitesValidate(sites);
  return {
    candidates: sites.filter((s) => s.kind === 'candidate'),
    own: sites.filter((s) => s.kind === 'own'),
    competitors: sites.filter((s) => s.kind === 'competitor'),
  };
}

function radiiChecked(radii: readonly number[]): readonly number[] {
  radii.forEach((r, k) => {
    if (!(r > 0) || !Number.isFinite(r)) {
      throw new CoreError('INVALID_ARGUMENT', `ring radius #${k + 1} must be a positive number of metres (got ${r})`, 'radii');
    }
  });
  return radii;
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
  scoringSurfaceValidate(surface);
  const { candidates, own, competitors } = splitSites(sites);
  const radii = radiiChecked(options.radii ?? RING_RADII_DEFAULT_M);
  const grid = huffGrid(surface, own, competitors, options, options.signal);
  const total = grid.cells.total;
  const ownBase = huffBaseCaptured(grid, own);
  const breakdown = options.breakdown ?? true;
  const scratch = breakdown ? new Float64Array(grid.cells.demand.length) : undefined;
  const batch = breakdown ? undefined : huffCandidatesAlone(grid, candidates, options.signal);
  const scores = candidates.map((site, k) => {
    throwIfAborted(options.signal);
    const r = batch ? { captured: batch.captured[k], cannibalization: batch.cannibalization[k], cannibalizedFrom: undefined } : huffCandidate(grid, site, true, scratch);
    options.onProgress?.((k + 1) / candidates.length);
    return {
      id: site.id,
      captured: r.captured,
      cannibalization: r.cannibalization,
      cannibalizedFrom: storeLosses(grid, r.cannibalizedFrom),
      netNew: r.captured - r.cannibalization,
      shareOfTotal: total > 0 ? r.captured / total : 0,
      rings: ringDemands(surface, site.x, site.y, radii),
    };
  });
  return {
    totalDemand: total,
    ownToday: own.map((s, k) => ({ id: s.id, demand: ownBase[k] })),
    candidates: scores,
    alpha: grid.alpha,
    beta: grid.beta,
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
  const { candidates, own, competitors } = splitSites(sites);
  const radii = radiiChecked(options.radii ?? RING_RADII_DEFAULT_M);
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
