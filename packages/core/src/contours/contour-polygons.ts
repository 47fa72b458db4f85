import { contours } from 'd3-contour';
import { CoreError } from '../errors.js';
import type { GridSpec } from '../types.js';
import { ringOrient, type ContourFeatureCollection, type MultiPolygonGeometry, type Position } from './contour-geojson.js';

/**
 * Filled contour polygons (the region at or above each threshold) as GeoJSON MultiPolygons in
 * planar metres, by marching squares (d3-contour, linear interpolation between cell centres).
 * d3 reads values[x + y·width] and returns vertices in grid units with the centre of cell (i, j) at
 * (i + 0.5, j + 0.5), so a grid unit (gx, gy) is the planar point (originX + gx·cellSize,
 * originY + gy·cellSize); since our j grows northwards, no flip is needed. Regions are closed
 * along the grid's outer edge. Rings are oriented per RFC 7946 (exteriors counter-clockwise).
 * Non-finite cells count as below every threshold.
 *
 * @param values surface values, row-major i + j·width (j = 0 south)
 * @param spec the grid
 * @param thresholds finite levels
 * @param properties optional extra properties per threshold (e.g. `{ percent: 50 }`)
 * @returns a FeatureCollection with one MultiPolygon feature per threshold
 * @throws CoreError INVALID_ARGUMENT for a size mismatch or non-finite thresholds
 * @example
 * contourPolygons(surface, spec, [12.5, 40]).features[0].geometry.coordinates;
 */
export function contourPolygons(
  values: ArrayLike<number>,
  spec: GridSpec,
  thresholds: number[],
  properties?: Array<Record<string, unknown>>,
): ContourFeatureCollection<MultiPolygonGeometry> {
  const { width, height, originX, originY, cellSize } = spec;
  if (values.length !== width * height) {
    throw new CoreError('INVALID_ARGUMENT', `values must have width × height = ${width * height} entries (got ${values.length})`, 'values');
  }
  for (const t of thresholds) {
    if (typeof t !== 'number' || !Number.isFinite(t)) {
      throw new CoreError('INVALID_ARGUMENT', `contour thresholds must be finite numbers (got ${String(t)})`, 'thresholds');
    }
  }
  const clean = new Float64Array(values.length);
  for (let c = 0; c < clean.length; c++) clean[c] = Number.isFinite(values[c]) ? values[c] : -Infinity;
  const gen = contours().size([width, height]);
  const arr = clean as unknown as number[];
  return {
    type: 'FeatureCollection',
    features: thresholds.map((threshold, k) => {
      const g = gen.contour(arr, threshold);
      const coordinates = g.coordinates.map((poly) =>
        poly.map((ring, r) =>
          ringOrient(
            ring.map((p) => [originX + p[0] * cellSize, originY + p[1] * cellSize] as Position),
            r === 0,
          ),
        ),
      );
      return {
        type: 'Feature' as const,
        properties: { ...(properties?.[k] ?? {}), threshold },
        geometry: { type: 'MultiPolygon' as const, coordinates },
      };
    }),
  };
}
