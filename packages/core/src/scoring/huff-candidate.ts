import type { Site } from '../sites/site.js';
import { huffTermsInto, type HuffGrid } from './huff-grid.js';

/** Captured demand and cannibalization of one candidate opened alone into today's network. */
export interface HuffCandidateResult {
  captured: number;
  /** Σ over own stores of demand they lose. */
  cannibalization: number;
  /** Demand lost by each own store (same order as grid.own), when asked for. */
  cannibalizedFrom?: Float64Array;
}

/**
 * Scores one candidate j added alone to today's network: with its term t_c = A_j^α d_cj^(−β)
 * and the precomputed S_c, P_cj = t/(S + t), and the own network's loss per cell is
 * W·O_c·P_cj (since A_k^α d^(−β)·(1/S − 1/(S + t)) = (A_k^α d^(−β)/S)·P_cj). One pass over the
 * demand cells; the per-own-store split costs one more pass per own store.
 *
 * @param grid today's network, precomputed
 * @param candidate the site under test
 * @param breakdown also split the cannibalization by own store
 * @param scratch optional reusable buffer (one value per demand cell) for the breakdown
 * @returns captured demand, cannibalization and optionally its split
 * @example
 * const { captured, cannibalization } = huffCandidate(grid, site, false);
 */
export function huffCandidate(grid: HuffGrid, candidate: Site, breakdown: boolean, scratch?: Float64Array): HuffCandidateResult {
  const { xKm, yKm, denominator, ownDemand, beta, minDistanceSqKm } = grid;
  const demand = grid.cells.demand;
  const n = demand.length;
  const a = Math.pow(candidate.attractiveness, grid.alpha);
  const sx = candidate.x / 1000;
  const sy = candidate.y / 1000;
  const p = breakdown ? (scratch ?? new Float64Array(n)) : undefined;
  let captured = 0;
  let cannibalization = 0;
  if (beta === 2 && p === undefined) {
    for (let c = 0; c < n; c++) {
      const dx = xKm[c] - sx;
      const dy = yKm[c] - sy;
      let d2 = dx * dx + dy * dy;
      if (d2 < minDistanceSqKm) d2 = minDistanceSqKm;
      const t = a / d2;
      const share = t / (denominator[c] + t);
      captured += demand[c] * share;
      cannibalization += ownDemand[c] * share;
    }
  } else {
    const half = -beta / 2;
    for (let c = 0; c < n; c++) {
      const dx = xKm[c] - sx;
      const dy = yKm[c] - sy;
      let d2 = dx * dx + dy * dy;
      if (d2 < minDistanceSqKm) d2 = minDistanceSqKm;
      const t = beta === 2 ? a / d2 : a * Math.exp(half * Math.log(d2));
      const share = t / (denominator[c] + t);
      captured += demand[c] * share;
      cannibalization += ownDemand[c] * share;
      if (p) p[c] = share;
    }
  }
  if (!p) return { captured, cannibalization };
  const cannibalizedFrom = new Float64Array(grid.own.length);
  const term = new Float64Array(n);
  grid.own.forEach((store, k) => {
    huffTermsInto(grid, store, term, false);
    let lost = 0;
    for (let c = 0; c < n; c++) lost += (demand[c] * term[c] * p[c]) / denominator[c];
    cannibalizedFrom[k] = lost;
  });
  return { captured, cannibalization, cannibalizedFrom };
}

/** Result of opening several candidates together. */
export interface HuffSetResult {
  /** Captured demand per candidate, in the given order. */
  captured: Float64Array;
  cannibalization: number;
  cannibalizedFrom: Float64Array;
}

/**
 * Opens a set of candidates together: T_c = Σ_j t_cj, P_cj = t_cj/(S + T), and each own store
 * k keeps a_ck/(S + T) instead of a_ck/S.
 *
 * @param grid today's network, precomputed
 * @param candidates the sites opened together
 * @returns captured per candidate, total and per-own-store cannibalization
 * @example
 * huffCandidateSet(grid, [siteA, siteB]);
 */
export function huffCandidateSet(grid: HuffGrid, candidates: readonly Site[]): HuffSetResult {
  const { denominator } = grid;
  const demand = grid.cells.demand;
  const n = demand.length;
  const total = new Float64Array(n);
  for (const s of candidates) huffTermsInto(grid, s, total, true);
  const term = new Float64Array(n);
  const captured = new Float64Array(candidates.length);
  candidates.forEach((s, j) => {
    huffTermsInto(grid, s, term, false);
    let sum = 0;
    for (let c = 0; c < n; c++) sum += (demand[c] * term[c]) / (denominator[c] + total[c]);
    captured[j] = sum;
  });
  const cannibalizedFrom = new Float64Array(grid.own.length);
  let cannibalization = 0;
  grid.own.forEach((store, k) => {
    huffTermsInto(grid, store, term, false);
    let lost = 0;
    for (let c = 0; c < n; c++) {
      const S = denominator[c];
      lost += (demand[c] * term[c] * total[c]) / (S * (S + total[c]));
    }
    cannibalizedFrom[k] = lost;
    cannibalization += lost;
  });
  return { captured, cannibalization, cannibalizedFrom };
}
