import { densityContours, densitySurface } from '@demandscape/core';
import type { SurfaceResolved, SurfaceThreshold } from './surface.entity.js';
import { surfacePlan } from './surface-plan.js';
import type { SurfaceParams } from './surface.schemas.js';

/** What a finished run stores. */
export interface SurfaceComputeResult {
  resolved: SurfaceResolved;
  /** Weight per km², row-major, j = 0 south; NaN outside the study area. */
  raster: Float32Array;
  width: number;
  height: number;
  stats: Record<string, unknown>;
  thresholds: SurfaceThreshold[];
  contours: Record<string, unknown>;
  timings: Record<string, number>;
}

function seconds(start: number): number {
  return Number(((performance.now() - start) / 1000).toFixed(3));
}

/**
 * The whole run on customer points: plan (project, bandwidth, grid) → `densitySurface` (method,
 * adaptive, mask, edge correction) → 50/75/90 % percent-volume contours in lon/lat. Pure: runs in
 * a worker thread; no database.
 *
 * @param lon longitudes, degrees
 * @param lat latitudes, degrees
 * @param w weights ≥ 0
 * @param params the run's parameters
 * @param onProgress receives 0–1 during the density sum
 * @returns resolved parameters, Float32 raster, stats, thresholds, contours and timings
 * @throws CoreError for bad input (e.g. GRID_TOO_LARGE)
 * @example
 * const r = surfaceCompute(lon, lat, w, params, (f) => console.log(f));
 */
export function surfaceCompute(
  lon: Float64Array,
  lat: Float64Array,
  w: Float64Array,
  params: SurfaceParams,
  onProgress?: (fraction: number) => void,
): SurfaceComputeResult {
  const plan = surfacePlan(lon, lat, w, params);
  const timings = { ...plan.timings };
  let t = performance.now();
  const surface = densitySurface(plan.points, plan.grid, {
    kernel: plan.kernel,
    bandwidth: plan.bandwidth.value,
    method: plan.method,
    adaptive: params.adaptive,
    mask: plan.mask,
    edgeCorrection: params.edgeCorrection,
    onProgress,
  });
  timings.density = seconds(t);

  t = performance.now();
  const { levels, geojson } = densityContours(surface.intensity, plan.grid, [50, 75, 90], plan.converter);
  timings.contours = seconds(t);

  const raster = new Float32Array(surface.intensity.length);
  for (let c = 0; c < raster.length; c++) raster[c] = plan.mask && plan.mask[c] === 0 ? Number.NaN : surface.intensity[c];
  const [maxLon, maxLat] = plan.converter.inversePoint(surface.stats.maxCell.x, surface.stats.maxCell.y);
  const s = surface.stats;
  return {
    resolved: {
      bandwidth: plan.bandwidth,
      cellSize: plan.cellSize,
      grid: { ...plan.grid },
      projection: plan.projection,
      method: surface.method,
    },
    raster,
    width: plan.grid.width,
    height: plan.grid.height,
    stats: {
      pointCount: s.pointCount,
      totalWeight: s.totalWeight,
      contributingPoints: s.contributingPoints,
      integral: s.integral,
      max: s.max,
      maxAt: { lon: maxLon, lat: maxLat },
      kernel: s.kernel,
      bandwidth: s.bandwidth,
      cellSize: s.cellSize,
      width: s.width,
      height: s.height,
      oversample: s.oversample,
      adaptive: s.adaptive,
      edgeCorrection: s.edgeCorrection,
      method: surface.method,
    },
    thresholds: levels.map((l) => ({ percent: l.percent, threshold: l.threshold, areaKm2: l.area_m2 / 1e6, clipped: l.clipped })),
    contours: geojson as unknown as Record<string, unknown>,
    timings,
  };
}
