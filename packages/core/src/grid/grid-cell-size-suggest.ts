import { KDE_BINNED_MAX_CELL_FRACTION, KDE_SUGGESTED_CELL_FRACTION } from '../kde/kde-cell-rule.js';
import { CoreError } from '../errors.js';
import { kernelByName } from '../kernels/kernels.js';
import { formatMetres, formatNumber } from '../lib/format-number.js';
import { niceFloor } from '../lib/nice-number.js';
import type { Extent, KernelName } from '../types.js';
import { GRID_MAX_CELLS, gridCellSizeToFit, gridSnap, type GridOptions } from './grid-size-limit.js';

/** A suggested cell size with the one-line reason the UI shows beside it. */
export interface CellSizeSuggestion {
  /** Metres. */
  value: number;
  explanation: string;
}

/**
 * Suggests a cell size from the bandwidth: the KDE engine's accuracy fraction × h
 * (`KDE_SUGGESTED_CELL_FRACTION`), rounded down to a round number (1, 2, 2.5 or 5 × 10^k m).
 * With an extent, the value is raised when the grid would exceed the cell limit, and the
 * explanation says so.
 *
 * @param kernel kernel name
 * @param bandwidth h in metres (sd for the Gaussian, radius otherwise), > 0
 * @param extent optional study extent in planar metres (already padded)
 * @param options `maxCells` (default 4,000,000), `align` (default true)
 * @returns `{ value, explanation }`
 * @throws CoreError INVALID_BANDWIDTH, INVALID_ARGUMENT (unknown kernel)
 * @example
 * gridCellSizeSuggest('quartic', 2500); // { value: 50, explanation: '50 m: …' }
 */
export function gridCellSizeSuggest(
  kernel: KernelName,
  bandwidth: number,
  extent?: Extent,
  options: GridOptions = {},
): CellSizeSuggestion {
  const k = kernelByName(kernel);
  if (typeof bandwidth !== 'number' || !Number.isFinite(bandwidth) || bandwidth <= 0) {
    throw new CoreError('INVALID_BANDWIDTH', `bandwidth must be a positive number of metres (got ${String(bandwidth)})`, 'bandwidth');
  }
  const fraction = KDE_SUGGESTED_CELL_FRACTION[kernel];
  const value = niceFloor(fraction * bandwidth);
  const hText = `${formatMetres(bandwidth)} ${k.compact ? 'radius' : 'standard deviation'}`;
  const binned = KDE_BINNED_MAX_CELL_FRACTION[kernel] >= fraction;
  let explanation = binned
    ? `${formatMetres(value)}: at most ${formatNumber(fraction, 3)} × the ${hText}, so the fast binned surface stays within 0.1 % of the exact sum (rounded down to a round number)`
    : `${formatMetres(value)}: about ${formatNumber(1 / fraction)} cells per ${hText}, fine enough to show the kernel's shape (this kernel is summed exactly; rounded down to a round number)`;
  if (extent) {
    const maxCells = options.maxCells ?? GRID_MAX_CELLS;
    const align = options.align ?? true;
    const g = gridSnap(extent, value, align);
    if (g.width * g.height > maxCells) {
      const fit = gridCellSizeToFit(extent, maxCells, align);
      explanation = `${formatMetres(fit)}: raised from ${formatMetres(value)} so the study area fits the ${formatNumber(maxCells)}-cell limit; the surface is coarser than the accuracy target (${formatNumber(fraction, 3)} × the ${hText}) — use a smaller study area for full detail`;
      return { value: fit, explanation };
    }
  }
  return { value, explanation };
}
