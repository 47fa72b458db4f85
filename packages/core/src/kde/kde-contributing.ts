import type { Kernel } from '../kernels/kernels.js';
import type { GridSpec, PlanarPoints } from '../types.js';
import { REACH_SQ_SHRINK } from './kde-stencil.js';

/**
 * Counts points whose kernel is non-zero at one or more sample positions of the grid — the
 * cell centres, or the s × s sub-samples per cell when the stencil uses cell means. The nearest
 * sample to a point is found by clamping it to the sample lattice, so the count is exact and
 * costs O(n) whatever the method.
 *
 * @param points planar points (metres)
 * @param spec the grid
 * @param kernel the kernel
 * @param bandwidth h in metres, or per-point bandwidths
 * @param oversample sub-samples per cell and axis (1 = cell centres)
 * @returns how many points reach the grid
 * @example
 * kdeContributingPoints(points, spec, kernelByName('quartic'), 800, 1);
 */
export function kdeContributingPoints(
  points: PlanarPoints,
  spec: GridSpec,
  kernel: Kernel,
  bandwidth: number | Float64Array,
  oversample: number,
): number {
  const { x, y } = points;
  const step = spec.cellSize / oversample;
  const nxs = spec.width * oversample;
  const nys = spec.height * oversample;
  const reach2 = kernel.reach * kernel.reach * REACH_SQ_SHRINK;
  let count = 0;
  for (let i = 0; i < x.length; i++) {
    const h = typeof bandwidth === 'number' ? bandwidth : bandwidth[i];
    const kx = Math.min(nxs - 1, Math.max(0, Math.round((x[i] - spec.originX) / step - 0.5)));
    const ky = Math.min(nys - 1, Math.max(0, Math.round((y[i] - spec.originY) / step - 0.5)));
    const dx = (spec.originX + (kx + 0.5) * step - x[i]) / h;
    const dy = (spec.originY + (ky + 0.5) * step - y[i]) / h;
    const r2 = dx * dx + dy * dy;
    if (r2 < reach2 && kernel.valueSq(r2) > 0) count++;
  }
  return count;
}
