import type { GridSpec } from '../types.js';

/**
 * The surface value at a planar point by bilinear interpolation between the four surrounding cell
 * centres. In the outer half-cell along the border the nearest centres' values are held constant;
 * outside the grid the result is NaN. A NaN cell with non-zero weight makes the result NaN.
 *
 * @param values row-major cell values (index i + j·width, j = 0 south)
 * @param spec the grid
 * @param x metres
 * @param y metres
 * @returns the interpolated value, or NaN outside the grid
 * @example
 * gridBilinearAt(Float64Array.of(0, 10), { originX: 0, originY: 0, cellSize: 10, width: 2, height: 1 }, 10, 5); // 5
 */
export function gridBilinearAt(values: ArrayLike<number>, spec: GridSpec, x: number, y: number): number {
  const { originX, originY, cellSize, width, height } = spec;
  if (!(x >= originX && x <= originX + width * cellSize && y >= originY && y <= originY + height * cellSize)) return NaN;
  // Continuous cell coordinates with centres at integers.
  const gx = Math.min(Math.max((x - originX) / cellSize - 0.5, 0), width - 1);
  const gy = Math.min(Math.max((y - originY) / cellSize - 0.5, 0), height - 1);
  const i0 = Math.min(Math.floor(gx), Math.max(width - 2, 0));
  const j0 = Math.min(Math.floor(gy), Math.max(height - 2, 0));
  const i1 = Math.min(i0 + 1, width - 1);
  const j1 = Math.min(j0 + 1, height - 1);
  const fx = gx - i0;
  const fy = gy - j0;
  // Terms with zero weight are skipped so a NaN neighbour does not spoil a point on a centre line.
  let s = 0;
  const add = (wt: number, v: number): void => {
    if (wt !== 0) s += wt * v;
  };
  add((1 - fx) * (1 - fy), values[i0 + j0 * width]);
  add(fx * (1 - fy), values[i1 + j0 * width]);
  add((1 - fx) * fy, values[i0 + j1 * width]);
  add(fx * fy, values[i1 + j1 * width]);
  return s;
}
