/**
 * The small GeoJSON subset (RFC 7946) contours produce. Coordinates are [x, y] planar metres
 * before `contourToLonLat` and [lon, lat] degrees after it.
 */
export type Position = [number, number];

export interface MultiPolygonGeometry {
  type: 'MultiPolygon';
  /** Polygons → rings (first exterior, counter-clockwise; then holes, clockwise) → closed positions. */
  coordinates: Position[][][];
}

export interface MultiLineStringGeometry {
  type: 'MultiLineString';
  coordinates: Position[][];
}

export interface ContourFeature<G extends MultiPolygonGeometry | MultiLineStringGeometry> {
  type: 'Feature';
  properties: { threshold: number } & Record<string, unknown>;
  geometry: G;
}

export interface ContourFeatureCollection<G extends MultiPolygonGeometry | MultiLineStringGeometry = MultiPolygonGeometry> {
  type: 'FeatureCollection';
  features: Array<ContourFeature<G>>;
}

/**
 * Twice the signed area of a ring by the shoelace formula: positive when counter-clockwise in a
 * frame with y (or latitude) pointing up.
 *
 * @param ring positions, closed or not
 * @returns twice the signed area
 * @example
 * ringSignedArea2([[0, 0], [1, 0], [1, 1], [0, 0]]); // 1
 */
export function ringSignedArea2(ring: Position[]): number {
  let s = 0;
  for (let k = 0, n = ring.length; k < n; k++) {
    const a = ring[k];
    const b = ring[(k + 1) % n];
    s += a[0] * b[1] - b[0] * a[1];
  }
  return s;
}

/**
 * Closes a ring (last position = first) and orients it: counter-clockwise for exteriors,
 * clockwise for holes (RFC 7946 §3.1.6).
 *
 * @param ring positions
 * @param exterior true for a polygon's first ring
 * @returns a new, closed, oriented ring
 * @example
 * ringOrient([[0, 0], [0, 1], [1, 1]], true); // [[0,0],[1,1],[0,1],[0,0]]
 */
export function ringOrient(ring: Position[], exterior: boolean): Position[] {
  const out = ring.map((p) => [p[0], p[1]] as Position);
  const first = out[0];
  const last = out[out.length - 1];
  if (first[0] !== last[0] || first[1] !== last[1]) out.push([first[0], first[1]]);
  const ccw = ringSignedArea2(out) > 0;
  if (ccw !== exterior) out.reverse();
  return out;
}
