/**
 * A bucket index of points on a square grid of a given cell size: neighbours within that size of a
 * point lie in its own bucket or one of the 8 around it.
 */
export interface PointBuckets {
  /** Point indices ordered by bucket. */
  sorted: Uint32Array;
  /** Bucket column and row of each point. */
  cx: Float64Array;
  cy: Float64Array;
  /** Numeric bucket key → [start, end) in `sorted`. */
  runs: Map<number, [number, number]>;
  key(cx: number, cy: number): number;
}

/**
 * Builds the bucket index.
 *
 * @param x metres
 * @param y metres
 * @param cell bucket size, metres (> 0)
 * @returns the index
 * @example
 * const b = pointBuckets(x, y, 500);
 */
export function pointBuckets(x: Float64Array, y: Float64Array, cell: number): PointBuckets {
  const n = x.length;
  let minX = Infinity;
  let minY = Infinity;
  for (let k = 0; k < n; k++) {
    if (x[k] < minX) minX = x[k];
    if (y[k] < minY) minY = y[k];
  }
  const cx = new Float64Array(n);
  const cy = new Float64Array(n);
  let ny = 1;
  for (let k = 0; k < n; k++) {
    cx[k] = Math.floor((x[k] - minX) / cell);
    cy[k] = Math.floor((y[k] - minY) / cell);
    if (cy[k] + 2 > ny) ny = cy[k] + 2;
  }
  // Rows run from -1 to ny - 1, so one extra row keeps keys unique.
  const key = (a: number, b: number): number => a * (ny + 1) + b;
  const sorted = Uint32Array.from(
    Array.from({ length: n }, (_, k) => k).sort((a, b) => key(cx[a], cy[a]) - key(cx[b], cy[b])),
  );
  const runs = new Map<number, [number, number]>();
  for (let s = 0; s < n; s++) {
    const kk = key(cx[sorted[s]], cy[sorted[s]]);
    const r = runs.get(kk);
    if (r) r[1] = s + 1;
    else runs.set(kk, [s, s + 1]);
  }
  return { sorted, cx, cy, runs, key };
}
