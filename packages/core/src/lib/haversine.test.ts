import { describe, expect, it } from 'vitest';
import { EARTH_MEAN_RADIUS_M, haversineMetres } from './haversine.js';

describe('haversineMetres', () => {
  it('gives R·π/180 for one degree along a meridian [D]', () => {
    expect(haversineMetres(10, 20, 10, 21)).toBeCloseTo((EARTH_MEAN_RADIUS_M * Math.PI) / 180, 6);
  });
  it('gives R·cos φ·π/180 (nearly) for one degree of longitude at 45° [D: DOMAIN.md 78.6 km]', () => {
    expect(haversineMetres(0, 45, 1, 45) / 1000).toBeCloseTo(78.6, 1);
  });
  it('gives half the circumference between antipodes [D]', () => {
    expect(haversineMetres(0, 0, 180, 0)).toBeCloseTo(Math.PI * EARTH_MEAN_RADIUS_M, 3);
  });
});
