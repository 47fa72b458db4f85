import {
  bandwidthByRule,
  CoreError,
  densityMethodCost,
  gridCellSizeSuggest,
  gridFromPoints,
  gridFromPolygon,
  kernelBandwidthConvert,
  kernelByName,
  kernelReach,
  pointsExtent,
  kernelSd,
  pointsFromLonLat,
  pointsProject,
  polygonsExtent,
  projectionConverter,
  surfaceCreditCost,
  CREDIT_COST_FORMULA,
  type BandwidthRule,
  type GridSpec,
  type KernelName,
  type PlanarPoints,
  type PlanarPolygon,
  type ProjectionConverter,
} from '@demandscape/core';
import type { SurfaceResolved } from './surface.entity.js';
import type { SurfaceParams } from './surface.schemas.js';

/**
 * Smallest bandwidth (metres) for executive views and exports: California's "precise geolocation"
 * radius of 1,850 ft ≈ 564 m (Cal. Civ. Code §1798.140; DOMAIN.md §3).
 */
export const PRIVACY_MIN_BANDWIDTH_M = 564;

/** Everything decided before the density sum: projected points, bandwidth, grid, mask, cost. */
export interface SurfacePlan {
  points: PlanarPoints;
  converter: ProjectionConverter;
  projection: SurfaceResolved['projection'];
  kernel: KernelName;
  bandwidth: SurfaceResolved['bandwidth'];
  cellSize: SurfaceResolved['cellSize'];
  grid: GridSpec;
  /** Study-area cells (1 inside) when the study area is a polygon. */
  mask?: Uint8Array;
  method: 'exact' | 'binned';
  estimatedSeconds: number;
  cost: { credits: number; formula: string };
  warnings: string[];
  /** Seconds per stage. */
  timings: Record<string, number>;
}

function seconds(start: number): number {
  return Number(((performance.now() - start) / 1000).toFixed(3));
}

function polygonsPlanar(geometry: Extract<SurfaceParams['studyArea'], { type: 'polygon' }>['geometry'], converter: ProjectionConverter): PlanarPolygon[] {
  const polygons = geometry.type === 'Polygon' ? [geometry.coordinates] : geometry.coordinates;
  return polygons.map((rings) => rings.map((r) => r.map(([lon, lat]) => converter.forwardPoint(lon, lat))));
}

/** A plan without the typed arrays and functions: what crosses threads and what the estimate shows. */
export type SurfacePlanSummary = Omit<SurfacePlan, 'points' | 'converter' | 'mask'>;

/**
 * The summary of a plan (drops points, projection functions and mask).
 * @param plan from {@link surfacePlan}
 * @returns the plain-data part
 * @example
 * port.postMessage(surfacePlanSummary(plan));
 */
export function surfacePlanSummary(plan: SurfacePlan): SurfacePlanSummary {
  const { points: _p, converter: _c, mask: _m, ...rest } = plan;
  return rest;
}

/**
 * Plans a surface run from customer points and the form's parameters: validate and project the
 * points (UTM zone of the data), pick the bandwidth (rule or value), the cell size (given or
 * suggested), the grid (points padded by the kernel's reach, or the study-area polygon with its
 * mask), the method, the credit cost and warnings. The estimate endpoint returns this; the worker
 * continues with the density sum.
 *
 * @param lon longitudes, degrees
 * @param lat latitudes, degrees
 * @param w weights ≥ 0
 * @param params kernel, bandwidth, cell size, study area, edge correction, adaptive, method
 * @returns the plan
 * @throws CoreError (INVALID_POLYGON, GRID_TOO_LARGE with details.suggestedCellSize, PROJECTION_SPAN, …)
 * @example
 * const plan = surfacePlan(lon, lat, w, surfaceParamsSchema.parse({}));
 */
