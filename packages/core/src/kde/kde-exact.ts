import { throwIfAborted } from '../errors.js';
import { kernelByName, type Kernel } from '../kernels/kernels.js';
import type { GridSpec, KernelName, PlanarPoints } from '../types.js';
import { kdeContributingPoints } from './kde-contributing.js';
import { kdePointOrder } from './kde-point-order.js';
import { cellMeansAdd } from './kde-exact-cell-means.js';
import { discRunsAdd, discRunsResolve } from './kde-exact-disc.js';
import { parabolaRunsAdd, parabolaRunsCreate, parabolaRunsResolve } from './kde-exact-parabola.js';
import type { KdeGridOptions, KdeGridResult } from './kde-options.js';
import { kdeRowRun } from './kde-row-run.js';
import { kernelStencil, REACH_SQ_SHRINK } from './kde-stencil.js';

export interface KdeExactOptions extends KdeGridOptions {
  /** Per-point bandwidths in metres (adaptive estimate); `bandwidth` is then only a fallback. */
  bandwidths?: Float64Array;
  /** Also count, per cell, the distinct points with a non-zero kernel value there. */
  countContributors?: boolean;
  /** Force the kernel sub-sampling per cell (1 = cell centres); by default as {@link kernelStencil} picks. */
  oversample?: number;
}

/** Cell visits between progress reports and abort checks. */
const VISITS_PER_CHUNK = 4_000_000;

/**
 * Weighted kernel intensity by direct summation: λ̂(c) = Σᵢ wᵢ K_hᵢ(c − xᵢ) at every cell
 * centre c, in weight per m². Each point visits only the run of cells inside its kernel's disc
 * in each row, so the cost is n × (cells in reach) — the bucketing is by point, not by cell,
 * which needs no index; points are visited in cell order for cache locality (measured: ≈ 10 %
 * faster than input order for the cell loop, ≈ 40 % for the row-run sums). The uniform disc and
 * the Epanechnikov kernel (centre samples) are summed per row run in difference arrays instead,
 * n × (rows in reach). Measured CPU time per cell visit: 2.0–3.5 ns (Gaussian 2.0 with a
 * separable exp, quartic 2.5, triangular 3.5); 10⁶ points with a 50-cell radius: Epanechnikov
 * 3.3 s, uniform 8.9 s (2 × 2 cell means), quartic ≈ 30 s.
 *
 * The kernel is evaluated exactly as the binned method's stencil samples it (see
 * {@link kernelStencil}): at cell centres, or as cell means on an s × s sub-lattice when the
 * kernel is too narrow or too jumpy for centre samples to carry its mass.
 *
 * @param points planar points in metres with weights ≥ 0 (validated by the caller)
 * @param spec the grid
 * @param kernelName the kernel
 * @param bandwidth h in metres (support radius, or sd for the Gaussian)
 * @param options mask, per-point bandwidths, contributor counts, abort signal, progress
 * @returns λ̂ per m², optional contributor counts, the number of contributing points
 * @example
 * const { values } = kdeExact(points, spec, 'quartic', 800);
 */
export function kdeExact(
  points: PlanarPoints,
  spec: GridSpec,
  kernelName: KernelName,
  bandwidth: number,
  options: KdeExactOptions = {},
): KdeGridResult {
  const kernel = kernelByName(kernelName);
  const { bandwidths, mask, signal, onProgress } = options;
  const { cellSize, width, height } = spec;
  const n = points.x.length;
  let hMin = bandwidth;
  if (bandwidths) {
    hMin = Infinity;
    for (let i = 0; i < n; i++) if (bandwidths[i] < hMin) hMin = bandwidths[i];
  }
  const s = options.oversample ?? kernelStencil(kernel, hMin, cellSize).oversample;
  const values = new Float64Array(width * height);
  const contributors = options.countContributors ? new Uint32Array(width * height) : undefined;

  // The uniform disc is summed by row runs (kde-exact-disc.ts): rows, not cells, per point.
  const disc = kernel.name === 'uniform';
  // Epanechnikov with centre samples likewise, by row parabolas (kde-exact-parabola.ts).
  const parabola =
    kernel.name === 'epanechnikov' && s === 1 ? parabolaRunsCreate(width, height) : undefined;
  const diff = disc ? new Float64Array((width + 1) * height) : undefined;
  const countDiff = disc ? new Int32Array((width + 1) * height) : undefined;
  const reach2 = kernel.reach * kernel.reach * REACH_SQ_SHRINK;
  const visitsPerPoint = (h: number): number => {
    const side = (2 * kernel.reach * h) / cellSize + 2;
    return disc || parabola ? side * s : side * side * s * s;
  };
  const order = kdePointOrder(points, spec);
  let i = 0;
  while (i < n) {
    throwIfAborted(signal);
    const budget = Math.max(1, Math.floor(VISITS_PER_CHUNK / visitsPerPoint(bandwidth)));
    const end = Math.min(n, i + budget);
    if (parabola) {
      parabolaRunsAdd(
        points,
        order,
        i,
        end,
        spec,
        kernel.valueSq(0),
        reach2,
        bandwidth,
        bandwidths,
        parabola,
      );
    } else if (diff && countDiff) {
      discRunsAdd(
        points,
        order,
        i,
        end,
        spec,
        kernel.valueSq(0),
        reach2,
        bandwidth,
        bandwidths,
        s,
        diff,
        countDiff,
      );
    } else if (s === 1) {
      sumCentres(points, order, i, end, spec, kernel, bandwidth, bandwidths, values, contributors);
    } else {
      cellMeansAdd(
        points,
        order,
        i,
        end,
        spec,
        kernel,
        bandwidth,
        bandwidths,
        mask,
        values,
        contributors,
        s,
      );
    }
    i = end;
    onProgress?.(i / n);
  }
  if (parabola) parabolaRunsResolve(parabola, width, height, values, contributors);
  if (diff && countDiff) discRunsResolve(diff, countDiff, width, height, values, contributors);
  // Cells outside the study area are summed like the others (a branch in the hot loop costs more
  // than the wasted cells) and cleared here.
  if (mask) {
    for (let c = 0; c < values.length; c++) {
      if (!mask[c]) {
        values[c] = 0;
        if (contributors) contributors[c] = 0;
      }
    }
  }
  return {
    values,
    contributors,
    contributingPoints: kdeContributingPoints(points, spec, kernel, bandwidths ?? bandwidth, s),
    oversample: s,
  };
}

