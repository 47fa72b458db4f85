/**
 * Shared types of the engine. Units are in the names: metres for planar coordinates and
 * distances, degrees for lon/lat, km² for densities.
 */

/** Kernel names accepted everywhere (API, CLI, UI). */
export type KernelName =
  | 'quartic'
  | 'epanechnikov'
  | 'triweight'
  | 'uniform'
  | 'triangular'
  | 'gaussian';

export const KERNEL_NAMES: readonly KernelName[] = [
  'quartic',
  'epanechnikov',
  'triweight',
  'uniform',
  'triangular',
  'gaussian',
];

/**
 * Weighted points in a planar metric projection (metres). Structure of arrays so a million
 * points stay three typed arrays. `w` is ≥ 0 per point.
 */
export interface PlanarPoints {
  x: Float64Array;
  y: Float64Array;
  w: Float64Array;
}

/** Axis-aligned extent in planar metres (or in the input's units for the CLI's --planar). */
export interface Extent {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

/**
 * A regular raster grid in planar metres. Cell (i, j) has its centre at
 * (originX + (i + 0.5)·cellSize, originY + (j + 0.5)·cellSize) — j = 0 is the SOUTHERN row,
 * y grows northwards. Values are row-major, index i + j·width.
 */
export interface GridSpec {
  originX: number;
  originY: number;
  cellSize: number;
  width: number;
  height: number;
}

/** A planar polygon ring list: first ring is the outer boundary, the rest are holes; [x, y] metres. */
export type PlanarPolygon = Array<Array<[number, number]>>;

/** Which algorithm computed a surface. */
export type DensityMethod = 'exact' | 'binned';
