import { describe, expect, it } from 'vitest';
import { haversineMetres } from '../lib/haversine.js';
import { pointsFromLonLat } from './points-from-lon-lat.js';
import { pointsProject } from './points-project.js';

describe('pointsProject', () => {
  it('returns planar metres whose distances match the geodesic (< 0.5 %) and keeps weights', () => {
    const lonLat = pointsFromLonLat([-31.8, -31.75, -31.7], [-38, -37.98, -37.95], [5, 0, 2]);
    const { points, projection } = pointsProject(lonLat);
    expect(projection.epsg).toBe(32725);
    expect(Array.from(points.w)).toEqual([5, 0, 2]);
    const planar = Math.hypot(points.x[2] - points.x[0], points.y[2] - points.y[0]);
    // [D] haversine on the sphere of mean radius 6371.0088 km differs from the ellipsoid by up to
    // ≈ 0.3 % depending on direction (meridian radius 6,358 km vs prime-vertical 6,386 km at 38°S),
    // and the UTM scale is 0.9996–1.0003 here: 0.5 % bounds both.
    expect(Math.abs(planar / haversineMetres(-31.8, -38, -31.7, -37.95) - 1)).toBeLessThan(5e-3);
  });
  it('reuses a given projection', () => {
    const a = pointsProject(pointsFromLonLat([-31.8], [-38]));
    const b = pointsProject(pointsFromLonLat([-31.5], [-38.2]), { using: a.projection });
    expect(b.projection).toBe(a.projection);
  });
});
