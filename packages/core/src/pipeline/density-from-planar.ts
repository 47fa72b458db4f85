import { bandwidthByRule } from '../bandwidth/bandwidth-by-rule.js';
import { pointsExtent } from '../points/points-extent.js';
import type { BandwidthRule } from '../bandwidth/bandwidth-result.js';
import { CoreError } from '../errors.js';
import { gridCellSizeSuggest } from '../grid/grid-cell-size-suggest.js';
import { gridFromExtent } from '../grid/grid-from-extent.js';
import { gridFromPoints } from '../grid/grid-from-points.js';
import { densitySurface, type DensitySurface } from '../kde/density-surface.js';
import { kernelBandwidthConvert, kernelByName, kernelReach, kernelSd } from '../kernels/kernels.js';
import { formatMetres } from '../lib/format-number.js';
import type { Extent, GridSpec, KernelName, PlanarPoints } from '../types.js';

/** Options of the density pipeline; everything has a default. */
export interface DensityPipelineOptions {
  /** Default 'quartic'. */
  kernel?: KernelName;
  /** Metres (radius for compact kernels, sd for the Gaussian) or a rule name; default 'normal-reference'. */
  bandwidth?: number | BandwidthRule;
  /** Metres; default suggested from the bandwidth (`gridCellSizeSuggest`). */
  cellSize?: number;
  /** Study extent in planar metres; default the points' extent padded by the kernel's reach. */
  extent?: Extent;
  /** Default 'auto'. */
  method?: 'exact' | 'binned' | 'auto';
  /** Cell limit (default the grid module's 4,000,000). */
  maxCells?: number;
  signal?: AbortSignal;
  onProgress?: (fraction: number) => void;
}

/** The bandwidth used, in the kernel's convention, with the equivalent figures and the reason. */
export interface PipelineBandwidth {
  /** Metres: radius for compact kernels, sd for the Gaussian. */
  value: number;
  rule: BandwidthRule | 'manual';
  explanation: string;
  /** The kernel's own sd per axis, h·√μ₂ (metres). */
  kernelSd: number;
  /** The canonically equivalent Gaussian sd (compact kernels) or quartic radius (Gaussian), metres. */
  equivalent: { kernel: KernelName; value: number };
}

/** What the planar stage hands back. */
export interface DensityPlanarResult {
  grid: GridSpec;
  surface: DensitySurface;
  bandwidth: PipelineBandwidth;
  cellSize: { value: number; explanation: string };
}

function bandwidthManual(kernel: KernelName, h: number): PipelineBandwidth {
  if (!(h > 0 && Number.isFinite(h))) {
    throw new CoreError('INVALID_BANDWIDTH', `bandwidth must be a positive number of metres (got ${h})`, 'bandwidth');
  }
  const k = kernelByName(kernel);
  const eqKernel: KernelName = k.compact ? 'gaussian' : 'quartic';
  return {
    value: h,
    rule: 'manual',
    explanation: `${formatMetres(h)} ${k.compact ? 'radius' : 'standard deviation'}, set by hand`,
    kernelSd: kernelSd(kernel, h),
    equivalent: { kernel: eqKernel, value: kernelBandwidthConvert(h, kernel, eqKernel) },
  };
}

/**
 * Builds a demand surface from planar points (metres): bandwidth (by hand or by rule) → cell size
 * (suggested unless given) → grid (extent given, or the points padded by the kernel's reach) →
 * `densitySurface`.
 *
 * @param points planar points in metres with weights ≥ 0
 * @param options kernel, bandwidth, cell size, extent, method, cell limit, signal, progress
 * @returns grid, surface, bandwidth and cell size with explanations
 * @throws CoreError from any stage (bad bandwidth, GRID_TOO_LARGE, …)
 * @example
 * const { surface, grid } = densityFromPlanar(points, { kernel: 'quartic', bandwidth: 'normal-reference' });
 */
export function densityFromPlanar(points: PlanarPoints, options: DensityPipelineOptions = {}): DensityPlanarResult {
  const kernel = options.kernel ?? 'quartic';
  const k = kernelByName(kernel);
  const requested = options.bandwidth ?? 'normal-reference';
  let bandwidth: PipelineBandwidth;
  if (typeof requested === 'number') {
    bandwidth = bandwidthManual(kernel, requested);
  } else {
    const r = bandwidthByRule(points, kernel, requested);
    const eqKernel: KernelName = k.compact ? 'gaussian' : 'quartic';
    bandwidth = {
      value: r.value,
      rule: r.rule,
      explanation: r.explanation,
      kernelSd: r.kernelSd,
      equivalent: { kernel: eqKernel, value: kernelBandwidthConvert(r.value, kernel, eqKernel) },
    };
  }
  const h = bandwidth.value;
  const gridOptions = { maxCells: options.maxCells };
  let cellSize: { value: number; explanation: string };
  if (options.cellSize !== undefined) {
    cellSize = { value: options.cellSize, explanation: `${formatMetres(options.cellSize)}, set by hand` };
  } else {
    const pad = kernelReach(kernel, h);
    const extent = options.extent ?? pointsExtent(points, pad);
    cellSize = gridCellSizeSuggest(kernel, h, extent, gridOptions);
  }
  const grid = options.extent
    ? gridFromExtent(options.extent, cellSize.value, gridOptions)
    : gridFromPoints(points, cellSize.value, kernelReach(kernel, h), gridOptions);
  const surface = densitySurface(points, grid, {
    kernel,
    bandwidth: h,
    method: options.method ?? 'auto',
    signal: options.signal,
    onProgress: options.onProgress,
  });
  return { grid, surface, bandwidth, cellSize };
}
