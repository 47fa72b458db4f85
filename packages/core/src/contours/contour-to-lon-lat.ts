import { ringOrient, type ContourFeatureCollection, type MultiLineStringGeometry, type MultiPolygonGeometry, type Position } from './contour-geojson.js';

/**
 * Reprojects contour features from planar metres to lon/lat degrees (GeoJSON order [lon, lat]),
 * re-closing and re-orienting polygon rings after the transform (RFC 7946: exteriors
 * counter-clockwise, holes clockwise). Lines are reprojected vertex by vertex.
 *
 * @param fc planar contour features
 * @param inverse planar (x, y) → [lon, lat], e.g. `projectionConverter(p).inversePoint`
 * @returns a new FeatureCollection in degrees
 * @example
 * contourToLonLat(contourPolygons(surface, spec, [10]), projectionConverter(projection).inversePoint);
 */
export function contourToLonLat<G extends MultiPolygonGeometry | MultiLineStringGeometry>(
  fc: ContourFeatureCollection<G>,
  inverse: (x: number, y: number) => [number, number],
): ContourFeatureCollection<G> {
  const tr = (p: Position): Position => {
    const q = inverse(p[0], p[1]);
    return [q[0], q[1]];
  };
  return {
    type: 'FeatureCollection',
    features: fc.features.map((f) => {
      const g = f.geometry;
      const geometry =
        g.type === 'MultiPolygon'
          ? { type: 'MultiPolygon' as const, coordinates: g.coordinates.map((poly) => poly.map((ring, r) => ringOrient(ring.map(tr), r === 0))) }
          : { type: 'MultiLineString' as const, coordinates: g.coordinates.map((line) => line.map(tr)) };
      return { type: 'Feature' as const, properties: { ...f.properties }, geometry: geometry as G };
    }),
  };
}
