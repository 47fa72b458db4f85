import { CoreError } from '../errors.js';
import type { GridSpec, PlanarPoints } from '../types.js';
import { pointsExtent } from '../points/points-extent.js';
import { gridFromExtent } from './grid-from-extent.js';
import type { GridOptions } from './grid-size-limit.js';

/**
 * A grid over the points' extent padded on every side, usually by the kernel's reach
 * (`kernelReach(kernel, h)`) so no demand spills off the grid. Zero-weight points do not widen it.
 *
 * @param points planar points (metres) with at least one positive weight
 * @param cellSize metres, > 0
 * @param padding metres added on every side, ≥ 0
 * @param options `maxCells`, `align`
 * @returns the grid spec
 * @throws CoreError EMPTY_POINTS, ZERO_TOTAL_WEIGHT, INVALID_ARGUMENT, INVALID_CELL_SIZE, GRID_TOO_LARGE
 * @example
 * gridFromPoints(points, 50, kernelReach('quartic', 1000));
 */
export function gridFromPoints(points: PlanarPoints, cellSize: number, padding: number, options: GridOptions = {}): GridSpec {
  if (points.x.length === 0) throw new CoreError('EMPTY_POINTS', 'there are no points to build a grid around', 'points');
  if (typeof padding !== 'number' || !Number.isFinite(padding) || padding < 0) {
    throw new CoreError('INVALID_ARGUMENT', `padding must be a number of metres ≥ 0 (got ${String(padding)})`, 'padding');
  }
  const extent = pointsExtent(points, padding);
  if (!extent) {
    throw new CoreError('ZERO_TOTAL_WEIGHT', 'every point has zero weight, so there is no demand to place a grid around', 'points');
  }
  return gridFromExtent(extent, cellSize, options);
}
