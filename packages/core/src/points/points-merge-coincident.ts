import type { PlanarPoints } from '../types.js';

/** Planar points after merging, with how many input points each one stands for. */
export interface MergedPoints extends PlanarPoints {
  /** Number of input points merged into each output point. */
  count: Uint32Array;
}

/**
 * Merges points with exactly the same coordinates (same address, same postcode centroid) into one
 * point carrying the summed weight. Cross-validated bandwidths collapse towards 0 when points
 * coincide, so bandwidth selection merges first. Output keeps the order of first occurrence.
 *
 * @param points planar points (metres)
 * @returns the distinct locations with summed weights and counts
 * @example
 * pointsMergeCoincident({ x: Float64Array.of(0, 0, 5), y: Float64Array.of(1, 1, 1), w: Float64Array.of(2, 3, 1) });
 * // → x [0, 5], y [1, 1], w [5, 1], count [2, 1]
 */
export function pointsMergeCoincident(points: PlanarPoints): MergedPoints {
  const n = points.x.length;
  const slot = new Map<string, number>();
  const index = new Int32Array(n);
  let m = 0;
  for (let i = 0; i < n; i++) {
    // -0 and 0 are the same location; String() prints both as "0".
    const key = `${points.x[i]} ${points.y[i]}`;
    const s = slot.get(key);
    if (s === undefined) {
      slot.set(key, m);
      index[i] = m++;
    } else {
      index[i] = s;
    }
  }
  const out: MergedPoints = { x: new Float64Array(m), y: new Float64Array(m), w: new Float64Array(m), count: new Uint32Array(m) };
  for (let i = 0; i < n; i++) {
    const s = index[i];
    if (out.count[s] === 0) {
      out.x[s] = points.x[i];
      out.y[s] = points.y[i];
    }
    out.w[s] += points.w[i];
    out.count[s]++;
  }
  return out;
}
