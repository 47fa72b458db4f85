import { CoreError } from '../errors.js';
import { kernelByName } from '../kernels/kernels.js';
import type { KernelName, PlanarPoints } from '../types.js';

/**
 * Weighted kernel intensity by direct summation at arbitrary query locations:
 * λ̂(q) = Σᵢ wᵢ h⁻² K(|q − xᵢ| / h), in weight per m². O(n × queries) with no grid, so it
 * serves as the ground truth for a few hundred sampled cells when the exact grid is too slow.
 *
 * @param points planar points in metres with weights
 * @param qx query x coordinates (metres)
 * @param qy query y coordinates (metres), same length as qx
 * @param kernelName the kernel
 * @param bandwidth h in metres (support radius, or sd for the Gaussian)
 * @returns λ̂ per m² at each query
 * @example
 * const v = kdeExactAt(points, Float64Array.of(500), Float64Array.of(500), 'quartic', 2500);
 */
export function kdeExactAt(
  points: PlanarPoints,
  qx: Float64Array,
  qy: Float64Array,
  kernelName: KernelName,
  bandwidth: number,
): Float64Array {
  if (!(bandwidth > 0 && Number.isFinite(bandwidth))) {
    throw new CoreError('INVALID_BANDWIDTH', `bandwidth must be a positive number of metres (got ${bandwidth})`, 'bandwidth');
  }
  if (qx.length !== qy.length) {
    throw new CoreError('INVALID_ARGUMENT', `qx and qy must have the same length (got ${qx.length} and ${qy.length})`, 'qy');
  }
  const kernel = kernelByName(kernelName);
  const { x, y, w } = points;
  const inv2 = 1 / (bandwidth * bandwidth);
  const reach2 = kernel.reach * kernel.reach;
  const out = new Float64Array(qx.length);
  for (let q = 0; q < qx.length; q++) {
    const cx = qx[q];
    const cy = qy[q];
    let sum = 0;
    for (let i = 0; i < x.length; i++) {
      const dx = cx - x[i];
      const dy = cy - y[i];
      const r2 = (dx * dx + dy * dy) * inv2;
      if (r2 < reach2) sum += w[i] * kernel.valueSq(r2);
    }
    out[q] = sum * inv2;
  }
  return out;
}
