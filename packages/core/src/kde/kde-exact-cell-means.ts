import type { Kernel } from '../kernels/kernels.js';
import type { GridSpec, PlanarPoints } from '../types.js';
import { REACH_SQ_SHRINK, stencilSubOffsets } from './kde-stencil.js';

/**
 * The exact sum with cell means: each cell receives the mean of K_h over its s × s sub-samples
 * (see `kernelStencil`), for kernels too narrow or too jumpy for centre samples. Cost
 * n × (cells in reach) × s², affordable because this mode is only chosen for narrow kernels.
 *
 * @param points planar points
 * @param order visiting order of the points (see `kdePointOrder`)
 * @param from first position in `order`
 * @param to one past the last position
 * @param spec the grid
 * @param kernel the kernel
 * @param bandwidth h in metres, unless per-point bandwidths are given
 * @param bandwidths optional per-point h
 * @param mask optional study-area mask; cells outside are skipped
 * @param values λ̂ per m², added to
 * @param contributors optional distinct-point counts, added to
 * @param s sub-samples per cell and axis
 * @returns nothing
 * @example
 * cellMeansAdd(points, order, 0, n, spec, kernel, 20, undefined, undefined, values, undefined, 4);
 */
export function cellMeansAdd(
  points: PlanarPoints,
  order: Uint32Array,
  from: number,
  to: number,
  spec: GridSpec,
  kernel: Kernel,
  bandwidth: number,
  bandwidths: Float64Array | undefined,
  mask: Uint8Array | undefined,
  values: Float64Array,
  contributors: Uint32Array | undefined,
  s: number,
): void {
  const { x, y, w } = points;
  const { originX, originY, cellSize, width, height } = spec;
  const sub = stencilSubOffsets(s);
  const reach2 = kernel.reach * kernel.reach * REACH_SQ_SHRINK;
  for (let o = from; o < to; o++) {
    const k = order[o];
    const wk = w[k];
    if (wk === 0) continue;
    const h = bandwidths ? bandwidths[k] : bandwidth;
    const invH = 1 / h;
    const scale = (wk * invH * invH) / (s * s);
    const fx = (x[k] - originX) / cellSize - 0.5;
    const fy = (y[k] - originY) / cellSize - 0.5;
    // A cell's sub-samples reach half a cell beyond its centre.
    const rc = (kernel.reach * h) / cellSize + 0.5;
    const i0 = Math.max(0, Math.ceil(fx - rc));
    const i1 = Math.min(width - 1, Math.floor(fx + rc));
    const j0 = Math.max(0, Math.ceil(fy - rc));
    const j1 = Math.min(height - 1, Math.floor(fy + rc));
    const stepR = cellSize * invH;
    for (let j = j0; j <= j1; j++) {
      const row = j * width;
      for (let i = i0; i <= i1; i++) {
        const c = row + i;
        if (mask !== undefined && mask[c] === 0) continue;
        let acc = 0;
        for (let q = 0; q < s; q++) {
          const dy = (j + sub[q] - fy) * stepR;
          const dy2 = dy * dy;
          if (dy2 >= reach2) continue;
          for (let p = 0; p < s; p++) {
            const dx = (i + sub[p] - fx) * stepR;
            const r2 = dx * dx + dy2;
            if (r2 < reach2) acc += kernel.valueSq(r2);
          }
        }
        if (acc > 0) {
          values[c] += scale * acc;
          if (contributors !== undefined) contributors[c]++;
        }
      }
    }
  }
}
