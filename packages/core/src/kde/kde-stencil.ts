import type { Kernel } from '../kernels/kernels.js';

/**
 * The kernel discretised on the cell lattice — the one object both the exact sum and the
 * binned FFT evaluate, so the two methods differ only by the binning of the points.
 *
 * Sampling. By default K_h is sampled at cell-centre offsets (dx·δ, dy·δ) and NOT renormalised:
 * renormalising would pull the surface away from the true λ̂ at the cell centres. That is sound
 * while the lattice resolves the kernel. When the kernel is narrow against the cell (or has a
 * jump, like the uniform disc), point samples no longer carry the kernel's mass — a quartic with
 * h = δ has only its centre sample, Σ K_h·δ² = 0.955, and at h = δ/2 it would be 3.8. Then each
 * stencil value becomes the MEAN of K_h over the cell, taken on an s × s sub-lattice with s the
 * smallest oversampling that brings the stencil's mass Σ K·δ² within {@link STENCIL_MASS_TOLERANCE}
 * of 1 (capped at {@link STENCIL_MAX_OVERSAMPLE}). The surface then reports each cell's mean
 * intensity, which keeps the demand total right however narrow the kernel is.
 */

/** Allowed |Σ stencil·δ² − 1| before switching to cell means [CP: 0.1 % of the demand total]. */
export const STENCIL_MASS_TOLERANCE = 1e-3;

/**
 * Relative shrink of the kernel's reach (squared) so a cell at exactly the support radius counts
 * as outside however the distance rounds; contributor counts must not depend on round-off.
 */
export const REACH_SQ_SHRINK = 1 - 1e-12;

/** Largest sub-lattice per axis for cell means (64² = 4,096 kernel samples per cell). */
export const STENCIL_MAX_OVERSAMPLE = 64;

export interface KernelStencil {
  /** Radius in cells: values exist for offsets −radius … radius on each axis. */
  readonly radius: number;
  /** (2·radius + 1)² values of K_h in weight per m² per unit weight, row-major, centre at (radius, radius). */
  readonly values: Float64Array;
  /** Sub-samples per axis and cell: 1 = point values at cell centres, s > 1 = cell means. */
  readonly oversample: number;
  /** Σ values·δ², the share of a point's weight the lattice carries (1 up to the tolerance). */
  readonly mass: number;
}

/**
 * Offsets of the s × s sub-lattice inside a cell, in cells, centred on 0 (s = 1 gives [0]).
 *
 * @param s sub-samples per axis
 * @returns s offsets in (−0.5, 0.5)
 * @example
 * stencilSubOffsets(2); // [-0.25, 0.25]
 */
export function stencilSubOffsets(s: number): Float64Array {
  const o = new Float64Array(s);
  for (let p = 0; p < s; p++) o[p] = (p + 0.5) / s - 0.5;
  return o;
}

/**
 * The stencil's radius in cells for a bandwidth, cell size and oversampling.
 *
 * @param kernel the kernel
 * @param h bandwidth in metres
 * @param cellSize δ in metres
 * @param oversample sub-samples per axis (1 = point values)
 * @returns radius in cells; every sample beyond it is 0
 * @example
 * stencilRadius(kernelByName('quartic'), 2500, 50, 1); // 50
 */
export function stencilRadius(
  kernel: Kernel,
  h: number,
  cellSize: number,
  oversample: number,
): number {
  const reachCells = (kernel.reach * h) / cellSize;
  // Cell means look half a cell further than the centre sample.
  return Math.max(1, Math.ceil(oversample > 1 ? reachCells + 0.5 : reachCells));
}

function stencilAt(kernel: Kernel, h: number, cellSize: number, s: number): KernelStencil {
  const radius = stencilRadius(kernel, h, cellSize, s);
  const side = 2 * radius + 1;
  const values = new Float64Array(side * side);
  const sub = stencilSubOffsets(s);
  const step = cellSize / h;
  const norm = 1 / (h * h * s * s);
  const reach2 = kernel.reach * kernel.reach * REACH_SQ_SHRINK;
  let sum = 0;
  for (let dy = -radius; dy <= radius; dy++) {
    for (let dx = -radius; dx <= radius; dx++) {
      let acc = 0;
      for (let q = 0; q < s; q++) {
        const ry = (dy + sub[q]) * step;
        const ry2 = ry * ry;
        for (let p = 0; p < s; p++) {
          const rx = (dx + sub[p]) * step;
          const r2 = rx * rx + ry2;
          if (r2 < reach2) acc += kernel.valueSq(r2);
        }
      }
      const v = acc * norm;
      values[dx + radius + (dy + radius) * side] = v;
      sum += v;
    }
  }
  return { radius, values, oversample: s, mass: sum * cellSize * cellSize };
}

/**
 * The smallest oversampling whose stencil carries the kernel's mass within the tolerance.
 *
 * @param kernel the kernel
 * @param h bandwidth in metres
 * @param cellSize δ in metres
 * @returns the stencil (radius, values, oversampling, mass)
 * @example
 * kernelStencil(kernelByName('quartic'), 500, 50).oversample; // 1 (h = 10 cells)
 * kernelStencil(kernelByName('quartic'), 25, 50).oversample;  // > 1 (narrower than a cell)
 */
export function kernelStencil(kernel: Kernel, h: number, cellSize: number): KernelStencil {
  let best = stencilAt(kernel, h, cellSize, 1);
  if (Math.abs(best.mass - 1) <= STENCIL_MASS_TOLERANCE) return best;
  for (let s = 2; s <= STENCIL_MAX_OVERSAMPLE; s = s < 8 ? s + 1 : Math.ceil(s * 1.5)) {
    const next = stencilAt(kernel, h, cellSize, Math.min(s, STENCIL_MAX_OVERSAMPLE));
    if (Math.abs(next.mass - 1) < Math.abs(best.mass - 1)) best = next;
    if (Math.abs(best.mass - 1) <= STENCIL_MASS_TOLERANCE) break;
  }
  return best;
}
