import type { GridSpec, PlanarPoints } from '../types.js';

/**
 * Linear binning (Wand 1994, "Fast computation of multivariate kernel estimators", JCGS 3:433–445;
 * Fan & Marron 1994): each weight is split over the 4 surrounding lattice nodes with bilinear
 * weights, so the binned lattice keeps every point's mass and its centre of gravity.
 *
 * The lattice nodes are the grid's cell centres extended by `pad` nodes on every side, so that
 * points just outside the grid still reach the cells they would in the exact sum. Node (a, b)
 * sits on cell (a − pad, b − pad); the result is stored with row length `rowLength` (the FFT
 * width) to be convolved in place. A point that is not between two nodes on both axes lies at
 * least `pad` cells from every cell centre, beyond the kernel's reach when pad ≥ the stencil
 * radius, and is left out — the exact sum gives it no weight either.
 *
 * @param points planar points (metres)
 * @param spec the grid whose cell centres are the nodes
 * @param pad extra nodes on each side
 * @param rowLength row length of `out` (≥ width + 2·pad)
 * @param out destination, zero-filled, at least (height + 2·pad)·rowLength values
 * @returns total weight that landed on the lattice
 * @example
 * const lattice = new Float64Array(px * py);
 * kdeLinearBinning(points, spec, 50, px, lattice);
 */
export function kdeLinearBinning(
  points: PlanarPoints,
  spec: GridSpec,
  pad: number,
  rowLength: number,
  out: Float64Array,
): number {
  const { x, y, w } = points;
  const { originX, originY, cellSize } = spec;
  const lastX = spec.width + 2 * pad - 1;
  const lastY = spec.height + 2 * pad - 1;
  const inv = 1 / cellSize;
  let kept = 0;
  for (let k = 0; k < x.length; k++) {
    const wk = w[k];
    if (wk === 0) continue;
    const gx = (x[k] - originX) * inv - 0.5 + pad;
    const gy = (y[k] - originY) * inv - 0.5 + pad;
    const a = Math.floor(gx);
    const b = Math.floor(gy);
    if (a < 0 || b < 0 || a >= lastX || b >= lastY) continue;
    const fx = gx - a;
    const fy = gy - b;
    const c = a + b * rowLength;
    const w0 = wk * (1 - fy);
    const w1 = wk * fy;
    out[c] += w0 * (1 - fx);
    out[c + 1] += w0 * fx;
    out[c + rowLength] += w1 * (1 - fx);
    out[c + rowLength + 1] += w1 * fx;
    kept += wk;
  }
  return kept;
}
