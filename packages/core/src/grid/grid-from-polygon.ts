import { CoreError } from '../errors.js';
import type { GridSpec, PlanarPolygon } from '../types.js';
import { gridCheckCellSize } from './grid-from-extent.js';
import { gridPolygonMask, polygonsExtent } from './grid-polygon-mask.js';
import { gridCheckSize, gridSnap, type GridOptions } from './grid-size-limit.js';

/**
 * A grid over a study area polygon (or several, e.g. a coast with islands) with a mask of the
 * cells whose centre lies inside (holes excluded). The grid covers the outer rings' extent,
 * snapped outward to whole cells, and may be padded.
 *
 * @param polygon one polygon (outer ring, then holes) or a list of polygons, planar metres
 * @param cellSize metres, > 0
 * @param options `maxCells`, `align`, `padding` (metres added on every side, default 0)
 * @returns the grid spec and `mask` (1 inside, 0 outside; index i + j·width) with `insideCells`
 * @throws CoreError INVALID_POLYGON, INVALID_CELL_SIZE, GRID_TOO_LARGE
 * @example
 * const { spec, mask } = gridFromPolygon([[[0, 0], [1000, 0], [1000, 800], [0, 800]]], 50);
 */
export function gridFromPolygon(
  polygon: PlanarPolygon | PlanarPolygon[],
  cellSize: number,
  options: GridOptions & { padding?: number } = {},
): { spec: GridSpec; mask: Uint8Array; insideCells: number } {
  const polygons = isPolygonList(polygon) ? polygon : [polygon];
  const ext = polygonsExtent(polygons);
  gridCheckCellSize(cellSize);
  const pad = options.padding ?? 0;
  if (typeof pad !== 'number' || !Number.isFinite(pad) || pad < 0) {
    throw new CoreError('INVALID_ARGUMENT', `padding must be a number of metres ≥ 0 (got ${String(pad)})`, 'padding');
  }
  const extent = { minX: ext.minX - pad, minY: ext.minY - pad, maxX: ext.maxX + pad, maxY: ext.maxY + pad };
  const spec = gridSnap(extent, cellSize, options.align ?? true);
  gridCheckSize(spec, extent, options);
  const mask = gridPolygonMask(polygons, spec);
  let insideCells = 0;
  for (let k = 0; k < mask.length; k++) insideCells += mask[k];
  return { spec, mask, insideCells };
}

function isPolygonList(p: PlanarPolygon | PlanarPolygon[]): p is PlanarPolygon[] {
  // A polygon's first ring's first vertex is [x, y]; a list's is a ring.
  return Array.isArray(p) && Array.isArray(p[0]) && Array.isArray(p[0][0]) && Array.isArray((p[0][0] as unknown[])[0]);
}
