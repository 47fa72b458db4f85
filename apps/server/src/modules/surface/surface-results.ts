import {
  gridBilinearAt,
  projectionConverter,
  rasterWebMercator,
  rasterWebMercatorLayout,
  rasterWebMercatorSample,
  type GridSpec,
  type LocalProjection,
  type ProjectionConverter,
} from '@demandscape/core';
import type { EntityManager } from '@mikro-orm/sqlite';
import { ConflictError, NotFoundError } from '../common/errors.js';
import { SurfaceRasterSchema, type Surface } from './surface.entity.js';
import { surfaceLoad, type SurfaceScope } from './surface.service.js';

/**
 * Demand per square mile from demand per km²: 1 mi = 1.609344 km exactly (NIST SP 811, B.8),
 * so 1 sq mi = 2.589988110336 km².
 */
export const KM2_PER_SQMI = 2.589988110336;

/** Multiplier from the stored per-km² values to the run's unit. */
export function surfaceUnitFactor(unit: 'km2' | 'sqmi'): number {
  return unit === 'sqmi' ? KM2_PER_SQMI : 1;
}

/** A succeeded run's grid and values (per km²) with its projection. */
export interface SurfaceGrid {
  surface: Surface;
  spec: GridSpec;
  values: Float32Array;
  converter: ProjectionConverter;
}

async function gridOf(em: EntityManager, surface: Surface): Promise<SurfaceGrid> {
  if (surface.status !== 'succeeded' || !surface.resolved) {
    throw new ConflictError('SURFACE_NOT_READY', `This surface is ${surface.status}; results exist once it has succeeded.`);
  }
  const raster = await em.findOne(SurfaceRasterSchema, { surface: surface.id, kind: 'intensity' }, { populate: ['data'] });
  if (!raster) throw new NotFoundError('Surface raster');
  // Copy into an aligned buffer: the blob may start at any byte offset.
  const bytes = new Uint8Array(raster.data.byteLength);
  bytes.set(raster.data);
  const values = new Float32Array(bytes.buffer);
  const p = surface.resolved.projection;
  const converter = projectionConverter({ ...p, centerLon: 0, centerLat: 0 } as LocalProjection);
  return { surface, spec: surface.resolved.grid, values, converter };
}

/**
 * A succeeded run's metric grid, for the result endpoints.
 * @param em entity manager
 * @param scope organization and workspace
 * @param surfaceId the run
 * @returns grid spec, Float32 values per km², projection converter
 * @throws ConflictError SURFACE_NOT_READY before success
 * @example
 * const g = await surfaceGridLoad(em, scope, id);
 */
export async function surfaceGridLoad(em: EntityManager, scope: SurfaceScope, surfaceId: string): Promise<SurfaceGrid> {
  return gridOf(em, await surfaceLoad(em, scope, surfaceId));
}

function scaled(values: Float32Array, factor: number): Float32Array {
  if (factor === 1) return values;
  const out = new Float32Array(values.length);
  for (let k = 0; k < values.length; k++) out[k] = values[k] * factor;
  return out;
}

/**
 * The surface reprojected onto a north-up Web Mercator pixel grid, in the run's unit.
 * @param g from {@link surfaceGridLoad}
 * @param maxSize largest side in pixels
 * @returns Float32 pixels (row 0 north; NaN = no data), size, corner bounds (lon/lat), max, unit
 * @example
 * const r = surfaceWebRaster(await surfaceGridLoad(em, scope, id), 1024);
 */
export function surfaceWebRaster(g: SurfaceGrid, maxSize: number) {
  const unit = g.surface.params.unit;
  const r = rasterWebMercator(scaled(g.values, surfaceUnitFactor(unit)), g.spec, g.converter, { maxSize });
  return { values: r.values, width: r.width, height: r.height, bounds: r.bounds, max: r.max, unit };
}

/**
 * Other minus this, both sampled on this surface's Web Mercator pixel grid, in this run's unit.
 * @param base this run's grid
 * @param other the compared run's grid (same workspace)
 * @param maxSize largest side in pixels
 * @returns the difference raster with its bounds, largest |difference| and unit
 * @example
 * const d = surfaceDifferenceRaster(a, b, 1024);
 */
export function surfaceDifferenceRaster(base: SurfaceGrid, other: SurfaceGrid, maxSize: number) {
  const unit = base.surface.params.unit;
  const factor = surfaceUnitFactor(unit);
  const layout = rasterWebMercatorLayout(base.spec, base.converter, maxSize);
  const a = rasterWebMercatorSample(layout, base.values, base.spec, base.converter);
  const b = rasterWebMercatorSample(layout, other.values, other.spec, other.converter);
  const out = new Float32Array(a.length);
  let max = 0;
  for (let k = 0; k < a.length; k++) {
    // Outside the other grid there is no demand from it: count it as 0, not as missing.
    const bv = Number.isNaN(b[k]) && !Number.isNaN(a[k]) ? 0 : b[k];
    out[k] = (bv - a[k]) * factor;
    if (Math.abs(out[k]) > max) max = Math.abs(out[k]);
  }
  return { values: out, width: layout.width, height: layout.height, bounds: layout.bounds, max, unit };
}

/**
 * The surface's value at a lon/lat point by bilinear interpolation on the metric grid.
 * @param g from {@link surfaceGridLoad}
 * @param lon degrees
 * @param lat degrees
 * @returns value in the run's unit (null outside the grid or study area) and the unit
 * @example
 * surfaceValueAt(g, -31.62, 38.47); // { value: 412.5, unit: 'km2' }
 */
export function surfaceValueAt(g: SurfaceGrid, lon: number, lat: number): { value: number | null; unit: 'km2' | 'sqmi' } {
  const [x, y] = g.converter.forwardPoint(lon, lat);
  const v = gridBilinearAt(g.values, g.spec, x, y);
  const unit = g.surface.params.unit;
  return { value: Number.isFinite(v) ? v * surfaceUnitFactor(unit) : null, unit };
}

/**
 * The 50/75/90 % percent-volume contours in lon/lat with thresholds in the run's unit.
 * @param em entity manager
 * @param scope organization and workspace
 * @param surfaceId the run
 * @returns GeoJSON FeatureCollection; properties percent, threshold, unit, areaKm2, clipped
 * @example
 * const fc = await surfaceContours(em, scope, id);
 */
export async function surfaceContours(em: EntityManager, scope: SurfaceScope, surfaceId: string) {
  const surface = await surfaceLoad(em, scope, surfaceId);
  if (surface.status !== 'succeeded') throw new ConflictError('SURFACE_NOT_READY', `This surface is ${surface.status}; results exist once it has succeeded.`);
  const raster = await em.findOne(SurfaceRasterSchema, { surface: surface.id, kind: 'intensity' }, { populate: ['contours'] });
  if (!raster) throw new NotFoundError('Surface raster');
  const unit = surface.params.unit;
  const factor = surfaceUnitFactor(unit);
  const fc = raster.contours as { features: { type: 'Feature'; properties: Record<string, unknown>; geometry: unknown }[] };
  return {
    type: 'FeatureCollection' as const,
    features: fc.features.map((f) => ({ ...f, properties: { ...f.properties, threshold: Number(f.properties.threshold) * factor, unit } })),
  };
}
