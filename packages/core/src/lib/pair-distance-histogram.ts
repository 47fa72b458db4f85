import { pointBuckets } from './point-buckets.js';

/**
 * Weighted pair-distance histograms with linear binning: for every pair i < j closer than
 * `maxRadius`, each coefficient c(i, j) is split between the two distance nodes k·Δ around
 * d(i, j) in proportion to closeness (as linear binning does for KDE; Wand 1994). Sums over
 * pairs of c·f(d) then cost O(nodes) per f: Σ_k C_k f(k·Δ), with error O((Δ/h)²) for smooth f.
 */
export interface PairDistanceHistogram {
  /** Node spacing Δ, metres. */
  step: number;
  /** Histogram per coefficient, indexed by node. */
  sums: Float64Array[];
}

/**
 * Builds the histograms in one pass over the neighbour pairs (bucket search).
 *
 * @param x metres
 * @param y metres
 * @param maxRadius metres, > 0
 * @param coefficients functions of (i, j) giving each histogram's per-pair weight
 * @param nodes number of distance nodes (default 8192)
 * @returns node spacing and one histogram per coefficient
 * @example
 * const h = pairDistanceHistogram(x, y, 5000, [(i, j) => w[i] * w[j]]);
 */
export function pairDistanceHistogram(
  x: Float64Array,
  y: Float64Array,
  maxRadius: number,
  coefficients: Array<(i: number, j: number) => number>,
  nodes = 8192,
): PairDistanceHistogram {
  const n = x.length;
  const { sorted, cx, cy, runs, key } = pointBuckets(x, y, maxRadius);
  const step = maxRadius / (nodes - 1);
  const sums = coefficients.map(() => new Float64Array(nodes + 1));
  const r2max = maxRadius * maxRadius;
  const m = coefficients.length;
  for (let a = 0; a < n; a++) {
    const xa = x[a];
    const ya = y[a];
    for (let dx = -1; dx <= 1; dx++) {
      for (let dy = -1; dy <= 1; dy++) {
        const run = runs.get(key(cx[a] + dx, cy[a] + dy));
        if (run === undefined) continue;
        for (let s = run[0]; s < run[1]; s++) {
          const c = sorted[s];
          if (c <= a) continue;
          const ddx = xa - x[c];
          const ddy = ya - y[c];
          const d2 = ddx * ddx + ddy * ddy;
          if (d2 > r2max) continue;
          const pos = Math.sqrt(d2) / step;
          const k = Math.floor(pos);
          const f = pos - k;
          for (let q = 0; q < m; q++) {
            const v = coefficients[q](a, c);
            sums[q][k] += v * (1 - f);
            sums[q][k + 1] += v * f;
          }
        }
      }
    }
  }
  return { step, sums };
}
