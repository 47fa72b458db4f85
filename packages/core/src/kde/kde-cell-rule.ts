import type { KernelName } from '../types.js';

/**
 * Largest cell size, as a fraction of the bandwidth h, at which the binned FFT estimate stays
 * within 1e-3 × max(exact) of the exact sum. Measured [D] (kde-binned.test.ts re-checks it) on
 * clustered, uniform, edge, heavy-weight and single-point data; the worst case is always one point
 * midway between four cell centres, where the error is the bilinear-interpolation error of the
 * kernel at its peak: ≈ 0.25·(δ/h)² of the peak for the Gaussian, 1.0·(δ/h)² for quartic and
 * 1.5·(δ/h)² for triweight. Epanechnikov and triangular have a kink (error ≈ 0.45·δ/h and
 * 0.23·δ/h) and the uniform disc a jump (error ≈ 0.3–0.9 of the peak at any cell size): for
 * them binned would need cells of a few thousandths of h (or can never meet the bound), so
 * `densitySurface` computes them exactly.
 *
 * Measured worst relative error (single point midway between centres):
 * Gaussian 0.06 → 9.0e-4, 0.1 → 2.5e-3; quartic 0.03 → 9.0e-4, 0.06 → 3.6e-3;
 * triweight 0.025 → 9.4e-4, 0.05 → 3.7e-3; Epanechnikov 0.01 → 4.5e-3; triangular 0.01 → 2.3e-3;
 * uniform 0.01 → 0.91.
 */
export const KDE_BINNED_MAX_CELL_FRACTION: Record<KernelName, number> = {
  gaussian: 0.06,
  quartic: 0.03,
  triweight: 0.025,
  epanechnikov: 0.002,
  triangular: 0.004,
  uniform: 0,
};

/**
 * Suggested cell size as a fraction of the bandwidth h (cell = fraction × h; h is the sd for the
 * Gaussian and the support radius otherwise). For Gaussian, quartic and triweight it is the
 * largest cell at which binned meets 1e-3 × max(exact) (see {@link KDE_BINNED_MAX_CELL_FRACTION}).
 * For the kinked and jumping kernels the exact sum is used, which is exact at every cell centre
 * whatever the cell size, so the fraction only sets the resolution: 20 cells per radius [CP].
 *
 * @example
 * const cellSize = KDE_SUGGESTED_CELL_FRACTION.quartic * 2500; // 75 m
 */
export const KDE_SUGGESTED_CELL_FRACTION: Record<KernelName, number> = {
  gaussian: 0.06,
  quartic: 0.03,
  triweight: 0.025,
  epanechnikov: 0.05,
  triangular: 0.05,
  uniform: 0.05,
};

/**
 * Whether the binned estimate meets 1e-3 × max(exact) for this kernel, bandwidth and cell size.
 *
 * @param kernel kernel name
 * @param bandwidth h in metres
 * @param cellSize δ in metres
 * @returns true when δ / h ≤ the kernel's measured limit
 * @example
 * kdeBinnedMeetsBound('quartic', 2500, 50); // true (δ/h = 0.02 ≤ 0.03)
 */
export function kdeBinnedMeetsBound(
  kernel: KernelName,
  bandwidth: number,
  cellSize: number,
): boolean {
  return cellSize / bandwidth <= KDE_BINNED_MAX_CELL_FRACTION[kernel];
}
