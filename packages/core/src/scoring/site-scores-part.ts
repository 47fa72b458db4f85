import { CoreError } from '../errors.js';
import { sitesValidate, type Site } from '../sites/site.js';
import { huffCandidatesAlone } from './huff-candidates-alone.js';
import { huffCandidatesBreakdown } from './huff-breakdown.js';
import { huffBaseCaptured, huffGrid, type HuffGridOptions } from './huff-grid.js';
import { ringDemandRows, RING_RADII_DEFAULT_M } from './ring-demand.js';
import { rowRangeChecked, scoringSurfaceValidate, type ScoringSurface } from './scoring-surface.js';

export interface SiteScoreOptions extends HuffGridOptions {
  /** Ring radii in metres (default 1, 3, 5 km). */
  radii?: readonly number[];
  /** Split each candidate's cannibalization by own store (default true; candidates × own stores × cells multiply-adds). */
  breakdown?: boolean;
  signal?: AbortSignal;
  onProgress?: (fraction: number) => void;
}

/**
 * The sums of {@link siteScores} over a range of grid rows. Every number is a sum over cells, so
 * parts of disjoint row ranges covering the grid add up to the whole: a server can score the
 * rows [0, h/2) and [h/2, h) in two worker threads and join them with siteScoresFromParts.
 * Plain typed arrays, so a part can be posted between threads (transfer the buffers).
 */
export interface SiteScoresPart {
  rows: [number, number];
  totalDemand: number;
  /** Demand each own store holds today within these rows (own stores in site order). */
  ownToday: Float64Array;
  /** Per candidate (candidates in site order). */
  captured: Float64Array;
  cannibalization: Float64Array;
  /** Candidate j's loss to own store k at j·K + k; null when breakdown is off. */
  cannibalizedFrom: Float64Array | null;
  /** Candidate j's demand inside radius r at j·R + r. */
  rings: Float64Array;
  alpha: number;
  beta: number;
}

/**
 * Splits sites by kind after checking them.
 *
 * @param sites candidates, own stores and competitors
 * @returns the three lists in input order
 * @example
 * const { candidates } = sitesByKind(sites);
 */
export function sitesByKind(sites: readonly Site[]): { candidates: Site[]; own: Site[]; competitors: Site[] } {
  sitesValidate(sites);
  return {
    candidates: sites.filter((s) => s.kind === 'candidate'),
    own: sites.filter((s) => s.kind === 'own'),
    competitors: sites.filter((s) => s.kind === 'competitor'),
  };
}

/**
 * Checks ring radii.
 *
 * @param radii radii in metres
 * @returns the same radii
 * @example
 * ringRadiiChecked([1000, 3000]);
 */
export function ringRadiiChecked(radii: readonly number[]): readonly number[] {
  if (!Array.isArray(radii)) throw new CoreError('INVALID_ARGUMENT', 'radii must be a list of metres, e.g. [1000, 3000, 5000]', 'radii');
  radii.forEach((r, k) => {
    if (typeof r !== 'number' || !(r > 0) || !Number.isFinite(r)) {
      throw new CoreError('INVALID_ARGUMENT', `ring radius #${k + 1} must be a positive number of metres (got ${r})`, 'radii');
    }
  });
  return radii;
}

/**
 * Scores every candidate alone (see siteScores) over the grid rows options.rows only (default
 * all rows): Huff captured demand, cannibalization (with the per-own-store split unless
 * breakdown is false), today's own-store demand and ring demands, as sums over those rows.
 *
 * @param surface λ̂ per km² on its grid; sites in the same projection (metres)
 * @param sites candidates, own stores and competitors
 * @param options α, β, minimum distance, rows, radii, breakdown, abort signal, progress
 * @returns the part's sums (candidates and own stores in site order)
 * @example
 * const top = siteScoresPart(surface, sites, { rows: [0, 500] });
 */
export function siteScoresPart(surface: ScoringSurface, sites: readonly Site[], options: SiteScoreOptions = {}): SiteScoresPart {
  scoringSurfaceValidate(surface);
  const { candidates, own, competitors } = sitesByKind(sites);
  const radii = ringRadiiChecked(options.radii ?? RING_RADII_DEFAULT_M);
  const rows = rowRangeChecked(options.rows, surface.spec.height);
  const grid = huffGrid(surface, own, competitors, options, options.signal);
  const ownToday = Float64Array.from(huffBaseCaptured(grid, own));
  const progress = options.onProgress ? (f: number) => options.onProgress?.(0.9 * f) : undefined;
  const breakdown = options.breakdown ?? true;
  const r = breakdown
    ? huffCandidatesBreakdown(grid, candidates, options.signal, progress)
    : { ...huffCandidatesAlone(grid, candidates, options.signal, progress), cannibalizedFrom: null };
  const R = radii.length;
  const rings = new Float64Array(candidates.length * R);
  candidates.forEach((s, j) => {
    for (let k = 0; k < R; k++) rings[j * R + k] = ringDemandRows(surface, s.x, s.y, radii[k], rows[0], rows[1]);
  });
  options.onProgress?.(1);
  return {
    rows,
    totalDemand: grid.cells.total,
    ownToday,
    captured: r.captured,
    cannibalization: r.cannibalization,
    cannibalizedFrom: r.cannibalizedFrom,
    rings,
    alpha: grid.alpha,
    beta: grid.beta,
  };
}

/**
 * Splits the grid rows into `count` contiguous ranges of nearly equal size (the first ranges
 * take one row more when it does not divide evenly), e.g. one per worker thread.
 *
 * @param height grid rows (surface.spec.height)
 * @param count number of ranges, a whole number ≥ 1 (more than height gives empty ranges)
 * @returns the ranges [rowStart, rowEnd) in order, covering 0 … height once
 * @example
 * siteScoresRowRanges(1000, 2); // [[0, 500], [500, 1000]]
 */
export function siteScoresRowRanges(height: number, count: number): Array<[number, number]> {
  if (!Number.isInteger(count) || count < 1) {
    throw new CoreError('INVALID_ARGUMENT', `the number of row ranges must be a whole number ≥ 1 (got ${count})`, 'count');
  }
  const base = Math.floor(height / count);
  const extra = height % count;
  const ranges: Array<[number, number]> = [];
  let start = 0;
  for (let k = 0; k < count; k++) {
    const end = start + base + (k < extra ? 1 : 0);
    ranges.push([start, end]);
    start = end;
  }
  return ranges;
}
