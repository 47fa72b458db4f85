import type { GridSpec } from '../types.js';
import type { ContourFeatureCollection, MultiLineStringGeometry, Position } from './contour-geojson.js';
import { contourPolygons } from './contour-polygons.js';

/**
 * Iso-lines (where the surface crosses each level) as GeoJSON MultiLineStrings in planar metres:
 * the boundaries of {@link contourPolygons} without the segments that touch the grid's outer edge.
 * Marching squares crosses levels only between cell centres, so a vertex on the outer edge (half a
 * cell beyond the outermost centres) only closes a polygon off; lines stop at the last crossing.
 *
 * @param values surface values, row-major i + j·width (j = 0 south)
 * @param spec the grid
 * @param levels finite levels
 * @returns a FeatureCollection with one MultiLineString feature per level
 * @example
 * contourIsolines(surface, spec, [5, 10, 20]);
 */
export function contourIsolines(values: ArrayLike<number>, spec: GridSpec, levels: number[]): ContourFeatureCollection<MultiLineStringGeometry> {
  const polys = contourPolygons(values, spec, levels);
  const x0 = spec.originX;
  const y0 = spec.originY;
  const x1 = x0 + spec.width * spec.cellSize;
  const y1 = y0 + spec.height * spec.cellSize;
  // Vertices on the outer edge are exact multiples computed the same way; compare with a tolerance.
  const eps = 1e-9 * spec.cellSize * Math.max(spec.width, spec.height);
  const edgeVertex = (p: Position): boolean =>
    Math.abs(p[0] - x0) < eps || Math.abs(p[0] - x1) < eps || Math.abs(p[1] - y0) < eps || Math.abs(p[1] - y1) < eps;
  const onEdge = (a: Position, b: Position): boolean => edgeVertex(a) || edgeVertex(b);
  return {
    type: 'FeatureCollection',
    features: polys.features.map((f) => {
      const lines: Position[][] = [];
      for (const poly of f.geometry.coordinates) {
        for (const ring of poly) {
          // Start the walk at a segment on the edge (if any) so a line is never split at the seam.
          const n = ring.length - 1;
          let start = 0;
          for (let k = 0; k < n; k++) if (onEdge(ring[k], ring[k + 1])) start = k + 1;
          let current: Position[] = [];
          for (let s = 0; s < n; s++) {
            const a = ring[(start + s) % n];
            const b = ring[(start + s + 1) % n];
            if (onEdge(a, b)) {
              if (current.length > 1) lines.push(current);
              current = [];
              continue;
            }
            if (current.length === 0) current.push(a);
            current.push(b);
          }
          if (current.length > 1) lines.push(current);
        }
      }
      return { type: 'Feature' as const, properties: { threshold: f.properties.threshold }, geometry: { type: 'MultiLineString' as const, coordinates: lines } };
    }),
  };
}
