import { describe, expect, it } from 'vitest';
import { pointsFromLonLat } from '../points/points-from-lon-lat.js';
import { pointsProject } from '../points/points-project.js';
import { projectionConverter } from '../projection/projection-transform.js';
import { ringSignedArea2 } from './contour-geojson.js';
import { contourIsolines } from './contour-isolines.js';
import { contourPolygons } from './contour-polygons.js';
import { contourToLonLat } from './contour-to-lon-lat.js';

describe('contourToLonLat', () => {
  const { points, projection } = pointsProject(pointsFromLonLat([-31.8], [-38]));
  const conv = projectionConverter(projection);
  const spec = { originX: points.x[0] - 250, originY: points.y[0] - 250, cellSize: 100, width: 5, height: 5 };
  const values = new Float64Array(25).fill(1);
  values[12] = 5;
  values[0] = 0;
  it('reprojects to [lon, lat] around the original point, rings closed, exterior counter-clockwise', () => {
    const fc = contourToLonLat(contourPolygons(values, spec, [3, 0.5]), conv.inversePoint);
    const ring = fc.features[0].geometry.coordinates[0][0];
    expect(ring[0]).toEqual(ring[ring.length - 1]);
    expect(ringSignedArea2(ring)).toBeGreaterThan(0);
    const lon = ring.reduce((s, p) => s + p[0], 0) / ring.length;
    const lat = ring.reduce((s, p) => s + p[1], 0) / ring.length;
    expect(lon).toBeCloseTo(-31.8, 3);
    expect(lat).toBeCloseTo(-38, 3);
    expect(fc.features[1].geometry.coordinates[0][0].every((p) => Math.abs(p[0] + 31.8) < 0.01 && Math.abs(p[1] + 38) < 0.01)).toBe(true);
    expect(fc.features[0].properties.threshold).toBe(3);
  });
  it('reprojects iso-lines vertex by vertex', () => {
    const fc = contourToLonLat(contourIsolines(values, spec, [3]), conv.inversePoint);
    expect(fc.features[0].geometry.type).toBe('MultiLineString');
    expect(fc.features[0].geometry.coordinates[0][0][1]).toBeCloseTo(-38, 2);
  });
});
