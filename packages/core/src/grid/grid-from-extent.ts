import { CoreError } from '../errors.js';
import type { Extent, GridSpec } from '../types.js';
import { gridCheckSize, gridSnap, type GridOptions } from './grid-size-limit.js';

/**
 * Checks that a cell size is a positive, finite number of metres.
 *
 * @param cellSize the value to check
 * @returns nothing
 * @throws CoreError INVALID_CELL_SIZE
 * @example
 * gridCheckCellSize(50); // ok
 */
export function gridCheckCellSize(cellSize: number): void {
  if (typeof cellSize !== 'number' || !Number.isFinite(cellSize) || cellSize <= 0) {
    throw new CoreError('INVALID_CELL_SIZE', `cell size must be a positive number of metres (got ${String(cellSize)})`, 'cellSize');
  }
}

/**
 * A grid covering an extent, snapped outward to whole cells (aligned to multiples of the cell size
 * unless `align: false`). A degenerate extent (one point) gives a 1 × 1 grid.
 *
 * @param extent planar metres, finite, min ≤ max
 * @param cellSize metres, > 0
 * @param options `maxCells` (default 4,000,000), `align` (default true)
 * @returns the grid spec
 * @throws CoreError INVALID_EXTENT, INVALID_CELL_SIZE, GRID_TOO_LARGE
 * @example
 * gridFromExtent({ minX: 10, minY: 0, maxX: 95, maxY: 40 }, 20); // { originX: 0, originY: 0, cellSize: 20, width: 5, height: 2 }
 */
export function gridFromExtent(extent: Extent, cellSize: number, options: GridOptions = {}): GridSpec {
  const { minX, minY, maxX, maxY } = extent;
  if (![minX, minY, maxX, maxY].every((v) => typeof v === 'number' && Number.isFinite(v))) {
    throw new CoreError('INVALID_EXTENT', `extent must have finite minX, minY, maxX, maxY in metres (got ${JSON.stringify(extent)})`, 'extent');
  }
  if (minX > maxX || minY > maxY) {
    throw new CoreError('INVALID_EXTENT', `extent must have minX ≤ maxX and minY ≤ maxY (got ${JSON.stringify(extent)}); swap the bounds`, 'extent');
  }
  gridCheckCellSize(cellSize);
  const spec = gridSnap(extent, cellSize, options.align ?? true);
  gridCheckSize(spec, extent, options);
  return spec;
}
