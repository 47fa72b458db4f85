import { throwIfAborted } from '../errors.js';
import { kernelByName } from '../kernels/kernels.js';
import { fftConvolutionApply, fftConvolutionPlan } from '../lib/fft-convolve.js';
import type { GridSpec, KernelName, PlanarPoints } from '../types.js';
import { kdeExact } from './kde-exact.js';
import { kernelStencil, REACH_SQ_SHRINK } from './kde-stencil.js';

/** Margin (relative) that keeps the full/none classification of a bucket clear of round-off. */
const CLASSIFY_MARGIN = 1e-9;

/** Points between abort checks in the ring pass. */
const POINTS_PER_CHUNK = 20_000;

/**
 * Distinct points whose kernel reaches each cell — the same counts as
 * `kdeExact(…, { countContributors: true })`, without the exact sum's n × (cells in reach) cost,
 * for the binned path and small-count suppression (no cell shown where fewer than k customers
 * contribute).
 *
 * Each point is put in the bucket of its nearest cell centre, so it lies within half a cell of
 * that centre on each axis. For a cell at bucket offset (di, dj) the distance to any point of the
 * bucket is then bounded below and above. Offsets entirely inside the kernel's reach form a disc
 * stencil and are counted for all points at once by FFT convolution of the bucket counts; only the
 * ring of offsets that straddle the reach is checked point by point, with the exact sum's own
 * distance arithmetic. Cost ≈ FFT + n × (ring cells ≈ 2π·reach/δ·1.3).
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
    return kdeExact(points, spec, kernelName, bandwidth, { mask, signal, countContributors: true }).contributors!;
  }
  const rc = (kernel.reach * bandwidth) / cellSize; // reach in cells
  const pad = Math.ceil(rc + 0.5) + 1;
  const lo = rc * (1 - CLASSIFY_MARGIN);
  const hi = rc * (1 + CLASSIFY_MARGIN);
  // Offsets whose whole bucket is within reach (full) and those that straddle it (ring).
  const side = 2 * pad + 1;
  const full = new Float64Array(side * side);
  const ring: number[] = [];
  for (let dj = -pad; dj <= pad; dj++) {
    for (let di = -pad; di <= pad; di++) {
      const nx = Math.max(0, Math.abs(di) - 0.5);
      const ny = Math.max(0, Math.abs(dj) - 0.5);
      const fx = Math.abs(di) + 0.5;
      const fy = Math.abs(dj) + 0.5;
      if (fx * fx + fy * fy < lo * lo) full[di + pad + (dj + pad) * side] = 1;
      else if (nx * nx + ny * ny < hi * hi) ring.push(di, dj);
    }
  }
  const nxLat = width + 2 * pad;
  const nyLat = height + 2 * pad;
  throwIfAborted(signal);
  const plan = fftConvolutionPlan(full, pad, pad, nxLat, nyLat, signal);
  const hist = new Float64Array(plan.px * plan.py);
  const counts = new Uint32Array(width * height);
  const { x, y, w } = points;
  const invH = 1 / bandwidth;
  const stepR = cellSize * invH;
  const reach2 = kernel.reach * kernel.reach * REACH_SQ_SHRINK;
  for (let k = 0; k < x.length; k++) {
    if (k % POINTS_PER_CHUNK === 0) throwIfAborted(signal);
    if (w[k] === 0) continue;
    // Same arithmetic as the exact sum: cell centre i sits at fx = i.
    const fx = (x[k] - originX) / cellSize - 0.5;
    const fy = (y[k] - originY) / cellSize - 0.5;
    const bi = Math.round(fx);
    const bj = Math.round(fy);
    if (bi < -pad || bj < -pad || bi >= width + pad || bj >= height + pad) continue;
    hist[bi + pad + (bj + pad) * plan.px] += 1;
    for (let r = 0; r < ring.length; r += 2) {
      const i = bi + ring[r];
      const j = bj + ring[r + 1];
      if (i < 0 || j < 0 || i >= width || j >= height) continue;
      const dx = (i - fx) * stepR;
      const dy = (j - fy) * stepR;
      if (dx * dx + dy * dy < reach2) counts[i + j * width]++;
    }
  }
  const fullCounts = new Float64Array(width * height);
  fftConvolutionApply(plan, hist, pad, pad, width, height, fullCounts, signal);
  for (let c = 0; c < counts.length; c++) {
    counts[c] = mask && !mask[c] ? 0 : counts[c] + Math.round(fullCounts[c]);
  }
  return counts;
}
