import { throwIfAborted } from '../errors.js';
import type { Site } from '../sites/site.js';
import { fourWayProductSafe, squaredDistancePower } from './huff-distance-power.js';
import { boxFarthestSq, type HuffGrid } from './huff-grid.js';

/** Demand cells per tile: the tile's S, W, W·O (24 bytes a cell) stay in a 512 KB L2 cache. */
const TILE_CELLS = 16384;

/** Captured demand and cannibalization of many candidates, each opened alone. */
export interface HuffCandidatesAlone {
  captured: Float64Array;
  cannibalization: Float64Array;
}

/** Per-candidate constants the run kernel needs (from huffCandidateTerms). */
export interface CandidateTerms {
  a: number;
  x: number;
  y: number;
  fourWay: boolean;
}

/**
 * Tiles of whole runs, each about TILE_CELLS cells: [firstRun, endRun) in run units.
 *
 * @param runs the grid's runs (4 integers each)
 * @returns tile boundaries in run units, first 0, last the number of runs
 * @example
 * const tiles = huffTiles(grid.cells.runs); // [0, 17, 34, …]
 */
export function huffTiles(runs: Int32Array): number[] {
  const bounds = [0];
  let cells = 0;
  for (let r = 0; r < runs.length / 4; r++) {
    cells += runs[4 * r + 2] - runs[4 * r + 1];
    if (cells >= TILE_CELLS) {
      bounds.push(r + 1);
      cells = 0;
    }
  }
  if (bounds[bounds.length - 1] !== runs.length / 4) bounds.push(runs.length / 4);
  return bounds;
}

/**
 * Per candidate: A^α, position in km, and whether the four-way division is safe for it
 * (D = A^α + S·d^β stays well inside float64 for every cell, see fourWayProductSafe).
 *
 * @param grid today's network
 * @param candidates the sites under test
 * @returns one entry per candidate
 * @example
 * const terms = huffCandidateTerms(grid, candidates);
 */
export function huffCandidateTerms(grid: HuffGrid, candidates: readonly Site[]): CandidateTerms[] {
  const { whole, quarters, halfBeta } = grid.power;
  return candidates.map((s) => {
    const a = Math.pow(s.attractiveness, grid.alpha);
    const x = s.x / 1000;
    const y = s.y / 1000;
    const far = squaredDistancePower(Math.max(grid.minDistanceSqKm, boxFarthestSq(grid.boxKm, x, y)), whole, quarters, halfBeta);
    const hi = a + grid.denominatorMax * far;
    return { a, x, y, fourWay: a > 0 && fourWayProductSafe(a, hi, a, a) };
  });
}

/**
 * Σ W·P and Σ (W·O)·P over one tile of runs for one candidate, P = A/(A + S·d^β), added into
 * out[0] and out[1]. With β = 2 and rows at least the minimum distance away, four cells share
 * one division: with D_i = A + S_i d_i², P_1 = A·D₂D₃D₄ / (D₁D₂D₃D₄) and so on.
 *
 * @param grid today's network
 * @param r0 first run of the tile
 * @param r1 end run of the tile (exclusive)
 * @param t the candidate's constants (huffCandidateTerms)
 * @param out two sums, added to
 * @returns nothing
 * @example
 * huffTileShares(grid, tiles[0], tiles[1], terms[0], acc);
 */
