import type { Extent, PlanarPoints } from '../types.js';

/**
 * The extent of the points that carry weight, padded on every side. Zero-weight points do not
 * widen it.
 *
 * @param points planar points (metres)
 * @param padding metres added on every side (default 0)
 * @returns the padded extent, or undefined when no point has a positive weight
 * @example
 * pointsExtent(points, kernelReach('quartic', 1000)); // { minX, minY, maxX, maxY }
 */
export function pointsExtent(points: PlanarPoints, padding = 0): Extent | undefined {
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (let i = 0; i < points.x.length; i++) {
    if (!(points.w[i] > 0)) continue;
    const x = points.x[i];
    const y = points.y[i];
    if (x < minX) minX = x;
    if (x > maxX) maxX = x;
    if (y < minY) minY = y;
    if (y > maxY) maxY = y;
  }
  if (minX === Infinity) return undefined;
  return { minX: minX - padding, minY: minY - padding, maxX: maxX + padding, maxY: maxY + padding };
}
