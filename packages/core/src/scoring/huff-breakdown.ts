import { throwIfAborted } from '../errors.js';
import type { Site } from '../sites/site.js';
import { squaredDistancePower } from './huff-distance-power.js';
import type { HuffCandidatesAlone } from './huff-candidates-alone.js';
import type { HuffGrid } from './huff-grid.js';

/** Bytes of own-store shares kept per tile (K stores × B cells × 8 bytes): well inside L2. */
const TILE_BYTES = 393_216;

/** Captured, cannibalization and its split by own store for many candidates. */
export interface HuffCandidatesBreakdown extends HuffCandidatesAlone {
  /** Demand candidate j takes from own store k at index j·K + k (K = grid.own.length). */
  cannibalizedFrom: Float64Array;
}

/**
 * Σ_c q_k[c]·v[c] for two rows of q against two share vectors at once (4 running sums: each
 * loaded value serves two products; measured faster than 4 × 2 or 4 × 1 blocks in V8, which
 * runs short of registers). One row when only one is left. Adds into out[j·K + k]; returns how
 * many rows were done.
 */
function dotsAdd(q: Float64Array, b: number, len: number, k: number, K: number, v0: Float64Array, v1: Float64Array, j0: number, two: boolean, out: Float64Array): number {
  const o0 = k * b;
  const r0 = j0 * K + k;
  if (k + 1 < K) {
    const o1 = o0 + b;
    let a0 = 0;
    let a1 = 0;
    let c0 = 0;
    let c1 = 0;
    for (let c = 0; c < len; c++) {
      const x = v0[c];
      const y = v1[c];
      const q0 = q[o0 + c];
      const q1 = q[o1 + c];
      a0 += q0 * x;
      a1 += q1 * x;
      c0 += q0 * y;
      c1 += q1 * y;
    }
    out[r0] += a0;
    out[r0 + 1] += a1;
    if (two) {
      out[r0 + K] += c0;
      out[r0 + K + 1] += c1;
    }
    return 2;
  }
  let a0 = 0;
  let c0 = 0;
  for (let c = 0; c < len; c++) {
    a0 += q[o0 + c] * v0[c];
    c0 += q[o0 + c] * v1[c];
  }
  out[r0] += a0;
  if (two) out[r0 + K] += c0;
  return 1;
}

/**
 * Scores every candidate alone like huffCandidatesAlone and also splits each candidate's
 * cannibalization by own store: store k loses L_jk = Σ_c W_c · q_ck · P_cj with q_ck =
 * A_k^α d_ck^(−β) / S_c its base share (A_k^α d^(−β)·(1/S − 1/(S + t)) = q·P). The q of a tile of
 * cells is computed once and reused by every candidate, two candidates and two stores at a
 * time; the cost is candidates × own stores × cells multiply-adds (exact, no cut-off).
 *
 * @param grid today's network, precomputed by huffGrid
 * @param candidates the sites under test
 * @param signal optional abort signal, checked between tiles
 * @param onProgress optional, called with the fraction of tiles done
 * @returns captured, cannibalization and the per-own-store split (j·K + k)
 * @example
 * const { cannibalizedFrom } = huffCandidatesBreakdown(grid, candidates);
 */
export function huffCandidatesBreakdown(
  grid: HuffGrid,
  candidates: readonly Site[],
  signal?: AbortSignal,
  onProgress?: (fraction: number) => void,
): HuffCandidatesBreakdown {
  const { xKm, yKm, denominator: S, ownDemand: O, minDistanceSqKm: minD, beta } = grid;
  const { whole, quarters, halfBeta } = grid.power;
  const W = grid.cells.demand;
  const n = W.length;
  const m = candidates.length;
  const K = grid.own.length;
  const B = Math.max(256, Math.min(16384, Math.floor(TILE_BYTES / 8 / Math.max(1, K))));
  const ka = grid.own.map((s) => Math.pow(s.attractiveness, grid.alpha));
  const kx = grid.own.map((s) => s.x / 1000);
  const ky = grid.own.map((s) => s.y / 1000);
  const ca = candidates.map((s) => Math.pow(s.attractiveness, grid.alpha));
  const cx = candidates.map((s) => s.x / 1000);
  const cy = candidates.map((s) => s.y / 1000);
  const captured = new Float64Array(m);
  const cannibalization = new Float64Array(m);
  const cannibalizedFrom = new Float64Array(m * K);
  const q = new Float64Array(K * B);
  const sh0 = new Float64Array(B);
  const sh1 = new Float64Array(B);
  const shares = (j: number, c0: number, len: number, out: Float64Array): void => {
    const a = ca[j];
    const x = cx[j];
    const y = cy[j];
    let cap = 0;
    let can = 0;
    for (let i = 0; i < len; i++) {
      const c = c0 + i;
      const dx = xKm[c] - x;
      const dy = yKm[c] - y;
      const e = Math.max(minD, dx * dx + dy * dy);
      const share = a / (a + S[c] * (beta === 2 ? e : (quarters < 0 ? Math.exp(halfBeta * Math.log(e)) : squaredDistancePower(e, whole, quarters, halfBeta))));
      cap += W[c] * share;
      can += O[c] * share;
      out[i] = share;
    }
    captured[j] += cap;
    cannibalization[j] += can;
  };
  const tiles = Math.ceil(n / B);
  for (let t = 0; t < tiles; t++) {
    throwIfAborted(signal);
    const c0 = t * B;
    const len = Math.min(B, n - c0);
    for (let k = 0; k < K; k++) {
      const o = k * B;
      for (let i = 0; i < len; i++) {
        const c = c0 + i;
        const dx = xKm[c] - kx[k];
        const dy = yKm[c] - ky[k];
        const e = Math.max(minD, dx * dx + dy * dy);
        q[o + i] = (W[c] * ka[k]) / ((beta === 2 ? e : (quarters < 0 ? Math.exp(halfBeta * Math.log(e)) : squaredDistancePower(e, whole, quarters, halfBeta))) * S[c]);
      }
    }
    for (let j = 0; j < m; j += 2) {
      const two = j + 1 < m;
      shares(j, c0, len, sh0);
      if (two) shares(j + 1, c0, len, sh1);
      for (let k = 0; k < K; ) k += dotsAdd(q, B, len, k, K, sh0, two ? sh1 : sh0, j, two, cannibalizedFrom);
    }
    onProgress?.((t + 1) / tiles);
  }
  return { captured, cannibalization, cannibalizedFrom };
}