export function surfacePlan(lon: Float64Array, lat: Float64Array, w: Float64Array, params: SurfaceParams): SurfacePlan {
  const timings: Record<string, number> = {};
  let t = performance.now();
  const { points, projection } = pointsProject(pointsFromLonLat(lon, lat, w));
  const converter = projectionConverter(projection);
  timings.project = seconds(t);

  t = performance.now();
  const kernel = params.kernel as KernelName;
  const k = kernelByName(kernel);
  let bandwidth: SurfaceResolved['bandwidth'];
  if (params.bandwidth.mode === 'rule') {
    const r = bandwidthByRule(points, kernel, params.bandwidth.rule as BandwidthRule);
    bandwidth = { value: r.value, rule: r.rule, explanation: r.explanation, gaussianSd: r.gaussianSd, radius: kernelReach(kernel, r.value), kernelSd: r.kernelSd };
  } else {
    const h = params.bandwidth.value;
    bandwidth = {
      value: h,
      rule: 'manual',
      explanation: `${Math.round(h).toLocaleString('en-GB')} m ${k.compact ? 'radius' : 'standard deviation'}, set by hand`,
      gaussianSd: kernel === 'gaussian' ? h : kernelBandwidthConvert(h, kernel, 'gaussian'),
      radius: kernelReach(kernel, h),
      kernelSd: kernelSd(kernel, h),
    };
  }
  timings.bandwidth = seconds(t);

  t = performance.now();
  const h = bandwidth.value;
  let grid: GridSpec;
  let mask: Uint8Array | undefined;
  let cellSize: SurfaceResolved['cellSize'];
  if (params.studyArea.type === 'polygon') {
    const polygons = polygonsPlanar(params.studyArea.geometry, converter);
    cellSize =
      params.cellSize !== undefined
        ? { value: params.cellSize, explanation: `${params.cellSize} m, set by hand` }
        : gridCellSizeSuggest(kernel, h, polygonsExtent(polygons));
    const g = gridFromPolygon(polygons, cellSize.value);
    if (g.insideCells === 0) {
      throw new CoreError('INVALID_POLYGON', 'the study area polygon covers no grid cell; draw a larger area or choose a smaller cell size', 'studyArea');
    }
    grid = g.spec;
    mask = g.mask;
  } else {
    const reach = kernelReach(kernel, h);
    cellSize =
      params.cellSize !== undefined
        ? { value: params.cellSize, explanation: `${params.cellSize} m, set by hand` }
        : gridCellSizeSuggest(kernel, h, pointsExtent(points, reach));
    grid = gridFromPoints(points, cellSize.value, reach);
  }
  timings.grid = seconds(t);

  const n = points.x.length;
  const cost = densityMethodCost(n, grid, kernel, h, { adaptive: params.adaptive, edgeCorrection: params.edgeCorrection });
  const method = params.adaptive ? 'exact' : params.method === 'auto' ? cost.method : params.method;
  const estimatedSeconds = method === cost.method ? cost.seconds : method === 'binned' ? cost.binnedSeconds : cost.exactSeconds;
  const warnings: string[] = [];
  if (h < PRIVACY_MIN_BANDWIDTH_M) {
    warnings.push(
      `The bandwidth of ${Math.round(h)} m is below ${PRIVACY_MIN_BANDWIDTH_M} m: executive views and exports need at least ${PRIVACY_MIN_BANDWIDTH_M} m so single homes cannot be picked out.`,
    );
  }
  if (estimatedSeconds > 120) {
    warnings.push(`This run will take about ${Math.ceil(estimatedSeconds / 60)} minutes; a larger cell size or the binned method is faster.`);
  }
  if (params.method === 'binned' && !cost.binnedMeetsBound) {
    warnings.push('At this cell size the binned method may differ from the exact sum by more than 0.1 % of the peak; choose a smaller cell size or auto.');
  }
  return {
    points,
    converter,
    projection: { kind: projection.kind, epsg: projection.epsg, proj4: projection.proj4, label: projection.label },
    kernel,
    bandwidth,
    cellSize,
    grid,
    mask,
    method,
    estimatedSeconds,
    cost: { credits: surfaceCreditCost(n, grid.width * grid.height), formula: CREDIT_COST_FORMULA },
    warnings,
    timings,
  };
}
