import { kernelByName } from '../kernels/kernels.js';
import { fftSize } from '../lib/fft-2d.js';
import type { DensityMethod, GridSpec, KernelName } from '../types.js';
import { BINNED_MAX_FFT_CELLS } from './kde-binned.js';
import { kdeBinnedMeetsBound } from './kde-cell-rule.js';
import { kernelStencil } from './kde-stencil.js';

/**
 * CPU seconds per unit of work on one core of the development machine (Node 20; measured with
 * the engine's own loops [D]: exact quartic 2.3–2.9 ns per cell visit, Gaussian 2.0, triangular
 * 3.4; a 1000 × 1000 binned quartic run with 2048² FFTs 0.46 s for 10³ points and 0.61 s for 10⁶).
 * They rank the methods and price credits; a factor of two either way changes neither.
 */
export const KDE_COST_SECONDS = {
  /** One kernel evaluation at one cell in the exact sum. */
  exactVisit: 3e-9,
  /**
   * One row run of the difference-array sums (uniform disc, Epanechnikov with centre samples):
   * ≈ 0.5 s per 10⁵ points × 101 rows, 1.0 s with 2 × 2 cell means.
   */
  rowRun: 5e-8,
  /** One point spread over four lattice nodes (random order, so mostly cache misses). */
  binPoint: 1.5e-7,
  /** One element·log₂(size) of a 2-D real FFT, times the three FFTs of a convolution. */
  fftUnit: 1.7e-9,
} as const;

/** Exact adaptive sums visit Σ hᵢ² / h₀² ≈ 1.5 times the fixed sum's cells [CP estimate]. */
const ADAPTIVE_VISIT_FACTOR = 1.5;

export interface DensityMethodCost {
  /** Estimated seconds for the exact sum. */
  exactSeconds: number;
  /** Estimated seconds for linear binning + FFT. */
  binnedSeconds: number;
  /** Whether binned stays within 1e-3 × max(exact) at this cell size ({@link kdeBinnedMeetsBound}). */
  binnedMeetsBound: boolean;
  /** What `method: 'auto'` runs. */
  method: DensityMethod;
  /** Estimated seconds of the whole run with that method (pilot and edge correction included). */
  seconds: number;
}

function convolutionSeconds(spec: GridSpec, radius: number): number {
  const px = fftSize(spec.width + 2 * radius);
  const py = fftSize(spec.height + 2 * radius);
  return KDE_COST_SECONDS.fftUnit * 3 * px * py * Math.log2(px * py);
}

/**
 * Estimated cost of each method and the choice `auto` makes: exact costs n × cells within the
 * kernel's reach (× s² sub-samples for narrow kernels), binned costs n + FFT size·log(FFT size).
 * Binned is chosen only when it meets its error bound at this h/cellSize, its FFT lattice fits
 * in {@link BINNED_MAX_FFT_CELLS} and it is cheaper; the
 * adaptive estimate always runs the exact sum (its pilot may be binned).
 *
 * @param n number of points
 * @param spec the grid
 * @param kernel kernel name
 * @param bandwidth h in metres
 * @param options adaptive and edge correction, which add a pilot or a mask convolution
 * @returns both estimates, whether binned meets its bound, the auto choice and its seconds
 * @example
 * densityMethodCost(1e6, { originX: 0, originY: 0, cellSize: 50, width: 1000, height: 1000 }, 'quartic', 2500);
 * // → { method: 'binned', binnedSeconds ≈ 1, exactSeconds ≈ 47, … }
 */
export function densityMethodCost(
  n: number,
  spec: GridSpec,
  kernel: KernelName,
  bandwidth: number,
  options: { adaptive?: boolean; edgeCorrection?: boolean } = {},
): DensityMethodCost {
  const k = kernelByName(kernel);
  const stencil = kernelStencil(k, bandwidth, spec.cellSize);
  const s = stencil.oversample;
  const rc = (k.reach * bandwidth) / spec.cellSize + (s > 1 ? 0.5 : 0);
  const cellsInReach = Math.min(Math.PI * rc * rc + 4 * rc + 1, spec.width * spec.height);
  const exactSeconds =
    kernel === 'uniform' || (kernel === 'epanechnikov' && s === 1)
      ? KDE_COST_SECONDS.rowRun * n * Math.min(2 * rc + 1, spec.height) * s
      : KDE_COST_SECONDS.exactVisit * n * cellsInReach * s * s;
  const fftSeconds = convolutionSeconds(spec, stencil.radius);
  const binnedSeconds = KDE_COST_SECONDS.binPoint * n + fftSeconds;
  const binnedFits =
    fftSize(spec.width + 2 * stencil.radius) * fftSize(spec.height + 2 * stencil.radius) <=
    BINNED_MAX_FFT_CELLS;
  const binnedMeetsBound = kdeBinnedMeetsBound(kernel, bandwidth, spec.cellSize);
  let method: DensityMethod;
  let seconds: number;
  if (options.adaptive) {
    method = 'exact';
    seconds =
      Math.min(binnedMeetsBound ? binnedSeconds : Infinity, exactSeconds) +
      ADAPTIVE_VISIT_FACTOR * exactSeconds;
  } else {
    method = binnedMeetsBound && binnedFits && binnedSeconds < exactSeconds ? 'binned' : 'exact';
    seconds = method === 'binned' ? binnedSeconds : exactSeconds;
  }
  if (options.edgeCorrection) seconds += fftSeconds;
  return { exactSeconds, binnedSeconds, binnedMeetsBound, method, seconds };
}
