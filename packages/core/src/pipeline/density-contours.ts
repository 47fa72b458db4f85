import type { ContourFeatureCollection } from '../contours/contour-geojson.js';
import { contourPercentVolume, type PercentVolumeLevel } from '../contours/contour-percent-volume.js';
import { contourPolygons } from '../contours/contour-polygons.js';
import { contourToLonLat } from '../contours/contour-to-lon-lat.js';
import type { ProjectionConverter } from '../projection/projection-transform.js';
import type { GridSpec } from '../types.js';

/** Percent-volume contours of a surface: the levels and their polygons. */
export interface DensityContours {
  /** One level per percent, in the order asked; empty when the surface is zero on the whole grid. */
  levels: PercentVolumeLevel[];
  /**
   * One MultiPolygon feature per level, largest percent first (smaller regions draw on top), with
   * properties percent, threshold (weight per km²), areaKm2 and clipped. `units` says whether the
   * coordinates are lon/lat degrees (RFC 7946) or planar metres (no projection).
   */
  geojson: ContourFeatureCollection & { units: 'degrees' | 'metres' };
}

/**
 * Percent-volume contours (default 50, 75, 90 %) of a surface, in lon/lat when a projection
 * converter is given, else in planar metres.
 *
 * @param intensity weight per km², row-major (j = 0 south)
 * @param spec the grid
 * @param percents levels in (0, 100]
 * @param converter local projection, to return lon/lat
 * @returns levels and a FeatureCollection
 * @example
 * const { levels, geojson } = densityContours(surface.intensity, spec, [50, 75, 90], converter);
 */
export function densityContours(
  intensity: Float64Array,
  spec: GridSpec,
  percents: number[] = [50, 75, 90],
  converter?: ProjectionConverter,
): DensityContours {
  const units = converter ? 'degrees' : 'metres';
  // A grid placed away from every customer holds no demand: no contours, but the surface is valid.
  if (!intensity.some((v) => v > 0)) return { levels: [], geojson: { type: 'FeatureCollection', units, features: [] } };
  const levels = contourPercentVolume(intensity, spec, percents);
  const ordered = [...levels].sort((a, b) => b.percent - a.percent);
  const planar = contourPolygons(
    intensity,
    spec,
    ordered.map((l) => l.threshold),
    ordered.map((l) => ({ percent: l.percent, areaKm2: l.area_m2 / 1e6, clipped: l.clipped })),
  );
  const fc = converter ? contourToLonLat(planar, converter.inversePoint) : planar;
  return { levels, geojson: { ...fc, units } };
}
