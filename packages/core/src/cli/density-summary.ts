import { kernelByName } from '../kernels/kernels.js';
import { formatMetres, formatNumber } from '../lib/format-number.js';
import type { DensityContours } from '../pipeline/density-contours.js';
import type { DensityPlanarResult } from '../pipeline/density-from-planar.js';

/** The decision caution shown wherever a surface may feed a real-estate decision. */
export const DECISION_CAUTION =
  'The surface is an estimate from a sample of customers; check leases, zoning and local rules with licensed professionals before deciding on a site.';

/** Facts for the summary that the pipeline result does not hold. */
export interface SummaryContext {
  /** e.g. "UTM zone 24N (EPSG:32624)" or "planar metres (EPSG:27700)". */
  crs: string;
  /** Peak location in the input's units, already formatted. */
  peakAt: string;
  contours: DensityContours;
  seconds: number;
  written: string[];
}

function percent(v: number): string {
  return `${formatNumber(100 * v, 1)} %`;
}

/**
 * The end-of-run summary for stderr: points, kernel, bandwidth with its rule and the equivalent
 * other figure, cell size, grid, method, peak, contour thresholds, time and files written.
 *
 * @param r the pipeline result
 * @param ctx CRS label, peak location, contours, time, files
 * @returns lines ending in a newline
 * @example
 * io.err(densitySummary(result, { crs, peakAt, contours, seconds, written }));
 */
export function densitySummary(r: DensityPlanarResult, ctx: SummaryContext): string {
  const s = r.surface.stats;
  const k = kernelByName(s.kernel);
  const b = r.bandwidth;
  const hWord = k.compact ? 'radius' : 'standard deviation';
  const other = k.compact
    ? `kernel sd ${formatMetres(b.kernelSd)}; ≈ Gaussian sd ${formatMetres(b.equivalent.value)}`
    : `≈ quartic radius ${formatMetres(b.equivalent.value)}`;
  const method = r.surface.method === 'binned' ? 'binned (linear binning + FFT convolution)' : 'exact (direct sum over every point)';
  const levels =
    ctx.contours.levels.length === 0
      ? 'none — the grid holds no demand (is --extent away from the customers?)'
      : ctx.contours.levels.map((l) => `${l.percent} % ≥ ${formatNumber(l.threshold, 2)}${l.clipped ? ' (cut by the grid edge)' : ''}`).join(', ');
  const lines = [
    `demandscape density: ${formatNumber(s.pointCount)} points, total weight ${formatNumber(s.totalWeight, 2)}`,
    `  kernel      ${s.kernel} — ${k.label}`,
    `  bandwidth   ${formatMetres(b.value)} ${hWord} (${other}) — ${b.rule}: ${b.explanation}`,
    `  cell size   ${formatMetres(r.cellSize.value)} — ${r.cellSize.explanation}`,
    `  grid        ${formatNumber(s.width)} × ${formatNumber(s.height)} = ${formatNumber(s.width * s.height)} cells, ${ctx.crs}`,
    `  method      ${method}${s.oversample > 1 ? `, cell means on a ${s.oversample} × ${s.oversample} sub-grid (kernel narrow for the cell)` : ''}`,
    `  peak        ${formatNumber(s.max, 2)} per km² at ${ctx.peakAt}`,
    `  on the grid ${percent(s.integral / s.totalWeight)} of the total weight (${formatNumber(s.contributingPoints)} points reach it)`,
    `  contours    percent-volume thresholds per km²: ${levels}`,
    `  time        ${ctx.seconds.toFixed(2)} s`,
  ];
  if (ctx.written.length > 0) lines.push(`  wrote       ${ctx.written.join(', ')}`);
  lines.push(`  ${DECISION_CAUTION}`);
  return `${lines.join('\n')}\n`;
}
