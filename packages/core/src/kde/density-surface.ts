import { CoreError, throwIfAborted } from '../errors.js';
import type { DensityMethod, GridSpec, KernelName, PlanarPoints } from '../types.js';
import { densityInputValidate } from './density-validate.js';
import { kdeAdaptive } from './kde-adaptive.js';
import { kdeBinned } from './kde-binned.js';
import { kdeContributorCounts } from './kde-contributor-counts.js';
import { densityMethodCost } from './kde-cost.js';
import { kdeEdgeCorrect, kdeEdgeFactor } from './kde-edge.js';
import { kdeExact } from './kde-exact.js';
import type { KdeGridResult } from './kde-options.js';

/** m² per km². */
const M2_PER_KM2 = 1e6;

export interface DensitySurfaceOptions {
  kernel: KernelName;
  /** h in metres: support radius, or standard deviation per axis for the Gaussian. */
  bandwidth: number;
  /** 'auto' (default) picks by cost and by the binned error bound, see {@link densityMethodCost}. */
  method?: 'exact' | 'binned' | 'auto';
  /** Abramson adaptive bandwidths; `pilotBandwidth` defaults to `bandwidth`. */
  adaptive?: boolean | { pilotBandwidth?: number };
  /** Study area, one byte per cell (1 = inside); cells outside are 0 in the result. */
  mask?: Uint8Array;
  /** Diggle's uniform edge correction against the study area (or the grid rectangle). */
  edgeCorrection?: boolean;
  /** Count distinct contributing points per cell (for small-count suppression), whatever the method. */
  countContributors?: boolean;
  signal?: AbortSignal;
  onProgress?: (fraction: number) => void;
}

export interface DensitySurfaceStats {
  totalWeight: number;
  pointCount: number;
  /** Points whose kernel reaches at least one cell of the grid (the mask is not considered). */
  contributingPoints: number;
  /** Σ intensity·cell area: the demand on the grid, in weight units. */
  integral: number;
  /** Largest intensity, weight per km². */
  max: number;
  /** Cell of the maximum and its centre in metres. */
  maxCell: { i: number; j: number; x: number; y: number };
  kernel: KernelName;
  bandwidth: number;
  cellSize: number;
  width: number;
  height: number;
  /** Kernel sub-samples per cell and axis: 1 = values at cell centres, > 1 = cell means (narrow kernel). */
  oversample: number;
  adaptive: boolean;
  edgeCorrection: boolean;
}

export interface DensitySurface {
  /** λ̂ in weight per km², row-major i + j·width, j = 0 the southern row. */
  intensity: Float64Array;
  /** intensity / Σw: a probability density per km². */
  share: Float64Array;
  /** Distinct contributing points per cell, when requested. */
  contributors?: Uint32Array;
  method: DensityMethod;
  stats: DensitySurfaceStats;
  /** Per-point bandwidths in metres (adaptive only). */
  bandwidths?: Float64Array;
}

/**
 * The demand surface: weighted kernel intensity on a grid, the single entry point for the
 * server and the CLI. Validates its inputs, picks exact or binned, optionally adapts bandwidths
 * (Abramson) and corrects edges (Diggle), and reports per km².
 *
 * @param points planar points in metres with weights ≥ 0
 * @param spec the grid
 * @param options kernel, bandwidth, method, adaptive, mask, edge correction, contributor counts, signal, progress
 * @returns intensity and share per km², the method used and summary statistics
 * @example
 * const surface = densitySurface(points, spec, { kernel: 'quartic', bandwidth: 850 });
 * surface.stats.max; // peak customers per km²
 */
export function densitySurface(
  points: PlanarPoints,
  spec: GridSpec,
  options: DensitySurfaceOptions,
): DensitySurface {
  const { kernel, bandwidth, mask, signal, onProgress } = options;
  const totalWeight = densityInputValidate(points, spec, kernel, bandwidth, mask);
  const requested = options.method ?? 'auto';
  if (requested !== 'auto' && requested !== 'exact' && requested !== 'binned') {
    throw new CoreError(
      'INVALID_ARGUMENT',
      `method must be exact, binned or auto (got "${String(requested)}")`,
      'method',
    );
  }
  const adaptive = options.adaptive !== undefined && options.adaptive !== false;
  const pilotBandwidth =
    typeof options.adaptive === 'object' ? options.adaptive.pilotBandwidth : undefined;
  if (pilotBandwidth !== undefined && !(pilotBandwidth > 0 && Number.isFinite(pilotBandwidth))) {
    throw new CoreError(
      'INVALID_BANDWIDTH',
      `pilot bandwidth must be a positive number of metres (got ${pilotBandwidth}); leave it out to use the bandwidth ${bandwidth} m`,
      'adaptive.pilotBandwidth',
    );
  }
  throwIfAborted(signal);
  const edge = options.edgeCorrection === true;
  // The edge factor is one more convolution: leave it the last 15 % of the progress bar.
  const mainPart = edge ? 0.85 : 1;
  const progress = onProgress ? (f: number) => onProgress(mainPart * f) : undefined;

  let method: DensityMethod;
  let result: KdeGridResult;
  let bandwidths: Float64Array | undefined;
  if (adaptive) {
    method = 'exact';
    const pilotMethod = requested === 'auto' ? undefined : requested;
    const r = kdeAdaptive(points, spec, kernel, bandwidth, {
      pilotBandwidth,
      pilotMethod,
      mask,
      signal,
      onProgress: progress,
      countContributors: options.countContributors,
    });
    result = r;
    bandwidths = r.bandwidths;
  } else {
    method =
      requested === 'auto'
        ? densityMethodCost(points.x.length, spec, kernel, bandwidth).method
        : requested;
    result =
      method === 'binned'
        ? kdeBinned(points, spec, kernel, bandwidth, { mask, signal, onProgress: progress })
        : kdeExact(points, spec, kernel, bandwidth, {
            mask,
            signal,
            onProgress: progress,
            countContributors: options.countContributors,
          });
    if (method === 'binned' && options.countContributors) {
      result.contributors = kdeContributorCounts(points, spec, kernel, bandwidth, { mask, signal });
    }
  }
  const values = result.values;
  if (edge) {
    // With adaptive bandwidths the factor is taken at h₀, the bandwidth of the typical point.
    kdeEdgeCorrect(values, kdeEdgeFactor(spec, kernel, bandwidth, mask, signal), mask);
    onProgress?.(1);
  }

  const cellArea = spec.cellSize * spec.cellSize;
  const intensity = new Float64Array(values.length);
  const shareOut = new Float64Array(values.length);
  let integral = 0;
  let max = -Infinity;
  let maxAt = 0;
  for (let c = 0; c < values.length; c++) {
    const v = values[c] * M2_PER_KM2;
    intensity[c] = v;
    shareOut[c] = v / totalWeight;
    integral += values[c] * cellArea;
    if (v > max) {
      max = v;
      maxAt = c;
    }
  }
  const i = maxAt % spec.width;
  const j = Math.floor(maxAt / spec.width);
  return {
    intensity,
    share: shareOut,
    contributors: result.contributors,
    method,
    bandwidths,
    stats: {
      totalWeight,
      pointCount: points.x.length,
      contributingPoints: result.contributingPoints,
      integral,
      max,
      maxCell: {
        i,
        j,
        x: spec.originX + (i + 0.5) * spec.cellSize,
        y: spec.originY + (j + 0.5) * spec.cellSize,
      },
      kernel,
      bandwidth,
      cellSize: spec.cellSize,
      width: spec.width,
      height: spec.height,
      oversample: result.oversample,
      adaptive,
      edgeCorrection: edge,
    },
  };
}
