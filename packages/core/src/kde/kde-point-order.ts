import type { GridSpec, PlanarPoints } from '../types.js';

/**
 * A visiting order that sorts points by the grid cell they fall in (row-major; points off the
 * grid by the nearest edge cell), by counting sort in O(n + cells). Consecutive points then write
 * to the same rows of the surface, so the sums run from cache instead of main memory — the
 * difference-array loops run several times faster in this order. The result is the same up to
 * floating-point summation order.
 *
 * @param points planar points
 * @param spec the grid
 * @returns a permutation of 0 … n − 1
 * @example
 * const order = kdePointOrder(points, spec);
 * for (const k of order) visit(k);
 */
export function kdePointOrder(points: PlanarPoints, spec: GridSpec): Uint32Array {
  const { x, y } = points;
  const { originX, originY, cellSize, width, height } = spec;
  const n = x.length;
  const key = new Uint32Array(n);
  const start = new Uint32Array(width * height + 1);
  for (let k = 0; k < n; k++) {
    const i = Math.min(width - 1, Math.max(0, Math.floor((x[k] - originX) / cellSize)));
    const j = Math.min(height - 1, Math.max(0, Math.floor((y[k] - originY) / cellSize)));
    // NaN coordinates are rejected at the public edge; `| 0` keeps the key an index regardless.
    const c = (i + j * width) | 0;
    key[k] = c;
    start[c + 1]++;
  }
  for (let c = 0; c < width * height; c++) start[c + 1] += start[c];
  const order = new Uint32Array(n);
  for (let k = 0; k < n; k++) order[start[key[k]]++] = k;
  return order;
}
