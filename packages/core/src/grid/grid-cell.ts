import type { GridSpec } from '../types.js';

/**
 * The planar centre of cell (i, j); j = 0 is the southern row.
 *
 * @param spec the grid
 * @param i column, 0 at the west
 * @param j row, 0 at the south
 * @returns [x, y] metres
 * @example
 * gridCellCenter({ originX: 0, originY: 0, cellSize: 10, width: 3, height: 3 }, 1, 2); // [15, 25]
 */
export function gridCellCenter(spec: GridSpec, i: number, j: number): [number, number] {
  return [spec.originX + (i + 0.5) * spec.cellSize, spec.originY + (j + 0.5) * spec.cellSize];
}

/**
 * The row-major index (i + j·width) of the cell containing a planar point, or -1 outside the grid.
 * Cells are half-open: [originX + i·cellSize, originX + (i+1)·cellSize).
 *
 * @param spec the grid
 * @param x metres
 * @param y metres
 * @returns the cell index or -1
 * @example
 * gridCellIndexAt({ originX: 0, originY: 0, cellSize: 10, width: 3, height: 3 }, 15, 25); // 7
 */
export function gridCellIndexAt(spec: GridSpec, x: number, y: number): number {
  const i = Math.floor((x - spec.originX) / spec.cellSize);
  const j = Math.floor((y - spec.originY) / spec.cellSize);
  if (!(i >= 0 && i < spec.width && j >= 0 && j < spec.height)) return -1;
  return i + j * spec.width;
}
