import { throwIfAborted } from '../errors.js';
import { kernelByName } from '../kernels/kernels.js';
import type { GridSpec, KernelName, PlanarPoints } from '../types.js';
import { kdeExact } from './kde-exact.js';
import { kdePointOrder } from './kde-point-order.js';
import { kdeRowRun } from './kde-row-run.js';
import { kernelStencil, REACH_SQ_SHRINK } from './kde-stencil.js';

/** Points between abort checks. */
const POINTS_PER_CHUNK = 20_000;

/**
 * Distinct points whose kernel reaches each cell — the same counts as
 * `kdeExact(…, { countContributors: true })`, without the exact sum's n × (cells in reach)
 * cost, for the binned path and small-count suppression (no cell shown where fewer than k
 * customers contribute).
 *
 * A point's disc covers one contiguous run of cells per row ({@link kdeRowRun}, the exact sum's
 * own test). Each run is recorded as +1 at its first cell and −1 after its last in a per-row
 * difference array, and a prefix sum per row turns that into counts: cost n × (rows in reach)
 * instead of n × (cells in reach) — about 1/80 of the exact sum for a 50-cell radius.
 *
 * Narrow kernels sampled as cell means (see `kernelStencil`) are counted by the exact sum, which
 * is cheap for them.
 *
 * @param points planar points (validated by the caller); zero weights do not count
 * @param spec the grid
 * @param kernelName the kernel
 * @param bandwidth h in metres
 * @param options study-area mask (counts outside are 0) and abort signal
 * @returns count per cell
 * @example
 * const counts = kdeContributorCounts(points, spec, 'quartic', 2500);
 * const hidden = counts.map((c) => (c < 11 ? 1 : 0));
 */
export function kdeContributorCounts(
  points: PlanarPoints,
  spec: GridSpec,
  kernelName: KernelName,
  bandwidth: number,
  options: { mask?: Uint8Array; signal?: AbortSignal } = {},
): Uint32Array {
  const kernel = kernelByName(kernelName);
  const { mask, signal } = options;
  const { originX, originY, cellSize, width, height } = spec;
  if (kernelStencil(kernel, bandwidth, cellSize).oversample > 1) {
    return kdeExact(points, spec, kernelName, bandwidth, { mask, signal, countContributors: true })
      .contributors!;
  }
  const { x, y, w } = points;
  const stride = width + 1;
  const diff = new Int32Array(stride * height);
  const run = new Int32Array(2);
  const reach2 = kernel.reach * kernel.reach * REACH_SQ_SHRINK;
  const stepR = cellSize / bandwidth;
  const rc = (kernel.reach * bandwidth) / cellSize;
  const order = kdePointOrder(points, spec);
  for (let o = 0; o < order.length; o++) {
    if (o % POINTS_PER_CHUNK === 0) throwIfAborted(signal);
    const k = order[o];
    if (w[k] === 0) continue;
    // Same arithmetic as the exact sum: cell centre i sits at fx = i.
    const fx = (x[k] - originX) / cellSize - 0.5;
    const fy = (y[k] - originY) / cellSize - 0.5;
    const i0 = Math.max(0, Math.ceil(fx - rc));
    const i1 = Math.min(width - 1, Math.floor(fx + rc));
    const j0 = Math.max(0, Math.ceil(fy - rc));
    const j1 = Math.min(height - 1, Math.floor(fy + rc));
    for (let j = j0; j <= j1 && i0 <= i1; j++) {
      const dy = (j - fy) * stepR;
      kdeRowRun(fx, stepR, dy * dy, reach2, i0, i1, run);
      if (run[0] > run[1]) continue;
      diff[j * stride + run[0]]++;
      diff[j * stride + run[1] + 1]--;
    }
  }
  const counts = new Uint32Array(width * height);
  for (let j = 0; j < height; j++) {
    let acc = 0;
    for (let i = 0; i < width; i++) {
      acc += diff[j * stride + i];
      const c = i + j * width;
      counts[c] = mask && !mask[c] ? 0 : acc;
    }
  }
  return counts;
}
