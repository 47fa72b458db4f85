import type { GridSpec, PlanarPoints } from '../types.js';
import { kdeRowRun } from './kde-row-run.js';
import { stencilSubOffsets } from './kde-stencil.js';

/**
 * The exact sum for the uniform disc kernel, whose value is the same constant c/h² wherever it is
 * non-zero: each row's run of samples inside the disc ({@link kdeRowRun}) is written as +v at its
 * first cell and −v after its last into a per-row difference array, and {@link discRunsResolve}
 * turns the rows into values by prefix sums. Cost n × (rows in reach × s) instead of
 * n × (cells in reach × s²).
 *
 * With cell means (s > 1 sub-samples per axis, see `kernelStencil`) each cell row is scanned along
 * its s sub-rows on the sub-lattice of columns (sub-column u = i·s + p sits at cell coordinate
 * (u + ½)/s − ½, as in the other loops); whole cells in a run gain s samples, the two end cells
 * their partial share. A point counts as a contributor of every cell between the leftmost and
 * rightmost sample it reaches in the cell row (the disc is convex). A second, integer difference
 * array holds these counts; cells no point reaches are set to exactly 0, so prefix-sum round-off
 * never leaves a trace outside the discs.
 *
 * @param points planar points
 * @param order visiting order of the points (see `kdePointOrder`)
 * @param from first position in `order`
 * @param to one past the last position
 * @param spec the grid
 * @param c0 kernel constant K(0) (1/π for the disc)
 * @param reach2 squared scaled reach (shrunk by REACH_SQ_SHRINK)
 * @param bandwidth h in metres, unless per-point bandwidths are given
 * @param bandwidths optional per-point h
 * @param s sub-samples per cell and axis (1 = cell centres)
 * @param diff value differences, (width + 1) × height
 * @param countDiff count differences, (width + 1) × height
 * @returns nothing; the difference arrays are updated
 * @example
 * discRunsAdd(points, order, 0, n, spec, 1 / Math.PI, 1 - 1e-12, 500, undefined, 1, diff, countDiff);
 */
export function discRunsAdd(
  points: PlanarPoints,
  order: Uint32Array,
  from: number,
  to: number,
  spec: GridSpec,
  c0: number,
  reach2: number,
  bandwidth: number,
  bandwidths: Float64Array | undefined,
  s: number,
  diff: Float64Array,
  countDiff: Int32Array,
): void {
  const { x, y, w } = points;
  const { originX, originY, cellSize, width, height } = spec;
  const stride = width + 1;
  const run = new Int32Array(2);
  const reach = Math.sqrt(reach2);
  const sub = stencilSubOffsets(s);
  for (let o = from; o < to; o++) {
    const k = order[o];
    if (w[k] === 0) continue;
    const h = bandwidths ? bandwidths[k] : bandwidth;
    const invH = 1 / h;
    const v = (w[k] * invH * invH * c0) / (s * s);
    const stepR = cellSize * invH;
    // Sub-samples reach half a cell beyond the cell centre.
    const rc = (reach * h) / cellSize + (s > 1 ? 0.5 : 0);
    // Continuous cell index of the point (cell centre i sits at fx = i) and on the sub-lattice.
    const fx = (x[k] - originX) / cellSize - 0.5;
    const fy = (y[k] - originY) / cellSize - 0.5;
    const fu = (fx + 0.5) * s - 0.5;
    const stepU = stepR / s;
    const i0 = Math.max(0, Math.ceil(fx - rc - 1));
    const i1 = Math.min(width - 1, Math.floor(fx + rc + 1));
    const j0 = Math.max(0, Math.ceil(fy - rc - 1));
    const j1 = Math.min(height - 1, Math.floor(fy + rc + 1));
    if (i0 > i1) continue;
    const u0 = i0 * s;
    const u1 = i1 * s + s - 1;
    for (let j = j0; j <= j1; j++) {
      const row = j * stride;
      let cellMin = width;
      let cellMax = -1;
      for (let q = 0; q < s; q++) {
        const dy = (j + sub[q] - fy) * stepR;
        kdeRowRun(fu, stepU, dy * dy, reach2, u0, u1, run);
        const ua = run[0];
        const ub = run[1];
        if (ua > ub) continue;
        const ca = Math.floor(ua / s);
        const cb = Math.floor(ub / s);
        if (ca === cb) {
          const part = v * (ub - ua + 1);
          diff[row + ca] += part;
          diff[row + ca + 1] -= part;
        } else {
          const first = v * (s * (ca + 1) - ua);
          const last = v * (ub - s * cb + 1);
          diff[row + ca] += first;
          diff[row + ca + 1] -= first;
          diff[row + cb] += last;
          diff[row + cb + 1] -= last;
          if (cb > ca + 1) {
            diff[row + ca + 1] += v * s;
            diff[row + cb] -= v * s;
          }
        }
        if (ca < cellMin) cellMin = ca;
        if (cb > cellMax) cellMax = cb;
      }
      if (cellMin <= cellMax) {
        countDiff[row + cellMin]++;
        countDiff[row + cellMax + 1]--;
      }
    }
  }
}

/**
 * Prefix-sums the difference arrays of {@link discRunsAdd} into values and counts.
 *
 * @param diff value differences, (width + 1) × height
 * @param countDiff count differences, (width + 1) × height
 * @param width grid width
 * @param height grid height
 * @param values destination values (added to)
 * @param contributors optional destination counts (added to)
 * @returns nothing
 * @example
 * discRunsResolve(diff, countDiff, spec.width, spec.height, values, contributors);
 */
export function discRunsResolve(
  diff: Float64Array,
  countDiff: Int32Array,
  width: number,
  height: number,
  values: Float64Array,
  contributors: Uint32Array | undefined,
): void {
  const stride = width + 1;
  for (let j = 0; j < height; j++) {
    let acc = 0;
    let count = 0;
    for (let i = 0; i < width; i++) {
      acc += diff[j * stride + i];
      count += countDiff[j * stride + i];
      const c = i + j * width;
      if (count > 0) values[c] += acc;
      if (contributors) contributors[c] += count;
    }
  }
}
