import { CoreError, throwIfAborted } from '../errors.js';
import { binnedLatticeCheck, BINNED_ROUNDOFF_FLOOR } from '../kde/kde-binned.js';
import { kdeLinearBinning } from '../kde/kde-linear-binning.js';
import { kernelStencil } from '../kde/kde-stencil.js';
import { kernelByName } from '../kernels/kernels.js';
import { fft2dRealForward, fft2dRealInverseWindow } from '../lib/fft-2d.js';
import { fftConvolutionPlan } from '../lib/fft-convolve.js';
import type { GridSpec, KernelName, PlanarPoints } from '../types.js';

/** One bandwidth's surface from {@link kdeBinnedMultiBandwidth}. */
export interface KdeBandwidthSurface {
  bandwidth: number;
  /** λ̂ in weight per m², row-major i + j·width (as kdeBinned). */
  values: Float64Array;
}

/**
 * Binned KDE (linear binning + FFT convolution, as {@link kdeBinned}) for several bandwidths at
 * once: the points are binned ONCE onto a lattice padded by the widest stencil's radius, the
 * lattice is transformed ONCE, and each bandwidth only costs its stencil's spectrum, one product
 * and one inverse FFT. Each result equals kdeBinned's for that bandwidth up to FFT round-off
 * (the lattice is larger, the linear convolution the same).
 *
 * @param points planar points in metres with weights ≥ 0 (validated by the caller)
 * @param spec the grid
 * @param kernelName the kernel
 * @param bandwidths h in metres, each > 0
 * @param options study-area mask (cells outside → 0) and abort signal
 * @returns one surface per bandwidth, in the given order
 * @example
 * const [half, base, double] = kdeBinnedMultiBandwidth(points, spec, 'gaussian', [500, 1000, 2000]);
 */
export function kdeBinnedMultiBandwidth(
  points: PlanarPoints,
  spec: GridSpec,
  kernelName: KernelName,
  bandwidths: readonly number[],
  options: { mask?: Uint8Array; signal?: AbortSignal } = {},
): KdeBandwidthSurface[] {
  if (!Array.isArray(bandwidths) || bandwidths.length === 0) {
    throw new CoreError('INVALID_BANDWIDTH', 'give at least one bandwidth in metres', 'bandwidths');
  }
  bandwidths.forEach((h, k) => {
    if (!(h > 0) || !Number.isFinite(h)) {
      throw new CoreError('INVALID_BANDWIDTH', `bandwidth #${k + 1} must be a positive number of metres (got ${h})`, 'bandwidths');
    }
  });
  const kernel = kernelByName(kernelName);
  const { width, height } = spec;
  const stencils = bandwidths.map((h) => kernelStencil(kernel, h, spec.cellSize));
  const pad = Math.max(...stencils.map((s) => s.radius));
  binnedLatticeCheck(spec, pad);
  const nx = width + 2 * pad;
  const ny = height + 2 * pad;
  const plans = stencils.map((s) => fftConvolutionPlan(s.values, s.radius, s.radius, nx, ny, options.signal));
  const { px, py } = plans[0];
  const lattice = new Float64Array(px * py);
  kdeLinearBinning(points, spec, pad, px, lattice);
  const spectrum = fft2dRealForward(lattice, px, py, options.signal);
  const product = new Float64Array(spectrum.length);
  return plans.map((plan, k) => {
    throwIfAborted(options.signal);
    const { filter } = plan;
    for (let q = 0; q < filter.length; q++) {
      product[2 * q] = spectrum[2 * q] * filter[q];
      product[2 * q + 1] = spectrum[2 * q + 1] * filter[q];
    }
    const values = new Float64Array(width * height);
    fft2dRealInverseWindow(product, px, py, pad, pad, width, height, values, options.signal);
    let peak = 0;
    for (let c = 0; c < values.length; c++) if (values[c] > peak) peak = values[c];
    const floor = peak * BINNED_ROUNDOFF_FLOOR;
    for (let c = 0; c < values.length; c++) {
      if (values[c] < floor || (options.mask !== undefined && options.mask[c] === 0)) values[c] = 0;
    }
    return { bandwidth: bandwidths[k], values };
  });
}
