import { CoreError } from '../errors.js';

/** Point × cell products per credit: 1e6 customers on a 1000 × 1000 grid cost ⌈1e12 / 3e9⌉ = 334 credits. */
export const CREDIT_POINT_CELLS = 3e9;

/** Description of {@link surfaceCreditCost} for the estimate shown before a run. */
export const CREDIT_COST_FORMULA = 'credits = max(1, ⌈customers × grid cells ÷ 3,000,000,000⌉)';

/**
 * Credits a demand surface costs: one credit per 3·10⁹ customer × cell products, at least one.
 * The product follows the direct sum's work (every customer near every cell) and is what the
 * user controls (file size, study area, cell size), so the price is known before the run:
 * 10,000 customers on 100,000 cells cost 1 credit, 100,000 on a 500 × 500 grid 9,
 * 1,000,000 on 1000 × 1000 cells 334.
 *
 * @param points number of customer points (whole number ≥ 0)
 * @param cells number of grid cells (whole number ≥ 1)
 * @returns whole credits ≥ 1
 * @throws CoreError INVALID_ARGUMENT for negative, fractional or non-finite counts
 * @example
 * surfaceCreditCost(100_000, 250_000); // 9
 */
export function surfaceCreditCost(points: number, cells: number): number {
  if (!(Number.isInteger(points) && points >= 0)) {
    throw new CoreError('INVALID_ARGUMENT', `points must be a whole number ≥ 0 (got ${String(points)})`, 'points');
  }
  if (!(Number.isInteger(cells) && cells >= 1)) {
    throw new CoreError('INVALID_ARGUMENT', `cells must be a whole number ≥ 1 (got ${String(cells)})`, 'cells');
  }
  return Math.max(1, Math.ceil((points * cells) / CREDIT_POINT_CELLS));
}