export function huffTileShares(grid: HuffGrid, r0: number, r1: number, t: CandidateTerms, out: Float64Array): void {
  const { denominator: S, ownDemand: O, colXKm: colX, rowYKm, minDistanceSqKm: minD, beta } = grid;
  const { whole, quarters, halfBeta } = grid.power;
  const W = grid.cells.demand;
  const runs = grid.cells.runs;
  const { a, x, y } = t;
  const fast = beta === 2 && t.fourWay;
  let cap = 0;
  let can = 0;
  for (let r = 4 * r0; r < 4 * r1; r += 4) {
    const i1 = runs[r + 2];
    let i = runs[r + 1];
    let p = runs[r + 3];
    const dy = rowYKm[runs[r]] - y;
    const dy2 = dy * dy;
    if (fast && dy2 >= minD) {
      for (; i + 3 < i1; i += 4, p += 4) {
        const u1 = colX[i] - x;
        const u2 = colX[i + 1] - x;
        const u3 = colX[i + 2] - x;
        const u4 = colX[i + 3] - x;
        const d1 = a + S[p] * (u1 * u1 + dy2);
        const d2 = a + S[p + 1] * (u2 * u2 + dy2);
        const d3 = a + S[p + 2] * (u3 * u3 + dy2);
        const d4 = a + S[p + 3] * (u4 * u4 + dy2);
        const p12 = d1 * d2;
        const p34 = d3 * d4;
        const q = a / (p12 * p34);
        const q12 = p34 * q;
        const q34 = p12 * q;
        const s1 = d2 * q12;
        const s2 = d1 * q12;
        const s3 = d4 * q34;
        const s4 = d3 * q34;
        cap += W[p] * s1 + W[p + 1] * s2 + (W[p + 2] * s3 + W[p + 3] * s4);
        can += O[p] * s1 + O[p + 1] * s2 + (O[p + 2] * s3 + O[p + 3] * s4);
      }
    }
    for (; i < i1; i++, p++) {
      const u = colX[i] - x;
      const e = Math.max(minD, u * u + dy2);
      const share = a / (a + S[p] * (beta === 2 ? e : (quarters < 0 ? Math.exp(halfBeta * Math.log(e)) : squaredDistancePower(e, whole, quarters, halfBeta))));
      cap += W[p] * share;
      can += O[p] * share;
    }
  }
  out[0] += cap;
  out[1] += can;
}

/**
 * Scores every candidate as if it alone were added to today's network — the same numbers as
 * {@link huffCandidate} without the per-store split, organised for speed:
 * - P_cj = t/(S + t) with t = A^α d^(−β) is computed as A^α / (A^α + S·d^β): no power for β = 2
 *   (d^β = d²), square roots for β a multiple of 0.5, exp·ln otherwise, and for β = 2 one
 *   division per four cells;
 * - cells are walked in tiles of whole grid-row runs (~16k cells) and every candidate visits a
 *   tile before the next is loaded, so the per-cell arrays stream from memory once instead of
 *   once per candidate; x comes from a per-column table and dy² once per run.
 * No cut-off: every demand cell counts for every candidate (Huff probabilities reach everywhere).
 * On a grid built for a row range the sums cover those rows only (parts add up).
 *
 * @param grid today's network, precomputed by huffGrid
 * @param candidates the sites under test
 * @param signal optional abort signal, checked between tiles
 * @param onProgress optional, called with the fraction of tiles done
 * @returns captured demand and cannibalization per candidate, input order
 * @example
 * const { captured, cannibalization } = huffCandidatesAlone(grid, candidates);
 */
export function huffCandidatesAlone(
  grid: HuffGrid,
  candidates: readonly Site[],
  signal?: AbortSignal,
  onProgress?: (fraction: number) => void,
): HuffCandidatesAlone {
  const m = candidates.length;
  const terms = huffCandidateTerms(grid, candidates);
  const captured = new Float64Array(m);
  const cannibalization = new Float64Array(m);
  const tiles = huffTiles(grid.cells.runs);
  const acc = new Float64Array(2);
  for (let t = 0; t + 1 < tiles.length; t++) {
    throwIfAborted(signal);
    for (let k = 0; k < m; k++) {
      acc[0] = 0;
      acc[1] = 0;
      huffTileShares(grid, tiles[t], tiles[t + 1], terms[k], acc);
      captured[k] += acc[0];
      cannibalization[k] += acc[1];
    }
    onProgress?.((t + 1) / (tiles.length - 1));
  }
  return { captured, cannibalization };
}