/**
 * Centre samples. Per row only the run of cells inside the disc is visited ({@link kdeRowRun},
 * the same test the contributor counts use); each kernel family gets its own branch-free loop over the run: the
 * Gaussian uses e^{−(dx²+dy²)/2} = e^{−dx²/2}·e^{−dy²/2} (one exp per column and row), the
 * (1 − r²)^q kernels are evaluated inline.
 */
function sumCentres(
  points: PlanarPoints,
  order: Uint32Array,
  from: number,
  to: number,
  spec: GridSpec,
  kernel: Kernel,
  bandwidth: number,
  bandwidths: Float64Array | undefined,
  values: Float64Array,
  contributors: Uint32Array | undefined,
): void {
  const { x, y, w } = points;
  const { originX, originY, cellSize, width, height } = spec;
  const reach2 = kernel.reach * kernel.reach * REACH_SQ_SHRINK;
  const gaussian = kernel.name === 'gaussian';
  const q = POLY_POWER[kernel.name] ?? -1;
  // Constant of c(1 − r²)^q, and of the Gaussian: K(0).
  const c0 = kernel.valueSq(0);
  const colFactor = gaussian ? new Float64Array(width) : undefined;
  const run = new Int32Array(2);
  for (let o = from; o < to; o++) {
    const k = order[o];
    const wk = w[k];
    if (wk === 0) continue;
    const h = bandwidths ? bandwidths[k] : bandwidth;
    const invH = 1 / h;
    const scale = wk * invH * invH;
    // Continuous cell index of the point: cell centre i sits at fx = i.
    const fx = (x[k] - originX) / cellSize - 0.5;
    const fy = (y[k] - originY) / cellSize - 0.5;
    const rc = (kernel.reach * h) / cellSize;
    const i0 = Math.max(0, Math.ceil(fx - rc));
    const i1 = Math.min(width - 1, Math.floor(fx + rc));
    const j0 = Math.max(0, Math.ceil(fy - rc));
    const j1 = Math.min(height - 1, Math.floor(fy + rc));
    if (i0 > i1 || j0 > j1) continue;
    const stepR = cellSize * invH;
    if (colFactor) {
      for (let i = i0; i <= i1; i++) {
        const dx = (i - fx) * stepR;
        colFactor[i] = Math.exp(-0.5 * dx * dx);
      }
    }
    for (let j = j0; j <= j1; j++) {
      const dy = (j - fy) * stepR;
      const dy2 = dy * dy;
      kdeRowRun(fx, stepR, dy2, reach2, i0, i1, run);
      const a = run[0];
      const b = run[1];
      if (a > b) continue;
      const row = j * width;
      if (colFactor) {
        const rowScale = scale * c0 * Math.exp(-0.5 * dy2);
        for (let i = a; i <= b; i++) values[row + i] += rowScale * colFactor[i];
      } else if (q === 2) {
        const rowScale = scale * c0;
        for (let i = a; i <= b; i++) {
          const dx = (i - fx) * stepR;
          const t = 1 - (dx * dx + dy2);
          values[row + i] += rowScale * t * t;
        }
      } else if (q === 3) {
        const rowScale = scale * c0;
        for (let i = a; i <= b; i++) {
          const dx = (i - fx) * stepR;
          const t = 1 - (dx * dx + dy2);
          values[row + i] += rowScale * t * t * t;
        }
      } else if (q === 0) {
        const rowScale = scale * c0;
        for (let i = a; i <= b; i++) values[row + i] += rowScale;
      } else {
        for (let i = a; i <= b; i++) {
          const dx = (i - fx) * stepR;
          values[row + i] += scale * kernel.valueSq(dx * dx + dy2);
        }
      }
      if (contributors !== undefined) for (let i = a; i <= b; i++) contributors[row + i]++;
    }
  }
}

/** Power q of the kernels of the form c(1 − r²)^q, evaluated inline in the hot loop. */
const POLY_POWER: Partial<Record<string, number>> = {
  uniform: 0,
  quartic: 2,
  triweight: 3,
};
