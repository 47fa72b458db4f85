import { pointsFromLonLat } from '../points/points-from-lon-lat.js';
import { pointsProject } from '../points/points-project.js';
import type { LocalProjection, ProjectionKind } from '../projection/projection-for-lon-lat.js';
import { projectionConverter, type ProjectionConverter } from '../projection/projection-transform.js';
import type { Extent } from '../types.js';
import { densityContours, type DensityContours } from './density-contours.js';
import { densityFromPlanar, type DensityPipelineOptions, type DensityPlanarResult } from './density-from-planar.js';

/** Options of {@link densityFromLonLat}: as the planar pipeline, but the extent is in degrees. */
export interface DensityLonLatOptions extends Omit<DensityPipelineOptions, 'extent'> {
  /** Study extent in WGS84 degrees: minX = west, minY = south, maxX = east, maxY = north. */
  extent?: Extent;
  /** Percent-volume contour levels, each in (0, 100]; default 50, 75, 90. */
  percents?: number[];
  /** 'utm' (default: the UTM zone of the data) or 'laea' (equal-area centred on the data, for wide or polar data). */
  projection?: ProjectionKind;
}

/** Everything a density job needs to store or show, with the projection to place it. */
export interface DensityLonLatResult extends DensityPlanarResult {
  projection: Pick<LocalProjection, 'kind' | 'epsg' | 'proj4' | 'label'>;
  /** Percent-volume thresholds (weight per km²) and contour polygons in lon/lat (GeoJSON). */
  contours: DensityContours;
  /** Converts the grid's planar metres back to degrees (e.g. cell centres for a CSV). */
  converter: ProjectionConverter;
}

/** Points per extent edge when projecting a lon/lat extent: projected edges are curves. */
const EDGE_SAMPLES = 32;

/**
 * The planar extent covering a lon/lat extent: its boundary is densified (32 points per edge) and
 * projected, and the bounding box of the projected points is taken — projected meridians and
 * parallels are curved, so the corners alone can miss part of the area.
 *
 * @param extent degrees (west, south, east, north)
 * @param converter the local projection
 * @returns planar metres
 * @example
 * extentProject({ minX: -38.7, minY: 44.4, maxX: -38.3, maxY: 44.6 }, converter);
 */
export function extentProject(extent: Extent, converter: ProjectionConverter): Extent {
  const lon: number[] = [];
  const lat: number[] = [];
  for (let k = 0; k <= EDGE_SAMPLES; k++) {
    const t = k / EDGE_SAMPLES;
    const x = extent.minX + t * (extent.maxX - extent.minX);
    const y = extent.minY + t * (extent.maxY - extent.minY);
    lon.push(x, x, extent.minX, extent.maxX);
    lat.push(extent.minY, extent.maxY, y, y);
  }
  const p = converter.forward(Float64Array.from(lon), Float64Array.from(lat));
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (let k = 0; k < p.x.length; k++) {
    minX = Math.min(minX, p.x[k]);
    maxX = Math.max(maxX, p.x[k]);
    minY = Math.min(minY, p.y[k]);
    maxY = Math.max(maxY, p.y[k]);
  }
  return { minX, minY, maxX, maxY };
}

/**
 * The whole density job from geocoded customers: validate → project (UTM zone of the data) →
 * bandwidth rule → cell size → grid → `densitySurface` → percent-volume contours in lon/lat.
 *
 * @param lon longitudes, degrees
 * @param lat latitudes, degrees
 * @param weight optional weights ≥ 0 (default 1 per customer)
 * @param options kernel, bandwidth (metres or rule), cell size, extent (degrees), method, cell limit, percents, projection, signal, progress
 * @returns projection (EPSG, proj4), grid, surface (intensity and share per km², stats), bandwidth and cell size with explanations, contours
 * @throws CoreError for bad points, bandwidth, extent, grid size or projection span
 * @example
 * const r = densityFromLonLat(lon, lat, spend, { kernel: 'quartic' });
 * r.projection.epsg; // 32624
 * r.contours.geojson.features.length; // 3 (50 %, 75 %, 90 %)
 */
export function densityFromLonLat(
  lon: ArrayLike<number>,
  lat: ArrayLike<number>,
  weight: ArrayLike<number> | undefined,
  options: DensityLonLatOptions = {},
): DensityLonLatResult {
  const valid = pointsFromLonLat(lon, lat, weight);
  const { points, projection } = pointsProject(valid, { projection: options.projection });
  const converter = projectionConverter(projection);
  const extent = options.extent ? extentProject(options.extent, converter) : undefined;
  const planar = densityFromPlanar(points, { ...options, extent });
  const contours = densityContours(planar.surface.intensity, planar.grid, options.percents, converter);
  return {
    ...planar,
    projection: { kind: projection.kind, epsg: projection.epsg, proj4: projection.proj4, label: projection.label },
    contours,
    converter,
  };
}
