import type { PlanarPoints } from '../types.js';
import { projectionForLonLat, type LocalProjection, type ProjectionKind } from '../projection/projection-for-lon-lat.js';
import { projectionConverter } from '../projection/projection-transform.js';
import type { LonLatPoints } from './points-from-lon-lat.js';

/**
 * Projects validated lon/lat points into a local metric projection chosen for them (UTM zone of
 * the data by default), so distances become Euclidean metres.
 *
 * @param points from `pointsFromLonLat`
 * @param options `projection`: 'utm' (default) or 'laea'; or a fixed `using` projection (e.g. the
 *   one stored with a workspace, so sites and customers share coordinates)
 * @returns planar points (metres; weights copied) and the projection used
 * @throws CoreError PROJECTION_SPAN when the data is too wide for the chosen projection
 * @example
 * const { points, projection } = pointsProject(pointsFromLonLat(lon, lat, spend));
 */
export function pointsProject(
  points: LonLatPoints,
  options: { projection?: ProjectionKind; using?: LocalProjection } = {},
): { points: PlanarPoints; projection: LocalProjection } {
  const projection = options.using ?? projectionForLonLat(points.lon, points.lat, { projection: options.projection });
  const { x, y } = projectionConverter(projection).forward(points.lon, points.lat);
  return { points: { x, y, w: points.w.slice() }, projection };
}
