import { CoreError } from '../errors.js';
import { formatMetres, formatNumber } from '../lib/format-number.js';
import type { Extent, GridSpec } from '../types.js';

/** Default most cells a grid may have: 4,000,000 float64 cells are 32 MB per surface. */
export const GRID_MAX_CELLS = 4_000_000;

/** Options shared by the grid constructors. */
export interface GridOptions {
  /** Most cells allowed (default {@link GRID_MAX_CELLS}). */
  maxCells?: number;
  /**
   * Snap the grid's edges to whole multiples of the cell size (default true), so surfaces of the
   * same study at the same cell size share cell boundaries.
   */
  align?: boolean;
}

/**
 * The grid covering an extent at a cell size, snapped outward to whole cells. No limit check.
 *
 * @param extent planar metres, min ≤ max
 * @param cellSize metres, > 0
 * @param align snap edges to multiples of the cell size
 * @returns the grid spec (at least 1 × 1)
 * @example
 * gridSnap({ minX: 10, minY: 0, maxX: 95, maxY: 40 }, 20, true); // origin (0, 0), 5 × 2
 */
export function gridSnap(extent: Extent, cellSize: number, align: boolean): GridSpec {
  const c = cellSize;
  // A relative 1e-9 slack stops round-off from adding a whole column at exact multiples.
  const eps = 1e-9;
  let originX = align ? Math.floor(extent.minX / c + eps) * c : extent.minX;
  let originY = align ? Math.floor(extent.minY / c + eps) * c : extent.minY;
  // The slack must never leave the extent's minimum outside the grid.
  if (originX > extent.minX) originX -= c;
  if (originY > extent.minY) originY -= c;
  let width = Math.max(1, Math.ceil((extent.maxX - originX) / c - eps));
  let height = Math.max(1, Math.ceil((extent.maxY - originY) / c - eps));
  if (originX + width * c < extent.maxX) width++;
  if (originY + height * c < extent.maxY) height++;
  return { originX, originY, cellSize: c, width, height };
}

/**
 * The smallest cell size (two significant digits) whose snapped grid over the extent fits the limit.
 *
 * @param extent planar metres
 * @param maxCells the cell limit
 * @param align as in {@link gridSnap}
 * @returns metres
 * @example
 * gridCellSizeToFit({ minX: 0, minY: 0, maxX: 150_000, maxY: 150_000 }, 4_000_000, true); // 75
 */
export function gridCellSizeToFit(extent: Extent, maxCells: number, align: boolean): number {
  const w = Math.max(extent.maxX - extent.minX, 0);
  const h = Math.max(extent.maxY - extent.minY, 0);
  let c = Math.sqrt((w * h) / maxCells) || Math.max(w, h) / maxCells || 1;
  const p = Math.pow(10, Math.floor(Math.log10(c)) - 1);
  c = Math.ceil(c / p - 1e-9) * p;
  for (let k = 0; k < 1000; k++) {
    const g = gridSnap(extent, c, align);
    if (g.width * g.height <= maxCells) return Number(c.toPrecision(12));
    c += p;
  }
  return Number(c.toPrecision(12));
}

/**
 * Fails fast with GRID_TOO_LARGE when a grid exceeds the cell limit; the message names a cell size
 * that fits and `details.suggestedCellSize` carries it.
 *
 * @param spec the grid about to be built
 * @param extent the extent it covers (to compute the fitting cell size)
 * @param options `maxCells`, `align`
 * @returns nothing
 * @throws CoreError GRID_TOO_LARGE
 * @example
 * gridCheckSize(spec, extent, { maxCells: 4_000_000 });
 */
export function gridCheckSize(spec: GridSpec, extent: Extent, options: GridOptions = {}): void {
  const maxCells = options.maxCells ?? GRID_MAX_CELLS;
  if (!(Number.isInteger(maxCells) && maxCells > 0)) {
    throw new CoreError('INVALID_ARGUMENT', `maxCells must be a positive whole number (got ${maxCells})`, 'maxCells');
  }
  const cells = spec.width * spec.height;
  if (cells <= maxCells) return;
  const suggested = gridCellSizeToFit(extent, maxCells, options.align ?? true);
  throw new CoreError(
    'GRID_TOO_LARGE',
    `a ${formatNumber(spec.width)} × ${formatNumber(spec.height)} grid at ${formatMetres(spec.cellSize)} cells has ${formatNumber(cells)} cells, which exceeds the ${formatNumber(maxCells)}-cell limit; a cell size of ${formatMetres(suggested)} or more fits (or use a smaller study area)`,
    'cellSize',
    { cells, maxCells, suggestedCellSize: suggested },
  );
}
