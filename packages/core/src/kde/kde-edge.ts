import { throwIfAborted } from '../errors.js';
import { kernelByName } from '../kernels/kernels.js';
import { fftConvolutionApply, fftConvolutionPlan } from '../lib/fft-convolve.js';
import type { GridSpec, KernelName } from '../types.js';
import { binnedLatticeCheck } from './kde-binned.js';
import { kernelStencil } from './kde-stencil.js';

/**
 * Smallest edge factor divided by. A cell whose kernel lies 95 % outside the study area (a
 * sliver of land, a spit between two bays) would otherwise be multiplied without limit; with the
 * floor the correction is at most ×20 [CP].
 */
export const KDE_EDGE_MIN_FACTOR = 0.05;

/**
 * Diggle's edge factor (Diggle 1985, "A kernel method for smoothing point process data", Appl.
 * Statist. 34:138–147; Berman & Diggle 1989, JRSS B 51:81–92): e_h(u) = ∫_W K_h(u − v) dv, the
 * share of the kernel at u that falls inside the study area W.
 *
 * W is the set of mask cells equal to 1 (the whole grid when there is no mask); everything
 * outside the grid counts as outside W. The integral is the convolution of W's indicator with
 * the kernel stencil through the same zero-padded FFT as the binned estimate, divided by the
 * stencil's own total so that e is exactly 1 deep inside W whatever the discretisation.
 *
 * @param spec the grid
 * @param kernelName the kernel
 * @param bandwidth h in metres
 * @param mask study-area mask (1 = inside), or undefined for the grid rectangle
 * @param signal optional abort signal
 * @returns e per cell in [0, 1]; 0 for cells outside W
 * @example
 * const e = kdeEdgeFactor(spec, 'gaussian', 800, landMask);
 */
export function kdeEdgeFactor(
  spec: GridSpec,
  kernelName: KernelName,
  bandwidth: number,
  mask?: Uint8Array,
  signal?: AbortSignal,
): Float64Array {
  const stencil = kernelStencil(kernelByName(kernelName), bandwidth, spec.cellSize);
  const { width, height } = spec;
  const r = stencil.radius;
  binnedLatticeCheck(spec, r);
  throwIfAborted(signal);
  const plan = fftConvolutionPlan(stencil.values, r, r, width + 2 * r, height + 2 * r, signal);
  const input = new Float64Array(plan.px * plan.py);
  for (let j = 0; j < height; j++) {
    for (let i = 0; i < width; i++) {
      if (!mask || mask[i + j * width]) input[i + r + (j + r) * plan.px] = 1;
    }
  }
  const e = new Float64Array(width * height);
  fftConvolutionApply(plan, input, r, r, width, height, e, signal);
  let total = 0;
  for (let k = 0; k < stencil.values.length; k++) total += stencil.values[k];
  for (let c = 0; c < e.length; c++) {
    e[c] = mask && !mask[c] ? 0 : Math.min(1, Math.max(0, e[c] / total));
  }
  return e;
}

/**
 * Applies the uniform edge correction in place: λ̂(u) ← λ̂(u) / max(e(u), minFactor) inside W,
 * 0 outside.
 *
 * @param values λ̂ per cell (any unit), changed in place
 * @param factor e per cell from {@link kdeEdgeFactor}
 * @param mask study-area mask, or undefined
 * @param minFactor floor for e, default {@link KDE_EDGE_MIN_FACTOR}
 * @returns the same `values` array
 * @example
 * kdeEdgeCorrect(result.values, kdeEdgeFactor(spec, 'quartic', 900, mask), mask);
 */
export function kdeEdgeCorrect(
  values: Float64Array,
  factor: Float64Array,
  mask?: Uint8Array,
  minFactor: number = KDE_EDGE_MIN_FACTOR,
): Float64Array {
  for (let c = 0; c < values.length; c++) {
    values[c] = mask && !mask[c] ? 0 : values[c] / Math.max(factor[c], minFactor);
  }
  return values;
}
